import { describe, expect, it } from "vitest";
import {
  commentAddedMail,
  decisionMail,
  passwordResetMail,
  setupSubmittedMail,
  verifyAddressMail,
  type MailContent,
  type SetupFacts,
} from "@/lib/mail/templates";

const FACTS: SetupFacts = {
  setupName: "Ridge relay, spring",
  customerName: "Wren Halloway",
  modelName: "Ridge 1.1",
  worstFlag: "caution",
  freeLiftRatio: 0.183,
  payloadMassKg: 0.245,
  url: "http://localhost:3000/review/setup-1",
};
const HOSTILE = `Looks fine <script>alert("x")</script> & "quoted"`;

const EVERY_TEMPLATE: Record<string, MailContent> = {
  setupSubmittedMail: setupSubmittedMail(FACTS),
  commentAddedMail: commentAddedMail({
    setupName: FACTS.setupName,
    authorName: "Sunniva Rook",
    body: "Move the mount 4 cm aft.",
    url: FACTS.url,
  }),
  decisionMail: decisionMail({
    ...FACTS,
    decision: "changes_requested",
    reason: "The safety line is rated below the gust load.",
    reviewerName: "Sunniva Rook",
  }),
  passwordResetMail: passwordResetMail({
    name: "Wren Halloway",
    url: "http://localhost:3000/api/auth/reset-password/abc?callbackURL=%2Freset-password",
  }),
  verifyAddressMail: verifyAddressMail({ name: "Wren Halloway", url: "http://localhost:3000/api/auth/verify-email?token=abc" }),
};

describe("mail templates", () => {
  for (const [name, mail] of Object.entries(EVERY_TEMPLATE)) {
    it(`returns a subject, a plain text and an HTML document from ${name}`, () => {
      expect(mail.subject.trim().length).toBeGreaterThan(5);
      expect(mail.text.trim().length).toBeGreaterThan(20);
      expect(mail.html).toMatch(/^<!doctype html>/i);
      expect(mail.html).toContain("</html>");
      expect(mail.subject).not.toMatch(/[\r\n]/); // a header line: no line breaks
    });
  }

  it("escapes a <script> in a comment body in the HTML and keeps it verbatim in the text", () => {
    const mail = commentAddedMail({ setupName: "A <b>bold</b> name", authorName: "Tobin Aske", body: HOSTILE, url: FACTS.url });
    expect(mail.html).not.toContain("<script>");
    expect(mail.html).not.toContain("<b>bold</b>");
    expect(mail.html).toContain("&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; &quot;quoted&quot;");
    expect(mail.text).toContain(`> ${HOSTILE}`);
  });

  it("puts the setup's figures into the submission mail: payload mass in grams and the free-lift ratio", () => {
    const mail = setupSubmittedMail(FACTS);
    for (const part of [mail.text, mail.html]) {
      expect(part).toContain("245 g");
      expect(part).toContain("18.3 %");
      expect(part).toContain("Ridge 1.1");
    }
  });

  it("carries the reviewer's reason and a figure in a decision mail", () => {
    const mail = decisionMail({
      ...FACTS,
      decision: "changes_requested",
      reason: "The safety line is rated below the gust load.",
      reviewerName: "Sunniva Rook",
    });
    expect(mail.subject).toBe("Changes requested: Ridge relay, spring");
    expect(mail.text).toContain("The safety line is rated below the gust load.");
    expect(mail.html).toContain("The safety line is rated below the gust load.");
    expect(mail.text).toContain("245 g");
  });

  it("links to the given URL in the text and, attribute-escaped, in the HTML of a reset mail", () => {
    const url = "http://localhost:3000/api/auth/reset-password/abc?callbackURL=%2Freset-password&x=1";
    const mail = passwordResetMail({ name: "Wren", url });
    expect(mail.text).toContain(url);
    expect(mail.html).toContain(`href="${url.replace("&", "&amp;")}"`);
  });
});

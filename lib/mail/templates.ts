import type { DecisionOutcome, FlagLevel } from "@/lib/domain";

// Every message Trimrail sends, as plain text and as HTML from the same facts. Pure: no I/O, so
// the texts are tested directly and the outbox stores exactly what was rendered.

export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

const escapeHtml = (value: string): string =>
  value.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;").replace(/'/g, "&#39;");

const SIGN_OFF = "Trimrail — planning estimates only; follow local aviation rules and make a test flight on a safety line.";

interface MailLink {
  label: string;
  url: string;
}

/** One layout for every message: a heading, paragraphs, an optional quote, and its links. */
function render(
  subject: string,
  {
    heading,
    paragraphs,
    quote,
    link,
    links = link ? [link] : [],
  }: { heading: string; paragraphs: string[]; quote?: string; link?: MailLink; links?: MailLink[] },
): MailContent {
  const text = [
    heading,
    "",
    ...paragraphs.flatMap((p) => [p, ""]),
    ...(quote
      ? [
          quote
            .split("\n")
            .map((l) => `> ${l}`)
            .join("\n"),
          "",
        ]
      : []),
    ...links.flatMap((l) => [`${l.label}: ${l.url}`, ""]),
    "--",
    SIGN_OFF,
  ].join("\n");
  const html = [
    `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>${escapeHtml(subject)}</title></head>`,
    `<body style="font-family:system-ui,sans-serif;color:#14202e;background:#f5f3ee;padding:16px">`,
    `<div style="max-width:560px;margin:auto;background:#fff;border:1px solid #d9d6cf;padding:20px">`,
    `<h1 style="font-size:18px;margin:0 0 12px">${escapeHtml(heading)}</h1>`,
    ...paragraphs.map((p) => `<p style="margin:0 0 12px;line-height:1.5">${escapeHtml(p)}</p>`),
    ...(quote
      ? [
          `<blockquote style="margin:0 0 12px;padding:8px 12px;border-left:3px solid #1d7f7a;white-space:pre-wrap">${escapeHtml(quote)}</blockquote>`,
        ]
      : []),
    ...links.map((l) => `<p style="margin:0 0 12px"><a href="${escapeHtml(l.url)}" style="color:#176b66">${escapeHtml(l.label)}</a></p>`),
    `<p style="margin:16px 0 0;font-size:12px;color:#5f6670">${escapeHtml(SIGN_OFF)}</p>`,
    `</div></body></html>`,
  ].join("\n");
  return { subject, text, html };
}

export interface SetupFacts {
  setupName: string;
  customerName: string;
  modelName: string;
  worstFlag: FlagLevel | null;
  /** Free lift ÷ gross lift, as a fraction. */
  freeLiftRatio: number | null;
  payloadMassKg: number;
  url: string;
}

const factsLine = (f: SetupFacts): string =>
  `${f.modelName}; payload ${(f.payloadMassKg * 1000).toFixed(0)} g; free-lift ratio ${f.freeLiftRatio === null ? "unknown" : `${(f.freeLiftRatio * 100).toFixed(1)} %`}; worst flag ${f.worstFlag ?? "none"}.`;

/** To support staff: a customer submitted a setup for review. */
export function setupSubmittedMail(f: SetupFacts): MailContent {
  return render(`Review requested: ${f.setupName}`, {
    heading: `${f.customerName} submitted “${f.setupName}” for review`,
    paragraphs: [factsLine(f)],
    link: { label: "Open it on the Review desk", url: f.url },
  });
}

/** To the other side of the thread: someone commented on a setup. */
export function commentAddedMail(f: { setupName: string; authorName: string; body: string; url: string }): MailContent {
  return render(`New comment on ${f.setupName}`, {
    heading: `${f.authorName} commented on “${f.setupName}”`,
    paragraphs: [],
    quote: f.body,
    link: { label: "Read and reply", url: f.url },
  });
}

/** To the customer: their setup was approved or sent back, with the reviewer's reason. */
export function decisionMail(f: SetupFacts & { decision: DecisionOutcome; reason: string; reviewerName: string }): MailContent {
  const approved = f.decision === "approved";
  return render(approved ? `Approved: ${f.setupName}` : `Changes requested: ${f.setupName}`, {
    heading: approved ? `“${f.setupName}” is approved for its first flight` : `“${f.setupName}” needs changes before its first flight`,
    paragraphs: [
      `${f.reviewerName} ${approved ? "approved it" : "sent it back"}. ${factsLine(f)}`,
      ...(approved
        ? ["Print the field report and take it to the field; fly it first on a safety line."]
        : ["Change the setup in the Planner and submit it again."]),
    ],
    ...(f.reason ? { quote: f.reason } : {}),
    link: { label: "Open the setup", url: f.url },
  });
}

export function passwordResetMail(f: { name: string; url: string }): MailContent {
  return render("Reset your Trimrail password", {
    heading: `Hello ${f.name}`,
    paragraphs: [
      "Someone asked to reset the password of this account. If it was you, choose a new one with the link below within an hour. If it was not, ignore this message: nothing changes.",
    ],
    link: { label: "Choose a new password", url: f.url },
  });
}

export function verifyAddressMail(f: { name: string; url: string }): MailContent {
  return render("Confirm your e-mail address for Trimrail", {
    heading: `Hello ${f.name}`,
    paragraphs: ["Confirm that this address is yours, so that review decisions and password resets reach you."],
    link: { label: "Confirm the address", url: f.url },
  });
}

/** To the holder of an address someone tried to sign up with again: nothing changed. */
export function signUpAttemptMail(f: { name: string; signInUrl: string; resetUrl: string }): MailContent {
  return render("Someone tried to sign up with your address", {
    heading: `Hello ${f.name}`,
    paragraphs: [
      "Someone just tried to create a Trimrail account with this e-mail address, which already has one. Nothing about your account has changed, and no new account was made.",
      "If it was you, sign in instead; if you no longer know the password, choose a new one. If it was not you, you can ignore this message.",
    ],
    links: [
      { label: "Sign in", url: f.signInUrl },
      { label: "Choose a new password", url: f.resetUrl },
    ],
  });
}

import { describe, expect, it } from "vitest";
import { signUpAttemptMail } from "@/lib/mail/templates";

describe("the mail to an address someone tried to sign up with again", () => {
  const mail = signUpAttemptMail({
    name: `Wren "<b>" Halloway`,
    signInUrl: "http://localhost:3000/sign-in",
    resetUrl: "http://localhost:3000/forgot-password",
  });

  it("says nothing changed and links to signing in and to choosing a new password", () => {
    expect(mail.subject).toBe("Someone tried to sign up with your address");
    expect(mail.text).toContain("Nothing about your account has changed");
    expect(mail.text).toContain("Sign in: http://localhost:3000/sign-in");
    expect(mail.text).toContain("Choose a new password: http://localhost:3000/forgot-password");
    expect(mail.html).toContain('<a href="http://localhost:3000/sign-in"');
    expect(mail.html).toContain('<a href="http://localhost:3000/forgot-password"');
  });

  it("escapes the name in the HTML", () => {
    expect(mail.html).toContain("Hello Wren &quot;&lt;b&gt;&quot; Halloway");
    expect(mail.html).not.toContain("<b>");
  });
});

import { describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD } from "../../db/seed-data";
import { ApiClient } from "../support/http";
import { keptMailIds, linkIn, waitForMail } from "../support/mail";
import { requestSignUp } from "../support/sign-up";

// Password reset and address verification end to end: real HTTP to the running app, real SMTP to
// its fake, the link read back from the kept .eml file.

const baseURL = inject("baseURL");
const mailDir = inject("mailDir");
// A demo customer that no other API test signs in as; its password is set back at the end.
const DEMO_EMAIL = "kasper@trimrail.test";
const NEW_PASSWORD = "a-fresh-long-password";

async function requestReset(email: string): Promise<Response> {
  return new ApiClient(baseURL).request("POST", "/api/auth/request-password-reset", { email, redirectTo: "/reset-password" });
}

/** Follows the mail's link through better-auth's check to our page; returns the token it hands over. */
async function tokenFromResetMail(text: string): Promise<string> {
  const link = linkIn(text, "/api/auth/reset-password/");
  expect(link.origin).toBe(baseURL);
  const check = await new ApiClient(baseURL).get(link.pathname + link.search);
  expect(check.status).toBe(302);
  const landing = new URL(check.headers.get("location") ?? "", baseURL);
  expect(landing.pathname).toBe("/reset-password");
  const token = landing.searchParams.get("token");
  expect(token).toBeTruthy();
  const page = await new ApiClient(baseURL).get(landing.pathname + landing.search);
  expect(page.status).toBe(200);
  expect(await page.text()).toContain('data-testid="reset-password-form"');
  return token!;
}

async function resetPassword(token: string, newPassword: string): Promise<Response> {
  return new ApiClient(baseURL).request("POST", "/api/auth/reset-password", { token, newPassword });
}

async function signInStatus(email: string, password: string): Promise<number> {
  return (await new ApiClient(baseURL).signIn(email, password)).status;
}

describe("password reset through the captured mail", () => {
  it("resets a demo customer's password from the mailed link, then signs in with the new one only", async () => {
    const before = await keptMailIds(mailDir);
    const response = await requestReset(DEMO_EMAIL);
    expect(response.status).toBe(200);

    const mail = await waitForMail({ dir: mailDir, to: DEMO_EMAIL, subject: /Reset your Trimrail password/, except: before });
    expect(mail.text).toContain("Kasper Lindqvet");
    expect(mail.html).toContain("Choose a new password");
    const token = await tokenFromResetMail(mail.text);

    expect((await resetPassword(token, NEW_PASSWORD)).status).toBe(200);
    expect(await signInStatus(DEMO_EMAIL, NEW_PASSWORD)).toBe(200);
    expect(await signInStatus(DEMO_EMAIL, DEMO_PASSWORD)).toBe(401);

    // A link works once.
    const reused = await resetPassword(token, "yet-another-password");
    expect(reused.status).toBe(400);
    expect(((await reused.json()) as { code: string }).code).toBe("INVALID_TOKEN");

    // Set it back through a second mail, so the demo account is as seeded for every other test.
    const seen = await keptMailIds(mailDir);
    expect((await requestReset(DEMO_EMAIL)).status).toBe(200);
    const second = await waitForMail({ dir: mailDir, to: DEMO_EMAIL, subject: /Reset your Trimrail password/, except: seen });
    expect((await resetPassword(await tokenFromResetMail(second.text), DEMO_PASSWORD)).status).toBe(200);
    expect(await signInStatus(DEMO_EMAIL, DEMO_PASSWORD)).toBe(200);
  });

  it("gives a registered and an unknown address the same answer, and mails only the registered one", async () => {
    const unknown = `nobody-${Date.now()}@trimrail.test`;
    const before = await keptMailIds(mailDir);
    const [registered, stranger] = await Promise.all([requestReset("mirela@trimrail.test"), requestReset(unknown)]);
    expect(stranger.status).toBe(registered.status);
    expect(registered.status).toBe(200);
    expect(await stranger.json()).toEqual(await registered.json());

    await waitForMail({ dir: mailDir, to: "mirela@trimrail.test", subject: /Reset your Trimrail password/, except: before });
    await expect(waitForMail({ dir: mailDir, to: unknown, except: before, timeoutMs: 1_500 })).rejects.toThrow(/no mail/);
  });

  it("answers a malformed address with 400 and sends nothing", async () => {
    const before = await keptMailIds(mailDir);
    const response = await requestReset("not-an-address");
    expect(response.status).toBe(400);
    await new Promise((r) => setTimeout(r, 500));
    expect(await keptMailIds(mailDir)).toEqual(before);
  });

  it("refuses a new password that breaks the sign-up rule, says why, and keeps the old one", async () => {
    const before = await keptMailIds(mailDir);
    expect((await requestReset("tobin@trimrail.test")).status).toBe(200);
    const mail = await waitForMail({ dir: mailDir, to: "tobin@trimrail.test", except: before });
    const token = await tokenFromResetMail(mail.text);
    for (const [password, code] of [
      ["short", "PASSWORD_TOO_SHORT"],
      [" ".repeat(12), "PASSWORD_TOO_SHORT"],
      ["password1234", "PASSWORD_TOO_WEAK"],
    ]) {
      const refused = await resetPassword(token, password);
      expect(refused.status, password).toBe(400);
      expect(((await refused.json()) as { code: string }).code, password).toBe(code);
    }
    expect(await signInStatus("tobin@trimrail.test", DEMO_PASSWORD)).toBe(200);
  });

  it("sends the reset page of an expired or used link to ask for a new one", async () => {
    const page = await new ApiClient(baseURL).get("/reset-password?error=INVALID_TOKEN");
    expect(page.status).toBe(200);
    expect(await page.text()).toContain('data-testid="reset-password-expired"');
  });
});

describe("address verification through the captured mail", () => {
  it("mails a new account a link that confirms its address and signs it in; no session before that", async () => {
    const email = `verify-${Date.now()}@trimrail.test`;
    const client = new ApiClient(baseURL);
    const signUp = await requestSignUp(client, { name: "Ilse Varrow", email, password: "copper-kettle-orbit" });
    expect(signUp.status).toBe(200);
    expect(await (await client.get("/api/auth/get-session")).json()).toBeNull();

    const mail = await waitForMail({ dir: mailDir, to: email, subject: /Confirm your e-mail address/ });
    const link = linkIn(mail.text, "/api/auth/verify-email");
    const verify = await client.get(link.pathname + link.search);
    expect(verify.status).toBe(302);
    expect(new URL(verify.headers.get("location") ?? "", baseURL).pathname).toBe("/setups");

    const verified = (await (await client.get("/api/auth/get-session")).json()) as { user: { emailVerified: boolean } };
    expect(verified.user.emailVerified).toBe(true);
  });
});

import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { CapturedMailPage, ForgotPasswordPage, ResetPasswordPage, SignUpPage } from "../support/auth-pages";
import { AppShell, SignInPage, launchBrowser, newPersonContext, screenshot } from "../support/browser";
import { DEMO_PASSWORD } from "../../db/seed-data";
import { ApiClient } from "../support/http";
import { keptMailIds, linkIn, waitForMail } from "../support/mail";
import { signUpAndVerify, uniqueEmail } from "../support/sign-up";

const baseURL = inject("baseURL");
const mailDir = inject("mailDir");
let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("forgotten password in Chromium", () => {
  it("asks for a link from the sign-in page, follows the captured mail, sets a new password and signs in with it", async () => {
    // A fresh account, so no other test's password changes.
    const email = `forgot-${Date.now()}@trimrail.test`;
    await signUpAndVerify({ baseURL, mailDir, name: "Ilse Varrow", email, password: "the-first-password" });

    const context = await newPersonContext(browser, baseURL);
    const page = await context.newPage();
    await new SignInPage(page).open();
    await page.getByRole("link", { name: "Forgot your password?" }).click();
    await page.waitForURL(/\/forgot-password$/);
    expect(await new ForgotPasswordPage(page).ask(email)).toContain(email);
    await screenshot(page, "mail-forgot-password-sent");

    const mail = await waitForMail({ dir: mailDir, to: email, subject: /Reset your Trimrail password/ });
    const link = linkIn(mail.text, "/api/auth/reset-password/");
    await page.goto(link.href);
    await page.waitForURL(/\/reset-password\?token=/);
    await screenshot(page, "mail-reset-password-form");

    const reset = new ResetPasswordPage(page);
    await reset.setPassword("the-second-password", "not-the-same-one");
    await expect(page.getByText("The two passwords differ.").isVisible()).resolves.toBe(true);
    // The server's own check, shown at the field it is about and read out with it.
    await reset.setPassword("password1234");
    await expect(reset.passwordError()).resolves.toMatch(/too easy to guess/);
    await reset.setPassword("the-second-password");
    await page.getByTestId("reset-password-done").waitFor();
    await page.getByRole("link", { name: "Sign in with it" }).click();
    await page.waitForURL(/\/sign-in$/);
    await new SignInPage(page).signIn(email, "the-second-password");
    await page.waitForURL(/\/setups$/);

    // The link is spent: opening it again offers a new one.
    await page.goto(link.href);
    await page.getByTestId("reset-password-expired").waitFor();
    await context.close();
  });

  it("shows the maker the captured message on /dev/mail, its HTML in a sandboxed frame", async () => {
    const email = `seen-${Date.now()}@trimrail.test`;
    expect(
      (
        await new ApiClient(baseURL).request("POST", "/api/auth/sign-up/email", {
          name: "Bram Osterlund",
          email,
          password: "copper-kettle-orbit",
        })
      ).status,
    ).toBe(200);
    await waitForMail({ dir: mailDir, to: email, subject: /Confirm your e-mail address/ });

    const context = await newPersonContext(browser, baseURL);
    const page = await context.newPage();
    await new SignInPage(page).open("/dev/mail");
    await new SignInPage(page).signIn("maker@trimrail.test", DEMO_PASSWORD);
    await page.waitForURL(/\/dev\/mail$/);
    const captured = new CapturedMailPage(page);
    await captured.open();
    await screenshot(page, "mail-dev-mail-list");
    await captured.openMessage("Confirm your e-mail address for Trimrail", email);
    expect(await page.getByTestId("captured-mail-to").innerText()).toContain(email);
    expect(await page.getByTestId("captured-mail-text").getByRole("link").first().getAttribute("href")).toContain(
      "/api/auth/verify-email?token=",
    );
    expect(await page.getByTestId("captured-mail-html").getAttribute("sandbox")).toBe("");
    const frame = page.frameLocator('[data-testid="captured-mail-html"]');
    await expect(frame.getByRole("heading", { name: "Hello Bram Osterlund" }).isVisible()).resolves.toBe(true);
    await screenshot(page, "mail-dev-mail-message");
    await context.close();
  });
});

describe("signing up in Chromium", () => {
  it("shows the server's password refusal at the field, then asks to check the mail, whose link signs in", async () => {
    const email = uniqueEmail("signup");
    const context = await newPersonContext(browser, baseURL);
    const page = await context.newPage();
    const signUp = new SignUpPage(page);
    await signUp.open();

    // Long enough for the form's own check, refused by the server's common-password check.
    await signUp.signUp({ name: "Nell Ardrey", email, password: "password1234" });
    await expect(signUp.passwordError()).resolves.toMatch(/too easy to guess.*password/);
    await screenshot(page, "sign-up-weak-password");

    // Blank-ish: refused before it is sent.
    await signUp.signUp({ name: "Nell Ardrey", email, password: " ".repeat(12) });
    await expect(signUp.passwordError()).resolves.toMatch(/at least 10 characters/);

    const before = await keptMailIds(mailDir);
    await signUp.signUp({ name: "Nell Ardrey", email, password: "copper-kettle-orbit" });
    await expect(signUp.sentMessage()).resolves.toMatch(
      new RegExp(`Check your mail to finish signing up.*${email.replace(/[.+]/g, "\\$&")}`, "s"),
    );
    await screenshot(page, "sign-up-check-your-mail");

    const mail = await waitForMail({ dir: mailDir, to: email, subject: /Confirm your e-mail address/, except: before });
    await page.goto(linkIn(mail.text, "/api/auth/verify-email").href);
    await page.waitForURL(/\/setups$/);
    expect(await new AppShell(page).role()).toMatch(/customer/i);
    await context.close();
  });

  it("shows the same view for an address that already has an account", async () => {
    const context = await newPersonContext(browser, baseURL);
    const page = await context.newPage();
    const signUp = new SignUpPage(page);
    await signUp.open();
    await signUp.signUp({ name: "Not Wren", email: "customer@trimrail.test", password: "copper-kettle-orbit" });
    await expect(signUp.sentMessage()).resolves.toMatch(/Check your mail to finish signing up.*customer@trimrail\.test/s);
    await context.close();
  });
});

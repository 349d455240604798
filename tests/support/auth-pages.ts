import type { Locator, Page } from "playwright-core";
import { expect } from "vitest";

/** Page object for /forgot-password. */
export class ForgotPasswordPage {
  constructor(private readonly page: Page) {}

  async ask(email: string): Promise<string> {
    const form = this.page.getByTestId("forgot-password-form");
    await form.getByLabel("E-mail").fill(email);
    await form.getByRole("button", { name: "Send me a link" }).click();
    return this.page.getByTestId("forgot-password-sent").innerText();
  }
}

/** Page object for /reset-password (opened from the mailed link). */
export class ResetPasswordPage {
  constructor(private readonly page: Page) {}

  async setPassword(password: string, confirmation = password): Promise<void> {
    const form = this.page.getByTestId("reset-password-form");
    await form.getByLabel("New password").fill(password);
    await form.getByLabel("The same again").fill(confirmation);
    await form.getByRole("button", { name: "Set the new password" }).click();
  }

  /** The message tied to the new-password field by aria-describedby (waits for it). */
  async passwordError(): Promise<string> {
    return describedError(this.page, this.page.getByTestId("reset-password-form").getByLabel("New password"));
  }
}

/** The text of the alert among the ids in the field's aria-describedby, once there is one. */
async function describedError(page: Page, field: Locator): Promise<string> {
  await expect.poll(async () => (await field.getAttribute("aria-invalid")) === "true").toBe(true);
  const ids = ((await field.getAttribute("aria-describedby")) ?? "").split(/\s+/).filter(Boolean);
  const texts = await Promise.all(ids.map((id) => page.locator(`[id="${id}"][role="alert"]`).allInnerTexts()));
  return texts.flat().join(" ");
}

/** Page object for /sign-up. */
export class SignUpPage {
  constructor(private readonly page: Page) {}

  async open(): Promise<void> {
    await this.page.goto("/sign-up");
  }

  async signUp({ name, email, password }: { name: string; email: string; password: string }): Promise<void> {
    const form = this.page.getByTestId("sign-up-form");
    await form.getByLabel("Name").fill(name);
    await form.getByLabel("E-mail").fill(email);
    await form.getByLabel("Password").fill(password);
    await form.getByRole("button", { name: "Create account" }).click();
  }

  async passwordError(): Promise<string> {
    return describedError(this.page, this.page.getByTestId("sign-up-form").getByLabel("Password"));
  }

  /** The view that replaces the form once the server has answered. */
  async sentMessage(): Promise<string> {
    return this.page.getByTestId("sign-up-sent").innerText();
  }
}

/** Page object for the maker's /dev/mail. */
export class CapturedMailPage {
  constructor(private readonly page: Page) {}

  async open(): Promise<void> {
    await this.page.goto("/dev/mail");
    await this.page.getByTestId("captured-mail-list").waitFor();
  }

  async openMessage(subject: string, to: string): Promise<void> {
    await this.page.getByTestId("captured-mail-row").filter({ hasText: to }).getByRole("link", { name: subject }).first().click();
    await this.page.getByTestId("captured-mail-text").waitFor();
  }
}

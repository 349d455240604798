import type { Page } from "playwright-core";

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

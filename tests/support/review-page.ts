import type { Page } from "playwright-core";

/** Page object for the review desk's queue (/review). */
export class ReviewQueuePage {
  constructor(readonly page: Page) {}

  async open(query = ""): Promise<void> {
    await this.page.goto(`/review${query}`);
    await this.page.getByTestId("review-queue").waitFor();
  }

  async search(text: string): Promise<void> {
    await this.page.getByTestId("queue-search").fill(text);
    await this.page.waitForURL((url) => url.searchParams.get("q") === text);
    await this.settled();
  }

  /** Until the table shows the answer to the present URL (it keeps the old rows while it asks). */
  async settled(): Promise<void> {
    await this.page.locator('[data-testid="review-queue"][aria-busy="false"]').waitFor();
  }

  row(setupName: string) {
    return this.page.getByTestId("queue-row").filter({ hasText: setupName });
  }

  async openSetup(setupName: string): Promise<void> {
    await this.row(setupName).getByRole("link", { name: setupName }).click();
    await this.page.getByTestId("review-page").waitFor();
  }
}

/** Page object for one setup under review (/review/:id). */
export class ReviewSetupPage {
  constructor(readonly page: Page) {}

  async status(): Promise<string> {
    return (await this.page.getByTestId("review-status").innerText()).trim();
  }

  async sendBack(reason: string): Promise<void> {
    const form = this.page.getByTestId("decision-form");
    await form.getByTestId("decision-send-back").check();
    await form.getByTestId("decision-reason").fill(reason);
    await form.getByTestId("decision-submit").click();
    await this.page.getByTestId("decision-closed").waitFor();
  }

  async approve(note: string): Promise<void> {
    const form = this.page.getByTestId("decision-form");
    await form.getByTestId("decision-approve").check();
    await form.getByTestId("decision-reason").fill(note);
    await form.getByTestId("decision-submit").click();
    await this.page.getByTestId("decision-closed").waitFor();
  }

  async comment(text: string): Promise<void> {
    await this.page.getByTestId("comment-input").fill(text);
    await this.page.getByTestId("comment-send").click();
    await this.page.getByTestId("thread-comment").filter({ hasText: text }).waitFor();
  }
}

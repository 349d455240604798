import type { Browser, BrowserContext, BrowserContextOptions, Locator, Page } from "playwright-core";
import { ApiClient } from "./http";
import { inject } from "vitest";
import { signUpAndVerify } from "./sign-up";

/** Page object for the Setups list (/setups): the new-setup form, the table and its pager. */
export class SetupsPage {
  constructor(readonly page: Page) {}

  async open(query = ""): Promise<void> {
    await this.page.goto(`/setups${query}`);
    await this.page.getByTestId("new-setup-form").waitFor();
  }

  get rows(): Locator {
    return this.page.getByTestId("setup-row");
  }

  get problem(): Locator {
    return this.page.getByTestId("new-setup-problem");
  }

  /** Fills the form and presses "New setup" (a real form post when JavaScript is off). */
  /** `model`: an option's value (the model's id) or its label. */
  async createSetup(name: string, model: string): Promise<void> {
    const form = this.page.getByTestId("new-setup-form");
    await form.getByLabel("Name").fill(name);
    await form.getByLabel("Envelope model").selectOption(model);
    await this.page.getByTestId("new-setup").click();
  }

  /** The row's own Duplicate and Delete buttons. */
  actionsOf(row: Locator): { duplicate: Locator; remove: Locator } {
    return { duplicate: row.getByRole("button", { name: /^Duplicate / }), remove: row.getByRole("button", { name: /^Delete / }) };
  }
}

/**
 * A browser context signed in as a newly signed-up customer (through the real sign-up route), so a test
 * can give the person setups of their own and can turn JavaScript off without needing the sign-in form.
 */
export async function signedUpContext(
  browser: Browser,
  baseURL: string,
  name: string,
  options: BrowserContextOptions = {},
): Promise<{ context: BrowserContext; api: ApiClient }> {
  const email = `${name.toLowerCase().replace(/\W+/g, "-")}-${Date.now()}-${Math.floor(Math.random() * 1e6)}@trimrail.test`;
  // New accounts confirm their address before they may sign in: follow the captured mail's link.
  const api = await signUpAndVerify({ baseURL, mailDir: inject("mailDir"), name, email, password: "quiet-harbour-lantern-93" });
  const context = await browser.newContext({
    baseURL,
    viewport: { width: 1360, height: 900 },
    extraHTTPHeaders: { "x-forwarded-for": api.address },
    ...options,
  });
  const cookies = api
    .cookieHeader()
    .split("; ")
    .map((pair) => ({ name: pair.slice(0, pair.indexOf("=")), value: pair.slice(pair.indexOf("=") + 1), url: baseURL }));
  await context.addCookies(cookies);
  return { context, api };
}

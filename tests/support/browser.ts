import { mkdirSync } from "node:fs";
import path from "node:path";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";

// Debian's Chromium with the flags known to work on these machines (WebGL through SwiftShader).
export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
export const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export const SCREENSHOT_DIR = path.join(process.cwd(), "test-output", "screenshots");

export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS, headless: true });
}

let clientCounter = 0;

/**
 * A fresh context per person. Each gets its own client address header, so better-auth's per-address
 * sign-in limit counts each simulated person separately (as it would count separate machines).
 */
export async function newPersonContext(browser: Browser, baseURL: string): Promise<BrowserContext> {
  clientCounter += 1;
  return browser.newContext({
    baseURL,
    viewport: { width: 1360, height: 900 },
    extraHTTPHeaders: { "x-forwarded-for": `10.77.${Math.floor(clientCounter / 250)}.${(clientCounter % 250) + 1}` },
  });
}

export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  const file = path.join(SCREENSHOT_DIR, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

/** Page object for /sign-in. */
export class SignInPage {
  constructor(private readonly page: Page) {}

  async open(next?: string): Promise<void> {
    await this.page.goto(next ? `/sign-in?next=${encodeURIComponent(next)}` : "/sign-in");
  }

  async signIn(email: string, password: string): Promise<void> {
    const form = this.page.getByTestId("sign-in-form");
    await form.getByLabel("E-mail").fill(email);
    await form.getByLabel("Password").fill(password);
    await form.getByRole("button", { name: "Sign in" }).click();
  }
}

/** Page object for the signed-in shell. */
export class AppShell {
  constructor(private readonly page: Page) {}

  async navLabels(): Promise<string[]> {
    await this.page.getByTestId("main-nav").waitFor();
    return this.page.getByTestId("main-nav").getByRole("link").allInnerTexts();
  }

  async role(): Promise<string> {
    return (await this.page.getByTestId("viewer-role").innerText()).trim();
  }
}

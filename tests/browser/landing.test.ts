import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD } from "../../db/seed-data";
import { SignInPage, launchBrowser, newPersonContext } from "../support/browser";

// The landing page comes from the Pages Router with no runtime (pages/index.tsx); the rest of the
// app is the App Router's. Moving between the two must work, and the page must look like the others.

const baseURL = inject("baseURL");
const PAPER = "rgb(245, 243, 238)"; // --color-paper, app/globals.css
let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("the landing page in Chromium", () => {
  it("opens from the sign-in page's logo with the site's styles and fonts, and loads no script", async () => {
    const context = await newPersonContext(browser, baseURL);
    const page = await context.newPage();
    await page.goto("/sign-in");
    await page
      .getByRole("main")
      .getByRole("link")
      .filter({ has: page.getByTestId("logo") })
      .click();
    await page.waitForURL(`${baseURL}/`);

    const scripts: string[] = [];
    page.on("request", (request) => (request.resourceType() === "script" ? scripts.push(request.url()) : undefined));
    await page.reload();
    await page.getByRole("heading", { level: 1 }).waitFor();
    const look = await page.evaluate(async () => {
      await document.fonts.ready;
      return {
        background: getComputedStyle(document.body).backgroundColor,
        headingFont: getComputedStyle(document.querySelector("h1") as Element).fontFamily,
        headingFontLoaded: document.fonts.check('700 16px "Space Grotesk"'),
      };
    });
    expect(look).toEqual({ background: PAPER, headingFont: expect.stringMatching(/^"Space Grotesk"/), headingFontLoaded: true });
    expect(scripts).toEqual([]);
    await context.close();
  });

  it("offers a signed-in customer a link that opens their setups", async () => {
    const context = await newPersonContext(browser, baseURL);
    const page = await context.newPage();
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn("customer@trimrail.test", DEMO_PASSWORD);
    await page.waitForURL(/\/setups$/);
    await page.goto("/");
    expect(await page.getByRole("navigation").getByRole("link").allInnerTexts()).toEqual(["Open your setups"]);
    await page.getByRole("link", { name: "Open your setups" }).click();
    await page.waitForURL(/\/setups$/);
    await page.getByTestId("main-nav").waitFor();
    await context.close();
  });
});

import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD } from "../../db/seed-data";
import { SignInPage, launchBrowser, newPersonContext, screenshot } from "../support/browser";

const baseURL = inject("baseURL");
const SECTIONS = [
  "insight-payload-mass",
  "insight-setup-mass",
  "insight-templates",
  "insight-rail",
  "insight-free-lift",
  "insight-flags",
  "insight-months",
  "insight-reasons",
];
let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("Insight in Chromium", () => {
  it("shows every chart for the demo data, each with its table, and follows the model filter", async () => {
    const context = await newPersonContext(browser, baseURL);
    const page = await context.newPage();
    const signIn = new SignInPage(page);
    await signIn.open("/insight");
    await signIn.signIn("maker@trimrail.test", DEMO_PASSWORD);
    await page.waitForURL(/\/insight$/);
    for (const id of SECTIONS) await page.getByTestId(`${id}-chart`).locator(".recharts-wrapper").waitFor();
    await screenshot(page, "insight-1-charts");

    await page.getByTestId("insight-templates-toggle").click();
    const table = page.getByTestId("insight-templates-table");
    await table.waitFor();
    const names = await table.locator("tbody tr td:first-child").allInnerTexts();
    expect(names).toContain("Quarter-wave VHF whip");

    await page.getByTestId("insight-model").selectOption({ label: "Ridge 0.6" });
    await page.waitForURL(/model=mdl-ridge-06/);
    await page.getByTestId("insight-rail-toggle").click();
    await expect
      .poll(async () => [...new Set(await page.getByTestId("insight-rail-table").locator("tbody tr td:first-child").allInnerTexts())])
      .toEqual(["Ridge 0.6"]);
    await screenshot(page, "insight-2-filtered-tables");
    await context.close();
  });
});

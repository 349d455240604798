import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { launchBrowser, screenshot } from "../support/browser";
import { SetupsPage, signedUpContext } from "../support/setups-page";

// The Setups list on a phone-sized screen (390 × 844 CSS pixels, a common phone viewport) and wide.
const baseURL = inject("baseURL");
const PHONE = { width: 390, height: 844 };
const PAGE_SIZE = 25;
let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const pageOverflowPx = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);

describe("the Setups list at 390 × 844", () => {
  it("fits the phone without sideways scrolling, keeps every row's facts and actions in view, and pages", async () => {
    const { context, api } = await signedUpContext(browser, baseURL, "Noor Narrowfield", { viewport: PHONE });
    // One more than a page, with a long unbroken name to push the width.
    for (let n = 1; n <= PAGE_SIZE + 1; n += 1) {
      const name =
        n === 1 ? "Orchardcameramastwithaverylongunbrokenname-north-east-corner" : `Phone test setup ${String(n).padStart(2, "0")}`;
      const made = await api.request("POST", "/api/setups", { modelId: n % 2 ? "mdl-ridge-06" : "mdl-ridge-11", name });
      expect(made.status).toBe(201);
    }
    const setups = new SetupsPage(await context.newPage());
    await setups.open();
    await expect.poll(() => setups.rows.count()).toBe(PAGE_SIZE);
    expect(await pageOverflowPx(setups.page)).toBeLessThanOrEqual(0);
    // A table still: its two narrow columns have headers; the other facts are listed under each name.
    await expect(setups.page.getByTestId("setup-table").getByRole("columnheader").count()).resolves.toBe(2);
    const firstFacts = setups.rows.first().getByTestId("setup-facts");
    expect(await firstFacts.isVisible()).toBe(true);
    expect(await firstFacts.innerText()).toMatch(
      /Envelope\s+Ridge \d\.\d[\s\S]*Status\s+draft[\s\S]*Worst flag[\s\S]*Last change\s+\d{4}-\d{2}-\d{2}/,
    );

    for (let i = 0; i < PAGE_SIZE; i += 1) {
      const row = setups.rows.nth(i);
      await row.scrollIntoViewIfNeeded();
      for (const button of Object.values(setups.actionsOf(row))) {
        const box = await button.boundingBox();
        expect(box, `row ${i}`).not.toBeNull();
        expect(box!.x, `row ${i}`).toBeGreaterThanOrEqual(0);
        expect(box!.x + box!.width, `row ${i}`).toBeLessThanOrEqual(PHONE.width);
        // Clickable: nothing covers the button's centre.
        const hit = await button.evaluate((el) => {
          const r = el.getBoundingClientRect();
          return el.contains(document.elementFromPoint(r.x + r.width / 2, r.y + r.height / 2));
        });
        expect(hit, `row ${i}`).toBe(true);
      }
    }
    await setups.page.evaluate(() => window.scrollTo(0, 0));
    await screenshot(setups.page, "setups-list-390");

    // Duplicate and Delete (with its confirm, which must fit too) work from the phone.
    const last = setups.rows.last();
    const lastName = await last.locator("td:first-child a").innerText();
    await setups.actionsOf(last).duplicate.click();
    await expect.poll(() => setups.page.getByTestId("pager").innerText()).toMatch(/of 2 · 27 in all/);
    const copy = setups.rows.filter({ hasText: `Copy of ${lastName}` });
    await expect.poll(() => copy.count()).toBe(1);
    await setups.actionsOf(copy).remove.click();
    const confirm = copy.getByRole("group", { name: "Confirm delete" });
    await confirm.waitFor();
    expect(await pageOverflowPx(setups.page)).toBeLessThanOrEqual(0);
    const confirmBox = await copy.getByTestId("confirm-delete").boundingBox();
    expect(confirmBox!.x + confirmBox!.width).toBeLessThanOrEqual(PHONE.width);
    await screenshot(setups.page, "setups-list-390-confirm-delete");
    await copy.getByTestId("confirm-delete").click();
    await expect.poll(() => setups.page.getByTestId("pager").innerText()).toMatch(/of 2 · 26 in all/);

    // The pager's links work on the phone and the second page fits as well.
    await setups.page.getByTestId("pager").getByRole("link", { name: "Next" }).click();
    await setups.page.waitForURL(/\/setups\?page=2$/);
    await expect.poll(() => setups.rows.count()).toBe(1);
    expect(await pageOverflowPx(setups.page)).toBeLessThanOrEqual(0);
    await context.close();
  });

  it("keeps one column per fact on a wide screen, without the stacked facts", async () => {
    const { context, api } = await signedUpContext(browser, baseURL, "Wim Widescreen");
    expect((await api.request("POST", "/api/setups", { modelId: "mdl-ridge-18", name: "Wide one" })).status).toBe(201);
    const setups = new SetupsPage(await context.newPage());
    await setups.open();
    const headers = setups.page.getByTestId("setup-table").getByRole("columnheader");
    await expect(headers.allInnerTexts()).resolves.toEqual(["Setup", "Envelope", "Status", "Worst flag", "Last change", "Actions"]);
    expect(await setups.rows.first().getByTestId("setup-facts").isVisible()).toBe(false);
    await expect(setups.rows.first().getByRole("cell").allInnerTexts()).resolves.toEqual([
      "Wide one",
      "Ridge 1.8",
      "draft",
      expect.stringMatching(/ok|caution|stop/),
      expect.stringMatching(/^\d{4}-\d{2}-\d{2}$/),
      expect.stringMatching(/^Duplicate\s+Delete$/),
    ]);
    expect(await pageOverflowPx(setups.page)).toBeLessThanOrEqual(0);
    await context.close();
  });
});

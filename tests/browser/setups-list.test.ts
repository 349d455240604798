import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD } from "../../db/seed-data";
import { SignInPage, launchBrowser, newPersonContext, screenshot } from "../support/browser";

const baseURL = inject("baseURL");
let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("the Setups list in Chromium", () => {
  it("lists only the customer's own setups and makes, duplicates and deletes one (with a confirm)", async () => {
    const context = await newPersonContext(browser, baseURL);
    const page = await context.newPage();
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn("mirela@trimrail.test", DEMO_PASSWORD);
    await page.waitForURL(/\/setups$/);
    const rows = page.getByTestId("setup-row");
    const names = await rows.locator("td:first-child a").allInnerTexts();
    expect(names).toContain("Profile logger");
    expect(names).not.toContain("Valley relay"); // Tobin's
    // support commented on the logger when they sent it back: unread until Mirela opens it
    await expect(rows.filter({ hasText: "Logger and tracker" }).getByTestId("unread-comments").innerText()).resolves.toBe("1 new comment");
    const before = await rows.count();

    await page.getByTestId("new-setup-form").locator("select").selectOption({ label: "Ridge 0.6 (0.60 m³)" });
    await page.getByTestId("new-setup").click();
    await page.waitForURL(/\/setups\/[0-9a-f-]{36}$/);
    await expect(page.getByTestId("setup-name").innerText()).resolves.toBe("New setup on Ridge 0.6");
    await page.getByTestId("planner").waitFor();
    await page.goto("/setups");
    await expect.poll(() => rows.count()).toBe(before + 1);

    await page.getByRole("button", { name: "Duplicate New setup on Ridge 0.6" }).click();
    await expect.poll(() => rows.count()).toBe(before + 2);
    await expect(page.getByText("Copy of New setup on Ridge 0.6").count()).resolves.toBe(1);
    await screenshot(page, "setups-list-duplicated");

    await page.getByRole("button", { name: "Delete Copy of New setup on Ridge 0.6" }).click();
    await page.getByRole("group", { name: "Confirm delete" }).waitFor();
    await page.getByTestId("confirm-delete").click();
    await expect.poll(() => rows.count()).toBe(before + 1);
    await expect(page.getByText("Copy of New setup on Ridge 0.6").count()).resolves.toBe(0);
    await context.close();
  });

  it("answers another customer's setup with 404 and a stranger's visit with sign-in", async () => {
    const context = await newPersonContext(browser, baseURL);
    const page = await context.newPage();
    const stranger = await page.goto("/setups/set-wren-whip");
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    expect(stranger?.status()).toBe(200);
    const signIn = new SignInPage(page);
    await signIn.signIn("kasper@trimrail.test", DEMO_PASSWORD);
    await page.waitForURL(/\/setups\/set-wren-whip$/);
    await page.getByRole("heading", { name: "Nothing here" }).waitFor();
    const direct = await page.goto("/setups/set-wren-whip");
    expect(direct?.status()).toBe(404);
    await context.close();
  });
});

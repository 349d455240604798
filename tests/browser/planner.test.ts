import type { Browser, BrowserContext } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { launchBrowser, screenshot } from "../support/browser";
import { PlannerPage, signedInContext } from "../support/planner-page";

const baseURL = inject("baseURL");
// Tobin's windy-day relay plan: a seeded draft with one payload and no serial unit.
const SETUP_ID = "set-tobin-draft";
const EMAIL = "tobin@trimrail.test";

let browser: Browser;
let context: BrowserContext;

beforeAll(async () => {
  browser = await launchBrowser();
  context = await signedInContext(browser, baseURL, EMAIL);
});
afterAll(async () => {
  await browser?.close();
});

describe("the Planner in Chromium", () => {
  it("shows the seeded setup in 3D and updates trim and flags live while the mount is dragged", async () => {
    const page = await context.newPage();
    // Nothing may need the internet at run time: every request stays on the app's own origin.
    const foreignRequests: string[] = [];
    page.on("request", (request) => {
      const url = new URL(request.url());
      if (!["data:", "blob:"].includes(url.protocol) && url.origin !== new URL(baseURL).origin) foreignRequests.push(request.url());
    });
    const planner = new PlannerPage(page);
    await planner.open(SETUP_ID);
    await planner.waitForScene();
    await screenshot(planner.page, "planner-1-open");
    const trimBefore = await planner.calmTrimDeg();
    const positionBefore = await planner.mountPositionText();
    const flagsTextBefore = await planner.page.getByTestId("flag-list").innerText();

    await planner.dragMountBy(60, 20);
    await planner.page.waitForTimeout(300);
    const trimAfter = await planner.calmTrimDeg();
    expect(trimAfter).not.toBeCloseTo(trimBefore, 1);
    expect(await planner.mountPositionText()).not.toBe(positionBefore);
    // The calm-trim flag's message carries the new figure.
    expect(await planner.page.getByTestId("flag-list").innerText()).not.toBe(flagsTextBefore);
    await screenshot(planner.page, "planner-2-dragged");
    expect(foreignRequests).toEqual([]);

    await planner.page.close();
  });

  it("levels the lifter with 'Level it' and then saves the new position", async () => {
    const planner = new PlannerPage(await context.newPage());
    await planner.open(SETUP_ID);
    await planner.levelIt();
    await expect.poll(() => planner.calmTrimDeg().then(Math.abs)).toBeLessThan(0.5);
    await expect(planner.page.getByTestId("level-message").innerText()).resolves.toMatch(/level calm trim/);
    await screenshot(planner.page, "planner-3-levelled");
    await expect(planner.save()).resolves.toMatch(/Saved/);
    await planner.page.close();
  });

  it("flags a payload that takes the free lift away as stop, blocks submit, and keeps it all after save and reload", async () => {
    const planner = new PlannerPage(await context.newPage());
    await planner.open(SETUP_ID);
    await planner.addCustomPayload({ name: "Lead test weight", massText: "2500" });
    await expect.poll(() => planner.hasStopFlag()).toBe(true);
    await expect(
      planner.page.getByTestId("flag-list").locator('[data-flag-code="free-lift"][data-flag-level="stop"]').count(),
    ).resolves.toBe(1);
    await expect(planner.page.getByTestId("submit-setup").isDisabled()).resolves.toBe(true);
    await expect(planner.page.getByTestId("submit-hint").innerText()).resolves.toMatch(/stop flag blocks/);
    await screenshot(planner.page, "planner-4-stop-flag");

    await expect(planner.save()).resolves.toMatch(/Saved/);
    const position = await planner.mountPositionText();
    const flags = await planner.flags();
    await planner.page.reload();
    await planner.page.getByTestId("planner").waitFor();
    expect(await planner.mountPositionText()).toBe(position);
    expect(await planner.flags()).toEqual(flags);
    await expect(planner.page.getByTestId("submit-setup").isDisabled()).resolves.toBe(true);
    await screenshot(planner.page, "planner-5-reloaded");

    // Take the weight off again for the tests that follow.
    await planner.page.getByRole("button", { name: "Remove Lead test weight" }).click();
    await expect(planner.save()).resolves.toMatch(/Saved/);
    await planner.page.close();
  });

  it("refuses a save from a second tab that read an older version, and loses nothing", async () => {
    const first = new PlannerPage(await context.newPage());
    const second = new PlannerPage(await context.newPage());
    await first.open(SETUP_ID);
    await second.open(SETUP_ID);

    await first.page.getByTestId("mount-aft").click();
    await first.page.getByTestId("mount-aft").click();
    await expect(first.save()).resolves.toMatch(/Saved/);
    const savedPosition = await first.mountPositionText();

    await second.page.getByTestId("mount-forward").click();
    const conflict = await second.save();
    expect(conflict).toMatch(/saved elsewhere/);
    await screenshot(second.page, "planner-6-conflict");

    await Promise.all([second.page.waitForEvent("load"), second.page.getByTestId("load-saved-version").click()]);
    await second.page.getByTestId("planner").waitFor();
    expect(await second.mountPositionText()).toBe(savedPosition);
    await first.page.close();
    await second.page.close();
  });

  it("switches to imperial units, shows pounds and feet, and remembers the choice", async () => {
    const planner = new PlannerPage(await context.newPage());
    await planner.open(SETUP_ID);
    await planner.page.getByTestId("units-imperial").click();
    await expect.poll(() => planner.page.getByTestId("gross-lift").innerText()).toMatch(/ lb$/);
    await expect(planner.page.getByTestId("max-tether").innerText()).resolves.toMatch(/ ft$/);
    await expect(planner.page.getByTestId("mount-controls").innerText()).resolves.toMatch(/ft/);
    const flagText = await planner.page.getByTestId("flag-list").innerText();
    expect(flagText).toMatch(/ lb\b/);
    expect(flagText).not.toMatch(/\d kg\b/);
    await screenshot(planner.page, "planner-7-imperial");
    await planner.page.reload();
    await planner.page.getByTestId("planner").waitFor();
    await expect(planner.page.getByTestId("gross-lift").innerText()).resolves.toMatch(/ lb$/);
    await planner.page.getByTestId("units-metric").click();
    await expect.poll(() => planner.page.getByTestId("gross-lift").innerText()).toMatch(/ g$/);
    await planner.page.close();
  });
});

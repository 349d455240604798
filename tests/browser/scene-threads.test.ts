import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { launchBrowser, screenshot } from "../support/browser";
import { PlannerPage, signedInContext } from "../support/planner-page";

const baseURL = inject("baseURL");
// Tobin's windy-day relay plan; nothing here saves it.
const SETUP_ID = "set-tobin-draft";
const EMAIL = "tobin@trimrail.test";
// A string three.js keeps through minification (its renderer names itself in its warnings).
const THREE_MARKER = "THREE.WebGLRenderer";

let browser: Browser;
let context: BrowserContext;

beforeAll(async () => {
  browser = await launchBrowser();
  context = await signedInContext(browser, baseURL, EMAIL);
});
afterAll(async () => {
  await browser?.close();
});

async function mountScreenAttr(page: Page): Promise<string | null> {
  return page.getByTestId("lifter-canvas").getAttribute("data-mount-screen");
}

/** The scripts the page itself loaded (a worker's own requests are not in the page's timeline). */
async function pageScripts(page: Page): Promise<string[]> {
  return page.evaluate(() =>
    performance
      .getEntriesByType("resource")
      .map((entry) => entry.name)
      .filter((name) => new URL(name).pathname.endsWith(".js")),
  );
}

describe("the 3D view's thread", () => {
  it("is a worker where the browser allows it: three.js never loads on the page, and orbit, zoom, reset and the mount drag work", async () => {
    const planner = new PlannerPage(await context.newPage());
    await planner.open(SETUP_ID);
    await planner.waitForScene();
    const view = planner.page.getByTestId("lifter-canvas");
    expect(await view.getAttribute("data-thread")).toBe("worker");

    // three.js registers itself on the global object of whatever thread loads it.
    expect(await planner.page.evaluate(() => "__THREE__" in window)).toBe(false);
    const scripts = await pageScripts(planner.page);
    expect(scripts.length).toBeGreaterThan(0);
    for (const url of scripts) {
      const body = await (await planner.page.request.get(url)).text();
      expect(body.includes(THREE_MARKER), `${url} carries three.js`).toBe(false);
    }

    // Orbit: a drag on the sky (top-left of the view, away from the lifter) turns the camera, which
    // moves the mount on screen; "Reset view" brings it back.
    const start = await mountScreenAttr(planner.page);
    const box = await view.boundingBox();
    if (!box || !start) throw new Error("the view has no box or no mount position");
    await planner.page.mouse.move(box.x + 40, box.y + 40);
    await planner.page.mouse.down();
    for (let i = 1; i <= 10; i++) await planner.page.mouse.move(box.x + 40 + 12 * i, box.y + 40);
    await planner.page.mouse.up();
    await expect.poll(() => mountScreenAttr(planner.page)).not.toBe(start);
    await planner.page.getByRole("button", { name: "Reset view" }).click();
    await expect.poll(() => mountScreenAttr(planner.page)).toBe(start);

    // Zoom: the wheel over the view moves the camera, not the page.
    const scrollBefore = await planner.page.evaluate(() => window.scrollY);
    await planner.page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await planner.page.mouse.wheel(0, 300);
    await expect.poll(() => mountScreenAttr(planner.page)).not.toBe(start);
    expect(await planner.page.evaluate(() => window.scrollY)).toBe(scrollBefore);
    await planner.page.getByRole("button", { name: "Reset view" }).click();
    await expect.poll(() => mountScreenAttr(planner.page)).toBe(start);

    const positionBefore = await planner.mountPositionText();
    await planner.dragMountBy(-50, 10);
    await expect.poll(() => planner.mountPositionText()).not.toBe(positionBefore);
    expect(Number(await planner.mountPositionText())).toBeLessThan(Number(positionBefore));
    await screenshot(planner.page, "scene-worker-dragged");
    await planner.page.close();
  });

  it("is the page's own where a canvas cannot be handed to a worker, and the mount drag still works", async () => {
    const page = await context.newPage();
    await page.addInitScript(() => {
      delete (HTMLCanvasElement.prototype as Partial<HTMLCanvasElement>).transferControlToOffscreen;
    });
    const planner = new PlannerPage(page);
    await planner.open(SETUP_ID);
    await planner.waitForScene();
    expect(await page.getByTestId("lifter-canvas").getAttribute("data-thread")).toBe("page");

    const positionBefore = await planner.mountPositionText();
    await planner.dragMountBy(50, 10);
    await expect.poll(() => planner.mountPositionText()).not.toBe(positionBefore);
    expect(Number(await planner.mountPositionText())).toBeGreaterThan(Number(positionBefore));
    await screenshot(page, "scene-page-dragged");
    await page.close();
  });

  it("moves to the page's thread when the worker finds no WebGL, and the view still draws and drags", async () => {
    const page = await context.newPage();
    // The worker's own script starts by taking WebGL away from its OffscreenCanvas, as a browser
    // without WebGL in workers would.
    await page.route(/\/_next\/static\/chunks\/turbopack-worker-[^/]*\.js/, async (route) => {
      const response = await route.fetch();
      const body = `OffscreenCanvas.prototype.getContext = function () { return null; };\n${await response.text()}`;
      await route.fulfill({ response, body });
    });
    const planner = new PlannerPage(page);
    await planner.open(SETUP_ID);
    await planner.waitForScene();
    expect(await page.getByTestId("lifter-canvas").getAttribute("data-thread")).toBe("page");
    expect(await page.evaluate(() => "__THREE__" in window)).toBe(true);

    const positionBefore = await planner.mountPositionText();
    await planner.dragMountBy(50, 10);
    await expect.poll(() => planner.mountPositionText()).not.toBe(positionBefore);
    await page.close();
  });
});

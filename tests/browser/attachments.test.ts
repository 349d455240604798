import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { openDatabase } from "../../db/index";
import { DEMO_PASSWORD } from "../../db/seed-data";
import { datasheetPdf, htmlPage, payloadPhoto } from "../support/attachment-files";
import { AttachmentsSection } from "../support/attachments-page";
import { SignInPage, launchBrowser, screenshot } from "../support/browser";
import { ApiClient } from "../support/http";
import { submittedSetup } from "../support/setup-fixtures";

const baseURL = inject("baseURL");
const SETUP_NAME = "Orchard camera, with photos";
const PHOTO_NAME = "camera on the rail.jpg";
const SHEET_NAME = "camera datasheet.pdf";
/** Slow enough (about 3 s for the ~330 kB photo) that the progress bar is seen moving. */
const UPLOAD_BYTES_PER_SECOND = 100 * 1024;

let browser: Browser;
let database: ReturnType<typeof openDatabase>;
let setupId: string;

let personCount = 0;

async function signedIn(email: string, next: string): Promise<Page> {
  // Client addresses of this file's own: sign-in limits count per address and per minute, across files.
  personCount += 1;
  const context = await browser.newContext({
    baseURL,
    viewport: { width: 1360, height: 900 },
    extraHTTPHeaders: { "x-forwarded-for": `10.79.0.${personCount}` },
  });
  const page = await context.newPage();
  const signIn = new SignInPage(page);
  await signIn.open(next);
  await signIn.signIn(email, DEMO_PASSWORD);
  await page.waitForURL((url) => url.pathname === next);
  return page;
}

/** Chromium's own network throttling (DevTools protocol), for uploads only. */
async function throttleUploads(page: Page, bytesPerSecond: number | null): Promise<void> {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send("Network.enable");
  await cdp.send("Network.emulateNetworkConditions", {
    offline: false,
    latency: 0,
    downloadThroughput: -1,
    uploadThroughput: bytesPerSecond ?? -1,
  });
}

beforeAll(async () => {
  browser = await launchBrowser();
  database = openDatabase(inject("databaseUrl"));
  // Staff see a setup once it has been submitted: Wren's orchard camera, all flags ok, submitted over the API.
  const wren = new ApiClient(baseURL, "10.79.1.1");
  expect((await wren.signIn("customer@trimrail.test")).status).toBe(200);
  setupId = (await submittedSetup(database.db, wren, { from: "set-wren-cam", name: SETUP_NAME })).id;
});
afterAll(async () => {
  await browser?.close();
  database?.client.close();
});

describe("attachments in Chromium", () => {
  it("uploads a photo in the Planner with a progress bar and a thumbnail, and support sees it on the review page", async () => {
    const customer = await signedIn("customer@trimrail.test", `/setups/${setupId}`);
    await customer.getByTestId("planner").waitFor();
    const section = new AttachmentsSection(customer);
    await section.root.scrollIntoViewIfNeeded();
    expect(await section.root.getByTestId("attachment-count").innerText()).toBe("0 of 20");

    // The photo goes up slowly enough to watch its bar fill.
    await throttleUploads(customer, UPLOAD_BYTES_PER_SECOND);
    const photo = await payloadPhoto();
    await section.pick([{ name: PHOTO_NAME, mimeType: "image/jpeg", buffer: photo }]);
    const bar = section.uploadRow(PHOTO_NAME).getByRole("progressbar", { name: `Uploading ${PHOTO_NAME}` });
    await bar.waitFor();
    await expect.poll(async () => Number(await bar.getAttribute("aria-valuenow")), { timeout: 10_000 }).toBeGreaterThan(20);
    const midway = Number(await bar.getAttribute("aria-valuenow"));
    expect(midway).toBeLessThan(100);
    expect(await bar.getAttribute("aria-valuetext")).toMatch(/^\d+ %, .+ of .+$/);
    await screenshot(customer, "attachments-1-uploading");

    // Done: the row gives way to the tile, whose thumbnail the browser has loaded.
    await section.uploadRow(PHOTO_NAME).waitFor({ state: "detached", timeout: 20_000 });
    await throttleUploads(customer, null);
    const thumb = await section.waitForThumbnail(PHOTO_NAME);
    expect(thumb.naturalWidth).toBe(320);
    expect(thumb.src).toMatch(/^\/api\/attachments\/[0-9a-f-]{36}\/thumbnail$/);
    expect(await section.tile(PHOTO_NAME).innerText()).toMatch(/Photo · 3\d\d kB/);

    // A datasheet, a page of HTML named like a photo, and a file over the cap, at once:
    // the PDF is added, the other two fail on their own rows with the reason.
    await section.pick([
      { name: SHEET_NAME, mimeType: "application/pdf", buffer: await datasheetPdf("Action camera AC-3 — datasheet") },
      { name: "mount.png", mimeType: "image/png", buffer: htmlPage() },
      { name: "whole flight.jpg", mimeType: "image/jpeg", buffer: Buffer.alloc(11 * 1024 * 1024, 0xff) },
    ]);
    await section.tile(SHEET_NAME).waitFor();
    await expect
      .poll(() =>
        section
          .uploadRow("mount.png")
          .getByTestId("upload-error")
          .innerText()
          .catch(() => ""),
      )
      .toMatch(/Only photos \(JPEG, PNG, WebP\) and PDF datasheets/);
    expect(await section.uploadRow("whole flight.jpg").getByTestId("upload-error").innerText()).toMatch(/at most 10 MB/);
    expect(await section.names()).toEqual([PHOTO_NAME, SHEET_NAME]);
    expect(await section.root.getByTestId("attachment-count").innerText()).toBe("2 of 20");
    await screenshot(customer, "attachments-2-planner");

    // Support opens the review page: the same files, read-only, the thumbnail linking to the full photo.
    const support = await signedIn("support@trimrail.test", `/review/${setupId}`);
    const review = new AttachmentsSection(support);
    await review.root.scrollIntoViewIfNeeded();
    const seen = await review.waitForThumbnail(PHOTO_NAME);
    expect(seen.naturalWidth).toBe(320);
    expect(await review.names()).toEqual([PHOTO_NAME, SHEET_NAME]);
    expect(await review.root.getByTestId("attachment-input").count()).toBe(0);
    expect(await review.root.getByTestId("attachment-delete").count()).toBe(0);
    const fullHref = await review.tile(PHOTO_NAME).getByTestId("attachment-link").getAttribute("href");
    expect(fullHref).toBe(seen.src.replace(/\/thumbnail$/, ""));
    const full = await support.request.get(fullHref!);
    expect(full.status()).toBe(200);
    expect(full.headers()["content-type"]).toBe("image/jpeg");
    expect(full.headers()["x-content-type-options"]).toBe("nosniff");
    expect((await full.body()).length).toBeLessThan(photo.length); // the GPS EXIF is gone
    const sheet = await support.request.get((await review.tile(SHEET_NAME).getByTestId("attachment-link").getAttribute("href"))!);
    expect(sheet.headers()["content-disposition"]).toMatch(/^attachment;/);
    await review.tile(PHOTO_NAME).scrollIntoViewIfNeeded();
    await screenshot(support, "attachments-3-review");

    // Back in the Planner the owner deletes the datasheet.
    await section.tile(SHEET_NAME).getByTestId("attachment-delete").click();
    await section.tile(SHEET_NAME).getByTestId("attachment-confirm-delete").click();
    await section.tile(SHEET_NAME).waitFor({ state: "detached" });
    expect(await section.names()).toEqual([PHOTO_NAME]);
  });
});

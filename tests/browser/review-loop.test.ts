import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { openDatabase } from "../../db/index";
import { DEMO_PASSWORD } from "../../db/seed-data";
import { SignInPage, launchBrowser, newPersonContext, screenshot } from "../support/browser";
import { ApiClient } from "../support/http";
import { waitForMail } from "../support/mail";
import { pdfText } from "../support/pdf-text";
import { PlannerPage } from "../support/planner-page";
import { ReviewQueuePage, ReviewSetupPage } from "../support/review-page";
import { plannerDataFor } from "../support/planner-fixture";
import { draftWithWorstFlag } from "../support/setup-fixtures";

const baseURL = inject("baseURL");
const mailDir = inject("mailDir");
const SETUP_NAME = "Dune camera, first review";
const REASON = "Add a second safety line on the camera and fly it below 60 m on the first day.";

let browser: Browser;
let database: ReturnType<typeof openDatabase>;
let setupId: string;

async function signedIn(email: string, next: string): Promise<Page> {
  const context = await newPersonContext(browser, baseURL);
  const page = await context.newPage();
  const signIn = new SignInPage(page);
  await signIn.open(next);
  await signIn.signIn(email, DEMO_PASSWORD);
  await page.waitForURL((url) => url.pathname === next);
  return page;
}

beforeAll(async () => {
  browser = await launchBrowser();
  database = openDatabase(inject("databaseUrl"));
  // A fresh draft of the customer's, all flags ok, so the loop starts from a clean "draft".
  const kasper = new ApiClient(baseURL);
  expect((await kasper.signIn("kasper@trimrail.test")).status).toBe(200);
  // The demo's survey camera on the 1.1 m³ model, flown on the model's nominal figures (no serial unit).
  const source = plannerDataFor("set-wren-cam").draft;
  const draft = await draftWithWorstFlag(database.db, { ...source, name: SETUP_NAME, unitId: null }, "ok");
  const created = await kasper.request("POST", "/api/setups", { draft });
  expect(created.status).toBe(201);
  setupId = ((await created.json()) as { id: string }).id;
});
afterAll(async () => {
  await browser?.close();
  database?.client.close();
});

describe("the review loop in Chromium", () => {
  it("carries a setup from the customer's submit through a send-back and a resubmit to approval and its report", async () => {
    // The customer submits from the Planner.
    const customer = await signedIn("kasper@trimrail.test", `/setups/${setupId}`);
    const planner = new PlannerPage(customer);
    await customer.getByTestId("planner").waitFor();
    await customer.getByTestId("submit-setup").click();
    await expect.poll(() => customer.getByTestId("setup-status").innerText()).toBe("submitted for review");
    // Both support staff hear of it by mail, kept by the SMTP fake as .eml files.
    const submitted = /^Review requested: Dune camera, first review$/;
    for (const to of ["support@trimrail.test", "orrin@trimrail.test"])
      expect((await waitForMail({ dir: mailDir, to, subject: submitted })).text).toContain("Kasper Lindqvet");

    // Support finds it in the queue and opens it.
    const support = await signedIn("support@trimrail.test", "/review");
    const queue = new ReviewQueuePage(support);
    await queue.search("Dune camera");
    await queue.row(SETUP_NAME).waitFor();
    for (const text of await support.getByTestId("queue-row").allInnerTexts()) expect(text).toMatch(/dune camera/i);
    await screenshot(support, "review-1-queue");
    await queue.openSetup(SETUP_NAME);
    const review = new ReviewSetupPage(support);
    expect(await review.status()).toBe("submitted");
    await support.locator('[data-testid="lifter-canvas"][data-ready="true"]').waitFor({ timeout: 30_000 });
    await support.getByTestId("balance-panel").waitFor();
    expect(await support.getByTestId("review-payloads").locator("tbody tr").count()).toBeGreaterThan(0);
    // nothing on the page can change the setup: no save, no inputs of the Planner
    expect(await support.getByTestId("save-setup").count()).toBe(0);
    await screenshot(support, "review-2-review-page");

    // A reason of one word is refused in the form, a sentence is sent.
    await support.getByTestId("decision-send-back").check();
    await support.getByTestId("decision-reason").fill("No.");
    await support.getByTestId("decision-submit").click();
    await support.getByText("Say what should change, in at least a sentence.").waitFor();
    await review.sendBack(REASON);
    expect(await review.status()).toBe("changes requested");

    // The customer sees the reason, and it was mailed to them.
    await customer.reload();
    const banner = customer.getByTestId("decision-banner");
    await banner.waitFor();
    expect(await banner.getAttribute("data-decision")).toBe("changes_requested");
    expect(await customer.getByTestId("decision-reason-text").innerText()).toBe(REASON);
    await screenshot(customer, "review-3-customer-reason");
    const sentBackMail = await waitForMail({
      dir: mailDir,
      to: "kasper@trimrail.test",
      subject: /^Changes requested: Dune camera, first review$/,
    });
    expect(sentBackMail.text).toContain(REASON);
    expect(sentBackMail.text).toMatch(/payload 125 g/); // a figure of the setup

    // The customer fixes, saves, answers and resubmits.
    const siteName = customer.getByLabel("Site name");
    await siteName.fill("Saltgrave dunes, north car park");
    await siteName.press("Tab");
    await customer.getByTestId("unsaved").waitFor();
    expect(await planner.save()).toMatch(/Saved \(version \d+\)/);
    await customer.getByTestId("comment-input").fill("Second line added; first day below 60 m.");
    await customer.getByTestId("comment-send").click();
    await customer.getByTestId("thread-comment").filter({ hasText: "Second line added" }).waitFor();
    expect(
      (await waitForMail({ dir: mailDir, to: "support@trimrail.test", subject: /^New comment on Dune camera, first review$/ })).text,
    ).toContain("Second line added");
    await customer.getByTestId("submit-setup").click();
    await expect.poll(() => customer.getByTestId("setup-status").innerText()).toBe("submitted for review");

    // Support approves the new version.
    await support.reload();
    await support.getByTestId("thread-comment").filter({ hasText: "Second line added" }).waitFor();
    await review.approve("Balanced; keep both lines on.");
    expect(await review.status()).toBe("approved");
    expect(
      (await waitForMail({ dir: mailDir, to: "kasper@trimrail.test", subject: /^Approved: Dune camera, first review$/ })).text,
    ).toContain("Balanced; keep both lines on.");

    // The customer sees "approved" and downloads the report.
    await customer.reload();
    await expect.poll(() => customer.getByTestId("decision-banner").getAttribute("data-decision")).toBe("approved");
    await customer.getByTestId("open-report").click();
    await customer.getByTestId("field-report").waitFor();
    expect(await customer.getByTestId("report-review").getAttribute("data-state")).toBe("approved");
    await screenshot(customer, "review-4-report");
    const [download] = await Promise.all([customer.waitForEvent("download"), customer.getByTestId("report-pdf").click()]);
    const path = await download.path();
    const { readFileSync } = await import("node:fs");
    const text = await pdfText(new Uint8Array(readFileSync(path)));
    expect(text).toContain("APPROVED FOR FIRST FLIGHT");
    expect(text).toContain(SETUP_NAME);
    await customer.context().close();
    await support.context().close();
  });
});

import { mkdirSync, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD } from "../../db/seed-data";
import { SignInPage, launchBrowser, newPersonContext } from "../support/browser";

const baseURL = inject("baseURL");
const AXE_PATH = createRequire(import.meta.url).resolve("axe-core/axe.min.js");
const BLOCKING_IMPACTS = new Set(["critical", "serious"]);
const INSIGHT_SECTIONS = [
  "insight-payload-mass",
  "insight-setup-mass",
  "insight-templates",
  "insight-rail",
  "insight-free-lift",
  "insight-flags",
  "insight-months",
  "insight-reasons",
];
const PLANNER_SETUP_ID = "set-wren-whip";
const SUBMITTED_SETUP_ID = "set-wren-cam";

interface Violation {
  id: string;
  impact: string | null;
  targets: string[];
}

interface PageCheck {
  path: string;
  status?: number;
  /** What shows that the page has its content (beyond the first `h1`). */
  ready?: (page: Page) => Promise<void>;
}

const scene = async (page: Page): Promise<void> => {
  await page.locator('[data-testid="lifter-canvas"][data-ready="true"]').waitFor({ timeout: 30_000 });
  // The scene's text summary is announced when it changes.
  expect(await page.getByTestId("scene-summary").getAttribute("aria-live")).toBe("polite");
};
const charts = async (page: Page): Promise<void> => {
  for (const id of INSIGHT_SECTIONS) await page.getByTestId(`${id}-chart`).locator(".recharts-wrapper").waitFor();
};

const PUBLIC_PAGES: PageCheck[] = [
  { path: "/" },
  { path: "/sign-in" },
  { path: "/sign-up" },
  { path: "/forgot-password" },
  { path: "/no-such-page", status: 404 },
];
const COMMON_PAGES: PageCheck[] = [{ path: "/" }, { path: "/setups" }, { path: "/setups/no-such-setup", status: 404 }];
const REVIEWER_PAGES: PageCheck[] = [
  { path: "/review", ready: (page) => page.locator('[data-testid="review-queue"][aria-busy="false"]').waitFor() },
  { path: `/review/${SUBMITTED_SETUP_ID}`, ready: scene },
  { path: "/insight", ready: charts },
];

const ROLES: { role: string; email: string; pages: PageCheck[] }[] = [
  {
    role: "customer",
    email: "customer@trimrail.test",
    pages: [
      ...COMMON_PAGES,
      { path: `/setups/${PLANNER_SETUP_ID}`, ready: scene },
      { path: `/setups/${PLANNER_SETUP_ID}/report`, ready: (page) => page.getByTestId("field-report").waitFor() },
      { path: "/review", status: 403 },
    ],
  },
  { role: "support", email: "support@trimrail.test", pages: [...COMMON_PAGES, ...REVIEWER_PAGES, { path: "/workshop", status: 403 }] },
  {
    role: "maker",
    email: "maker@trimrail.test",
    pages: [
      ...COMMON_PAGES,
      ...REVIEWER_PAGES,
      { path: "/workshop", ready: (page) => page.getByTestId("workshop-models").waitFor() },
      { path: "/workshop/models/mdl-ridge-11", ready: (page) => page.getByTestId("workshop-nav").waitFor() },
      ...["units", "mounts", "adapters", "templates"].map((part) => ({
        path: `/workshop/${part}`,
        ready: (page: Page) => page.getByTestId("workshop-nav").waitFor(),
      })),
      { path: "/workshop/people", ready: (page) => page.getByTestId("workshop-users").waitFor() },
      { path: "/dev/mail" },
    ],
  },
];

/** Every page's findings, written out so a run can be compared with the last. */
const findings: Record<string, Violation[]> = {};

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  const dir = path.join(process.cwd(), "test-output");
  mkdirSync(dir, { recursive: true });
  writeFileSync(path.join(dir, "accessibility.json"), JSON.stringify(findings, null, 2));
});

async function runAxe(page: Page): Promise<Violation[]> {
  await page.addScriptTag({ path: AXE_PATH });
  return page.evaluate(async () => {
    const axe = (
      window as unknown as {
        axe: {
          run: (context: Document) => Promise<{ violations: { id: string; impact: string | null; nodes: { target: unknown[] }[] }[] }>;
        };
      }
    ).axe;
    const result = await axe.run(document);
    return result.violations.map((v) => ({ id: v.id, impact: v.impact, targets: v.nodes.map((n) => n.target.map(String).join(" ")) }));
  });
}

async function checkPage(page: Page, label: string, check: PageCheck): Promise<void> {
  const response = await page.goto(check.path);
  expect(response?.status(), check.path).toBe(check.status ?? 200);
  await page.locator("h1").first().waitFor();
  await check.ready?.(page);
  const violations = await runAxe(page);
  findings[`${label} ${check.path}`] = violations;
  const blocking = violations.filter((v) => v.impact && BLOCKING_IMPACTS.has(v.impact));
  const described = blocking.map((v) => `${v.id} (${v.impact}): ${v.targets.join(" | ")}`);
  expect.soft(described, `${label} ${check.path}`).toEqual([]);
  // One main landmark on every page, and a title of its own on the 403 and 404 pages.
  expect.soft(await page.locator("main").count(), `${label} ${check.path} main landmarks`).toBe(1);
  // The skip link comes first and has somewhere to go.
  expect.soft(await page.locator("body a").first().getAttribute("href"), `${label} ${check.path} skip link`).toBe("#main");
  expect.soft(await page.locator("#main").count(), `${label} ${check.path} skip target`).toBe(1);
  if (check.status === 403) expect.soft(await page.title()).toMatch(/not open to your role/i);
  if (check.status === 404) expect.soft(await page.title()).toMatch(/not found/i);
}

describe("accessibility (axe-core) in Chromium", () => {
  it("finds no critical or serious violation on the public pages, signed out", async () => {
    const context = await newPersonContext(browser, baseURL);
    const page = await context.newPage();
    for (const check of PUBLIC_PAGES) await checkPage(page, "stranger", check);
    await context.close();
  });

  for (const demo of ROLES) {
    it(`finds no critical or serious violation on any page the ${demo.role} can open`, async () => {
      const context = await newPersonContext(browser, baseURL);
      const page = await context.newPage();
      const signIn = new SignInPage(page);
      await signIn.open();
      await signIn.signIn(demo.email, DEMO_PASSWORD);
      await page.waitForURL(/\/setups$/);
      for (const check of demo.pages) await checkPage(page, demo.role, check);
      await context.close();
    }, 180_000);
  }
});

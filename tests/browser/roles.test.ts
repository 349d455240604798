import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD } from "../../db/seed-data";
import { AppShell, SignInPage, launchBrowser, newPersonContext, screenshot } from "../support/browser";

const baseURL = inject("baseURL");
let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const DEMO_ROLES = [
  { role: "customer", email: "customer@trimrail.test", nav: ["Setups"], refusedAt: "/review" },
  { role: "support", email: "support@trimrail.test", nav: ["Setups", "Review desk", "Insight"], refusedAt: "/workshop" },
  { role: "maker", email: "maker@trimrail.test", nav: ["Setups", "Review desk", "Workshop", "Insight"], refusedAt: null },
] as const;

describe("signing in as each demo role in Chromium", () => {
  it("shows the landing page to a stranger and sends a protected page to sign-in", async () => {
    const context = await newPersonContext(browser, baseURL);
    const page = await context.newPage();
    await page.goto("/");
    await expect(page.getByRole("heading", { level: 1 }).innerText()).resolves.toMatch(/mount/i);
    await screenshot(page, "foundation-landing");
    await page.goto("/workshop");
    await page.waitForURL(/\/sign-in\?next=%2Fworkshop/);
    await screenshot(page, "foundation-sign-in");
    await context.close();
  });

  for (const demo of DEMO_ROLES) {
    it(`signs in the ${demo.role} and shows that role's navigation`, async () => {
      const context = await newPersonContext(browser, baseURL);
      const page = await context.newPage();
      const signIn = new SignInPage(page);
      await signIn.open();
      await signIn.signIn(demo.email, DEMO_PASSWORD);
      await page.waitForURL(/\/setups$/);
      const shell = new AppShell(page);
      expect(await shell.navLabels()).toEqual(demo.nav);
      expect(await shell.role()).toBe(demo.role);
      await screenshot(page, `foundation-${demo.role}-setups`);

      if (demo.role === "customer") {
        // Signing out ends the session on the server: the app pages send the browser to sign-in again.
        await page.getByRole("button", { name: "Sign out" }).click();
        await page.waitForURL(/\/sign-in$/);
        await page.goto("/setups");
        await page.waitForURL(/\/sign-in\?next=%2Fsetups/);
        await signIn.signIn(demo.email, DEMO_PASSWORD);
        await page.waitForURL(/\/setups$/);
      }

      if (demo.refusedAt) {
        const response = await page.goto(demo.refusedAt);
        expect(response?.status()).toBe(403);
        await page.getByTestId("forbidden").waitFor();
        await screenshot(page, `foundation-${demo.role}-refused`);
      } else {
        for (const path of ["/review", "/workshop", "/insight"]) {
          const response = await page.goto(path);
          expect(response?.status(), path).toBe(200);
          await screenshot(page, `foundation-${demo.role}${path.replace("/", "-")}`);
        }
      }
      await context.close();
    });
  }

  it("lets the maker change a role in the Workshop after confirming it, and the change holds after a reload", async () => {
    const context = await newPersonContext(browser, baseURL);
    const page = await context.newPage();
    const signIn = new SignInPage(page);
    await signIn.open("/workshop/people");
    await signIn.signIn("maker@trimrail.test", DEMO_PASSWORD);
    await page.waitForURL(/\/workshop\/people$/);
    const orrin = () =>
      page
        .getByTestId("workshop-users")
        .getByRole("row", { name: /orrin@trimrail\.test/ })
        .getByTestId("role-select");
    await expect(orrin().getAttribute("data-role")).resolves.toBe("support");
    for (const role of ["customer", "support"] as const) {
      await orrin().getByLabel("Role of Orrin Pell").selectOption(role);
      await orrin().getByRole("button", { name: "Change Orrin Pell's role…" }).click();
      await orrin()
        .getByRole("button", { name: `Yes, make Orrin Pell ${role}` })
        .click();
      await expect.poll(() => orrin().getByRole("status").innerText()).toBe(`Orrin Pell is now ${role}.`);
      await page.reload();
      await expect(orrin().getAttribute("data-role")).resolves.toBe(role);
    }
    await context.close();
  });

  it("shows a clear message for a wrong password and stays on sign-in", async () => {
    const context = await newPersonContext(browser, baseURL);
    const page = await context.newPage();
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn("customer@trimrail.test", "wrong-password-here");
    await expect(page.getByTestId("auth-error").innerText()).resolves.toMatch(/invalid|wrong|password/i);
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    await context.close();
  });
});

import type { Browser, BrowserContext, Locator, Page } from "playwright-core";
import { DEMO_PASSWORD } from "../../db/seed-data";
import { SignInPage, newPersonContext } from "./browser";

/** Page object for the Planner (/setups/:id). */
export class PlannerPage {
  constructor(readonly page: Page) {}

  async open(setupId: string): Promise<void> {
    await this.page.goto(`/setups/${setupId}`);
    await this.page.getByTestId("planner").waitFor();
  }

  /** Waits until the 3D view has loaded its envelope and drawn a frame. */
  async waitForScene(): Promise<void> {
    await this.page.locator('[data-testid="lifter-canvas"][data-ready="true"]').waitFor({ timeout: 30_000 });
  }

  async mountScreenPoint(): Promise<{ x: number; y: number }> {
    const canvas = this.page.getByTestId("lifter-canvas");
    const box = await canvas.boundingBox();
    const attr = await canvas.getAttribute("data-mount-screen");
    if (!box || !attr) throw new Error("the scene does not report the mount's screen position");
    const [x, y] = attr.split(",").map(Number);
    return { x: box.x + x, y: box.y + y };
  }

  /** Drags the mount with the mouse by `dx` CSS pixels, in small steps as a hand would. */
  async dragMountBy(dx: number, steps = 12): Promise<void> {
    const start = await this.mountScreenPoint();
    await this.page.mouse.move(start.x, start.y);
    await this.page.mouse.down();
    for (let i = 1; i <= steps; i++) await this.page.mouse.move(start.x + (dx * i) / steps, start.y, { steps: 1 });
    await this.page.mouse.up();
  }

  async calmTrimDeg(): Promise<number> {
    const text = await this.page.getByTestId("calm-trim").innerText();
    return Number(text.replace("°", ""));
  }

  async mountPositionText(): Promise<string> {
    return this.page.getByTestId("mount-position-input").inputValue();
  }

  async flags(): Promise<string[]> {
    return this.page
      .getByTestId("flag-list")
      .locator("li")
      .evaluateAll((items) => items.map((li) => `${li.getAttribute("data-flag-code")}:${li.getAttribute("data-flag-level")}`));
  }

  async hasStopFlag(): Promise<boolean> {
    return (await this.page.getByTestId("flag-list").locator('li[data-flag-level="stop"]').count()) > 0;
  }

  async levelIt(): Promise<void> {
    await this.page.getByTestId("level-it").click();
  }

  async save(): Promise<string> {
    await this.page.getByTestId("save-setup").click();
    const message = this.page.getByTestId("save-message");
    await message.waitFor();
    return message.innerText();
  }

  async addCustomPayload({ name, massText }: { name: string; massText: string }): Promise<void> {
    await this.page.getByTestId("add-custom").click();
    const form = this.page.getByTestId("payload-form");
    await form.getByLabel("Name").fill(name);
    await form.getByTestId("payload-mass").fill(massText);
    await form.getByRole("button", { name: "Add payload" }).click();
  }

  /** Waits until the operating envelope's chart has drawn its marks (it loads after the page). */
  async waitForEnvelopeChart(): Promise<void> {
    // The chart mounts when its section comes near the screen, as a person scrolling to it would see.
    await this.page.getByTestId("section-envelope").scrollIntoViewIfNeeded();
    const chart = this.page.getByTestId("envelope-chart");
    await chart.locator("svg [data-level]").first().waitFor({ timeout: 30_000 });
  }

  /** The worst-flag levels the envelope's table shows, one per point. */
  async envelopeTableLevels(): Promise<string[]> {
    const table = this.page.getByTestId("envelope-table");
    await table.locator("summary").click();
    return table.locator("td[data-level]").evaluateAll((cells) => cells.map((c) => c.getAttribute("data-level") ?? ""));
  }

  async text(testId: string): Promise<string> {
    return (await this.page.getByTestId(testId).innerText()).trim();
  }

  /** How the 3D view draws the tether: "curve" (its computed shape), "straight", or "slack" (on the ground). */
  async tetherDrawing(): Promise<string | null> {
    return this.page.getByTestId("lifter-canvas").getAttribute("data-tether");
  }

  async version(): Promise<number> {
    return Number(await this.page.getByTestId("setup-version").innerText());
  }

  /** Types into a field as a person would (select all, type) and leaves it with Tab. */
  async typeInto(testId: string, text: string): Promise<void> {
    const field = this.page.getByTestId(testId);
    await field.click();
    await field.press("ControlOrMeta+a");
    if (text === "") await field.press("Backspace");
    else await field.pressSequentially(text);
    await field.press("Tab");
  }

  /** The message a field shows beside it (the element its aria-describedby names), or null. */
  async fieldMessage(testId: string): Promise<string | null> {
    const describedBy = await this.page.getByTestId(testId).getAttribute("aria-describedby");
    if (!describedBy) return null;
    return (await this.page.locator(`[id="${describedBy}"]`).innerText()).trim();
  }

  /** The data-testid of the element that has the focus. */
  async focusedTestId(): Promise<string | null> {
    return this.page.evaluate(() => document.activeElement?.getAttribute("data-testid") ?? null);
  }

  /** Opens a collapsed input section (Gas and Tether start closed). */
  async openSection(testId: string): Promise<void> {
    const section = this.page.getByTestId(testId);
    if ((await section.getAttribute("open")) === null) await section.locator("summary").click();
  }

  /** Every request that would write the setup (PUT, POST) from now on, as "METHOD path". */
  recordSetupWrites(): string[] {
    const writes: string[] = [];
    this.page.on("request", (request) => {
      const url = new URL(request.url());
      if (url.pathname.startsWith("/api/setups") && request.method() !== "GET") writes.push(`${request.method()} ${url.pathname}`);
    });
    return writes;
  }

  payloadNames(): Promise<string[]> {
    return this.page.getByTestId("payload-item").locator("span.font-medium").allInnerTexts();
  }

  /** The narrow screens' balance summary and the first input section, to compare where they stand. */
  summaryAndFirstInputs(): { summary: Locator; firstInputs: Locator } {
    return { summary: this.page.getByTestId("balance-summary"), firstInputs: this.page.getByTestId("mount-controls") };
  }
}

/** A browser context of its own for one customer, signed in through the sign-in page. */
export async function signedInContext(browser: Browser, baseURL: string, email: string): Promise<BrowserContext> {
  const context = await newPersonContext(browser, baseURL);
  const page = await context.newPage();
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(email, DEMO_PASSWORD);
  await page.waitForURL(/\/setups$/);
  await page.close();
  return context;
}

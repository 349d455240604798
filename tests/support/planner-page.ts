import type { Page } from "playwright-core";

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
}

import type { Page } from "playwright-core";

export type WorkshopSection = "models" | "units" | "mounts" | "adapters" | "templates" | "people";
const PATHS: Record<WorkshopSection, string> = {
  models: "/workshop",
  units: "/workshop/units",
  mounts: "/workshop/mounts",
  adapters: "/workshop/adapters",
  templates: "/workshop/templates",
  people: "/workshop/people",
};
const TABLES: Record<WorkshopSection, string> = {
  models: "workshop-models",
  units: "workshop-units",
  mounts: "workshop-mounts",
  adapters: "workshop-adapters",
  templates: "workshop-templates",
  people: "workshop-users",
};

/** Page object for the maker's Workshop (/workshop/...). */
export class WorkshopPage {
  constructor(readonly page: Page) {}

  async open(section: WorkshopSection, query = ""): Promise<void> {
    await this.page.goto(`${PATHS[section]}${query}`);
    await this.table(section).waitFor();
  }

  /** Through the Workshop's own section links, as a person finds their way. */
  async goTo(label: string, section: WorkshopSection): Promise<void> {
    await this.page.getByTestId("workshop-nav").getByRole("link", { name: label }).click();
    await this.page.waitForURL((url) => url.pathname === PATHS[section]);
    await this.table(section).waitFor();
  }

  table(section: WorkshopSection) {
    return this.page.getByTestId(TABLES[section]);
  }

  async rowTexts(section: WorkshopSection): Promise<string[]> {
    return this.table(section).locator("tbody tr").allInnerTexts();
  }

  /** Edits one mount, adapter or template in its form: fields by their data-testid suffix (the SI path). */
  async editItem(name: string, values: Record<string, string>): Promise<void> {
    await this.page.getByRole("button", { name: `Edit ${name}` }).click();
    const form = this.page.getByTestId("item-form");
    for (const [path, value] of Object.entries(values)) await form.getByTestId(`field-${path}`).fill(value);
    await form.getByTestId("item-save").click();
    await form.waitFor({ state: "detached" });
  }

  async previewVolumeM3(): Promise<number> {
    return Number(await this.page.getByTestId("preview-volume").getAttribute("data-volume-m3"));
  }

  async waitForPreview(): Promise<void> {
    await this.page.locator('[data-testid="lifter-canvas"][data-ready="true"]').waitFor({ timeout: 30_000 });
  }

  async unitFactor(): Promise<number | null> {
    const text = await this.page.getByTestId("unit-factor").getAttribute("data-factor");
    return text ? Number(text) : null;
  }

  async recordLiftTest(values: {
    grossLift: string;
    temperature: string;
    pressure?: string;
    altitude?: string;
    purity: string;
  }): Promise<string> {
    const form = this.page.getByTestId("lift-test-form");
    await form.getByTestId("test-gross-lift").fill(values.grossLift);
    await form.getByTestId("test-temperature").fill(values.temperature);
    await form.getByTestId("test-pressure").fill(values.pressure ?? "");
    if (values.altitude !== undefined) await form.getByTestId("test-altitude").fill(values.altitude);
    await form.getByTestId("test-purity").fill(values.purity);
    await form.getByTestId("lift-test-save").click();
    const message = form.getByTestId("lift-test-message");
    await message.waitFor();
    return message.innerText();
  }

  roleOf(email: string) {
    return this.table("people")
      .getByRole("row", { name: new RegExp(email.replace(/[.@]/g, "\\$&")) })
      .getByTestId("role-select");
  }
}

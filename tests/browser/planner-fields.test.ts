import path from "node:path";
import type { Browser, BrowserContext } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { SCREENSHOT_DIR, launchBrowser, screenshot } from "../support/browser";
import { ApiClient } from "../support/http";
import { createSetupFrom, plannerDataFor, storedSetup } from "../support/planner-fixture";
import { PlannerPage, signedInContext } from "../support/planner-page";

const baseURL = inject("baseURL");
const EMAIL = "tobin@trimrail.test";
// Tobin's windy-day relay plan (7 m/s wind, one payload) and Wren's field-day whip (two payloads),
// copied into new setups of Tobin's so that these tests may save them without touching the seeded ones.
const RELAY = "set-tobin-draft";
const WHIP = "set-wren-whip";

let browser: Browser;
let context: BrowserContext;
const api = new ApiClient(baseURL);

beforeAll(async () => {
  browser = await launchBrowser();
  context = await signedInContext(browser, baseURL, EMAIL);
  expect((await api.signIn(EMAIL)).status).toBe(200);
});
afterAll(async () => {
  await browser?.close();
});

async function plannerOn(setupId: string): Promise<PlannerPage> {
  const planner = new PlannerPage(await context.newPage());
  await planner.open(setupId);
  return planner;
}

describe("Planner fields: what is saved is what is shown", () => {
  it("keeps an out-of-range wind with its message, refuses Save naming the field, and sends nothing", async () => {
    const { id, draft } = await createSetupFrom(api, RELAY, "Fields: wind out of range");
    const planner = await plannerOn(id);
    const writes = planner.recordSetupWrites();

    await planner.typeInto("wind-input", "-5");
    expect(await planner.page.getByTestId("wind-input").inputValue()).toBe("-5");
    expect(await planner.fieldMessage("wind-input")).toMatch(/Between 0 and 40 m\/s: -5 m\/s is too low/);
    // Nothing in the setup changed: the bad value is not in the draft.
    expect(await planner.page.getByTestId("unsaved").count()).toBe(0);

    const refusal = await planner.save();
    expect(refusal).toMatch(/Nothing was saved/);
    expect(refusal).toMatch(/Wind/);
    expect(await planner.focusedTestId()).toBe("wind-input");
    await screenshot(planner.page, "planner-fields-1-refused");
    // Submit refuses the same way while the field shows its error (its cautions read, so that it could go).
    const acknowledge = planner.page.getByTestId("acknowledge-cautions");
    if ((await acknowledge.count()) > 0) await acknowledge.check();
    await planner.page.getByTestId("submit-setup").click();
    await expect.poll(() => planner.text("save-message")).toMatch(/Nothing was submitted.*Wind/);
    expect(writes).toEqual([]);

    const stored = await storedSetup(api, id);
    expect(stored.version).toBe(1);
    expect(stored.draft.site.windMS).toBe(draft.site.windMS);
    await planner.page.reload();
    await planner.page.getByTestId("planner").waitFor();
    expect(await planner.page.getByTestId("wind-input").inputValue()).toBe(String(draft.site.windMS));

    // Put right, the refusal goes and Save saves the value shown.
    await planner.typeInto("wind-input", "9");
    await expect(planner.save()).resolves.toMatch(/Saved \(version 2\)/);
    expect((await storedSetup(api, id)).draft.site.windMS).toBe(9);
    await planner.page.close();
  });

  it("reads a decimal comma in Fill as a decimal: 1,5 is 1.5 % (below the least fill), 7,5 is saved as 7.5 %", async () => {
    const { id } = await createSetupFrom(api, RELAY, "Fields: decimal comma");
    const planner = await plannerOn(id);
    await planner.openSection("section-gas");

    await planner.typeInto("fill-input", "1,5");
    expect(await planner.page.getByTestId("fill-input").inputValue()).toBe("1,5");
    expect(await planner.fieldMessage("fill-input")).toMatch(/Between 5 and 100 %: 1\.5 % is too low/);
    await expect(planner.save()).resolves.toMatch(/Nothing was saved.*Fill/);
    expect(await planner.focusedTestId()).toBe("fill-input");

    await planner.typeInto("fill-input", "1,500.5");
    expect(await planner.fieldMessage("fill-input")).toMatch(/could be read two ways/);
    await planner.typeInto("fill-input", "9x");
    expect(await planner.fieldMessage("fill-input")).toBe("Enter a number, e.g. 1.5");
    await screenshot(planner.page, "planner-fields-2-fill");

    await planner.typeInto("fill-input", "7,5");
    expect(await planner.fieldMessage("fill-input")).toBeNull();
    await expect(planner.save()).resolves.toMatch(/Saved/);
    expect((await storedSetup(api, id)).draft.gas.fillFraction).toBeCloseTo(0.075, 12);
    await planner.page.reload();
    await planner.page.getByTestId("planner").waitFor();
    expect(await planner.page.getByTestId("fill-input").inputValue()).toBe("7.5");
    await planner.page.close();
  });

  it("leaves the setup unchanged when the mount field is only tabbed through: no unsaved state, no rounding written back", async () => {
    // A mount position finer than the field shows (it shows millimetres).
    const rail = plannerDataFor(RELAY).catalogue.models.find((m) => m.id === plannerDataFor(RELAY).draft.modelId)!;
    const positionXM = rail.railStartXM + 0.1234567;
    const { id } = await createSetupFrom(api, RELAY, "Fields: tab through", { mountPositionXM: positionXM });
    const planner = await plannerOn(id);
    const writes = planner.recordSetupWrites();

    const shown = await planner.mountPositionText();
    expect(Number(shown)).not.toBe(positionXM);
    await planner.page.getByTestId("mount-position-input").focus();
    await planner.page.keyboard.press("Tab");
    await planner.page.getByTestId("mount-position-input").focus();
    await planner.page.keyboard.press("Shift+Tab");
    expect(await planner.page.getByTestId("unsaved").count()).toBe(0);
    expect(await planner.mountPositionText()).toBe(shown);
    expect(writes).toEqual([]);

    // Saved for another change, the position is still the exact one it had, not the shown rounding.
    await planner.typeInto("wind-input", "6");
    expect(await planner.page.getByTestId("unsaved").count()).toBe(1);
    await expect(planner.save()).resolves.toMatch(/Saved/);
    expect((await storedSetup(api, id)).draft.mountPositionXM).toBe(positionXM);
    await planner.page.close();
  });

  it("refuses an empty setup name with a message and keeps the field empty, rather than restoring the old name", async () => {
    const { id } = await createSetupFrom(api, RELAY, "Fields: name kept");
    const planner = await plannerOn(id);
    const writes = planner.recordSetupWrites();

    await planner.typeInto("setup-name-input", "");
    expect(await planner.page.getByTestId("setup-name-input").inputValue()).toBe("");
    expect(await planner.fieldMessage("setup-name-input")).toBe("Give the setup a name");
    await expect(planner.save()).resolves.toMatch(/Nothing was saved.*Setup name/);
    expect(await planner.focusedTestId()).toBe("setup-name-input");
    expect(await planner.page.getByTestId("setup-name-input").inputValue()).toBe("");
    expect(writes).toEqual([]);
    expect((await storedSetup(api, id)).draft.name).toBe("Fields: name kept");
    await screenshot(planner.page, "planner-fields-3-name");

    await planner.typeInto("setup-name-input", "Fields: name renamed");
    await expect(planner.save()).resolves.toMatch(/Saved/);
    expect((await storedSetup(api, id)).draft.name).toBe("Fields: name renamed");
    await planner.page.close();
  });

  it("undoes a Remove: the payload comes back at its place with its values, and the offer goes with the next edit", async () => {
    const { id } = await createSetupFrom(api, WHIP, "Fields: undo remove");
    const planner = await plannerOn(id);
    const names = await planner.payloadNames();
    expect(names.length).toBe(2);
    const massBefore = await planner.text("total-mass");

    await planner.page.getByRole("button", { name: `Remove ${names[0]}` }).click();
    expect(await planner.payloadNames()).toEqual(names.slice(1));
    expect((await planner.text("payload-undo")).replace(/\s+/g, " ")).toBe(`Removed ${names[0]}. Undo`);
    expect(await planner.focusedTestId()).toBe("undo-remove");
    await screenshot(planner.page, "planner-fields-4-removed");

    await planner.page.keyboard.press("Enter");
    expect(await planner.payloadNames()).toEqual(names);
    expect(await planner.text("total-mass")).toBe(massBefore);
    expect(await planner.page.getByTestId("undo-remove").count()).toBe(0);
    // Back as it was: nothing to save.
    expect(await planner.page.getByTestId("unsaved").count()).toBe(0);

    // Another edit after a Remove ends the offer; the Remove stays.
    await planner.page.getByRole("button", { name: `Remove ${names[1]}` }).click();
    await planner.page.getByTestId("mount-aft").click();
    expect(await planner.page.getByTestId("undo-remove").count()).toBe(0);
    expect(await planner.payloadNames()).toEqual(names.slice(0, 1));
    await planner.page.close();
  });

  it("puts the balance summary above the first input section at 390 × 844, and leaves the wide layout as it was", async () => {
    const { id } = await createSetupFrom(api, RELAY, "Fields: phone layout");
    const phone = await plannerOn(id);
    await phone.page.setViewportSize({ width: 390, height: 844 });
    const { summary, firstInputs } = phone.summaryAndFirstInputs();
    await summary.waitFor({ state: "visible" });
    const summaryBox = (await summary.boundingBox())!;
    const inputsBox = (await firstInputs.boundingBox())!;
    expect(summaryBox.y + summaryBox.height).toBeLessThanOrEqual(inputsBox.y);
    // Its figures are the panel's own.
    expect(await phone.text("summary-free-lift")).toContain(await phone.text("free-lift"));
    expect(await phone.text("summary-calm-trim")).toBe(await phone.text("calm-trim"));
    await screenshot(phone.page, "planner-fields-5-phone");
    // And the first screen alone, as the phone shows it on opening.
    await phone.page.evaluate(() => window.scrollTo(0, 0));
    await phone.page.screenshot({ path: path.join(SCREENSHOT_DIR, "planner-fields-6-phone-first-screen.png") });
    await phone.page.close();

    const wide = await plannerOn(id);
    const wideParts = wide.summaryAndFirstInputs();
    expect(await wideParts.summary.isVisible()).toBe(false);
    const panel = (await wide.page.getByTestId("balance-panel").boundingBox())!;
    const inputs = (await wideParts.firstInputs.boundingBox())!;
    // Beside the inputs, as before.
    expect(panel.x).toBeGreaterThan(inputs.x + inputs.width - 1);
    await wide.page.close();
  });
});

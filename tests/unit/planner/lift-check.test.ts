import { describe, expect, it } from "vitest";
import { createPlannerStore, setupCatalogueFor } from "@/components/planner/store";
import { draftFromRows, columnsFromDraft } from "@/db/setup-columns";
import { liftCheckOf, plannedBalanceInput, toBalanceInput } from "@/lib/setups/balance-input";
import { setupDraftSchema, type SetupDraft } from "@/lib/setups/setup-draft";
import { plannerDataFor } from "../../support/planner-fixture";

// Wren's whip setup on her serial unit R11-0007 (invented demo), weighed at the field at the
// site's own temperature so the engine's free lift must equal the weighed one.
const SETUP = "set-wren-whip";

describe("setLiftCheck", () => {
  it("returns a result whose free lift is the weighed one, planned with the measured purity", () => {
    const store = createPlannerStore(plannerDataFor(SETUP));
    const { draft } = store.getState();
    const temperatureC = draft.site.temperatureC ?? 15;
    store.getState().actions.setLiftCheck({ freeLiftKg: 0.25, temperatureC, weighedWith: "setup", solveFor: "purity" });
    const after = store.getState();
    expect(after.result.freeLiftKg).toBeCloseTo(0.25, 9);
    const check = liftCheckOf(after.draft, plannedBalanceInput(after.draft, setupCatalogueFor(after.draft, after.catalogue)));
    expect(check?.problem).toBeNull();
    expect(after.input.gas?.purity).toBeCloseTo(check!.purity, 12);
    expect(after.input.gas?.purity).not.toBeCloseTo(draft.gas.purity, 3);
  });

  it("returns the envelope's own free lift when it was weighed alone", () => {
    const store = createPlannerStore(plannerDataFor(SETUP));
    const temperatureC = store.getState().draft.site.temperatureC ?? 15;
    store.getState().actions.setLiftCheck({ freeLiftKg: 0.5, temperatureC, weighedWith: "envelope", solveFor: "volume" });
    const { result, input } = store.getState();
    expect(result.grossLiftKg - input.envelope.massKg).toBeCloseTo(0.5, 9);
  });

  it("keeps the gas as entered when the weighing is more than pure helium could lift", () => {
    const store = createPlannerStore(plannerDataFor(SETUP));
    const before = store.getState().input;
    store.getState().actions.setLiftCheck({ freeLiftKg: 5, temperatureC: 15, weighedWith: "setup", solveFor: "purity" });
    expect(store.getState().input).toEqual(before);
    store.getState().actions.setLiftCheck(null);
    expect(store.getState().draft.liftCheck).toBeNull();
  });
});

describe("a stored lift check", () => {
  it("returns the same draft after the setup's columns and back, and passes the draft schema", () => {
    const data = plannerDataFor(SETUP);
    const draft: SetupDraft = { ...data.draft, liftCheck: { freeLiftKg: 0.31, temperatureC: 9, weighedWith: "setup", solveFor: "volume" } };
    expect(setupDraftSchema.safeParse(draft).success).toBe(true);
    const row = { ...columnsFromDraft(draft) } as unknown as Parameters<typeof draftFromRows>[0];
    expect(draftFromRows(row, []).liftCheck).toEqual(draft.liftCheck);
    // The server's input (toBalanceInput) is the Planner's: one function for both.
    expect(toBalanceInput(draft, setupCatalogueFor(draft, data.catalogue)).envelope.gasVolumeM3).not.toBeCloseTo(
      plannedBalanceInput(draft, setupCatalogueFor(draft, data.catalogue)).envelope.gasVolumeM3,
      4,
    );
  });

  it("refuses a lift check with an unknown load, naming the field", () => {
    const data = plannerDataFor(SETUP);
    const parsed = setupDraftSchema.safeParse({
      ...data.draft,
      liftCheck: { freeLiftKg: 0.3, temperatureC: 9, weighedWith: "balloon", solveFor: "purity" },
    });
    expect(parsed.error?.issues[0].path).toEqual(["liftCheck", "weighedWith"]);
  });
});

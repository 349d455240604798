import { describe, expect, it } from "vitest";
import { createPlannerStore, displayedTrimDeg, inputFor } from "@/components/planner/store";
import { evaluateBalance } from "@/lib/balance";
import { plannerDataFor } from "../../support/planner-fixture";

// A seeded demo draft: Tobin's relay plan on the 1.1 m³ model, 7 m/s wind, 11 m/s gusts.
const SETUP = "set-tobin-draft";

describe("createPlannerStore", () => {
  it("returns the engine's result for the initial draft", () => {
    const store = createPlannerStore(plannerDataFor(SETUP));
    const { draft, catalogue, result } = store.getState();
    expect(result).toEqual(evaluateBalance(inputFor(draft, catalogue)));
  });
});

describe("setMountPosition", () => {
  it("recomputes the result and moves the centre of mass aft when the mount goes aft", () => {
    const store = createPlannerStore(plannerDataFor(SETUP));
    const before = store.getState().result;
    const x0 = store.getState().draft.mountPositionXM;
    store.getState().actions.setMountPosition(x0 + 0.05);
    const after = store.getState();
    expect(after.draft.mountPositionXM).toBeCloseTo(x0 + 0.05, 12);
    expect(after.result.centreOfMass.x).toBeGreaterThan(before.centreOfMass.x);
    expect(after.result).toEqual(evaluateBalance(inputFor(after.draft, after.catalogue)));
    expect(after.lastEditAtMs).toBeGreaterThan(0);
  });

  it("leaves the state untouched for a non-finite position", () => {
    const store = createPlannerStore(plannerDataFor(SETUP));
    const before = store.getState();
    store.getState().actions.setMountPosition(Number.NaN);
    expect(store.getState()).toBe(before);
  });
});

describe("nudgeMount", () => {
  it("keeps the mount on the rail", () => {
    const store = createPlannerStore(plannerDataFor(SETUP));
    const model = store.getState().catalogue.models.find((m) => m.id === store.getState().draft.modelId)!;
    store.getState().actions.nudgeMount(10);
    expect(store.getState().draft.mountPositionXM).toBe(model.railEndXM);
    store.getState().actions.nudgeMount(-10);
    expect(store.getState().draft.mountPositionXM).toBe(model.railStartXM);
  });
});

describe("levelIt", () => {
  it("moves the mount to where the calm trim is level (|trim| < 0.1°)", () => {
    const store = createPlannerStore(plannerDataFor(SETUP));
    expect(Math.abs(store.getState().result.calmTrimDeg ?? 0)).toBeGreaterThan(0.5);
    const outcome = store.getState().actions.levelIt();
    expect(outcome.ok).toBe(true);
    expect(Math.abs(store.getState().result.calmTrimDeg ?? 99)).toBeLessThan(0.1);
  });

  it("returns a reason and moves nothing when the setup has no free lift", () => {
    const store = createPlannerStore(plannerDataFor("set-wren-heavy"));
    const x0 = store.getState().draft.mountPositionXM;
    const outcome = store.getState().actions.levelIt();
    expect(outcome.ok).toBe(false);
    expect(store.getState().draft.mountPositionXM).toBe(x0);
  });
});

describe("levelIt and the stops a level position brings", () => {
  it("returns the stop flags that the levelled position brings: a whip hung ahead of the mount meets the line", () => {
    const data = plannerDataFor("set-wren-whip");
    const model = data.catalogue.models.find((m) => m.id === data.draft.modelId)!;
    // The whip 12 cm ahead of a mount far aft: clear there, on the line once levelling moves it forward.
    const draft = {
      ...data.draft,
      mountPositionXM: model.railStartXM + 0.8 * (model.railEndXM - model.railStartXM),
      payloads: data.draft.payloads.map((p, i) => (i === 0 ? { ...p, offsetXM: -0.12 } : p)),
    };
    const store = createPlannerStore({ ...data, draft });
    const stopsBefore = store.getState().result.flags.filter((f) => f.level === "stop");
    expect(stopsBefore).toEqual([]);
    const outcome = store.getState().actions.levelIt();
    expect(outcome.ok).toBe(true);
    if (!outcome.ok) return;
    expect(outcome.positionXM).toBeLessThan(draft.mountPositionXM);
    expect(outcome.newStops).toEqual(["clearance-tether"]);
    expect(store.getState().result.flags.find((f) => f.code === "clearance-tether")?.level).toBe("stop");
  });

  it("returns no new stops when the level position is clear", () => {
    const outcome = createPlannerStore(plannerDataFor(SETUP)).getState().actions.levelIt();
    expect(outcome).toMatchObject({ ok: true, newStops: [] });
  });
});

describe("payload actions", () => {
  it("adds, updates and removes payloads and the total mass follows", () => {
    const store = createPlannerStore(plannerDataFor(SETUP));
    const { actions } = store.getState();
    const mass0 = store.getState().result.totalMassKg;
    const base = store.getState().draft.payloads[0];
    actions.addPayload({ ...base, name: "Spare", massKg: 0.2 });
    expect(store.getState().result.totalMassKg).toBeCloseTo(mass0 + 0.2, 9);
    actions.updatePayload(1, { ...base, name: "Spare", massKg: 0.3 });
    expect(store.getState().result.totalMassKg).toBeCloseTo(mass0 + 0.3, 9);
    actions.removePayload(1);
    expect(store.getState().result.totalMassKg).toBeCloseTo(mass0, 9);
  });
});

describe("setModel", () => {
  it("keeps the mount at the same fraction of the new rail and drops a unit of another model", () => {
    const store = createPlannerStore(plannerDataFor("set-wren-whip"));
    const { catalogue, draft } = store.getState();
    const from = catalogue.models.find((m) => m.id === draft.modelId)!;
    const fraction = (draft.mountPositionXM - from.railStartXM) / (from.railEndXM - from.railStartXM);
    expect(draft.unitId).not.toBeNull();
    store.getState().actions.setModel("mdl-ridge-18");
    const to = catalogue.models.find((m) => m.id === "mdl-ridge-18")!;
    const after = store.getState().draft;
    expect((after.mountPositionXM - to.railStartXM) / (to.railEndXM - to.railStartXM)).toBeCloseTo(fraction, 9);
    expect(after.unitId).toBeNull();
  });
});

describe("markSaved and displayedTrimDeg", () => {
  it("clears the unsaved state and shows the chosen case's trim", () => {
    const store = createPlannerStore(plannerDataFor(SETUP));
    store.getState().actions.nudgeMount(0.01);
    expect(store.getState().draft).not.toBe(store.getState().savedDraft);
    store.getState().actions.markSaved({ version: 2, status: "draft" });
    expect(store.getState().draft).toBe(store.getState().savedDraft);
    expect(store.getState().version).toBe(2);

    store.getState().actions.setTrimCase("calm");
    expect(displayedTrimDeg(store.getState())).toBe(store.getState().result.calmTrimDeg);
    store.getState().actions.setTrimCase("wind");
    expect(displayedTrimDeg(store.getState())).toBe(store.getState().result.wind?.trimDeg);
  });
});

describe("a read-only store (the reviewer's view)", () => {
  it("returns the stored result and ignores every edit", () => {
    const data = plannerDataFor(SETUP);
    const fresh = createPlannerStore(data).getState().result;
    const stored = { ...fresh, calmTrimDeg: 4.25 };
    const store = createPlannerStore({ ...data, readOnly: true, storedResult: stored });
    expect(store.getState().result).toBe(stored);
    const { actions } = store.getState();
    actions.setMountPosition(data.draft.mountPositionXM + 0.05);
    actions.nudgeMount(0.01);
    actions.setGas({ purity: 0.6 });
    actions.removePayload(0);
    actions.setName("Changed");
    expect(store.getState().draft).toBe(data.draft);
    expect(store.getState().result).toBe(stored);
  });
});

import { describe, expect, it } from "vitest";
import { createPlannerStore } from "@/components/planner/store";
import { sameValue } from "@/components/planner/same-draft";
import { plannerDataFor } from "../../support/planner-fixture";

// Seeded demo drafts: Tobin's relay plan (one payload), Wren's field-day whip (two).
const ONE_PAYLOAD = "set-tobin-draft";
const SEVERAL = "set-wren-whip";

describe("an edit that changes nothing", () => {
  it("leaves the draft, the result and the unsaved state as they were", () => {
    const store = createPlannerStore(plannerDataFor(ONE_PAYLOAD));
    const before = store.getState();
    const { actions, draft } = before;
    actions.setSite({ windMS: draft.site.windMS });
    actions.setGas({ fillFraction: draft.gas.fillFraction });
    actions.setName(draft.name);
    actions.setMountPosition(draft.mountPositionXM);
    expect(store.getState().draft).toBe(before.draft);
    expect(store.getState().result).toBe(before.result);
    expect(store.getState().dirty).toBe(false);
  });

  it("is unsaved after a change and saved again once the value is typed back as it was", () => {
    const store = createPlannerStore(plannerDataFor(ONE_PAYLOAD));
    const windMS = store.getState().draft.site.windMS;
    store.getState().actions.setSite({ windMS: windMS + 1 });
    expect(store.getState().dirty).toBe(true);
    store.getState().actions.setSite({ windMS });
    expect(store.getState().dirty).toBe(false);
  });

  it("clears the unsaved state on save", () => {
    const store = createPlannerStore(plannerDataFor(ONE_PAYLOAD));
    store.getState().actions.setGas({ purity: 0.9 });
    expect(store.getState().dirty).toBe(true);
    store.getState().actions.markSaved({ version: 2, status: "draft" });
    expect(store.getState().dirty).toBe(false);
  });
});

describe("removePayload and insertPayload", () => {
  it("hands back the payload removed, and puts it back at its place with its values", () => {
    const store = createPlannerStore(plannerDataFor(SEVERAL));
    const original = store.getState().draft.payloads;
    expect(original.length).toBeGreaterThanOrEqual(2);
    const removed = store.getState().actions.removePayload(0);
    expect(removed).toBe(original[0]);
    expect(store.getState().draft.payloads).toEqual(original.slice(1));
    expect(store.getState().dirty).toBe(true);
    store.getState().actions.insertPayload(0, removed!);
    expect(store.getState().draft.payloads).toEqual(original);
    expect(store.getState().dirty).toBe(false);
  });

  it("hands back nothing for a place with no payload, and in a read-only view", () => {
    const data = plannerDataFor(SEVERAL);
    expect(createPlannerStore(data).getState().actions.removePayload(99)).toBeNull();
    const readOnly = createPlannerStore({ ...data, readOnly: true });
    expect(readOnly.getState().actions.removePayload(0)).toBeNull();
    readOnly.getState().actions.insertPayload(0, data.draft.payloads[0]);
    expect(readOnly.getState().draft).toBe(data.draft);
  });
});

describe("reportFieldIssue", () => {
  it("keeps the fields that show an error, by id, and drops them when put right", () => {
    const store = createPlannerStore(plannerDataFor(ONE_PAYLOAD));
    const { reportFieldIssue } = store.getState().actions;
    reportFieldIssue("wind", { id: "wind", label: "Wind", message: "Between 0 and 40 m/s: -5 m/s is too low." });
    reportFieldIssue("fill", { id: "fill", label: "Fill", message: "Between 5 and 100 %: 1.5 % is too low." });
    expect(Object.keys(store.getState().fieldIssues).sort()).toEqual(["fill", "wind"]);
    const issues = store.getState().fieldIssues;
    // The same report again is no change (no re-render of whoever listens).
    reportFieldIssue("fill", { id: "fill", label: "Fill", message: "Between 5 and 100 %: 1.5 % is too low." });
    expect(store.getState().fieldIssues).toBe(issues);
    reportFieldIssue("wind", null);
    expect(Object.keys(store.getState().fieldIssues)).toEqual(["fill"]);
    reportFieldIssue("wind", null);
    expect(Object.keys(store.getState().fieldIssues)).toEqual(["fill"]);
    // An issue is not an edit of the setup.
    expect(store.getState().dirty).toBe(false);
  });
});

describe("sameValue", () => {
  it("compares plain data by value, whatever the key order", () => {
    expect(sameValue({ a: 1, b: [1, { c: null }] }, { b: [1, { c: null }], a: 1 })).toBe(true);
    expect(sameValue({ a: 1, b: undefined }, { a: 1 })).toBe(true);
    expect(sameValue({ a: 1 }, { a: 2 })).toBe(false);
    expect(sameValue([1, 2], [1, 2, 3])).toBe(false);
    expect(sameValue([], {})).toBe(false);
    expect(sameValue({ a: null }, { a: 0 })).toBe(false);
  });
});

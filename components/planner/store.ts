import { createStore, type StoreApi } from "zustand/vanilla";
import type { FlagCode, SetupStatus, UnitSystem } from "@/lib/domain";
import { evaluateBalance, solveLevelTrimPositionX, type BalanceInput, type BalanceResult, type LevelTrimFailure } from "@/lib/balance";
import { formatQuantity } from "@/lib/units";
import { toBalanceInput, type SetupCatalogue } from "@/lib/setups/balance-input";
import type { LiftCheckDraft, SetupDraft, SetupPayloadDraft } from "@/lib/setups/setup-draft";
import type { FieldIssue } from "@/components/ui/field-issues";
import { sameValue } from "./same-draft";
import type { PlannerCatalogue, PlannerData, PlannerModel, TrimCase } from "./types";

const LEVEL_FAILURES: Record<LevelTrimFailure, string> = {
  "no-free-lift": "No mount position levels it: without free lift it does not fly.",
  unstable: "No mount position levels it: it has no stable trim (its centre of mass is too high).",
  "nothing-moves": "No mount position levels it: nothing rides on the mount.",
};

export interface PlannerActions {
  setMountPosition: (positionXM: number) => void;
  nudgeMount: (deltaM: number) => void;
  /** Levels the calm trim; `newStops` are the stop flags the new position brings (e.g. a payload on the line). */
  levelIt: () => { ok: true; positionXM: number; newStops: FlagCode[] } | { ok: false; reason: string };
  setName: (name: string) => void;
  setModel: (modelId: string) => void;
  setUnit: (unitId: string | null) => void;
  setMountId: (mountId: string) => void;
  setSite: (patch: Partial<SetupDraft["site"]>) => void;
  setGas: (patch: Partial<SetupDraft["gas"]>) => void;
  setTether: (tether: SetupDraft["tether"]) => void;
  /** The day's lift check as weighed at the field; null removes it. */
  setLiftCheck: (liftCheck: LiftCheckDraft | null) => void;
  setTargetHeight: (heightM: number | null) => void;
  addPayload: (payload: SetupPayloadDraft) => void;
  updatePayload: (index: number, payload: SetupPayloadDraft) => void;
  /** Takes a payload off; returns it (null: no payload there), so that it can be put back. */
  removePayload: (index: number) => SetupPayloadDraft | null;
  /** Puts a payload back at its place in the list (an undone Remove). */
  insertPayload: (index: number, payload: SetupPayloadDraft) => void;
  /** A field that shows an error (or no longer does): Save and Submit refuse while any does. */
  reportFieldIssue: (id: string, issue: FieldIssue | null) => void;
  setTrimCase: (trimCase: TrimCase) => void;
  setUnitSystem: (unitSystem: UnitSystem) => void;
  markSaved: (saved: { version: number; status: SetupStatus }) => void;
}

export interface PlannerState extends PlannerData {
  /** The draft as last saved, to tell whether there is anything to save. */
  savedDraft: SetupDraft;
  /** The draft holds something the saved one does not (typing a value back as it was is not a change). */
  dirty: boolean;
  /** The fields that show an error now, by element id. */
  fieldIssues: Record<string, FieldIssue>;
  input: BalanceInput;
  result: BalanceResult;
  trimCase: TrimCase;
  /** performance.now() of the last edit, so the panel can measure edit-to-paint time. */
  lastEditAtMs: number;
  actions: PlannerActions;
}

export type PlannerStore = StoreApi<PlannerState>;

export function modelOf(catalogue: PlannerCatalogue, modelId: string): PlannerModel {
  return catalogue.models.find((m) => m.id === modelId) ?? catalogue.models[0];
}

/** The catalogue rows a draft names, from the catalogue the page was given. */
export function setupCatalogueFor(draft: SetupDraft, catalogue: PlannerCatalogue): SetupCatalogue {
  const model = modelOf(catalogue, draft.modelId);
  const unit = catalogue.units.find((u) => u.id === draft.unitId) ?? null;
  const mount = catalogue.mounts.find((m) => m.id === draft.mountId) ?? catalogue.mounts[0];
  const adaptersById = Object.fromEntries(catalogue.adapters.map((a) => [a.id, a]));
  return { model, unit, mount, adaptersById };
}

/** The engine's input for a draft, from the catalogue the page was given. */
export function inputFor(draft: SetupDraft, catalogue: PlannerCatalogue): BalanceInput {
  return toBalanceInput(draft, setupCatalogueFor(draft, catalogue));
}

const now = (): number => (typeof performance === "undefined" ? 0 : performance.now());

export function createPlannerStore(data: PlannerData): PlannerStore {
  return createStore<PlannerState>()((set, get) => {
    // Every edit goes through here: the engine runs once per change, in the same tick.
    const withDraft = (draft: SetupDraft): Partial<PlannerState> => {
      const input = inputFor(draft, get().catalogue);
      return { draft, input, result: evaluateBalance(input), lastEditAtMs: now(), dirty: !sameValue(draft, get().savedDraft) };
    };
    // A read-only store (a reviewer's view) ignores every edit, so no control can change what is shown;
    // an edit that changes nothing is no edit (no new draft, no unsaved state).
    const edit = (change: (draft: SetupDraft) => SetupDraft) => {
      if (get().readOnly) return;
      const next = change(get().draft);
      if (!sameValue(next, get().draft)) set(withDraft(next));
    };

    const initialInput = inputFor(data.draft, data.catalogue);
    return {
      ...data,
      savedDraft: data.draft,
      dirty: false,
      fieldIssues: {},
      input: initialInput,
      result: data.readOnly && data.storedResult ? data.storedResult : evaluateBalance(initialInput),
      trimCase: data.draft.site.windMS > 0 ? "wind" : "calm",
      lastEditAtMs: 0,
      actions: {
        setMountPosition: (positionXM) => {
          if (positionXM === get().draft.mountPositionXM || !Number.isFinite(positionXM)) return;
          edit((d) => ({ ...d, mountPositionXM: positionXM }));
        },
        nudgeMount: (deltaM) => {
          const { draft, catalogue } = get();
          const model = modelOf(catalogue, draft.modelId);
          const next = Math.min(model.railEndXM, Math.max(model.railStartXM, draft.mountPositionXM + deltaM));
          get().actions.setMountPosition(next);
        },
        levelIt: () => {
          const { input, catalogue, draft, unitSystem } = get();
          const solution = solveLevelTrimPositionX(input, 0);
          if (solution.positionX === null) return { ok: false, reason: LEVEL_FAILURES[solution.reason] };
          const model = modelOf(catalogue, draft.modelId);
          if (!solution.withinRail) {
            const at = (x: number) => formatQuantity("length", x, unitSystem, 3);
            return {
              ok: false,
              reason: `Level trim needs the mount at ${at(solution.positionX)} from the nose, off the rail (${at(model.railStartXM)} to ${at(model.railEndXM)}).`,
            };
          }
          const stopsBefore = new Set(
            get()
              .result.flags.filter((f) => f.level === "stop")
              .map((f) => f.code),
          );
          get().actions.setMountPosition(solution.positionX);
          const newStops = [
            ...new Set(
              get()
                .result.flags.filter((f) => f.level === "stop" && !stopsBefore.has(f.code))
                .map((f) => f.code),
            ),
          ];
          return { ok: true, positionXM: solution.positionX, newStops };
        },
        setName: (name) => edit((d) => ({ ...d, name })),
        setModel: (modelId) =>
          edit((d) => {
            const model = modelOf(get().catalogue, modelId);
            const unitStays = get().catalogue.units.some((u) => u.id === d.unitId && u.modelId === modelId);
            // Keep the mount where it was along the rail, in proportion, on the new model's rail.
            const old = modelOf(get().catalogue, d.modelId);
            const fraction = (d.mountPositionXM - old.railStartXM) / Math.max(1e-9, old.railEndXM - old.railStartXM);
            const clamped = Math.min(1, Math.max(0, fraction));
            return {
              ...d,
              modelId,
              unitId: unitStays ? d.unitId : null,
              mountPositionXM: model.railStartXM + clamped * (model.railEndXM - model.railStartXM),
            };
          }),
        setUnit: (unitId) => edit((d) => ({ ...d, unitId })),
        setMountId: (mountId) => edit((d) => ({ ...d, mountId })),
        setSite: (patch) => edit((d) => ({ ...d, site: { ...d.site, ...patch } })),
        setGas: (patch) => edit((d) => ({ ...d, gas: { ...d.gas, ...patch } })),
        setTether: (tether) => edit((d) => ({ ...d, tether })),
        setLiftCheck: (liftCheck) => edit((d) => ({ ...d, liftCheck })),
        setTargetHeight: (targetHeightM) => edit((d) => ({ ...d, targetHeightM })),
        addPayload: (payload) => edit((d) => ({ ...d, payloads: [...d.payloads, payload] })),
        updatePayload: (index, payload) => edit((d) => ({ ...d, payloads: d.payloads.map((p, i) => (i === index ? payload : p)) })),
        removePayload: (index) => {
          const removed = get().draft.payloads[index];
          if (!removed || get().readOnly) return null;
          edit((d) => ({ ...d, payloads: d.payloads.filter((_, i) => i !== index) }));
          return removed;
        },
        insertPayload: (index, payload) =>
          edit((d) => ({ ...d, payloads: [...d.payloads.slice(0, index), payload, ...d.payloads.slice(index)] })),
        reportFieldIssue: (id, issue) => {
          const issues = get().fieldIssues;
          if (issue === null ? !(id in issues) : sameValue(issues[id], issue)) return;
          const { [id]: _gone, ...rest } = issues;
          set({ fieldIssues: issue === null ? rest : { ...rest, [id]: issue } });
        },
        setTrimCase: (trimCase) => set({ trimCase }),
        setUnitSystem: (unitSystem) => set({ unitSystem }),
        markSaved: ({ version, status }) => set({ version, status, savedDraft: get().draft, dirty: false }),
      },
    };
  });
}

/** The trim the scene shows for the chosen case, falling back to calm when that case has none. */
export function displayedTrimDeg(state: Pick<PlannerState, "result" | "trimCase">): number {
  const { result, trimCase } = state;
  const windCase = trimCase === "wind" ? result.wind : trimCase === "gust" ? result.gust : null;
  return windCase?.trimDeg ?? result.calmTrimDeg ?? 0;
}

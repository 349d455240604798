import type { BalanceResult } from "@/lib/balance";
import type { SetupStatus, UnitSystem } from "@/lib/domain";
import type { AdapterSpec, ModelSpec, MountSpec, UnitSpec } from "@/lib/setups/balance-input";
import type { SetupDraft, SetupPayloadDraft } from "@/lib/setups/setup-draft";

// Plain, serialisable catalogue records the server page hands to the Planner.
// `active` false: retired in the Workshop. Such an item is here only because the open setup names
// it; the Planner keeps it for that setup but does not offer it as a new choice.
export interface PlannerModel extends ModelSpec {
  id: string;
  name: string;
  slug: string;
  glbPath: string;
  railTabCount: number;
  active?: boolean;
}
export interface PlannerUnit extends UnitSpec {
  id: string;
  modelId: string;
  serial: string;
  /** The latest lift test's gross lift and date; null: never tested. */
  testedGrossLiftKg: number | null;
  testedOn: string | null;
  active?: boolean;
}
export interface PlannerMount extends MountSpec {
  id: string;
  name: string;
  active?: boolean;
}
export interface PlannerAdapter extends AdapterSpec {
  id: string;
  name: string;
  active?: boolean;
}
export type PlannerTemplate = Omit<SetupPayloadDraft, "templateId" | "adapterId"> & { id: string; description: string; active?: boolean };

/** Whether an item may be offered as a new choice (retired ones only stay where already chosen). */
export const isOffered = (item: { active?: boolean }, chosen: boolean): boolean => item.active !== false || chosen;

export interface PlannerCatalogue {
  models: PlannerModel[];
  units: PlannerUnit[];
  mounts: PlannerMount[];
  adapters: PlannerAdapter[];
  templates: PlannerTemplate[];
}

export interface PlannerData {
  setupId: string;
  version: number;
  status: SetupStatus;
  draft: SetupDraft;
  catalogue: PlannerCatalogue;
  unitSystem: UnitSystem;
  /** A reviewer's view: nothing can be edited, and the panels show the stored result. */
  readOnly?: boolean;
  /** The server's stored evaluation, shown instead of a fresh one when read-only. */
  storedResult?: BalanceResult | null;
}

export type TrimCase = "calm" | "wind" | "gust";

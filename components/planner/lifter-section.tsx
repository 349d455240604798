"use client";
import { formatQuantity } from "@/lib/units";
import { usePlanner, usePlannerActions } from "./planner-context";
import { Section } from "./section";
import { SetupNameInput } from "./setup-name-input";
import { isOffered, type PlannerUnit } from "./types";

const RETIRED = " (retired: kept for this setup)";

function unitWords(u: PlannerUnit, unitSystem: Parameters<typeof formatQuantity>[2]): string {
  const weighs = `weighs ${formatQuantity("itemMass", u.measuredMassKg, unitSystem)}`;
  if (u.calibrationFactor === null) return `${u.serial} (${weighs}; no lift test: the model's volume)`;
  return `${u.serial} (${weighs}; lift ×${u.calibrationFactor.toFixed(3)} from its ${u.testedOn} test)`;
}

const select = "mt-0.5 w-full rounded border border-hairline bg-white px-2 py-1";

export function LifterSection() {
  const catalogue = usePlanner((s) => s.catalogue);
  const modelId = usePlanner((s) => s.draft.modelId);
  const unitId = usePlanner((s) => s.draft.unitId);
  const mountId = usePlanner((s) => s.draft.mountId);
  const unitSystem = usePlanner((s) => s.unitSystem);
  const actions = usePlannerActions();
  const units = catalogue.units.filter((u) => u.modelId === modelId && isOffered(u, u.id === unitId));
  return (
    <Section title="Lifter" testId="section-lifter">
      <div className="grid gap-3 sm:grid-cols-2">
        <SetupNameInput className={select} />
        <label className="block text-sm text-muted">
          Envelope model
          <select className={select} value={modelId} onChange={(e) => actions.setModel(e.target.value)} data-testid="model-select">
            {catalogue.models
              .filter((m) => isOffered(m, m.id === modelId))
              .map((m) => (
                <option key={m.id} value={m.id}>
                  {m.name} ({formatQuantity("volume", m.gasVolumeM3, unitSystem)}){m.active === false ? RETIRED : ""}
                </option>
              ))}
          </select>
        </label>
        <label className="block text-sm text-muted">
          Serial unit
          <select
            className={select}
            value={unitId ?? ""}
            onChange={(e) => actions.setUnit(e.target.value || null)}
            data-testid="unit-select"
          >
            <option value="">none: the model&apos;s nominal mass</option>
            {units.map((u) => (
              <option key={u.id} value={u.id}>
                {unitWords(u, unitSystem)}
                {u.active === false ? RETIRED : ""}
              </option>
            ))}
          </select>
        </label>
        <label className="block text-sm text-muted sm:col-span-2">
          Mount
          <select className={select} value={mountId} onChange={(e) => actions.setMountId(e.target.value)} data-testid="mount-select">
            {catalogue.mounts
              .filter((m) => isOffered(m, m.id === mountId))
              .map((m) => (
                <option key={m.id} value={m.id}>
                  {m.name}, rated {formatQuantity("mass", m.ratedLoadKg, unitSystem)}
                  {m.active === false ? RETIRED : ""}
                </option>
              ))}
          </select>
        </label>
      </div>
    </Section>
  );
}

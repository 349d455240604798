"use client";
import { useMemo, useState } from "react";
import {
  INPUT_LIMITS,
  LIFT_CHECK_LOAD_WORDS,
  LIFT_CHECK_LOADS,
  type LiftCheckLoad,
  type LiftCheckUnknown,
  type UnitSystem,
} from "@/lib/domain";
import { liftCheckOf, plannedBalanceInput } from "@/lib/setups/balance-input";
import type { LiftCheckDraft } from "@/lib/setups/setup-draft";
import type { DayLiftCheckResult } from "@/lib/balance";
import { formatQuantity } from "@/lib/units";
import { usePlanner, usePlannerActions } from "./planner-context";
import { QuantityInput } from "./quantity-input";
import { Section } from "./section";
import { setupCatalogueFor } from "./store";

const PROBLEM_WORDS: Record<NonNullable<DayLiftCheckResult["problem"]>, string> = {
  "no-gross-lift": "The scale shows no lift at all with that load: check the weighing. The gas is planned as entered.",
  "above-pure-helium":
    "That is more lift than pure helium gives in the planned volume: the envelope holds more gas than planned, or the weighing is off. Try settling the gas volume instead. The gas is planned as entered.",
  "out-of-range":
    "That weighing implies a fill nobody should fly (below half helium): check the weighing and the gas. The gas is planned as entered.",
};

function resultWords(check: DayLiftCheckResult, entered: { purity: number; gasVolumeM3: number }, units: UnitSystem): string {
  if (check.problem) return PROBLEM_WORDS[check.problem];
  if (check.solvedFor === "purity") {
    return `Measured purity ${formatQuantity("ratio", check.purity, units)} (you entered ${formatQuantity("ratio", entered.purity, units)} under Gas); the setup now plans with the measured purity.`;
  }
  return `Measured gas volume ${formatQuantity("volume", check.gasVolumeM3, units)} (planned ${formatQuantity("volume", entered.gasVolumeM3, units)}); the setup now plans with the measured volume.`;
}

/**
 * The day's lift check: the free lift the person weighed at the field, with the air temperature
 * then. The engine (lib/balance/lift-check.ts) turns it into the gas purity or volume that explains
 * it, and the setup uses that, shown here as a measured input.
 */
export function LiftCheckSection() {
  const draft = usePlanner((s) => s.draft);
  const catalogue = usePlanner((s) => s.catalogue);
  const units = usePlanner((s) => s.unitSystem);
  const readOnly = usePlanner((s) => s.readOnly === true);
  const { setLiftCheck } = usePlannerActions();
  const stored = draft.liftCheck ?? null;

  const [freeLiftKg, setFreeLiftKg] = useState<number | null>(stored?.freeLiftKg ?? null);
  const [temperatureC, setTemperatureC] = useState<number | null>(stored?.temperatureC ?? draft.site.temperatureC);
  const [weighedWith, setWeighedWith] = useState<LiftCheckLoad>(stored?.weighedWith ?? "setup");
  const [solveFor, setSolveFor] = useState<LiftCheckUnknown>(stored?.solveFor ?? "purity");

  const planned = useMemo(() => plannedBalanceInput(draft, setupCatalogueFor(draft, catalogue)), [draft, catalogue]);
  const check = useMemo(() => liftCheckOf(draft, planned), [draft, planned]);
  const entered = { purity: draft.gas.purity, gasVolumeM3: planned.envelope.gasVolumeM3 };
  const ready = freeLiftKg !== null && temperatureC !== null;
  const candidate: LiftCheckDraft | null = ready ? { freeLiftKg, temperatureC, weighedWith, solveFor } : null;
  const changed = JSON.stringify(candidate) !== JSON.stringify(stored);
  const freeLimit = INPUT_LIMITS.liftCheckFreeLiftKg;
  const temperatureLimit = INPUT_LIMITS.temperatureC;

  return (
    <Section title="The day's lift check" testId="section-lift-check" defaultOpen={stored !== null}>
      <p className="mb-3 text-sm text-muted">
        At the field, tie the filled lifter to a scale and read its free lift (the upward pull). The check works out the gas you really have
        and plans with it.
      </p>
      <div className="grid gap-3 sm:grid-cols-2">
        <QuantityInput
          label="Free lift weighed"
          quantity="mass"
          valueSI={freeLiftKg}
          unitSystem={units}
          minSI={freeLimit.min}
          maxSI={freeLimit.max}
          onCommit={setFreeLiftKg}
          optional
          testId="lift-check-free-lift"
          disabled={readOnly}
        />
        <QuantityInput
          label="Air temperature at the weighing"
          quantity="temperature"
          valueSI={temperatureC}
          unitSystem={units}
          minSI={temperatureLimit.min}
          maxSI={temperatureLimit.max}
          onCommit={setTemperatureC}
          optional
          testId="lift-check-temperature"
          disabled={readOnly}
        />
        <fieldset className="text-sm" disabled={readOnly}>
          <legend className="text-muted">What hung on it</legend>
          {LIFT_CHECK_LOADS.map((load) => (
            <label key={load} className="mr-3 block">
              <input
                type="radio"
                name="lift-check-load"
                value={load}
                checked={weighedWith === load}
                onChange={() => setWeighedWith(load)}
                className="mr-1"
              />
              {LIFT_CHECK_LOAD_WORDS[load]}
            </label>
          ))}
        </fieldset>
        <fieldset className="text-sm" disabled={readOnly}>
          <legend className="text-muted">It settles</legend>
          <label className="block">
            <input
              type="radio"
              name="lift-check-unknown"
              value="purity"
              checked={solveFor === "purity"}
              onChange={() => setSolveFor("purity")}
              className="mr-1"
            />
            the gas purity (the envelope&apos;s volume as planned)
          </label>
          <label className="block">
            <input
              type="radio"
              name="lift-check-unknown"
              value="volume"
              checked={solveFor === "volume"}
              onChange={() => setSolveFor("volume")}
              className="mr-1"
            />
            the gas volume (the purity entered under Gas)
          </label>
        </fieldset>
      </div>
      {!readOnly && (
        <div className="mt-3 flex flex-wrap gap-2">
          <button
            type="button"
            disabled={!candidate || !changed}
            onClick={() => setLiftCheck(candidate)}
            className="rounded bg-accent px-3 py-1.5 text-sm text-white disabled:opacity-50"
            data-testid="lift-check-apply"
          >
            Use this check
          </button>
          {stored && (
            <button
              type="button"
              onClick={() => {
                setLiftCheck(null);
                setFreeLiftKg(null);
              }}
              className="rounded border border-hairline px-3 py-1.5 text-sm"
              data-testid="lift-check-remove"
            >
              Remove the check
            </button>
          )}
        </div>
      )}
      {check && stored && (
        <p
          className={`mt-3 rounded border px-3 py-2 text-sm ${check.problem ? "border-flag-stop text-flag-stop" : "border-accent"}`}
          role="status"
          data-testid="lift-check-result"
          data-problem={check.problem ?? ""}
        >
          <span className="font-medium">Measured input: </span>
          {formatQuantity("mass", stored.freeLiftKg, units)} free lift at {formatQuantity("temperature", stored.temperatureC, units)} with{" "}
          {LIFT_CHECK_LOAD_WORDS[stored.weighedWith]} (gross lift {formatQuantity("mass", check.grossLiftKg, units)}).{" "}
          {resultWords(check, entered, units)}
        </p>
      )}
    </Section>
  );
}

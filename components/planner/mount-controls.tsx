"use client";
import { useDeferredValue, useMemo, useState } from "react";
import { solveMaxPayloadMassKg } from "@/lib/balance";
import { STOP_CAUSES } from "@/lib/flag-messages";
import { formatQuantity } from "@/lib/units";
import { usePlanner, usePlannerActions } from "./planner-context";
import { QuantityInput } from "./quantity-input";
import { modelOf } from "./store";

const STEP_M = 0.01;

/** The mount's place on the rail without the 3D view: field, slider (arrow keys), steps, "level it". */
export function MountControls() {
  const positionXM = usePlanner((s) => s.draft.mountPositionXM);
  const rail = usePlanner((s) => {
    const m = modelOf(s.catalogue, s.draft.modelId);
    return `${m.railStartXM}|${m.railEndXM}`;
  });
  const [railStartXM, railEndXM] = rail.split("|").map(Number);
  const units = usePlanner((s) => s.unitSystem);
  const input = usePlanner((s) => s.input);
  const actions = usePlannerActions();
  const [levelMessage, setLevelMessage] = useState<string | null>(null);

  // The payload solver runs dozens of evaluations: let drags paint first.
  const deferredInput = useDeferredValue(input);
  const capacity = useMemo(() => solveMaxPayloadMassKg(deferredInput), [deferredInput]);

  return (
    <div className="panel space-y-3 p-4" data-testid="mount-controls">
      <div className="flex flex-wrap items-end gap-3">
        <QuantityInput
          label="Mount position from the nose"
          quantity="length"
          valueSI={positionXM}
          unitSystem={units}
          minSI={railStartXM}
          maxSI={railEndXM}
          onCommit={(v) => v !== null && actions.setMountPosition(v)}
          testId="mount-position-input"
        />
        <div className="flex gap-1">
          <button
            type="button"
            className="rounded border border-hairline bg-white px-2 py-1 text-sm"
            onClick={() => actions.nudgeMount(-STEP_M)}
            data-testid="mount-forward"
          >
            ◀ forward {formatQuantity("smallLength", STEP_M, units, 1)}
          </button>
          <button
            type="button"
            className="rounded border border-hairline bg-white px-2 py-1 text-sm"
            onClick={() => actions.nudgeMount(STEP_M)}
            data-testid="mount-aft"
          >
            aft {formatQuantity("smallLength", STEP_M, units, 1)} ▶
          </button>
        </div>
        <button
          type="button"
          className="rounded bg-accent px-3 py-1.5 text-sm font-medium text-white hover:bg-accent-dark"
          data-testid="level-it"
          onClick={() => {
            const outcome = actions.levelIt();
            if (!outcome.ok) return setLevelMessage(outcome.reason);
            const moved = `Mount moved to ${formatQuantity("length", outcome.positionXM, units, 3)} for level calm trim`;
            // Level is not enough if the new place brings a stop: say which, so it is not missed.
            setLevelMessage(
              outcome.newStops.length === 0
                ? `${moved}.`
                : `${moved}, but there ${outcome.newStops.map((code) => STOP_CAUSES[code]).join(" and ")}: a stop flag. Move it back or change the payloads.`,
            );
          }}
        >
          Level it
        </button>
      </div>
      <label className="block text-sm text-muted">
        Slide along the rail (arrow keys move it)
        <input
          type="range"
          min={railStartXM}
          max={railEndXM}
          step={0.001}
          value={Math.min(railEndXM, Math.max(railStartXM, positionXM))}
          onChange={(e) => actions.setMountPosition(Number(e.target.value))}
          className="mt-1 w-full accent-[#1d7f7a]"
          aria-valuetext={formatQuantity("length", positionXM, units, 3)}
          data-testid="mount-slider"
        />
      </label>
      {levelMessage && (
        <p className="text-sm" role="status" data-testid="level-message">
          {levelMessage}
        </p>
      )}
      <p className="text-sm" data-testid="capacity">
        <span className="text-muted">How much more it can carry here: </span>
        {capacity.extraMassKg === null
          ? "nothing until the stop flags are cleared"
          : `${formatQuantity("mass", capacity.extraMassKg, units)} at the mount${capacity.limitingCode ? `; beyond that ${STOP_CAUSES[capacity.limitingCode]}` : ""}`}
      </p>
    </div>
  );
}

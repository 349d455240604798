"use client";
import { useMemo } from "react";
import { useShallow } from "zustand/react/shallow";
import { LifterCanvas, type ScenePayload } from "@/components/scene";
import { formatFixed } from "@/lib/units";
import { usePlanner, usePlannerActions } from "./planner-context";
import { CASE_WORDS, sceneSummary, windArrowLabel } from "./scene-labels";
import { displayedTrimDeg, modelOf } from "./store";
import { useSceneTether } from "./use-scene-tether";
import type { TrimCase } from "./types";

/** Maps the planner store onto the scene's props; the scene itself only draws. */
export function PlannerScene() {
  const model = usePlanner((s) => modelOf(s.catalogue, s.draft.modelId));
  const readOnly = usePlanner((s) => s.readOnly === true);
  const mountX = usePlanner((s) => s.draft.mountPositionXM);
  const payloadDrafts = usePlanner((s) => s.draft.payloads);
  const flags = usePlanner((s) => s.result.flags);
  const centreOfMass = usePlanner((s) => s.result.centreOfMass);
  const calmTrimDeg = usePlanner((s) => s.result.calmTrimDeg);
  const trimDeg = usePlanner((s) => displayedTrimDeg(s));
  const trimCase = usePlanner((s) => s.trimCase);
  const units = usePlanner((s) => s.unitSystem);
  const [windMS, tetherAngleDeg] = usePlanner(
    useShallow((s) => {
      const c = s.trimCase === "wind" ? s.result.wind : s.trimCase === "gust" ? s.result.gust : null;
      return [c?.speedMS ?? 0, c?.tetherAngleDeg ?? 0] as const;
    }),
  );
  const { setMountPosition, setTrimCase } = usePlannerActions();
  const sceneTether = useSceneTether();
  const hull = model.hullJson;

  const payloads = useMemo<ScenePayload[]>(
    () =>
      payloadDrafts.map((p, i) => {
        const own = flags.filter((f) => f.payloads?.some((p) => p.index === i));
        const level = own.some((f) => f.level === "stop") ? "stop" : own.some((f) => f.level === "caution") ? "caution" : "ok";
        return {
          key: `${i}-${p.name}`,
          label: p.name,
          shape: p.shape,
          lengthM: p.lengthM,
          widthM: p.widthM,
          heightM: p.heightM,
          offset: { x: p.offsetXM, z: p.offsetZM },
          level,
        };
      }),
    [payloadDrafts, flags],
  );

  const summary = sceneSummary({
    modelName: model.name,
    calmTrimDeg,
    trimCase,
    shownTrimDeg: trimDeg,
    groundedBecause: sceneTether.grounded ? (sceneTether.groundedLabel ?? "it does not fly") : null,
    mountXM: mountX,
    massAftOfBuoyancyM: centreOfMass.x - model.buoyancyCentreXM,
    units,
  });

  return (
    <div className="space-y-2">
      <LifterCanvas
        glbUrl={model.glbPath}
        hullLengthM={hull.lengthM}
        hullMaxDiameterM={hull.maxDiameterM}
        rail={{ startX: model.railStartXM, endX: model.railEndXM, z: model.railZM }}
        railTabCount={model.railTabCount}
        mountX={mountX}
        payloads={payloads}
        buoyancyCentre={{ x: model.buoyancyCentreXM, z: model.buoyancyCentreZM }}
        centreOfMass={centreOfMass}
        tetherPoint={{ x: model.tetherPointXM, z: model.tetherPointZM }}
        trimDeg={trimDeg}
        tetherAngleDeg={tetherAngleDeg}
        windMS={windMS}
        windLabel={windArrowLabel(trimCase, windMS, units)}
        onMountDrag={readOnly ? undefined : setMountPosition}
        summary={summary}
        mountSelected
        {...sceneTether}
      />
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <span className="text-muted">Show the lifter in:</span>
        {(Object.keys(CASE_WORDS) as TrimCase[]).map((c) => (
          <button
            key={c}
            type="button"
            aria-pressed={trimCase === c}
            onClick={() => setTrimCase(c)}
            className={`rounded px-2 py-1 ${trimCase === c ? "bg-ink text-white" : "border border-hairline bg-white"}`}
            data-testid={`trim-case-${c}`}
          >
            {CASE_WORDS[c]}
          </button>
        ))}
        <span className="figure ml-auto" data-testid="scene-trim">
          Trim {formatFixed(trimDeg, 1)}°
        </span>
      </div>
      <p className="sr-only" aria-live="polite" data-testid="scene-summary">
        {summary}
      </p>
    </div>
  );
}

"use client";
import { useMemo } from "react";
import { tetherLinePoints } from "@/lib/balance";
import type { SceneVec } from "@/components/scene";
import { usePlanner } from "./planner-context";

export interface SceneTether {
  /** The computed line of the case shown (lib/balance), or null: drawn straight. */
  tetherLine: SceneVec[] | null;
  /** The lifter does not fly in the case shown: the scene draws it on the ground. */
  grounded: boolean;
  groundedLabel?: string;
}

/**
 * The scene's tether props for the case the Planner shows: the line's computed curve in wind or
 * gusts, and whether the lifter is on the ground (no free lift, or no equilibrium in that case).
 * The scene only draws them; the physics is lib/balance's.
 */
export function useSceneTether(): SceneTether {
  const input = usePlanner((s) => s.input);
  const result = usePlanner((s) => s.result);
  const trimCase = usePlanner((s) => s.trimCase);
  return useMemo<SceneTether>(() => {
    if (!(result.freeLiftKg > 0)) return { tetherLine: null, grounded: true, groundedLabel: "it does not fly" };
    const windy = trimCase === "wind" ? (input.site?.windMS ?? 0) > 0 : trimCase === "gust" ? (input.site?.gustMS ?? 0) > 0 : false;
    const c = trimCase === "wind" ? result.wind : trimCase === "gust" ? result.gust : null;
    if (windy && !c)
      return { tetherLine: null, grounded: true, groundedLabel: trimCase === "wind" ? "no flight in the wind" : "no flight in gusts" };
    // Calm air shows the line straight down, as a heavy line hangs; wind and gusts their curve.
    const caseName = trimCase === "calm" ? ((input.site?.windMS ?? 0) === 0 ? "wind" : null) : trimCase;
    const points = caseName ? tetherLinePoints(input, result, caseName) : [];
    return { tetherLine: points.length >= 2 ? points : null, grounded: false };
  }, [input, result, trimCase]);
}

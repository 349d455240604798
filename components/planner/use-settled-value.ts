"use client";
import { useEffect, useState } from "react";

/**
 * How long a value must stay put before the charts redraw with it: a drag or a held arrow key
 * changes the draft every frame, and a chart redrawn at that pace (a sweep of evaluations, then
 * a few hundred SVG nodes) took most of each frame, so the mount lagged behind the pointer.
 */
export const CHART_SETTLE_MS = 200;

/** `value` once it has not changed for `quietMs`; the first value at once. */
export function useSettledValue<T>(value: T, quietMs: number = CHART_SETTLE_MS): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    if (Object.is(value, settled)) return;
    const timer = setTimeout(() => setSettled(value), quietMs);
    return () => clearTimeout(timer);
  }, [value, settled, quietMs]);
  return settled;
}

import { formatFixed } from "@/lib/units";

interface FreeLiftBarProps {
  ratio: number;
  cautionRatio: number;
}

const SCALE_MAX = 0.6;

/** Free-lift ratio on a 0–60 % scale with the caution limit marked; stop is at or below zero. */
export function FreeLiftBar({ ratio, cautionRatio }: FreeLiftBarProps) {
  const clamped = Math.max(0, Math.min(SCALE_MAX, ratio));
  const level = ratio <= 0 ? "stop" : ratio < cautionRatio ? "caution" : "ok";
  const fill = level === "stop" ? "bg-flag-stop" : level === "caution" ? "bg-flag-caution" : "bg-flag-ok";
  return (
    <div
      role="meter"
      aria-label="Free-lift ratio"
      aria-valuemin={0}
      aria-valuemax={SCALE_MAX * 100}
      aria-valuenow={Math.round(ratio * 1000) / 10}
      aria-valuetext={`${formatFixed(ratio * 100, 1)} %, ${level}`}
      className="relative mt-1 h-3 w-full rounded-full bg-paper"
      data-testid="free-lift-bar"
    >
      <div className={`h-3 rounded-full ${fill}`} style={{ width: `${(clamped / SCALE_MAX) * 100}%` }} />
      <div
        className="absolute -top-1 h-5 w-0.5 bg-ink"
        style={{ left: `${(cautionRatio / SCALE_MAX) * 100}%` }}
        title={`caution below ${(cautionRatio * 100).toFixed(0)} %`}
      />
      <div className="mt-1 flex justify-between text-[10px] text-muted">
        <span>0 %</span>
        <span>caution below {(cautionRatio * 100).toFixed(0)} %</span>
        <span>{SCALE_MAX * 100} %</span>
      </div>
    </div>
  );
}

import type { FlagLevel } from "@/lib/domain";

const LABEL: Record<FlagLevel, string> = { ok: "ok", caution: "caution", stop: "stop" };
const COLOUR: Record<FlagLevel, string> = {
  ok: "text-flag-ok",
  caution: "text-flag-caution",
  stop: "text-flag-stop",
};

/** The level's shape carries the meaning; colour only repeats it. */
export function FlagIcon({ level, size = 16 }: { level: FlagLevel; size?: number }) {
  return (
    <svg width={size} height={size} viewBox="0 0 16 16" aria-hidden="true" className={COLOUR[level]}>
      {level === "ok" && (
        <>
          <circle cx="8" cy="8" r="7" fill="currentColor" />
          <path d="M4.5 8.2 L7 10.5 L11.5 5.5" stroke="white" strokeWidth="1.8" fill="none" strokeLinecap="round" />
        </>
      )}
      {level === "caution" && (
        <>
          <path d="M8 1 L15 14.5 H1 Z" fill="currentColor" />
          <rect x="7.1" y="5" width="1.8" height="5" fill="white" />
          <rect x="7.1" y="11.2" width="1.8" height="1.8" fill="white" />
        </>
      )}
      {level === "stop" && (
        <>
          <path d="M5 1 H11 L15 5 V11 L11 15 H5 L1 11 V5 Z" fill="currentColor" />
          <rect x="4" y="7" width="8" height="2" fill="white" />
        </>
      )}
    </svg>
  );
}

interface FlagBadgeProps {
  level: FlagLevel;
  label?: string;
}

export function FlagBadge({ level, label }: FlagBadgeProps) {
  return (
    <span className={`inline-flex items-center gap-1 text-sm font-medium ${COLOUR[level]}`} data-flag-level={level}>
      <FlagIcon level={level} />
      <span>{label ?? LABEL[level]}</span>
    </span>
  );
}

export type FlagLevel = "ok" | "caution" | "stop";

const RANK: Record<FlagLevel, number> = { ok: 0, caution: 1, stop: 2 };

/** The most serious level among the flags (`ok` when there are none). */
export function worstFlagLevel(flags: ReadonlyArray<{ level: FlagLevel }>): FlagLevel {
  let worst: FlagLevel = "ok";
  for (const flag of flags) if (RANK[flag.level] > RANK[worst]) worst = flag.level;
  return worst;
}

// Flag levels and the codes the balance engine raises. The engine (lib/balance/flags.ts) builds
// flags from these; the UI words them from the code and its parameters.

export const FLAG_LEVELS = ["ok", "caution", "stop"] as const;
export type FlagLevel = (typeof FLAG_LEVELS)[number];

export const FLAG_LEVEL_RANK: Record<FlagLevel, number> = { ok: 0, caution: 1, stop: 2 };

export const FLAG_CODES = [
  "free-lift",
  "trim-calm",
  "trim-unstable",
  "trim-wind",
  "trim-gust",
  "tether-angle-wind",
  "tether-angle-gust",
  "mount-off-rail",
  "thread-mismatch",
  "adapter-mismatch",
  "mount-rated-load",
  "thread-capacity",
  "safety-line",
  "clearance-hull",
  "clearance-tether",
  "tether-length",
  "tether-strength",
  "tether-on-ground",
  "helium-top-up",
  "moored-balloon-rules",
  "tether-height",
] as const;
export type FlagCode = (typeof FLAG_CODES)[number];

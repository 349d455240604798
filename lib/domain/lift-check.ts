// The day's lift check: what hung on the lifter when the person weighed its free lift at the field,
// and which unknown the weighing settles (the gas purity, keeping the envelope's volume, or the gas
// volume, keeping the purity entered).

export const LIFT_CHECK_LOADS = ["setup", "envelope"] as const;
export type LiftCheckLoad = (typeof LIFT_CHECK_LOADS)[number];

export const LIFT_CHECK_UNKNOWNS = ["purity", "volume"] as const;
export type LiftCheckUnknown = (typeof LIFT_CHECK_UNKNOWNS)[number];

export const LIFT_CHECK_LOAD_WORDS: Record<LiftCheckLoad, string> = {
  setup: "the whole setup: mount, adapters and payloads",
  envelope: "the envelope alone",
};

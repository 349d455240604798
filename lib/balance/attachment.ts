/**
 * Attachment checks (design.md item 7): thread fit, adapter, the mount's rated load, the screw's
 * capacity and the safety line. Camera threads are 1/4-20 UNC and 3/8-16 UNC (ISO 1222).
 * Tensile stress area per ASME B1.1: As = 0.7854·(D − 0.9743/n)² in², D in inches, n threads/in.
 */
import { fixed, makeFlag, type Flag, type Limits } from "./flags";
import type { BalanceInput, DeepReadonly, Thread } from "./schema";
import { STANDARD_GRAVITY_MS2, squareInchesToSquareMetres } from "./units-si";

export const THREAD_SPECS: Readonly<Record<Thread, { majorDiameterIn: number; threadsPerInch: number }>> = {
  "1/4-20 UNC": { majorDiameterIn: 0.25, threadsPerInch: 20 },
  "3/8-16 UNC": { majorDiameterIn: 0.375, threadsPerInch: 16 },
};

/** ASME B1.1 tensile stress area, square inches. */
export function tensileStressAreaSquareInches(majorDiameterIn: number, threadsPerInch: number): number {
  const d = majorDiameterIn - 0.9743 / threadsPerInch;
  return 0.7854 * d * d;
}

export function threadStressAreaM2(thread: Thread): number {
  const spec = THREAD_SPECS[thread];
  return squareInchesToSquareMetres(
    tensileStressAreaSquareInches(spec.majorDiameterIn, spec.threadsPerInch),
  );
}

/** Proof load = stress area × proof strength, N. */
export function threadProofLoadN(thread: Thread, proofStrengthPa: number): number {
  return threadStressAreaM2(thread) * proofStrengthPa;
}

function weaker(a: Thread, b: Thread, proofStrengthPa: number): number {
  return Math.min(threadProofLoadN(a, proofStrengthPa), threadProofLoadN(b, proofStrengthPa));
}

export function attachmentFlags(
  input: DeepReadonly<BalanceInput>,
  hangingMassKg: number,
  limits: Limits,
  out: Flag[],
): void {
  const { mount, payloads } = input;
  const proofPa = limits.screwProofStrengthPa;
  const mountCapacityN = threadProofLoadN(mount.thread, proofPa);
  // Utilisation of the most loaded screw: the mount's carries everything that hangs from it.
  let worstUse = (hangingMassKg * STANDARD_GRAVITY_MS2 * limits.loadFactor) / mountCapacityN;
  let worstCapacityN = mountCapacityN;
  let worstIndex: number | undefined;

  for (let i = 0; i < payloads.length; i++) {
    const payload = payloads[i];
    if (payload.attachment === "strap") continue;
    const adapter = payload.adapter;
    const needsAdapter = payload.attachment !== mount.thread;
    if (adapter) {
      const bridges = (adapter.from === payload.attachment && adapter.to === mount.thread) ||
        (adapter.to === payload.attachment && adapter.from === mount.thread);
      if (!bridges) {
        out.push(makeFlag("adapter-mismatch", "stop",
          `The adapter for ${payload.name} goes ${adapter.from} to ${adapter.to}, but the payload ` +
          `has ${payload.attachment} and the mount ${mount.thread}.`, undefined, undefined, i));
        continue;
      }
    } else if (needsAdapter) {
      out.push(makeFlag("thread-mismatch", "stop",
        `${payload.name} has a ${payload.attachment} thread and the mount a ${mount.thread} ` +
        "screw; fit an adapter.", undefined, undefined, i));
      continue;
    }
    out.push(makeFlag("thread-mismatch", "ok",
      `${payload.name} fits the mount (${payload.attachment}${adapter ? " via adapter" : ""}).`,
      undefined, undefined, i));
    // A bridging adapter joins two threads (a strap plate never reaches here: strap payloads skip).
    const ownCapacityN = adapter && adapter.from !== "strap"
      ? weaker(adapter.from, adapter.to, proofPa)
      : threadProofLoadN(payload.attachment, proofPa);
    const use = ((payload.massKg + (adapter?.massKg ?? 0)) * STANDARD_GRAVITY_MS2 * limits.loadFactor) /
      ownCapacityN;
    if (use > worstUse) {
      worstUse = use;
      worstCapacityN = ownCapacityN;
      worstIndex = i;
    }
  }

  const loadN = worstUse * worstCapacityN;
  const capacityText = `${fixed(loadN, 0)} N against a proof load of ${fixed(worstCapacityN, 0)} N`;
  // Common practice: keep a screw below half its proof load.
  out.push(worstUse > 1
    ? makeFlag("thread-capacity", "stop", `Screw load with gusts is ${capacityText}.`, loadN, worstCapacityN, worstIndex)
    : worstUse > 0.5
      ? makeFlag("thread-capacity", "caution", `Screw load with gusts is ${capacityText}; caution above half.`, loadN, worstCapacityN, worstIndex)
      : makeFlag("thread-capacity", "ok", `Screw load with gusts is ${capacityText}.`, loadN, worstCapacityN, worstIndex));

  const demandKg = hangingMassKg * limits.loadFactor;
  const ratedKg = mount.ratedLoadKg;
  const mountText = `${fixed(demandKg, 2)} kg with gusts (×${limits.loadFactor}) on a mount rated ${fixed(ratedKg, 2)} kg`;
  out.push(demandKg > ratedKg
    ? makeFlag("mount-rated-load", "stop", `Payload load is ${mountText}.`, demandKg, ratedKg)
    : demandKg > limits.mountCautionFraction * ratedKg
      ? makeFlag("mount-rated-load", "caution",
        `Payload load is ${mountText}; caution above ${fixed(limits.mountCautionFraction * 100, 0)} %.`, demandKg, ratedKg)
      : makeFlag("mount-rated-load", "ok", `Payload load is ${mountText}.`, demandKg, ratedKg));

  if (hangingMassKg > 0) {
    const weightN = hangingMassKg * STANDARD_GRAVITY_MS2;
    const wantedN = weightN * limits.safetyLineFactor;
    const breakingN = mount.safetyLineBreakingLoadN;
    if (breakingN === undefined) {
      out.push(makeFlag("safety-line", "caution",
        `No safety line given; fly the payloads on one of at least ${fixed(wantedN, 0)} N.`, undefined, wantedN));
    } else if (breakingN < weightN * limits.loadFactor) {
      out.push(makeFlag("safety-line", "stop",
        `The safety line breaks at ${fixed(breakingN, 0)} N, below the payloads' gust load of ` +
        `${fixed(weightN * limits.loadFactor, 0)} N.`, breakingN, weightN * limits.loadFactor));
    } else if (breakingN < wantedN) {
      out.push(makeFlag("safety-line", "caution",
        `The safety line breaks at ${fixed(breakingN, 0)} N; at least ${fixed(wantedN, 0)} N ` +
        `(${limits.safetyLineFactor}× the payloads' weight) is advised.`, breakingN, wantedN));
    } else {
      out.push(makeFlag("safety-line", "ok",
        `The safety line breaks at ${fixed(breakingN, 0)} N, at least ${limits.safetyLineFactor}× the payloads' weight (${fixed(wantedN, 0)} N).`,
        breakingN, wantedN));
    }
  }
}

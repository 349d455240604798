/**
 * Attachment checks (design.md item 7): thread fit, adapter, the mount's rated load, the screw's
 * capacity and the safety line. Camera threads are 1/4-20 UNC and 3/8-16 UNC (ISO 1222).
 * Tensile stress area per ASME B1.1: As = 0.7854·(D − 0.9743/n)² in², D in inches, n threads/in.
 */
import { figure, findingsByPayload, makeFlag, type Flag, type Limits, type PayloadRef } from "./flags";
import type { Attachment, BalanceInput, DeepReadonly, Thread } from "./schema";
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
  return squareInchesToSquareMetres(tensileStressAreaSquareInches(spec.majorDiameterIn, spec.threadsPerInch));
}

/** Proof load = stress area × proof strength, N. */
export function threadProofLoadN(thread: Thread, proofStrengthPa: number): number {
  return threadStressAreaM2(thread) * proofStrengthPa;
}

/** Of two threads in the same material, the one with the smaller stress area gives first. */
function weakerThread(a: Thread, b: Thread): Thread {
  return threadStressAreaM2(a) <= threadStressAreaM2(b) ? a : b;
}

type ThreadFinding =
  | { readonly code: "adapter-mismatch"; readonly adapterFrom: Attachment; readonly adapterTo: Thread; readonly payloadThread: Thread }
  | { readonly code: "thread-mismatch"; readonly level: "ok" | "stop"; readonly payloadThread: Thread; readonly viaAdapter: boolean };

interface Screw {
  readonly use: number;
  readonly capacityN: number;
  readonly screw: "mount" | "payload" | "adapter";
  readonly thread: Thread;
  readonly payloads: PayloadRef[];
}

export function attachmentFlags(input: DeepReadonly<BalanceInput>, hangingMassKg: number, limits: Limits, out: Flag[]): void {
  const { mount, payloads } = input;
  const proofPa = limits.screwProofStrengthPa;
  const mountCapacityN = threadProofLoadN(mount.thread, proofPa);
  // Utilisation of the most loaded screw: the mount's carries everything that hangs from it.
  let worst: Screw = {
    use: (hangingMassKg * STANDARD_GRAVITY_MS2 * limits.loadFactor) / mountCapacityN,
    capacityN: mountCapacityN,
    screw: "mount",
    thread: mount.thread,
    payloads: [],
  };
  // One flag per distinct finding: identical payloads share theirs.
  const findings = findingsByPayload<ThreadFinding>();

  for (let i = 0; i < payloads.length; i++) {
    const payload = payloads[i];
    const attachment = payload.attachment;
    if (attachment === "strap") continue;
    const ref = { index: i, name: payload.name };
    const adapter = payload.adapter;
    const needsAdapter = attachment !== mount.thread;
    if (adapter) {
      const bridges =
        (adapter.from === attachment && adapter.to === mount.thread) || (adapter.to === attachment && adapter.from === mount.thread);
      if (!bridges) {
        findings.add(`adapter|${attachment}|${adapter.from}|${adapter.to}`, ref, {
          code: "adapter-mismatch",
          adapterFrom: adapter.from,
          adapterTo: adapter.to,
          payloadThread: attachment,
        });
        continue;
      }
    } else if (needsAdapter) {
      findings.add(`stop|${attachment}`, ref, { code: "thread-mismatch", level: "stop", payloadThread: attachment, viaAdapter: false });
      continue;
    }
    findings.add(`ok|${attachment}|${adapter ? "adapter" : ""}`, ref, {
      code: "thread-mismatch",
      level: "ok",
      payloadThread: attachment,
      viaAdapter: adapter !== undefined,
    });
    // A bridging adapter joins two threads (a strap plate never reaches here: strap payloads skip).
    const viaAdapter = adapter !== undefined && adapter.from !== "strap";
    const thread = viaAdapter ? weakerThread(adapter.from as Thread, adapter.to) : attachment;
    const capacityN = threadProofLoadN(thread, proofPa);
    const use = ((payload.massKg + (adapter?.massKg ?? 0)) * STANDARD_GRAVITY_MS2 * limits.loadFactor) / capacityN;
    if (use > worst.use) {
      worst = { use, capacityN, screw: viaAdapter ? "adapter" : "payload", thread, payloads: [ref] };
    } else if (use === worst.use && worst.screw === (viaAdapter ? "adapter" : "payload") && worst.thread === thread) {
      worst.payloads.push(ref); // an identical payload: the same screw, loaded the same
    }
  }

  for (const { finding, payloads: refs } of findings.groups()) {
    out.push(
      finding.code === "adapter-mismatch"
        ? makeFlag("adapter-mismatch", "stop", {
            figures: {},
            params: {
              payloadThread: finding.payloadThread,
              mountThread: mount.thread,
              adapterFrom: finding.adapterFrom,
              adapterTo: finding.adapterTo,
            },
            payloads: refs,
          })
        : makeFlag("thread-mismatch", finding.level, {
            figures: {},
            params: { payloadThread: finding.payloadThread, mountThread: mount.thread, viaAdapter: finding.viaAdapter },
            payloads: refs,
          }),
    );
  }

  // Common practice: keep a screw below half its proof load.
  const capacity = {
    figures: { load: figure("force", worst.use * worst.capacityN, worst.capacityN) },
    params: { loadFactor: limits.loadFactor, screw: worst.screw, thread: worst.thread },
    payloads: worst.payloads,
  };
  out.push(makeFlag("thread-capacity", worst.use > 1 ? "stop" : worst.use > 0.5 ? "caution" : "ok", capacity));

  const demandKg = hangingMassKg * limits.loadFactor;
  const ratedKg = mount.ratedLoadKg;
  const load = figure("mass", demandKg, ratedKg);
  const params = { loadFactor: limits.loadFactor };
  out.push(
    demandKg > ratedKg
      ? makeFlag("mount-rated-load", "stop", { figures: { load }, params })
      : demandKg > limits.mountCautionFraction * ratedKg
        ? makeFlag("mount-rated-load", "caution", {
            figures: { load, share: figure("ratio", demandKg / ratedKg, limits.mountCautionFraction) },
            params,
          })
        : makeFlag("mount-rated-load", "ok", { figures: { load }, params }),
  );

  if (hangingMassKg > 0) {
    const weightN = hangingMassKg * STANDARD_GRAVITY_MS2;
    const wantedN = weightN * limits.safetyLineFactor;
    const gustLoadN = weightN * limits.loadFactor;
    const breakingN = mount.safetyLineBreakingLoadN;
    const lineParams = { loadFactor: limits.loadFactor, safetyLineFactor: limits.safetyLineFactor };
    out.push(
      breakingN === undefined
        ? makeFlag("safety-line", "caution", { figures: { needed: figure("force", wantedN) }, params: lineParams })
        : breakingN < gustLoadN
          ? makeFlag("safety-line", "stop", { figures: { breakingLoad: figure("force", breakingN, gustLoadN) }, params: lineParams })
          : makeFlag("safety-line", breakingN < wantedN ? "caution" : "ok", {
              figures: { breakingLoad: figure("force", breakingN, wantedN) },
              params: lineParams,
            }),
    );
  }
}

/**
 * `npm run bench`: timings of the balance engine against its targets.
 *  - median µs per evaluateBalance on the demo setup (target ≤ 20 µs), and with the tether line's
 *    drag (2 mm) in wind that grows with height, wind and gust (target ≤ 50 µs)
 *  - a 150-point wind sweep, 0–15 m/s (target ≤ 5 ms)
 *  - an operating envelope of 16 winds × 20 line-outs, with its scans for the highest ok wind and
 *    a target height (target ≤ 20 ms)
 *  - profile integration + mesh build + mesh volume/area of a ~100k-triangle hull (target ≤ 20 ms)
 */
import { readFileSync } from "node:fs";
import { performance } from "node:perf_hooks";
import {
  buildHullMesh,
  demoHulls,
  evaluateBalance,
  integrateHullProfile,
  operatingEnvelope,
  meshSurfaceArea,
  meshVolumeAndCentroid,
  type BalanceInput,
} from "../lib/balance";

const setup = JSON.parse(readFileSync(new URL("../tests/fixtures/demo-setup.json", import.meta.url), "utf8")) as BalanceInput;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

/** Median of `rounds` timings of `run`, each averaged over `repeat` calls, in milliseconds. */
function time(run: () => void, rounds: number, repeat: number): number {
  for (let i = 0; i < Math.max(50, rounds); i++) run(); // warm up the JIT
  const samples: number[] = [];
  for (let round = 0; round < rounds; round++) {
    const start = performance.now();
    for (let i = 0; i < repeat; i++) run();
    samples.push((performance.now() - start) / repeat);
  }
  return median(samples);
}

let sink = 0;
const evaluateMs = time(
  () => {
    sink += evaluateBalance(setup).freeLiftKg;
  },
  200,
  100,
);

// The demo with a 2 mm line: its weight and drag, in the 1/7 power-law wind from a 10 m reading.
const withLine: BalanceInput = { ...setup, tether: { ...setup.tether!, diameterM: 0.002 } };
const lineMs = time(
  () => {
    sink += evaluateBalance(withLine).freeLiftKg;
  },
  200,
  50,
);
const envelopeMs = time(
  () => {
    sink += operatingEnvelope(withLine, { targetHeightM: 30 }).points.length;
  },
  15,
  1,
);

const sweepInputs = Array.from({ length: 150 }, (_, i) => ({
  ...setup,
  site: { ...setup.site, windMS: (15 * i) / 149 },
}));
const sweepMs = time(
  () => {
    for (const input of sweepInputs) sink += evaluateBalance(input).wind?.tetherAngleDeg ?? 0;
  },
  50,
  1,
);

const hull = demoHulls["ridge-11"];
const resolution = { segments: 128, rings: 390 };
const triangles = buildHullMesh(hull, resolution).indices.length / 3;
const geometryMs = time(
  () => {
    sink += integrateHullProfile(hull).gasVolumeM3;
    const mesh = buildHullMesh(hull, resolution);
    sink += meshVolumeAndCentroid(mesh.positions, mesh.indices).volumeM3;
    sink += meshSurfaceArea(mesh.positions, mesh.indices).areaM2;
  },
  30,
  1,
);

const row = (label: string, value: string, target: string, ok: boolean): string =>
  `${label.padEnd(48)} ${value.padStart(10)}   target ${target.padEnd(8)} ${ok ? "ok" : "OVER"}`;
console.log(row("evaluateBalance, median per call", `${(evaluateMs * 1000).toFixed(2)} µs`, "≤ 20 µs", evaluateMs * 1000 <= 20));
console.log(row("evaluateBalance with line and wind profile", `${(lineMs * 1000).toFixed(2)} µs`, "≤ 50 µs", lineMs * 1000 <= 50));
console.log(row("operating envelope, 16 winds × 20 line-outs", `${envelopeMs.toFixed(2)} ms`, "≤ 20 ms", envelopeMs <= 20));
console.log(row("wind sweep, 150 points (0–15 m/s)", `${sweepMs.toFixed(3)} ms`, "≤ 5 ms", sweepMs <= 5));
console.log(row(`hull profile + mesh, ${triangles} triangles`, `${geometryMs.toFixed(2)} ms`, "≤ 20 ms", geometryMs <= 20));
if (!Number.isFinite(sink)) console.log("(checksum not finite)");

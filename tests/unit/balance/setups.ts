/** Named setups shared by the balance tests. Invented, like all Trimrail demo data. */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import type { BalanceInput, BalanceResult } from "@/lib/balance";

const demoPath = fileURLToPath(new URL("../../fixtures/demo-setup.json", import.meta.url));

/** The demo fixture: a ~1.1 m³ envelope with a VHF whip and a logger. */
export function demoSetup(): BalanceInput {
  return JSON.parse(readFileSync(demoPath, "utf8")) as BalanceInput;
}

/** Everything on one vertical line through the tether point: it must hang level. */
export function symmetricSetup(x = 1): BalanceInput {
  return {
    envelope: {
      gasVolumeM3: 1.1,
      massKg: 0.45,
      buoyancyCentre: { x, z: 0 },
      massCentre: { x, z: -0.05 },
      tetherPoint: { x, z: -0.9 },
      rail: { startX: x - 0.3, endX: x + 0.3, z: -0.5 },
    },
    mount: { positionX: x, massKg: 0.04, thread: "1/4-20 UNC", ratedLoadKg: 2 },
    payloads: [{ name: "logger", massKg: 0.2, offset: { x: 0, z: -0.06 }, attachment: "1/4-20 UNC" }],
  };
}

export function flagLevels(result: BalanceResult, code: string): string[] {
  return result.flags.filter((flag) => flag.code === code).map((flag) => flag.level);
}

/** Every number anywhere in a value, with its path, for finiteness checks. */
export function allNumbers(value: unknown, path = "result"): [string, number][] {
  if (typeof value === "number") return [[path, value]];
  if (Array.isArray(value)) return value.flatMap((item, i) => allNumbers(item, `${path}[${i}]`));
  if (value && typeof value === "object") {
    return Object.entries(value).flatMap(([key, item]) => allNumbers(item, `${path}.${key}`));
  }
  return [];
}

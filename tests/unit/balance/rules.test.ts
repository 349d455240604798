import { describe, expect, it } from "vitest";
import { PART_101_DIAMETER_M, PART_101_GAS_VOLUME_M3, THREADS, cubicMetresToCubicFeet, evaluateBalance } from "@/lib/balance";
import { demoSetup, flagLevels } from "./setups";

describe("moored-balloon rule flags", () => {
  it("holds 35.3 ft³ in 1 m³ (references.md; 1 ft = 0.3048 m)", () => {
    expect(cubicMetresToCubicFeet(1)).toBeCloseTo(35.3, 1);
  });

  it("uses the 14 CFR 101.1(a)(1) thresholds: 115 ft³ of gas, 6 ft diameter", () => {
    expect(PART_101_GAS_VOLUME_M3).toBeCloseTo(115 * 0.3048 ** 3, 12);
    expect(PART_101_DIAMETER_M).toBeCloseTo(6 * 0.3048, 12);
  });

  it("cautions above 115 ft³ or 6 ft across and is ok for the ~1.1 m³ demo envelope", () => {
    const setup = demoSetup();
    expect(flagLevels(evaluateBalance(setup), "moored-balloon-rules")).toEqual(["ok"]);
    const big = { ...setup, envelope: { ...setup.envelope, gasVolumeM3: 3.3 } };
    expect(flagLevels(evaluateBalance(big), "moored-balloon-rules")).toEqual(["caution"]);
    const wide = { ...setup, envelope: { ...setup.envelope, hull: { ...setup.envelope.hull!, maxDiameterM: 1.9 } } };
    expect(flagLevels(evaluateBalance(wide), "moored-balloon-rules")).toEqual(["caution"]);
  });

  it("cautions above 150 ft of tether (14 CFR 101.15; UK ANO 2016 art. 92: 60 m)", () => {
    const setup = demoSetup();
    expect(flagLevels(evaluateBalance({ ...setup, tether: { ...setup.tether!, lengthOutM: 40 } }), "tether-height")).toEqual([]);
    const high = evaluateBalance({ ...setup, tether: { ...setup.tether!, lengthOutM: 70 } });
    expect(flagLevels(high, "tether-height")).toEqual(["caution"]);
    expect(high.flags.find((f) => f.code === "tether-height")?.message).toMatch(/101\.15.*60 m/);
  });
});

describe("THREADS", () => {
  it("are the two camera/tripod threads of ISO 1222: 1/4-20 UNC and 3/8-16 UNC", () => {
    expect([...THREADS].sort()).toEqual(["1/4-20 UNC", "3/8-16 UNC"]);
  });
});

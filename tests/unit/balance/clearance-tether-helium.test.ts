import { describe, expect, it } from "vitest";
import {
  DEFAULT_CYLINDER_CONTENT_M3,
  cubicFeetToCubicMetres,
  demoHulls,
  evaluateBalance,
  hullClearanceM,
  profileRadiusAt,
  tetherClearanceM,
  type BalanceInput,
} from "@/lib/balance";
import { demoSetup, flagLevels } from "./setups";

const hull = demoHulls["ridge-11"];

describe("hullClearanceM", () => {
  const x = 1;
  const belly = -profileRadiusAt(hull, x);
  it("is the vertical gap under the belly for a small box", () => {
    expect(hullClearanceM(hull, { x, z: belly - 0.1 }, { lengthM: 0, widthM: 0.05, heightM: 0.1 }))
      .toBeCloseTo(0.05, 9);
  });

  it("is negative when the box reaches into the hull", () => {
    expect(hullClearanceM(hull, { x, z: belly }, { lengthM: 0.1, widthM: 0.1, heightM: 0.1 })).toBeLessThan(0);
  });
});

describe("tetherClearanceM", () => {
  it("is zero when the line passes through the box, and the gap otherwise", () => {
    const tether = { x: 1, z: -0.9 };
    expect(tetherClearanceM(tether, 0, 50, { x: 1, z: -2 }, { lengthM: 0.1, widthM: 0.1, heightM: 0.1 })).toBe(0);
    expect(tetherClearanceM(tether, 0, 50, { x: 1.3, z: -2 }, { lengthM: 0.2, widthM: 0.1, heightM: 0.1 })).toBeCloseTo(0.2, 12);
  });
});

describe("evaluateBalance clearance flags", () => {
  it("stops a payload that cuts the hull and one that hangs across the tether", () => {
    const setup = demoSetup();
    const inHull: BalanceInput = { ...setup, payloads: [{ ...setup.payloads[1], offset: { x: 0, z: 0.02 } }] };
    expect(flagLevels(evaluateBalance(inHull), "clearance-hull")).toEqual(["stop"]);
    const tether = setup.envelope.tetherPoint;
    const onLine: BalanceInput = {
      ...setup, site: { windMS: 0 },
      mount: { ...setup.mount, positionX: tether.x },
      payloads: [{ ...setup.payloads[0], offset: { x: 0, z: tether.z - setup.envelope.rail.z - 0.1 } }],
    };
    expect(flagLevels(evaluateBalance(onLine), "clearance-tether")).toEqual(["stop"]);
  });

  it("returns one clearance flag for identical payloads at the same place, naming both", () => {
    const setup = demoSetup();
    const whip = setup.payloads[0];
    const result = evaluateBalance({ ...setup, payloads: [whip, whip, setup.payloads[1]] });
    for (const code of ["clearance-hull", "clearance-tether"] as const) {
      const flags = result.flags.filter((f) => f.code === code);
      expect(flags.map((f) => f.payloads?.map((p) => p.index))).toEqual([[0, 1], [2]]);
    }
  });

  it("skips the hull check without a hull shape", () => {
    const setup = demoSetup();
    const { hull: _omit, ...envelope } = setup.envelope;
    expect(flagLevels(evaluateBalance({ ...setup, envelope }), "clearance-hull")).toEqual([]);
  });
});

describe("maxTetherOutM", () => {
  it("is free lift / line mass per metre, and a longer line is a stop", () => {
    const setup = demoSetup();
    const result = evaluateBalance(setup);
    expect(result.maxTetherOutM).toBeCloseTo(result.freeLiftKg / setup.tether!.massPerMetreKg, 9);
    const tooLong = evaluateBalance({ ...setup, tether: { ...setup.tether!, lengthOutM: (result.maxTetherOutM ?? 0) + 1 } });
    expect(flagLevels(tooLong, "tether-length")).toEqual(["stop"]);
  });

  it("is null without a tether", () => {
    const { tether: _omit, ...setup } = demoSetup();
    expect(evaluateBalance(setup).maxTetherOutM).toBeNull();
  });

  it("stops a tether weaker than the largest tension", () => {
    const setup = demoSetup();
    expect(flagLevels(evaluateBalance({ ...setup, tether: { ...setup.tether!, breakingLoadN: 5 } }), "tether-strength")).toEqual(["stop"]);
  });
});

describe("helium budget", () => {
  it("fills about 1.1 m³ at sea level from one 40 ft³ cylinder (common practice)", () => {
    const setup = demoSetup();
    expect(DEFAULT_CYLINDER_CONTENT_M3).toBeCloseTo(cubicFeetToCubicMetres(40), 12);
    const result = evaluateBalance({ ...setup, site: { altitudeM: 0 }, gas: { fillFraction: 1, purity: 1 } });
    expect(result.helium.fillVolumeM3).toBeCloseTo(setup.envelope.gasVolumeM3, 12);
    expect(result.helium.cylindersNeeded).toBe(1);
    const bigger = evaluateBalance({ ...setup, envelope: { ...setup.envelope, gasVolumeM3: 2.5 } });
    expect(bigger.helium.cylindersNeeded).toBe(3);
  });

  it("tops up when the free-lift ratio reaches the caution limit", () => {
    const setup = demoSetup();
    const result = evaluateBalance(setup);
    const days = result.helium.daysToTopUp;
    expect(days).not.toBeNull();
    const fill = (setup.gas?.fillFraction ?? 1) * (1 - result.helium.lossPerDayFraction) ** (days ?? 0);
    const later = evaluateBalance({ ...setup, gas: { ...setup.gas, fillFraction: fill } });
    expect(later.freeLiftRatio).toBeCloseTo(0.15, 9);
  });

  it("has no top-up day when already below the caution limit or with no loss", () => {
    const setup = demoSetup();
    expect(evaluateBalance({ ...setup, gas: { ...setup.gas, lossPerDayFraction: 0 } }).helium.daysToTopUp).toBeNull();
    const heavy = { ...setup, mount: { ...setup.mount, massKg: 0.2 } };
    expect(evaluateBalance(heavy).freeLiftRatio).toBeLessThan(0.15);
    expect(evaluateBalance(heavy).helium.daysToTopUp).toBeNull();
  });
});

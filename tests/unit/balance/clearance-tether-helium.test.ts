import { describe, expect, it } from "vitest";
import {
  DEFAULT_CYLINDER_CONTENT_M3,
  DEFAULT_LOSS_PER_DAY_FRACTION,
  hullSkinAreaM2,
  cubicFeetToCubicMetres,
  demoHulls,
  evaluateBalance,
  hullClearanceM,
  profileRadiusAt,
  tetherClearanceM,
  type BalanceInput,
  type Flag,
} from "@/lib/balance";
import { demoSetup, flagLevels } from "./setups";

const hull = demoHulls["ridge-11"];

describe("hullClearanceM", () => {
  const x = 1;
  const belly = -profileRadiusAt(hull, x);
  it("is the vertical gap under the belly for a small box", () => {
    expect(hullClearanceM(hull, { x, z: belly - 0.1 }, { lengthM: 0, widthM: 0.05, heightM: 0.1 })).toBeCloseTo(0.05, 9);
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

  it("returns contact on the forward side for a negative angle (line leaning forward) and clearance on the aft side", () => {
    // A line leaving at 20° forward of straight down (angle −20° from −z towards +x): at 0.5 m
    // below the tether point it is 0.5·tan 20° = 0.182 m forward.
    const tether = { x: 1, z: -0.9 };
    const angleRad = (-20 * Math.PI) / 180;
    const box = { lengthM: 0.04, widthM: 0.04, heightM: 0.04 };
    expect(tetherClearanceM(tether, angleRad, 50, { x: 1 - 0.5 * Math.tan(-angleRad), z: -1.4 }, box)).toBe(0);
    expect(tetherClearanceM(tether, angleRad, 50, { x: 1 + 0.5 * Math.tan(-angleRad), z: -1.4 }, box)).toBeGreaterThan(0.3);
  });
});

describe("evaluateBalance tether clearance, with the line on its upwind side", () => {
  it("returns a stop for the demo's whip at 4 m/s: it hangs ahead of the tether point, where the line runs to the anchor", () => {
    const setup = demoSetup();
    const whipCentreX = setup.mount.positionX + setup.payloads[0].offset.x;
    expect(whipCentreX).toBeLessThan(setup.envelope.tetherPoint.x); // ahead of it (x is aft positive)
    expect(setup.site?.windMS).toBe(4);
    const result = evaluateBalance(setup);
    const whip = result.flags.find((f) => f.code === "clearance-tether" && f.payloads?.[0].index === 0);
    expect(whip?.level).toBe("stop");
    // In the body frame the line leaves at θ − tether angle from straight down: forward, since
    // the lifter's tether angle exceeds its trim in this wind.
    expect(result.wind!.tetherAngleDeg).toBeGreaterThan(result.wind!.trimDeg);
  });

  it("returns clear for the same whip moved the same distance aft of the tether point: the line is not on that side", () => {
    const setup = demoSetup();
    const aheadM = setup.envelope.tetherPoint.x - (setup.mount.positionX + setup.payloads[0].offset.x);
    const mirrored: BalanceInput = {
      ...setup,
      payloads: [
        { ...setup.payloads[0], offset: { ...setup.payloads[0].offset, x: setup.payloads[0].offset.x + 2 * aheadM } },
        setup.payloads[1],
      ],
    };
    const whip = evaluateBalance(mirrored).flags.find((f) => f.code === "clearance-tether" && f.payloads?.[0].index === 0);
    expect(whip?.level).toBe("ok");
    expect((whip as Flag<"clearance-tether">).figures.gap.value).toBeGreaterThan(0.05);
  });

  it("returns the payload hanging aft in touch with the line when the trim exceeds the tether angle (the line then leans aft in the body frame)", () => {
    const setup = demoSetup();
    const t = setup.envelope.tetherPoint;
    const depthM = 0.3;
    // Calm air, nose up: the line hangs straight down in the world, i.e. θ aft of the body's −z.
    // A small logger placed on that line (its own mass moves the trim a little: place it twice).
    const onLine = (thetaRad: number): BalanceInput => ({
      ...setup,
      site: { windMS: 0 },
      // The envelope's own mass well aft of its buoyancy: it floats nose up.
      envelope: { ...setup.envelope, massCentre: { x: 1.3, z: -0.04 } },
      payloads: [
        {
          ...setup.payloads[1],
          offset: { x: t.x + depthM * Math.tan(thetaRad) - setup.mount.positionX, z: t.z - depthM - setup.envelope.rail.z },
        },
      ],
    });
    let input = onLine(0);
    for (let i = 0; i < 8; i++) input = onLine((evaluateBalance(input).calmTrimDeg! * Math.PI) / 180);
    expect(evaluateBalance(input).calmTrimDeg).toBeGreaterThan(2);
    expect(flagLevels(evaluateBalance(input), "clearance-tether")).toEqual(["stop"]);
    // The same logger as far forward of the tether point is clear.
    const ahead: BalanceInput = {
      ...input,
      payloads: [
        {
          ...input.payloads[0],
          offset: { ...input.payloads[0].offset, x: input.payloads[0].offset.x - 2 * depthM * Math.tan(0.05) - 0.1 },
        },
      ],
    };
    expect(flagLevels(evaluateBalance(ahead), "clearance-tether")).toEqual(["ok"]);
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
  it("returns the loss through the fabric: P·A·(T/273.15 K)/V a day (0.5 L/(m²·day·atm), Lv et al. 2022)", () => {
    const setup = demoSetup();
    const result = evaluateBalance(setup);
    expect(result.helium.lossSource).toBe("fabric");
    const areaM2 = hullSkinAreaM2(setup.envelope.hull!);
    const gasK = result.airTemperatureK + (setup.gas?.superheatK ?? 0);
    const expected = (0.5 * areaM2 * (gasK / 273.15)) / (result.helium.fillVolumeM3 * 1000);
    expect(result.helium.lossPerDayFraction).toBeCloseTo(expected, 12);
    // The review's range for this envelope's area: 0.11–0.5 % a day for 0.2–0.9 L/(m²·day·atm).
    expect(result.helium.lossPerDayFraction).toBeGreaterThan(0.0011);
    expect(result.helium.lossPerDayFraction).toBeLessThan(0.005);
    const twice = evaluateBalance({ ...setup, envelope: { ...setup.envelope, permeabilityLPerM2DayAtm: 1 } });
    expect(twice.helium.lossPerDayFraction).toBeCloseTo(2 * result.helium.lossPerDayFraction, 12);
  });

  it("returns the given loss when one is given, and the flat 3 % only when no area is known", () => {
    const setup = demoSetup();
    const given = evaluateBalance({ ...setup, gas: { ...setup.gas, lossPerDayFraction: 0.02 } }).helium;
    expect(given).toMatchObject({ lossPerDayFraction: 0.02, lossSource: "given" });
    const { hull: _omit, ...noHull } = setup.envelope;
    expect(evaluateBalance({ ...setup, envelope: noHull }).helium).toMatchObject({
      lossPerDayFraction: DEFAULT_LOSS_PER_DAY_FRACTION,
      lossSource: "default",
    });
    expect(evaluateBalance({ ...setup, envelope: { ...noHull, surfaceAreaM2: 5 } }).helium.lossSource).toBe("fabric");
  });

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

import { unit } from "mathjs";
import { describe, expect, it } from "vitest";
import { FLAG_CODES, type FlagCode, type FlagLevel, type UnitSystem } from "@/lib/domain";
import { evaluateBalance, figure, makeFlag, type BalanceInput, type Figure, type FigureQuantity, type Flag } from "@/lib/balance";
import { STOP_CAUSES, flagMessage } from "@/lib/flag-messages";
import { decimalsOf } from "@/lib/units";
import { demoSetup, symmetricSetup } from "./balance/setups";

// ---- fixtures: engine inputs that raise every code, at each level its wording tells apart ----

interface Case {
  readonly level: FlagLevel;
  readonly what: string;
  readonly input: BalanceInput;
}

function demoWith(change: (setup: BalanceInput) => void): BalanceInput {
  const setup = demoSetup();
  change(setup);
  return setup;
}

/** The sail gives no lift: wind only drags it down. */
const dragOnly = (windMS: number, gustMS?: number): BalanceInput =>
  demoWith((s) => {
    s.envelope.aero = { ...s.envelope.aero!, liftSlopePerRad: 0 };
    s.site = { ...s.site, windMS, gustMS };
  });

const heavyWhip = (windMS: number): BalanceInput =>
  demoWith((s) => {
    s.payloads = [{ ...s.payloads[0], massKg: 0.65 }];
    s.site = { ...s.site, windMS, gustMS: windMS };
  });

/** A big envelope that lifts a heavy load on one payload screw. */
const bigLoad = (massKg: number): BalanceInput =>
  demoWith((s) => {
    s.envelope.gasVolumeM3 = 1000;
    s.mount.ratedLoadKg = 5000;
    s.payloads = [{ ...s.payloads[0], massKg }];
  });

/** 60 m of a heavy line in 3 m/s: half of it lies on the ground. */
const heavyLine: BalanceInput = demoWith((s) => {
  s.tether = { ...s.tether!, massPerMetreKg: 0.02, lengthOutM: 60 };
  s.site = { ...s.site, windMS: 3 };
});

/** The demo with its whip hung behind the tether point: the line leaves forward, clear of it. */
const whipAft = (offsetXM: number): BalanceInput =>
  demoWith((s) => {
    s.payloads[0].offset.x = offsetXM;
  });

const CASES: { readonly [C in FlagCode]: readonly Case[] } = {
  "free-lift": [
    { level: "ok", what: "the demo", input: demoSetup() },
    {
      level: "caution",
      what: "a heavy mount",
      input: demoWith((s) => {
        s.mount.massKg = 0.2;
      }),
    },
    { level: "stop", what: "a 2 kg payload", input: { ...symmetricSetup(), payloads: [{ ...symmetricSetup().payloads[0], massKg: 2 }] } },
  ],
  "trim-calm": [
    { level: "ok", what: "the demo", input: demoSetup() },
    {
      level: "caution",
      what: "the mount far aft",
      input: demoWith((s) => {
        s.mount.positionX = 1.25;
      }),
    },
    {
      level: "caution",
      what: "the mount far forward",
      input: demoWith((s) => {
        s.mount.positionX = 0.65;
      }),
    },
  ],
  "trim-unstable": [
    {
      level: "stop",
      what: "a tether point above the axis",
      input: { ...symmetricSetup(), envelope: { ...symmetricSetup().envelope, tetherPoint: { x: 1, z: 1 } } },
    },
  ],
  "trim-wind": [
    { level: "ok", what: "the demo", input: demoSetup() },
    {
      level: "caution",
      what: "8 m/s",
      input: demoWith((s) => {
        s.site = { ...s.site, windMS: 8 };
      }),
    },
    {
      level: "stop",
      what: "a pressure centre far forward",
      input: demoWith((s) => {
        s.envelope.aero!.pressureCentre = { x: -1, z: 0 };
        s.site = { windMS: 10 };
      }),
    },
    { level: "stop", what: "a heavy whip in a breath of wind", input: heavyWhip(0.5) },
    {
      level: "stop",
      what: "drag high above the tether point",
      input: demoWith((s) => {
        s.envelope.aero = { ...s.envelope.aero!, liftSlopePerRad: 0, dragCoefficient: 2, pressureCentre: { x: 0.845, z: 3 } };
        s.site = { windMS: 10 };
      }),
    },
  ],
  "trim-gust": [
    { level: "caution", what: "the demo's 7 m/s gust", input: demoSetup() },
    { level: "stop", what: "a sail without lift at 10 m/s", input: dragOnly(5, 10) },
  ],
  "tether-angle-wind": [
    { level: "ok", what: "the demo (worse at the anchor)", input: demoSetup() },
    { level: "caution", what: "a sail without lift at 3 m/s, the line flatter at the anchor", input: dragOnly(3) },
    { level: "stop", what: "a sail without lift at 8 m/s", input: dragOnly(8) },
    {
      level: "caution",
      what: "a sail without lift at 4 m/s and no tether given (the lifter's end only)",
      input: demoWith((s) => {
        Object.assign(s, dragOnly(4));
        delete s.tether;
      }),
    },
    { level: "stop", what: "a heavy line lying on the ground (90° at the anchor)", input: heavyLine },
  ],
  "tether-angle-gust": [
    { level: "ok", what: "the demo", input: demoSetup() },
    { level: "stop", what: "a sail without lift at 10 m/s", input: dragOnly(5, 10) },
  ],
  "mount-off-rail": [
    { level: "ok", what: "the demo", input: demoSetup() },
    {
      level: "stop",
      what: "the mount past the rail's aft end",
      input: demoWith((s) => {
        s.mount.positionX = s.envelope.rail.endX + 0.01;
      }),
    },
    {
      level: "stop",
      what: "the mount ahead of the rail",
      input: demoWith((s) => {
        s.mount.positionX = s.envelope.rail.startX - 0.2;
      }),
    },
  ],
  "thread-mismatch": [
    { level: "ok", what: "the demo (one direct, one through an adapter)", input: demoSetup() },
    {
      level: "stop",
      what: "a 3/8-16 payload without adapter",
      input: demoWith((s) => {
        delete s.payloads[1].adapter;
      }),
    },
  ],
  "adapter-mismatch": [
    {
      level: "stop",
      what: "an adapter for the wrong thread",
      input: demoWith((s) => {
        s.payloads[1].adapter = { massKg: 0.01, from: "1/4-20 UNC", to: "1/4-20 UNC" };
      }),
    },
  ],
  "mount-rated-load": [
    { level: "ok", what: "the demo", input: demoSetup() },
    {
      level: "caution",
      what: "a mount rated 0.65 kg",
      input: demoWith((s) => {
        s.mount.ratedLoadKg = 0.65;
      }),
    },
    {
      level: "stop",
      what: "a mount rated 0.5 kg",
      input: demoWith((s) => {
        s.mount.ratedLoadKg = 0.5;
      }),
    },
  ],
  "thread-capacity": [
    { level: "ok", what: "the demo", input: demoSetup() },
    {
      level: "caution",
      what: "300 kg on the payload's own screw",
      input: demoWith((s) => {
        Object.assign(s, bigLoad(300));
        s.mount.thread = "3/8-16 UNC";
        s.payloads[0].adapter = { massKg: 0.01, from: "1/4-20 UNC", to: "3/8-16 UNC" };
      }),
    },
    { level: "stop", what: "500 kg on the mount's screw", input: bigLoad(500) },
  ],
  "safety-line": [
    { level: "ok", what: "the demo", input: demoSetup() },
    {
      level: "caution",
      what: "no safety line",
      input: demoWith((s) => {
        delete s.mount.safetyLineBreakingLoadN;
      }),
    },
    {
      level: "caution",
      what: "a 20 N line",
      input: demoWith((s) => {
        s.mount.safetyLineBreakingLoadN = 20;
      }),
    },
    {
      level: "stop",
      what: "a 5 N line",
      input: demoWith((s) => {
        s.mount.safetyLineBreakingLoadN = 5;
      }),
    },
  ],
  "clearance-hull": [
    { level: "ok", what: "the demo", input: demoSetup() },
    {
      level: "caution",
      what: "the logger 1.5 cm higher",
      input: demoWith((s) => {
        s.payloads[1].offset.z += 0.015;
      }),
    },
    {
      level: "stop",
      what: "the logger inside the hull",
      input: demoWith((s) => {
        s.payloads = [{ ...s.payloads[1], offset: { x: 0, z: 0.02 } }];
      }),
    },
  ],
  "clearance-tether": [
    { level: "stop", what: "the demo: its whip hangs ahead of the tether point, across the line to the anchor", input: demoSetup() },
    { level: "ok", what: "the whip under the mount, aft of the tether point", input: whipAft(0) },
    {
      level: "ok",
      what: "calm air",
      input: demoWith((s) => {
        s.site = { ...s.site, windMS: 0 };
      }),
    },
    { level: "caution", what: "the whip 2 cm further forward", input: whipAft(-0.17) },
    {
      level: "stop",
      what: "the whip hanging across the line",
      input: demoWith((s) => {
        const t = s.envelope.tetherPoint;
        s.site = { windMS: 0 };
        s.mount.positionX = t.x;
        s.payloads = [{ ...s.payloads[0], offset: { x: 0, z: t.z - s.envelope.rail.z - 0.1 } }];
      }),
    },
  ],
  "tether-length": [
    { level: "ok", what: "the demo", input: demoSetup() },
    {
      level: "caution",
      what: "60 m out",
      input: demoWith((s) => {
        s.tether!.lengthOutM = 60;
      }),
    },
    {
      level: "stop",
      what: "200 m out",
      input: demoWith((s) => {
        s.tether!.lengthOutM = 200;
      }),
    },
  ],
  "tether-strength": [
    { level: "ok", what: "the demo", input: demoSetup() },
    {
      level: "caution",
      what: "a 50 N tether",
      input: demoWith((s) => {
        s.tether!.breakingLoadN = 50;
      }),
    },
    {
      level: "stop",
      what: "a 5 N tether",
      input: demoWith((s) => {
        s.tether!.breakingLoadN = 5;
      }),
    },
    {
      level: "ok",
      what: "calm air",
      input: demoWith((s) => {
        s.site = { altitudeM: 240 };
      }),
    },
    {
      level: "ok",
      what: "a light, thick line in 12 m/s (largest at the anchor)",
      input: demoWith((s) => {
        s.tether = { ...s.tether!, massPerMetreKg: 0.0005, diameterM: 0.004, lengthOutM: 200 };
        s.site = { ...s.site, windMS: 12, gustMS: undefined };
      }),
    },
  ],
  "tether-on-ground": [{ level: "caution", what: "a heavy line in 3 m/s", input: heavyLine }],
  "helium-top-up": [
    { level: "ok", what: "the demo (loss through the fabric)", input: demoSetup() },
    {
      level: "ok",
      what: "a given loss",
      input: demoWith((s) => {
        s.gas = { ...s.gas, lossPerDayFraction: 0.01 };
      }),
    },
    {
      level: "ok",
      what: "no hull shape (the flat rule of thumb)",
      input: demoWith((s) => {
        delete s.envelope.hull;
      }),
    },
  ],
  "moored-balloon-rules": [
    { level: "ok", what: "the demo", input: demoSetup() },
    {
      level: "caution",
      what: "3.3 m³ of gas",
      input: demoWith((s) => {
        s.envelope.gasVolumeM3 = 3.3;
      }),
    },
    {
      level: "caution",
      what: "1.9 m across",
      input: demoWith((s) => {
        s.envelope.hull!.maxDiameterM = 1.9;
      }),
    },
    {
      level: "ok",
      what: "no hull shape",
      input: demoWith((s) => {
        delete s.envelope.hull;
      }),
    },
  ],
  "tether-height": [
    {
      level: "caution",
      what: "70 m out",
      input: demoWith((s) => {
        s.tether!.lengthOutM = 70;
      }),
    },
  ],
};

// ---- independent conversions (mathjs, a general-purpose units library) ----

/** How each quantity reads: mathjs's unit to convert to, and the label printed after the figure. */
const READS: Record<UnitSystem, Record<FigureQuantity, { mathjs: string; label: string }>> = {
  metric: {
    mass: { mathjs: "g", label: "g" },
    force: { mathjs: "N", label: "N" },
    length: { mathjs: "m", label: "m" },
    smallLength: { mathjs: "cm", label: "cm" },
    distance: { mathjs: "m", label: "m" },
    speed: { mathjs: "m/s", label: "m/s" },
    volume: { mathjs: "m^3", label: "m³" },
    angle: { mathjs: "deg", label: "°" },
    ratio: { mathjs: "", label: "%" },
    duration: { mathjs: "day", label: "days" },
  },
  imperial: {
    mass: { mathjs: "lbm", label: "lb" },
    force: { mathjs: "lbf", label: "lbf" },
    length: { mathjs: "ft", label: "ft" },
    smallLength: { mathjs: "inch", label: "in" },
    distance: { mathjs: "ft", label: "ft" },
    speed: { mathjs: "mi/h", label: "mph" },
    volume: { mathjs: "ft^3", label: "ft³" },
    angle: { mathjs: "deg", label: "°" },
    ratio: { mathjs: "", label: "%" },
    duration: { mathjs: "day", label: "days" },
  },
};

const MATHJS_SI: Record<string, string> = { kg: "kg", N: "N", m: "m", "m/s": "m/s", "m³": "m^3", rad: "rad", s: "s" };

/** The text a figure's SI value should read as, converted by mathjs, not by lib/units. */
function expectedText(quantity: FigureQuantity, siUnit: string, si: number, system: UnitSystem): string {
  const reads = READS[system][quantity];
  // A ratio is a pure number: percent by definition (×100).
  const shown = quantity === "ratio" ? si * 100 : unit(si, MATHJS_SI[siUnit]).toNumber(reads.mathjs);
  const text = Math.abs(shown).toFixed(decimalsOf(quantity, system));
  return `${text}${reads.label === "°" ? "" : " "}${reads.label}`;
}

const figuresOf = (flag: Flag): Array<[string, Figure]> => Object.entries(flag.figures as Record<string, Figure>);

// Units a figure may be written in: SI (with prefixes) and imperial, as whole tokens after a digit.
const SI_UNIT = /\d ?(?:kg|g|N|kN|Pa|kPa|m\/s|m³|m²|cm|mm|km|m)(?![\w/²³])/;
const IMPERIAL_UNIT = /\d ?(?:lb|lbf|oz|ft|ft³|in|in²|mph|psi)(?![\w/²³])/;
const NEGATIVE_ZERO = /(?<![\d.])[-−]0(?:\.0+)?(?![.\d])/;

function flagsFor(code: FlagCode, c: Case): Flag[] {
  return evaluateBalance(c.input).flags.filter((f) => f.code === code && f.level === c.level);
}

// ---- tests ----

describe("flagMessage", () => {
  it("has a case raising every code in FLAG_CODES", () => {
    for (const code of FLAG_CODES) expect(CASES[code]?.length ?? 0, code).toBeGreaterThan(0);
  });

  for (const code of FLAG_CODES) {
    for (const c of CASES[code] ?? []) {
      describe(`${code} (${c.level}: ${c.what})`, () => {
        it("returns the engine's message unchanged in metric, with every figure in SI units", () => {
          const flags = flagsFor(code, c);
          expect(flags.length, `the case raises ${code} at ${c.level}`).toBeGreaterThan(0);
          for (const flag of flags) {
            const metric = flagMessage(flag, "metric");
            expect(metric).toBe(flag.message);
            expect(metric).not.toMatch(IMPERIAL_UNIT);
            for (const [name, f] of figuresOf(flag)) {
              expect(f.unit, name).toBe(
                {
                  mass: "kg",
                  force: "N",
                  length: "m",
                  smallLength: "m",
                  distance: "m",
                  speed: "m/s",
                  volume: "m³",
                  angle: "rad",
                  ratio: "1",
                  duration: "s",
                }[f.quantity],
              );
              expect(metric, `${name}.value`).toContain(expectedText(f.quantity, f.unit, f.value, "metric"));
              if (f.limit !== undefined) expect(metric, `${name}.limit`).toContain(expectedText(f.quantity, f.unit, f.limit, "metric"));
            }
          }
        });

        it("returns every figure converted to imperial and no SI unit when the reader uses imperial", () => {
          for (const flag of flagsFor(code, c)) {
            const imperial = flagMessage(flag, "imperial");
            expect(imperial).not.toMatch(SI_UNIT);
            for (const [name, f] of figuresOf(flag)) {
              expect(imperial, `${name}.value`).toContain(expectedText(f.quantity, f.unit, f.value, "imperial"));
              if (f.limit !== undefined) expect(imperial, `${name}.limit`).toContain(expectedText(f.quantity, f.unit, f.limit, "imperial"));
            }
          }
        });

        it("returns plain words: no code names, no negative zero, no NaN, one sentence end", () => {
          for (const flag of flagsFor(code, c)) {
            for (const text of [flagMessage(flag, "metric"), flagMessage(flag, "imperial")]) {
              for (const name of FLAG_CODES) expect(text).not.toContain(name);
              expect(text).not.toMatch(NEGATIVE_ZERO);
              expect(text).not.toMatch(/NaN|Infinity|undefined|\[object/);
              expect(text).toMatch(/^[A-Z].*\.$/);
            }
          }
        });
      });
    }
  }

  it("returns the figures checked by hand for the demo's free lift, in pounds by definition (1 lb = 0.45359237 kg; NIST SP 811)", () => {
    const flag = evaluateBalance(demoSetup()).flags.find((f) => f.code === "free-lift");
    expect(flag?.level).toBe("ok");
    const kg = flag!.figures.freeLift.value;
    expect(flagMessage(flag!, "imperial")).toContain(`Free lift is ${(kg / 0.45359237).toFixed(2)} lb`);
    expect(flagMessage(flag!, "metric")).toContain(`Free lift is ${(kg * 1000).toFixed(0)} g`);
  });

  it("returns tether lengths in whole feet by definition (1 ft = 0.3048 m; NIST SP 811)", () => {
    const flag = evaluateBalance(
      demoWith((s) => {
        s.tether!.lengthOutM = 70;
      }),
    ).flags.find((f) => f.code === "tether-height");
    expect(flagMessage(flag!, "imperial")).toContain(`With ${(70 / 0.3048).toFixed(0)} ft of tether out it can fly higher than 150 ft`);
    expect(flagMessage(flag!, "imperial")).toContain(`higher than ${(60 / 0.3048).toFixed(0)} ft needs permission`);
  });

  it("returns a trim that rounds to zero as level, never as −0.0°", () => {
    const trim = makeFlag("trim-calm", "ok", { figures: { trim: figure("angle", -1e-5, Math.PI / 18) }, params: {} });
    expect(trim.message).toBe("Calm trim is level (0.0°), within ±10.0°.");
    const up = makeFlag("trim-calm", "caution", { figures: { trim: figure("angle", (12.34 * Math.PI) / 180, Math.PI / 18) }, params: {} });
    expect(up.message).toBe("Calm trim is 12.3° nose up; caution beyond ±10.0°. Slide the mount forward.");
  });

  it("returns the message in every flag's JSON, after code and level, as the API, the CLI and the stored result carry it", () => {
    for (const flag of evaluateBalance(demoSetup()).flags) {
      const json = JSON.parse(JSON.stringify(flag)) as Record<string, unknown>;
      expect(Object.keys(json).slice(0, 5)).toEqual(["code", "level", "message", "figures", "params"]);
      expect(json.message).toBe(flagMessage(flag, "metric"));
    }
  });

  it("returns words without a gap for flags stored before their newer parameters existed", () => {
    const stored = JSON.parse(JSON.stringify(evaluateBalance(demoSetup()).flags)) as Array<{
      code: string;
      params: Record<string, unknown>;
    }>;
    for (const flag of stored) {
      // What a result saved before the tether line had: no line end, no loss source.
      delete flag.params.end;
      delete flag.params.lossSource;
      for (const system of ["metric", "imperial"] as const) {
        expect(flagMessage(flag as unknown as Flag, system)).not.toMatch(/undefined|NaN/);
      }
    }
  });

  it("returns the gust's own words for a gust flag", () => {
    const gust = evaluateBalance(demoSetup()).flags.find((f) => f.code === "trim-gust");
    expect(gust?.message).toMatch(/^Trim in gusts of 7\.0 m\/s/);
    expect(flagMessage(gust!, "imperial")).toContain(`in gusts of ${(7 / 0.44704).toFixed(1)} mph`); // 1 mph = 0.44704 m/s exactly
  });
});

describe("STOP_CAUSES", () => {
  it("returns plain words for every code, without code names", () => {
    for (const code of FLAG_CODES) {
      expect(STOP_CAUSES[code].length, code).toBeGreaterThan(0);
      for (const name of FLAG_CODES) expect(STOP_CAUSES[code]).not.toContain(name);
    }
  });
});

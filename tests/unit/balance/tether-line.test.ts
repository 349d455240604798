import fc from "fast-check";
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import {
  STANDARD_GRAVITY_MS2,
  degreesToRadians,
  evaluateBalance,
  integrateLine,
  tetherLinePoints,
  windAtHeightMS,
  windProfile,
  type BalanceInput,
  type LineSpec,
  type WindProfile,
} from "@/lib/balance";
import { demoSetup } from "./setups";

// ---- named fixtures ----

const g = STANDARD_GRAVITY_MS2;
/** 2.5 g/m braided line, 100 m out (the demo's line). */
const W = 0.0025 * g;
const still: WindProfile = { referenceMS: 0, referenceHeightM: 10, exponent: 0 };
const uniform = (windMS: number): WindProfile => ({ referenceMS: windMS, referenceHeightM: 10, exponent: 0 });
const line = (over: Partial<LineSpec> = {}): LineSpec => ({
  lengthM: 100,
  weightPerMetreN: W,
  normalDragAreaPerMetreM: 0,
  skinFrictionAreaPerMetreM: 0,
  airDensityKgM3: 1.225,
  ...over,
});
/** 2 mm line, C_n = 1.2 (Hoerner), C_f = 0.01 (common practice). */
const DRAG_2MM = { normalDragAreaPerMetreM: 0.002 * 1.2, skinFrictionAreaPerMetreM: Math.PI * 0.002 * 0.01 };
const cameraSetup = (): BalanceInput =>
  JSON.parse(readFileSync(new URL("../../fixtures/camera-line-setup.json", import.meta.url), "utf8")) as BalanceInput;

/**
 * The elastic-free catenary (Irvine, Cable Structures, 1981, §1.2): with horizontal tension H and
 * weight w per metre, the arc length from the vertex is s = (H/w)·sinh(w·x/H) and the height above
 * it (H/w)·(cosh(w·x/H) − 1). An end where the vertical tension is V sits at s = V/w, so between
 * the top (V_t) and the anchor (V_a = V_t − w·L):
 *   Δx = (H/w)·(asinh(V_t/H) − asinh(V_a/H)),   Δz = (√(H² + V_t²) − √(H² + V_a²)) / w.
 */
function catenary(horizontalN: number, topVerticalN: number, lengthM: number, w: number): { heightM: number; blowdownM: number } {
  const anchorVerticalN = topVerticalN - w * lengthM;
  return {
    heightM: (Math.hypot(horizontalN, topVerticalN) - Math.hypot(horizontalN, anchorVerticalN)) / w,
    blowdownM: (horizontalN / w) * (Math.asinh(topVerticalN / horizontalN) - Math.asinh(anchorVerticalN / horizontalN)),
  };
}

/**
 * A weightless line in a uniform wind with normal drag only (k = ½ρU²·d·C_n per metre): its
 * tension T is constant and T·dφ/dσ = k·sin²φ, so cot φ falls linearly, by k/T per metre, from the
 * lifter down (derived from the cable equation with the cross-flow load; Hoerner 1965). Then
 *   height = (T/k)·(asinh(c_a) − asinh(c_t)),  blowdown = (T/k)·(√(1 + c_a²) − √(1 + c_t²)),
 * c = cot φ at the top (t) and the anchor (a = t + k·L/T).
 */
function dragOnlyLine(
  downwindN: number,
  upN: number,
  lengthM: number,
  k: number,
): { heightM: number; blowdownM: number; anchorAngleDeg: number } {
  const tensionN = Math.hypot(downwindN, upN);
  const top = downwindN / upN;
  const anchor = top + (k * lengthM) / tensionN;
  return {
    heightM: (tensionN / k) * (Math.asinh(anchor) - Math.asinh(top)),
    blowdownM: (tensionN / k) * (Math.sqrt(1 + anchor * anchor) - Math.sqrt(1 + top * top)),
    anchorAngleDeg: (Math.atan(anchor) * 180) / Math.PI,
  };
}

const relative = (value: number, reference: number): number => Math.abs(value - reference) / Math.abs(reference);

// ---- tests ----

describe("integrateLine", () => {
  it.each([
    [3, 6],
    [1.5, 4],
    [6, 3],
  ])(
    "returns the elastic-free catenary (Irvine, Cable Structures) to 1e-6 when the line has weight and no drag (H = %d N, V = %d N)",
    (h, v) => {
      const shape = integrateLine(line(), { downwindN: h, upN: v }, still, 80);
      const exact = catenary(h, v, 100, W);
      expect(relative(shape.heightAboveGroundM, exact.heightM)).toBeLessThan(1e-6);
      expect(relative(shape.blowdownM, exact.blowdownM)).toBeLessThan(1e-6);
      // The ends: horizontal tension is the same all along; the vertical loses the line's weight.
      expect(shape.anchorDownwindN).toBeCloseTo(h, 9);
      expect(shape.anchorUpN).toBeCloseTo(v - W * 100, 9);
      expect(shape.anchorAngleDeg).toBeCloseTo((Math.atan2(h, v - W * 100) * 180) / Math.PI, 9);
      expect(shape.lengthOnGroundM).toBe(0);
    },
  );

  it("returns the catenary down to the touchdown and the rest laid on the ground when the line is heavier than the lift", () => {
    // 2 N up holds 81.6 m of a 2.5 g/m line; the rest lies on the ground, pulled straight downwind.
    const h = 1,
      v = 2;
    const shape = integrateLine(line(), { downwindN: h, upN: v }, still, 50);
    const hungM = v / W;
    const exact = catenary(h, v, hungM, W);
    expect(shape.lengthOnGroundM).toBeCloseTo(100 - hungM, 5);
    expect(relative(shape.heightAboveGroundM, exact.heightM)).toBeLessThan(1e-5);
    expect(relative(shape.blowdownM, exact.blowdownM + (100 - hungM))).toBeLessThan(1e-5);
    expect(shape.anchorAngleDeg).toBe(90);
    expect(shape.anchorTensionN).toBeCloseTo(h, 9);
  });

  it("returns a straight, vertical line with the lifter carrying its weight when the air is still", () => {
    const shape = integrateLine(line(DRAG_2MM), { downwindN: 0, upN: 3 }, still, 100);
    expect(shape.heightAboveGroundM).toBeCloseTo(100, 9);
    expect(shape.blowdownM).toBe(0);
    expect(shape.anchorAngleDeg).toBe(0);
    expect(shape.anchorTensionN).toBeCloseTo(3 - W * 100, 9);
    // Too heavy to lift it all: it hangs straight as far as the lift holds it, the rest in a heap.
    const heavy = integrateLine(line(), { downwindN: 0, upN: 1 }, still, 40);
    expect(heavy.heightAboveGroundM).toBeCloseTo(1 / W, 6);
    expect(heavy.lengthOnGroundM).toBeCloseTo(100 - 1 / W, 6);
    expect(heavy.blowdownM).toBe(0);
  });

  it("returns the same shape in no wind as with no drag at all", () => {
    const pull = { downwindN: 2, upN: 5 };
    expect(integrateLine(line(DRAG_2MM), pull, uniform(0), 60)).toEqual(integrateLine(line(), pull, still, 60));
  });

  it("returns the drag-only shape to 1e-6 for a weightless line in a uniform wind (normal drag only)", () => {
    const spec = line({ weightPerMetreN: 0, normalDragAreaPerMetreM: 0.002 * 1.2 });
    const k = 0.5 * 1.225 * 8 * 8 * 0.002 * 1.2;
    const shape = integrateLine(spec, { downwindN: 3, upN: 6 }, uniform(8), 90);
    const exact = dragOnlyLine(3, 6, 100, k);
    expect(relative(shape.heightAboveGroundM, exact.heightM)).toBeLessThan(1e-6);
    expect(relative(shape.blowdownM, exact.blowdownM)).toBeLessThan(1e-6);
    expect(relative(shape.anchorAngleDeg, exact.anchorAngleDeg)).toBeLessThan(1e-6);
    // No load along the line: the tension is the same at both ends.
    expect(relative(shape.anchorTensionN, Math.hypot(3, 6))).toBeLessThan(1e-6);
  });

  it("returns the weight-only limit as the drag vanishes and the drag-only limit as the weight vanishes", () => {
    const pull = { downwindN: 3, upN: 6 };
    const weightOnly = catenary(3, 6, 100, W);
    const faint = integrateLine(line({ normalDragAreaPerMetreM: 1e-9 }), pull, uniform(5), 80);
    expect(relative(faint.heightAboveGroundM, weightOnly.heightM)).toBeLessThan(1e-6);
    expect(relative(faint.blowdownM, weightOnly.blowdownM)).toBeLessThan(1e-6);
    const k = 0.5 * 1.225 * 25 * 0.002 * 1.2;
    const dragOnly = dragOnlyLine(3, 6, 100, k);
    const feather = integrateLine(line({ weightPerMetreN: 1e-9, normalDragAreaPerMetreM: 0.002 * 1.2 }), pull, uniform(5), 80);
    expect(relative(feather.heightAboveGroundM, dragOnly.heightM)).toBeLessThan(1e-6);
    expect(relative(feather.blowdownM, dragOnly.blowdownM)).toBeLessThan(1e-6);
  });

  it("returns end forces that balance the lifter's pull with the line's weight and drag", () => {
    // An independent, fine integration of the same cable equation (explicit midpoint, 20 000
    // steps): its summed loads, added to the pull, give the anchor's tension.
    const spec = line(DRAG_2MM);
    const profile: WindProfile = { referenceMS: 6, referenceHeightM: 10, exponent: 1 / 7 };
    const pull = { downwindN: 4, upN: 7 };
    const topHeightM = 70;
    const shape = integrateLine(spec, pull, profile, topHeightM);
    const loadAt = (h: number, v: number, z: number): [number, number] => {
      const t = Math.hypot(h, v),
        c = h / t,
        n = v / t;
      const windMS = windAtHeightMS(profile, topHeightM + z);
      const q = 0.5 * spec.airDensityKgM3 * windMS * windMS;
      const normal = q * spec.normalDragAreaPerMetreM * Math.abs(n);
      const along = q * spec.skinFrictionAreaPerMetreM * Math.abs(c);
      return [normal * n * n + along * c * c, -spec.weightPerMetreN - normal * n * c + along * c * n];
    };
    let h = pull.downwindN,
      v = pull.upN,
      z = 0,
      sumX = 0,
      sumZ = 0;
    const steps = 20_000,
      ds = spec.lengthM / steps;
    for (let i = 0; i < steps; i++) {
      const [fx, fz] = loadAt(h, v, z);
      const hm = h + 0.5 * ds * fx,
        vm = v + 0.5 * ds * fz,
        zm = z - 0.5 * ds * (v / Math.hypot(h, v));
      const [mx, mz] = loadAt(hm, vm, zm);
      sumX += mx * ds;
      sumZ += mz * ds;
      h += mx * ds;
      v += mz * ds;
      z -= ds * (vm / Math.hypot(hm, vm));
    }
    expect(shape.anchorDownwindN).toBeCloseTo(pull.downwindN + sumX, 5);
    expect(shape.anchorUpN).toBeCloseTo(pull.upN + sumZ, 5);
    expect(shape.heightAboveGroundM).toBeCloseTo(-z, 3);
    // The line's weight alone is w·L of the vertical difference; drag takes the rest down.
    expect(pull.upN - shape.anchorUpN).toBeGreaterThan(spec.weightPerMetreN * spec.lengthM);
  });
});

describe("evaluateBalance with a tether line", () => {
  it("returns the line's height, blowdown and anchor figures on each wind case", () => {
    const result = evaluateBalance(demoSetup());
    for (const c of [result.wind, result.gust]) {
      expect(c?.line).toBeDefined();
      expect(Object.keys(c!.line!).sort()).toEqual([
        "anchorAngleDeg",
        "anchorTensionN",
        "blowdownM",
        "heightAboveGroundM",
        "lengthOnGroundM",
      ]);
      // The lifter's figures stay those at the lifter; the heavy line meets the ground flatter.
      expect(c!.line!.anchorAngleDeg).toBeGreaterThan(c!.tetherAngleDeg);
      expect(c!.line!.heightAboveGroundM).toBeLessThan(demoSetup().tether!.lengthOutM);
    }
  });

  it("returns a line that hangs straight, height = line out, with the lifter carrying it, when the wind is 0", () => {
    const setup = demoSetup();
    const result = evaluateBalance({ ...setup, site: { ...setup.site, windMS: 0, gustMS: undefined } });
    const l = result.wind!.line!;
    expect(l.heightAboveGroundM).toBeCloseTo(setup.tether!.lengthOutM, 9);
    expect(l.blowdownM).toBe(0);
    expect(l.anchorAngleDeg).toBe(0);
    expect(l.anchorTensionN).toBeCloseTo((result.freeLiftKg - setup.tether!.massPerMetreKg * setup.tether!.lengthOutM) * g, 9);
    expect(result.wind!.tetherAngleDeg).toBe(0);
    expect(result.wind!.trimDeg).toBe(result.calmTrimDeg);
  });

  it("returns the lifter in the wind at its own height: the power law at the line's height", () => {
    const setup = { ...demoSetup(), tether: { ...demoSetup().tether!, diameterM: 0.002 } };
    const result = evaluateBalance(setup);
    const wind = result.wind!;
    const profile = windProfile(setup.site!.windMS!, setup.site);
    expect(wind.windAtLifterMS).toBeCloseTo(windAtHeightMS(profile, wind.line!.heightAboveGroundM), 4);
    // Higher than the 10 m mast: more wind up there.
    expect(wind.windAtLifterMS).toBeGreaterThan(setup.site!.windMS!);
    // Without a tether the height is not known: the lifter flies in the wind as measured.
    const { tether: _omit, ...noLine } = setup;
    expect(evaluateBalance(noLine).wind!.windAtLifterMS).toBe(setup.site!.windMS);
    expect(evaluateBalance(noLine).wind!.line).toBeNull();
  });

  it("returns a lower, further-downwind tether point than the straight line for 100 m of 2 mm line at 5 m/s", () => {
    // scripts/tether-line-figures.ts prints these figures for the same fixture.
    const result = evaluateBalance(cameraSetup());
    const wind = result.wind!;
    const straightHeightM = 100 * Math.cos(degreesToRadians(wind.tetherAngleDeg));
    expect(wind.line!.heightAboveGroundM).toBeLessThan(straightHeightM - 10);
    expect(wind.line!.blowdownM).toBeGreaterThan(100 * Math.sin(degreesToRadians(wind.tetherAngleDeg)) + 10);
    // Past the 45° caution at the anchor while the lifter's end is near 30°: the flag reads the anchor.
    expect(wind.line!.anchorAngleDeg).toBeGreaterThan(45);
    const angle = result.flags.find((f) => f.code === "tether-angle-wind");
    expect(angle?.level).toBe("caution");
    expect(angle?.params).toMatchObject({ end: "anchor" });
  });

  it("returns points from the tether point to the anchor that end where the case's line does", () => {
    const setup = { ...demoSetup(), tether: { ...demoSetup().tether!, diameterM: 0.002 } };
    const result = evaluateBalance(setup);
    const points = tetherLinePoints(setup, result, "wind");
    expect(points[0]).toEqual({ x: 0, z: 0 });
    const anchor = points[points.length - 1];
    expect(-anchor.z).toBeCloseTo(result.wind!.line!.heightAboveGroundM, 3);
    expect(-anchor.x).toBeCloseTo(result.wind!.line!.blowdownM, 3);
    expect(tetherLinePoints({ ...setup, tether: undefined }, evaluateBalance({ ...setup, tether: undefined }), "wind")).toEqual([]);
  });

  it("returns a tether-on-ground caution and a 90° anchor angle when a heavy line lies partly on the ground", () => {
    const setup = demoSetup();
    const heavy: BalanceInput = {
      ...setup,
      tether: { ...setup.tether!, massPerMetreKg: 0.02, lengthOutM: 60 },
      site: { ...setup.site, windMS: 3 },
    };
    const result = evaluateBalance(heavy);
    expect(result.wind!.line!.lengthOnGroundM).toBeGreaterThan(0);
    expect(result.wind!.line!.anchorAngleDeg).toBe(90);
    expect(result.flags.find((f) => f.code === "tether-on-ground")?.level).toBe("caution");
    expect(result.flags.find((f) => f.code === "tether-angle-wind")?.level).toBe("stop");
    expect(evaluateBalance(setup).flags.some((f) => f.code === "tether-on-ground")).toBe(false);
  });

  it("returns the breaking-load check at the anchor when the line's drag makes it the larger tension", () => {
    const setup = demoSetup();
    const draggy: BalanceInput = {
      ...setup,
      tether: { ...setup.tether!, massPerMetreKg: 0.0005, diameterM: 0.004, lengthOutM: 200 },
      site: { ...setup.site, windMS: 12, gustMS: undefined },
    };
    const result = evaluateBalance(draggy);
    expect(result.wind!.line!.anchorTensionN).toBeGreaterThan(result.wind!.tensionN);
    const strength = result.flags.find((f) => f.code === "tether-strength")!;
    expect(strength.params).toMatchObject({ case: "wind", end: "anchor" });
    expect(strength.figures.tension.value).toBeCloseTo(result.wind!.line!.anchorTensionN, 9);
  });
});

/** The demo at a wind and line out, with a 2 mm line (drag). */
const demoAt = (windMS: number, lineOutM: number): BalanceInput => {
  const setup = demoSetup();
  return {
    ...setup,
    site: { ...setup.site, windMS, gustMS: undefined },
    tether: { ...setup.tether!, lengthOutM: lineOutM, diameterM: 0.002 },
  };
};

describe("the line's shape over winds and lengths (fast-check)", () => {
  it("returns a calm height never above the line out, and never lower for more line out", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 300, noNaN: true }), fc.double({ min: 0, max: 300, noNaN: true }), (a, b) => {
        const [short, long] = a <= b ? [a, b] : [b, a];
        const heightOf = (lineOutM: number) => evaluateBalance(demoAt(0, lineOutM)).wind!.line!.heightAboveGroundM;
        expect(heightOf(long)).toBeLessThanOrEqual(long + 1e-9);
        expect(heightOf(long)).toBeGreaterThanOrEqual(heightOf(short) - 1e-9);
      }),
      { numRuns: 200 },
    );
  });

  it("returns a blowdown that more wind never lowers", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 110, noNaN: true }),
        fc.array(fc.double({ min: 0, max: 15, noNaN: true }), { minLength: 2, maxLength: 5 }),
        (lineOutM, winds) => {
          const blowdowns = [...winds]
            .sort((x, y) => x - y)
            .map((w) => evaluateBalance(demoAt(w, lineOutM)).wind?.line?.blowdownM ?? Infinity);
          // The height and the wind are solved together to 1e-6 of the line out: monotone to that.
          for (let i = 1; i < blowdowns.length; i++) expect(blowdowns[i]).toBeGreaterThanOrEqual(blowdowns[i - 1] - 1e-5 * lineOutM);
        },
      ),
      { numRuns: 150 },
    );
  });
});

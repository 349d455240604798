import { evaluate } from "mathjs";
import { describe, expect, it } from "vitest";
import { formatFixed, formatQuantity, fromDisplay, toDisplay, unitOf } from "@/lib/units";

// Reference conversions from mathjs (a general-purpose units library), checked against ours.
const mj = (expr: string): number => evaluate(expr) as number;

describe("toDisplay / fromDisplay", () => {
  it("returns mathjs's conversions for every imperial unit we show", () => {
    expect(toDisplay("mass", 1, "imperial")).toBeCloseTo(mj("number(1 kg, lb)"), 12);
    expect(toDisplay("itemMass", 0.1, "imperial")).toBeCloseTo(mj("number(0.1 kg, oz)"), 12);
    expect(toDisplay("length", 100, "imperial")).toBeCloseTo(mj("number(100 m, ft)"), 10);
    expect(toDisplay("smallLength", 0.254, "imperial")).toBeCloseTo(mj("number(0.254 m, inch)"), 12);
    expect(toDisplay("volume", 1, "imperial")).toBeCloseTo(mj("number(1 m^3, ft^3)"), 10);
    expect(toDisplay("speed", 10, "imperial")).toBeCloseTo(mj("number(10 m/s, mi/h)"), 10);
    expect(toDisplay("force", 100, "imperial")).toBeCloseTo(mj("number(100 N, lbf)"), 10);
    expect(toDisplay("area", 0.01, "imperial")).toBeCloseTo(mj("number(0.01 m^2, inch^2)"), 8);
    expect(toDisplay("distance", 100, "imperial")).toBeCloseTo(mj("number(100 m, ft)"), 10);
  });

  it("returns degrees for radians, days for seconds and percent for a ratio in both systems", () => {
    for (const system of ["metric", "imperial"] as const) {
      expect(toDisplay("angle", 0.5, system)).toBeCloseTo(mj("number(0.5 rad, deg)"), 12);
      expect(toDisplay("duration", 200_000, system)).toBeCloseTo(mj("number(200000 s, day)"), 12);
      expect(toDisplay("ratio", 0.256, system)).toBeCloseTo(25.6, 12);
    }
  });

  it("returns °F for °C by the exact formula (0 °C = 32 °F, 100 °C = 212 °F; definition)", () => {
    expect(toDisplay("temperature", 0, "imperial")).toBe(32);
    expect(toDisplay("temperature", 100, "imperial")).toBe(212);
    expect(toDisplay("temperatureDifference", 10, "imperial")).toBeCloseTo(18, 12);
  });

  it("round-trips every quantity in both systems", () => {
    const quantities = [
      "mass",
      "itemMass",
      "length",
      "smallLength",
      "distance",
      "volume",
      "speed",
      "temperature",
      "temperatureDifference",
      "force",
      "massPerLength",
      "area",
      "angle",
      "ratio",
      "duration",
    ] as const;
    for (const system of ["metric", "imperial"] as const) {
      for (const q of quantities) {
        for (const si of [-12.5, 0, 0.001, 3.7, 1234]) expect(fromDisplay(q, toDisplay(q, si, system), system)).toBeCloseTo(si, 9);
      }
    }
  });
});

describe("formatQuantity", () => {
  it("returns the figure with its unit in the chosen system", () => {
    expect(formatQuantity("mass", 1.1, "metric")).toBe("1100 g");
    expect(formatQuantity("mass", 0.45359237, "imperial")).toBe("1.00 lb");
    expect(formatQuantity("length", 0.3048 * 150, "imperial", 0)).toBe("150 ft");
    expect(unitOf("speed", "imperial")).toBe("mph");
    expect(formatQuantity("angle", Math.PI / 18, "imperial")).toBe("10.0°");
    expect(formatQuantity("ratio", 0.15, "metric")).toBe("15.0 %");
    expect(formatQuantity("distance", 45.72, "metric")).toBe("46 m");
  });

  it("returns zero, not negative zero, for a value that rounds to zero from below", () => {
    expect(formatQuantity("angle", -1e-5, "metric")).toBe("0.0°");
    expect(formatQuantity("mass", -0.0001, "metric")).toBe("0 g");
    expect(formatQuantity("length", -0.001, "imperial")).toBe("0.00 ft");
    expect(formatQuantity("mass", -0.012, "metric")).toBe("-12 g");
  });
});

describe("formatFixed", () => {
  it("returns the fixed-decimal text with no sign on a zero", () => {
    expect(formatFixed(-0.04, 1)).toBe("0.0");
    expect(formatFixed(-0, 2)).toBe("0.00");
    expect(formatFixed(-0.06, 1)).toBe("-0.1");
    expect(formatFixed(3.14159, 2)).toBe("3.14");
  });
});

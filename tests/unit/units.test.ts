import { evaluate } from "mathjs";
import { describe, expect, it } from "vitest";
import { formatQuantity, fromDisplay, toDisplay, unitOf } from "@/lib/units";

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
  });

  it("returns °F for °C by the exact formula (0 °C = 32 °F, 100 °C = 212 °F; definition)", () => {
    expect(toDisplay("temperature", 0, "imperial")).toBe(32);
    expect(toDisplay("temperature", 100, "imperial")).toBe(212);
    expect(toDisplay("temperatureDifference", 10, "imperial")).toBeCloseTo(18, 12);
  });

  it("round-trips every quantity in both systems", () => {
    const quantities = ["mass", "itemMass", "length", "smallLength", "volume", "speed", "temperature", "temperatureDifference", "force", "massPerLength", "area"] as const;
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
  });
});

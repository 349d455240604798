import * as math from "mathjs";
import { describe, expect, it } from "vitest";
import {
  CUBIC_FOOT_M3,
  MOLAR_GAS_CONSTANT_ISA_J_PER_KMOL_K,
  MOLAR_MASS_AIR_KG_PER_KMOL,
  SPECIFIC_GAS_CONSTANT_AIR_J_PER_KG_K,
  STANDARD_GRAVITY_MS2,
  cubicFeetToCubicMetres,
  feetToMetres,
  inchesToMetres,
  ksiToPascals,
  poundsForceToNewtons,
  poundsToKg,
} from "@/lib/balance";

// Cross-checks of our constants and conversions against mathjs (references.md, "General-purpose
// reference libraries").

describe("units-si against mathjs", () => {
  it("has mathjs's standard gravity", () => {
    expect(STANDARD_GRAVITY_MS2).toBe(math.gravity.toNumber("m/s^2"));
  });

  it("has the ISA gas constant within 2e-5 of mathjs's CODATA value (ISO 2533 predates CODATA 2018)", () => {
    const codata = math.gasConstant.toNumber("J/(mol K)") * 1000;
    expect(Math.abs(MOLAR_GAS_CONSTANT_ISA_J_PER_KMOL_K / codata - 1)).toBeLessThan(2e-5);
  });

  it("has R_air = R*/M_air (ISO 2533: 8314.32 / 28.9644 → 287.05287)", () => {
    const derived = MOLAR_GAS_CONSTANT_ISA_J_PER_KMOL_K / MOLAR_MASS_AIR_KG_PER_KMOL;
    expect(Math.abs(derived / SPECIFIC_GAS_CONSTANT_AIR_J_PER_KG_K - 1)).toBeLessThan(1e-6);
  });

  it.each([
    ["1 lbm", "kg", poundsToKg(1)],
    ["1 inch", "m", inchesToMetres(1)],
    ["1 ft", "m", feetToMetres(1)],
    ["1 ft^3", "m^3", cubicFeetToCubicMetres(1)],
    ["1 lbf", "N", poundsForceToNewtons(1)],
    ["1000 psi", "Pa", ksiToPascals(1)],
  ])("converts %s to %s like mathjs", (quantity, unit, ours) => {
    expect(Math.abs(ours / math.unit(quantity).toNumber(unit) - 1)).toBeLessThan(1e-9);
  });

  it("has 1 ft³ = 0.028316846592 m³ exactly (definition: 1 ft = 0.3048 m)", () => {
    expect(CUBIC_FOOT_M3).toBeCloseTo(0.028316846592, 15);
  });
});

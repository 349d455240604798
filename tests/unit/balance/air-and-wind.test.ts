import { describe, expect, it } from "vitest";
import {
  DEFAULT_WIND_MEASURED_AT_M,
  DEFAULT_WIND_SHEAR_EXPONENT,
  airDensityKgM3,
  celsiusToKelvin,
  evaluateBalance,
  moistAirDensityKgM3,
  saturationVapourPressurePa,
  siteAir,
  windAtHeightMS,
  windProfile,
} from "@/lib/balance";
import { demoSetup } from "./setups";

// ---- a reference: the CIPM-2007 equation for the density of moist air ----

/**
 * The CIPM-2007 formula (Picard, Davis, Gläser & Fujii, Metrologia 45, 149–155, 2008), written out
 * here as an independent check; constants as printed there (from memory), x_CO2 = 0.0004.
 * ρ = p·M_a/(Z·R·T) · (1 − x_v·(1 − M_v/M_a)), with the vapour's mole fraction x_v = h·f·p_sv/p,
 * its own saturation pressure p_sv, enhancement factor f and compressibility Z.
 */
function cipm2007DensityKgM3(pressurePa: number, temperatureC: number, relativeHumidity: number): number {
  const T = temperatureC + 273.15;
  const R = 8.314472;
  const Ma = 28.96546e-3;
  const Mv = 18.01528e-3;
  const psv = Math.exp(1.2378847e-5 * T * T - 1.9121316e-2 * T + 33.93711047 - 6.3431645e3 / T);
  const f = 1.00062 + 3.14e-8 * pressurePa + 5.6e-7 * temperatureC * temperatureC;
  const xv = (relativeHumidity * f * psv) / pressurePa;
  const t = temperatureC;
  const Z =
    1 -
    (pressurePa / T) *
      (1.58123e-6 - 2.9331e-8 * t + 1.1043e-10 * t * t + (5.707e-6 - 2.051e-8 * t) * xv + (1.9898e-4 - 2.376e-6 * t) * xv * xv) +
    ((pressurePa * pressurePa) / (T * T)) * (1.83e-11 - 0.765e-8 * xv * xv);
  return ((pressurePa * Ma) / (Z * R * T)) * (1 - xv * (1 - Mv / Ma));
}

describe("saturationVapourPressurePa", () => {
  it.each([
    // WMO-No. 8, Annex 4.B (Magnus form over water): 611.2 Pa at 0 °C by its constant. At 20 °C and
    // 30 °C the form is within 0.5 % of the steam-table 2339 Pa and 4247 Pa (steam-table figures
    // from memory).
    [0, 611.2, 0.01],
    [20, 2339, 0.005 * 2339],
    [30, 4247, 0.005 * 4247],
  ])("returns the Magnus saturation pressure at %d °C", (temperatureC, pa, tolerancePa) => {
    expect(Math.abs(saturationVapourPressurePa(temperatureC) - pa)).toBeLessThan(tolerancePa);
  });
});

describe("moistAirDensityKgM3", () => {
  it.each([
    [101_325, 20, 0.5],
    [101_325, 30, 0.8],
    [101_325, 0, 1],
    [90_000, 10, 0.5],
    [101_325, 15, 0],
  ])("returns the CIPM-2007 density within 0.1 %% at %d Pa, %d °C, RH %d", (pressurePa, temperatureC, rh) => {
    const ours = moistAirDensityKgM3(pressurePa, celsiusToKelvin(temperatureC), rh);
    const reference = cipm2007DensityKgM3(pressurePa, temperatureC, rh);
    expect(Math.abs(ours - reference) / reference).toBeLessThan(0.001);
  });

  it("returns the worked value of references.md: 1.1989 kg/m³ at 20 °C, 101 325 Pa, 50 % (dry: 1.2041)", () => {
    // Derived in references.md from the ideal mixture and the Magnus form.
    expect(moistAirDensityKgM3(101_325, celsiusToKelvin(20), 0.5)).toBeCloseTo(1.1989, 4);
    expect(moistAirDensityKgM3(101_325, celsiusToKelvin(20), 0)).toBeCloseTo(1.2041, 4);
    expect(moistAirDensityKgM3(101_325, celsiusToKelvin(20), 0)).toBe(airDensityKgM3(101_325, celsiusToKelvin(20)));
  });
});

describe("siteAir with humidity", () => {
  it("returns lighter air, and about 16 g less lift for 1.1 m³, at 30 °C and 80 % relative humidity", () => {
    const dry = siteAir({ altitudeM: 0, temperatureC: 30 });
    const humid = siteAir({ altitudeM: 0, temperatureC: 30, relativeHumidity: 0.8 });
    expect(humid.densityKgM3).toBeLessThan(dry.densityKgM3);
    // Derived: e = 0.8 · 4234 Pa; Δρ = e·(1/R_d − 1/R_v)/T ≈ 0.0147 kg/m³, × 1.1 m³ ≈ 16 g.
    expect((dry.densityKgM3 - humid.densityKgM3) * 1.1).toBeCloseTo(0.0162, 3);
    const setup = demoSetup();
    const lift = (relativeHumidity?: number) =>
      evaluateBalance({ ...setup, site: { ...setup.site, temperatureC: 30, relativeHumidity } }).grossLiftKg;
    expect(lift() - lift(0.8)).toBeGreaterThan(0.014);
    expect(lift(0)).toBe(lift());
  });
});

describe("windAtHeightMS", () => {
  it("returns the measured wind at the reference height, for any exponent", () => {
    for (const exponent of [0, 1 / 7, 0.3]) {
      expect(windAtHeightMS({ referenceMS: 6.5, referenceHeightM: 10, exponent }, 10)).toBe(6.5);
      expect(windAtHeightMS({ referenceMS: 6.5, referenceHeightM: 2, exponent }, 2)).toBe(6.5);
    }
  });

  it("returns 1.9 times the 10 m dynamic pressure at 100 m with α = 1/7 (power law; derived: 10^(2/7))", () => {
    const profile = windProfile(10, {});
    expect(profile.referenceHeightM).toBe(DEFAULT_WIND_MEASURED_AT_M); // WMO-No. 8: 10 m exposure
    expect(profile.exponent).toBe(DEFAULT_WIND_SHEAR_EXPONENT); // common practice: 1/7
    const ratio = (windAtHeightMS(profile, 100) / 10) ** 2;
    expect(ratio).toBeCloseTo(Math.pow(10, 2 / 7), 12);
    expect(ratio).toBeCloseTo(1.93, 2);
  });

  it("returns the same wind at every height when the exponent is 0, and none at the ground otherwise", () => {
    expect(windAtHeightMS({ referenceMS: 5, referenceHeightM: 10, exponent: 0 }, 0)).toBe(5);
    expect(windAtHeightMS({ referenceMS: 5, referenceHeightM: 10, exponent: 1 / 7 }, 0)).toBe(0);
    // A hand-held reading at 2 m means more wind at the lifter than a 10 m mast's same reading.
    const at2 = windAtHeightMS({ referenceMS: 5, referenceHeightM: 2, exponent: 1 / 7 }, 40);
    const at10 = windAtHeightMS({ referenceMS: 5, referenceHeightM: 10, exponent: 1 / 7 }, 40);
    expect(at2).toBeGreaterThan(at10);
  });
});

describe("evaluateBalance with wind that grows with height", () => {
  it("returns the uniform-wind case when the exponent is 0, and a stronger wind at the lifter when it is 1/7", () => {
    const setup = demoSetup();
    const uniform = evaluateBalance({ ...setup, site: { ...setup.site, windShearExponent: 0 } }).wind!;
    expect(uniform.windAtLifterMS).toBe(setup.site!.windMS);
    const sheared = evaluateBalance(setup).wind!;
    expect(sheared.windAtLifterMS).toBeGreaterThan(uniform.windAtLifterMS);
    expect(sheared.dynamicPressurePa).toBeGreaterThan(uniform.dynamicPressurePa);
    // The wind as given stays the case's speed.
    expect(sheared.speedMS).toBe(setup.site!.windMS);
  });
});

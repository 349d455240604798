import { describe, expect, it } from "vitest";
import { geopotentialFromGeometricM, isaAtGeometricM, isaAtGeopotentialM, siteAir } from "@/lib/balance";

// Check values: references.md, "Standard atmosphere — ISO 2533:1975 / ICAO Doc 7488/3
// (= US Standard Atmosphere 1976 below 32 km)".

describe("isaAtGeopotentialM", () => {
  it("returns the ISO 2533 sea-level values at H = 0", () => {
    const air = isaAtGeopotentialM(0);
    expect(air.temperatureK).toBe(288.15); // ISO 2533: T0
    expect(air.pressurePa).toBe(101_325); // ISO 2533: p0
    expect(air.densityKgM3).toBeCloseTo(1.225, 4); // ISO 2533: ρ0
  });

  it("falls at the ISO 2533 lapse rate of −0.0065 K per geopotential metre", () => {
    expect(isaAtGeopotentialM(1000).temperatureK).toBeCloseTo(288.15 - 6.5, 10);
  });

  it.each([
    // ICAO Doc 7488/3 tabulates by geopotential H (derived values in references.md)
    [1000, 1.11164],
    [2000, 1.00649],
    [3000, 0.90912],
  ])("returns the ICAO density at geopotential H = %d m", (altitudeM, density) => {
    expect(isaAtGeopotentialM(altitudeM).densityKgM3).toBeCloseTo(density, 5);
  });
});

describe("isaAtGeometricM", () => {
  it.each([
    // US Standard Atmosphere 1976 table by geometric Z: table values from memory (4 decimals),
    // formula values as listed in references.md; ratios ρ/ρ0 also from the same table.
    [500, 1.1673, 1.16727, 0.9529],
    [1000, 1.1117, 1.11166, 0.9075],
    [1500, 1.0581, 1.0581, 0.8638],
    [2000, 1.0066, 1.00655, 0.8217],
    [3000, 0.9093, 0.90925, 0.7423],
  ])("returns the US 1976 density at geometric Z = %d m", (altitudeM, table, formula, ratio) => {
    const air = isaAtGeometricM(altitudeM);
    expect(Math.abs(air.densityKgM3 - table)).toBeLessThan(1e-4);
    expect(Math.abs(air.densityKgM3 - formula)).toBeLessThan(1e-5);
    expect(Math.abs(air.densityKgM3 / isaAtGeometricM(0).densityKgM3 - ratio)).toBeLessThan(1e-4);
  });

  it("differs from the geopotential value: a geometric altitude is a lower geopotential one (H = r·Z/(r+Z))", () => {
    const r = 6_356_766; // ISO 2533 earth radius
    expect(geopotentialFromGeometricM(3000)).toBeCloseTo((r * 3000) / (r + 3000), 9);
    expect(isaAtGeometricM(3000).densityKgM3).toBeGreaterThan(isaAtGeopotentialM(3000).densityKgM3);
  });
});

describe("siteAir", () => {
  it("replaces the ISA temperature and pressure by measured ones", () => {
    const air = siteAir({ altitudeM: 1000, temperatureC: 30, pressurePa: 95_000 });
    expect(air.temperatureK).toBeCloseTo(303.15, 10);
    expect(air.pressurePa).toBe(95_000);
    expect(air.densityKgM3).toBeCloseTo(95_000 / (287.05287 * 303.15), 10);
  });

  it("uses ISA at sea level when the site is not given", () => {
    expect(siteAir(undefined).densityKgM3).toBeCloseTo(1.225, 4);
  });
});

import { describe, expect, it } from "vitest";
import { flagTextIn } from "@/lib/flag-text";

// Conversions by definition: 1 lb = 0.45359237 kg, 1 ft = 0.3048 m, 1 mph = 0.44704 m/s,
// 1 lbf = 4.4482216152605 N (NIST SP 811, appendix B).
describe("flagTextIn", () => {
  it("returns the engine's message unchanged in metric", () => {
    const message = "Free lift is 0.432 kg, 38.0 % of gross lift; caution below 15.0 %.";
    expect(flagTextIn(message, "metric")).toBe(message);
  });

  it("returns masses in pounds and keeps percentages", () => {
    expect(flagTextIn("Free lift is 0.432 kg, 38.0 % of gross lift; caution below 15.0 %.", "imperial")).toBe(
      `Free lift is ${(0.432 / 0.45359237).toFixed(2)} lb, 38.0 % of gross lift; caution below 15.0 %.`,
    );
  });

  it("returns wind in mph, forces in lbf, small gaps in inches and long lines in feet", () => {
    expect(flagTextIn("Low-power radio relay box clears the tether by 0.230 m at 7.0 m/s.", "imperial")).toBe(
      `Low-power radio relay box clears the tether by ${(0.23 / 0.0254).toFixed(1)} in at ${(7 / 0.44704).toFixed(1)} mph.`,
    );
    expect(flagTextIn("90 m of tether out; the lifter holds up at most 360 m.", "imperial")).toBe(
      `${(90 / 0.3048).toFixed(1)} ft of tether out; the lifter holds up at most ${(360 / 0.3048).toFixed(1)} ft.`,
    );
    expect(flagTextIn("Largest tether tension is 46.3 N; the tether breaks at 900 N.", "imperial")).toBe(
      `Largest tether tension is ${(46.3 / 4.4482216152605).toFixed(1)} lbf; the tether breaks at ${(900 / 4.4482216152605).toFixed(1)} lbf.`,
    );
  });

  it("returns the mount's place and the rail in feet", () => {
    expect(flagTextIn("The mount at x = 0.945 m is on the rail (0.625–1.285 m).", "imperial")).toBe(
      `The mount at ${(0.945 / 0.3048).toFixed(2)} ft from the nose is on the rail (${(0.625 / 0.3048).toFixed(2)}–${(1.285 / 0.3048).toFixed(2)} ft).`,
    );
  });

  it("drops an SI echo after a figure the rule already states in feet", () => {
    expect(flagTextIn("Gas volume 1.12 m³ is under 115 ft³ (3.26 m³) and 1.05 m across is under 6 ft (1.83 m).", "imperial")).toBe(
      `Gas volume ${(1.12 / 0.3048 ** 3).toFixed(1)} ft³ is under 115 ft³ and ${(1.05 / 0.3048).toFixed(1)} ft across is under 6 ft.`,
    );
  });

  it("leaves thread names, degrees and percentages alone", () => {
    const message = "Tether angle in wind of 7.0 m/s is 23.8° from vertical, within 45°. Fits the mount (1/4-20 UNC).";
    expect(flagTextIn(message, "imperial")).toBe(
      `Tether angle in wind of ${(7 / 0.44704).toFixed(1)} mph is 23.8° from vertical, within 45°. Fits the mount (1/4-20 UNC).`,
    );
  });
});

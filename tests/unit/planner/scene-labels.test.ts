import { describe, expect, it } from "vitest";
import { sceneSummary, windArrowLabel } from "@/components/planner/scene-labels";

const WIND_MS = 5;
const GUST_MS = 8;
// 8 m/s in mph: 8 / 0.44704 (international mile and hour, exact definitions).
const GUST_MPH_TEXT = (GUST_MS / 0.44704).toFixed(1);

describe("windArrowLabel", () => {
  it("returns the wind speed named as wind when the wind case is shown", () => {
    expect(windArrowLabel("wind", WIND_MS, "metric")).toBe("Wind 5.0 m/s");
  });

  it("returns the gust speed named as gust when the gust case is shown", () => {
    expect(windArrowLabel("gust", GUST_MS, "metric")).toBe("Gust 8.0 m/s");
    expect(windArrowLabel("gust", GUST_MS, "imperial")).toMatch(new RegExp(`^Gust ${GUST_MPH_TEXT} mph$`));
  });

  it("returns nothing in calm air or without wind", () => {
    expect(windArrowLabel("calm", WIND_MS, "metric")).toBeUndefined();
    expect(windArrowLabel("wind", 0, "metric")).toBeUndefined();
  });
});

describe("sceneSummary", () => {
  const flying = {
    modelName: "Ridge 1.1",
    calmTrimDeg: 2.04,
    trimCase: "wind" as const,
    shownTrimDeg: -3.96,
    groundedBecause: null,
    mountXM: 1.234,
    massAftOfBuoyancyM: -0.012,
    units: "metric" as const,
  };

  it("returns the calm trim, the case shown with its trim, and the mount and centre of mass when the lifter flies", () => {
    const text = sceneSummary(flying);
    expect(text).toMatch(/^Ridge 1\.1: in calm air it trims 2\.0° nose up; shown wind case at -4\.0°\./);
    expect(text).toMatch(/forward of the centre of buoyancy\.$/);
    expect(text).not.toMatch(/ground/);
  });

  it("returns that the lifter is on the ground, and why, instead of a trim when it does not fly in the case shown", () => {
    const text = sceneSummary({ ...flying, calmTrimDeg: null, groundedBecause: "it does not fly" });
    expect(text).toMatch(/in calm air it has no stable trim; shown on the ground in the wind case: it does not fly\./);
    expect(text).not.toMatch(/at -4\.0°/);
  });

  it("returns a level trim without a sign, and aft when the centre of mass is behind the centre of buoyancy", () => {
    const text = sceneSummary({ ...flying, calmTrimDeg: -0.04, massAftOfBuoyancyM: 0.02 });
    expect(text).toMatch(/in calm air it trims level;/);
    expect(text).toMatch(/aft of the centre of buoyancy\.$/);
  });
});

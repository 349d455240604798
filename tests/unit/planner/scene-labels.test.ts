import { describe, expect, it } from "vitest";
import { windArrowLabel } from "@/components/planner/scene-labels";

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

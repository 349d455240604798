import { describe, expect, it } from "vitest";
import { z } from "zod";
import { siResolver, toSiValues, type NumberFieldSpec } from "@/components/workshop/si-form";

// Two of the Workshop's kinds of field: a length in the maker's units and a plain coefficient.
const FIELDS: NumberFieldSpec[] = [{ path: "hull.lengthM", quantity: "length" }, { path: "dragCoefficient" }];
const schema = z.object({ hull: z.object({ lengthM: z.number("Length must be a number") }), dragCoefficient: z.number() });

describe("toSiValues", () => {
  it("reads a decimal comma as a decimal point, in the maker's units", () => {
    const si = toSiValues({ hull: { lengthM: "2,5" }, dragCoefficient: "0.35" }, FIELDS, "metric");
    expect(si).toEqual({ hull: { lengthM: 2.5 }, dragCoefficient: 0.35 });
    const imperial = toSiValues({ hull: { lengthM: "10" }, dragCoefficient: "0,5" }, FIELDS, "imperial");
    expect(imperial.hull).toEqual({ lengthM: 3.048 }); // 1 ft = 0.3048 m exactly (international foot)
  });

  it("leaves a figure it cannot read as typed, for the schema to refuse", () => {
    expect(toSiValues({ hull: { lengthM: "1,500.5" }, dragCoefficient: "x" }, FIELDS, "metric")).toEqual({
      hull: { lengthM: "1,500.5" },
      dragCoefficient: "x",
    });
  });
});

describe("siResolver", () => {
  it("gives the parser's message for a figure that could be read two ways", async () => {
    const resolve = siResolver(schema, FIELDS, "metric");
    const outcome = await resolve({ hull: { lengthM: "1,500.5" }, dragCoefficient: "0.3" }, undefined, {
      fields: {},
      shouldUseNativeValidation: false,
    });
    const errors = outcome.errors as { hull?: { lengthM?: { message?: string } } };
    expect(errors.hull?.lengthM?.message).toMatch(/could be read two ways/);
  });
});

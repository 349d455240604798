import { describe, expect, it } from "vitest";
import { NOT_A_NUMBER_MESSAGE, parseNumber, separatorsOf, type NumberSeparators } from "@/lib/parse-number";

// Separators as ICU (through Node's Intl) gives them for each locale.
const EN: NumberSeparators = { decimal: ".", group: "," };
const DE: NumberSeparators = { decimal: ",", group: "." };
const FR: NumberSeparators = { decimal: ",", group: "\u202f" };
const AR: NumberSeparators = { decimal: "\u066b", group: "\u066c" };

describe("separatorsOf", () => {
  it("reads each locale's decimal mark and thousands separator from Intl", () => {
    expect(separatorsOf("en-US")).toEqual(EN);
    expect(separatorsOf("de-DE")).toEqual(DE);
    expect(separatorsOf("fr-FR")).toEqual(FR);
    expect(separatorsOf("ar-EG")).toEqual(AR);
  });
});

// text, separators, the number read (or null when refused)
const READ: [string, NumberSeparators, number][] = [
  ["1.5", EN, 1.5],
  ["1,5", EN, 1.5],
  ["1.5", DE, 1.5],
  ["1,5", DE, 1.5],
  ["1,5", FR, 1.5],
  ["  7  ", EN, 7],
  ["-5", EN, -5],
  ["\u22125", EN, -5], // the typographic minus sign
  ["+2.25", EN, 2.25],
  [".5", EN, 0.5],
  [",5", DE, 0.5],
  ["5.", EN, 5],
  ["0,125", EN, 0.125], // a leading zero is never a thousands group
  ["1234,567", EN, 1234.567], // four digits before the mark: not a group
  ["1,25", EN, 1.25],
  ["1,5000", EN, 1.5],
  ["1.500", EN, 1.5], // "." is not the English thousands separator
  ["1,500", DE, 1.5], // "," is the German decimal mark
  ["-0", EN, 0],
  ["1\u066b5", AR, 1.5],
  ["\u0661\u066b\u0665", AR, 1.5], // Arabic-Indic digits with the Arabic decimal mark
  ["\u06f2\u06f5", AR, 25], // Extended Arabic-Indic digits
  ["1.5", AR, 1.5],
];

const REFUSED: [string, NumberSeparators, "empty" | "not-a-number" | "ambiguous"][] = [
  ["", EN, "empty"],
  ["   ", EN, "empty"],
  ["1,500.5", EN, "ambiguous"],
  ["1.500,5", DE, "ambiguous"],
  ["1,500", EN, "ambiguous"], // 1.5 or 1500?
  ["12,500", EN, "ambiguous"],
  ["1.500", DE, "ambiguous"],
  ["1 500", FR, "ambiguous"],
  ["1\u202f500", FR, "ambiguous"],
  ["1'500", EN, "ambiguous"],
  ["1.2.3", EN, "ambiguous"],
  ["abc", EN, "not-a-number"],
  ["12kg", EN, "not-a-number"],
  ["1e3", EN, "not-a-number"],
  ["0x10", EN, "not-a-number"],
  ["Infinity", EN, "not-a-number"],
  ["NaN", EN, "not-a-number"],
  ["-", EN, "not-a-number"],
  [".", EN, "not-a-number"],
  ["--5", EN, "not-a-number"],
  ["9".repeat(400), EN, "not-a-number"],
];

describe("parseNumber", () => {
  it.each(READ)("reads %j as a number", (text, separators, expected) => {
    const parsed = parseNumber(text, separators);
    expect(parsed).toEqual({ ok: true, value: expected });
    if (parsed.ok) expect(Object.is(parsed.value, -0)).toBe(false);
  });

  it.each(REFUSED)("refuses %j (%s)", (text, separators, reason) => {
    const parsed = parseNumber(text, separators);
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.reason).toBe(reason);
  });

  it("says what to type instead", () => {
    expect(parseNumber("abc", EN)).toMatchObject({ message: NOT_A_NUMBER_MESSAGE });
    expect(NOT_A_NUMBER_MESSAGE).toBe("Enter a number, e.g. 1.5");
    const twoWays = parseNumber("1,500.5", EN);
    expect(twoWays.ok ? "" : twoWays.message).toMatch(/could be read two ways.*e\.g\. 1500 or 1\.5/);
    const german = parseNumber("1.500", DE);
    expect(german.ok ? "" : german.message).toMatch(/e\.g\. 1500 or 1,5/);
  });

  it("uses the runtime's locale when no separators are given", () => {
    const { decimal } = separatorsOf();
    expect(parseNumber(`2${decimal}5`)).toEqual({ ok: true, value: 2.5 });
  });
});

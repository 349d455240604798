// One reading of a typed number for every number field: a decimal point or a decimal comma, or the
// reader's own locale's decimal mark, and never a guess. Text that could mean two numbers ("1,500.5",
// or "1,500" where "," groups thousands) is refused with a message, as is anything that is not digits.

export interface NumberSeparators {
  /** The locale's decimal mark: "." in en, "," in de, "٫" in ar. */
  decimal: string;
  /** The locale's thousands separator: "," in en, "." in de, a (narrow) no-break space in fr. */
  group: string;
}

export type ParsedNumber = { ok: true; value: number } | { ok: false; reason: "empty" | "not-a-number" | "ambiguous"; message: string };

export const NOT_A_NUMBER_MESSAGE = "Enter a number, e.g. 1.5";

/** The decimal mark and thousands separator of a locale (the runtime's own when none is given). */
export function separatorsOf(locale?: string): NumberSeparators {
  const parts = new Intl.NumberFormat(locale, { useGrouping: true }).formatToParts(12345.6);
  return {
    decimal: parts.find((p) => p.type === "decimal")?.value ?? ".",
    group: parts.find((p) => p.type === "group")?.value ?? ",",
  };
}

// Arabic-Indic (U+0660…) and Extended Arabic-Indic (U+06F0…) digits, typed where "٫" is the decimal mark.
const ZERO_CODES = [0x0660, 0x06f0];

function asciiDigits(text: string): string {
  return text.replace(/[\u0660-\u0669\u06f0-\u06f9]/g, (digit) => {
    const code = digit.charCodeAt(0);
    const zero = ZERO_CODES.find((z) => code >= z && code <= z + 9) ?? 0x30;
    return String(code - zero);
  });
}

const ambiguous = (text: string, separators: NumberSeparators): ParsedNumber => ({
  ok: false,
  reason: "ambiguous",
  message: `"${text}" could be read two ways: write one decimal mark and no thousands separator, e.g. 1500 or 1${separators.decimal === "," ? "," : "."}5`,
});

/**
 * The number a person typed, or why it is not one. "1.5", "1,5", "-0.25", ",5" and "5." are read;
 * the locale's own decimal mark (e.g. "٫") is read as well. Two marks, or a lone thousands
 * separator before exactly three digits ("1,500" in English), are refused rather than guessed.
 */
export function parseNumber(text: string, separators: NumberSeparators = separatorsOf()): ParsedNumber {
  const trimmed = text.trim();
  if (trimmed === "") return { ok: false, reason: "empty", message: NOT_A_NUMBER_MESSAGE };
  let normal = asciiDigits(trimmed).replace(/^\u2212/, "-");
  if (separators.decimal !== "." && separators.decimal !== ",") normal = normal.split(separators.decimal).join(".");
  const shape = /^([+-]?)(\d*)([.,]?)(\d*)$/.exec(normal);
  if (!shape) {
    // Digits with more than one mark, or with spaces between them, are a grouped or mistyped number.
    return /^[+-]?[\d.,\s\u00a0\u202f'\u2019]+$/.test(normal) && /\d/.test(normal)
      ? ambiguous(trimmed, separators)
      : { ok: false, reason: "not-a-number", message: NOT_A_NUMBER_MESSAGE };
  }
  const [, sign, whole, mark, fraction] = shape;
  if (whole === "" && fraction === "") return { ok: false, reason: "not-a-number", message: NOT_A_NUMBER_MESSAGE };
  // "1,500" where "," groups thousands: 1.5 or 1500? A leading zero ("0,125") or a whole part
  // longer than a group ("1234,567") can only be a decimal.
  const looksGrouped = mark === separators.group && fraction.length === 3 && /^[1-9]\d{0,2}$/.test(whole);
  if (looksGrouped) return ambiguous(trimmed, separators);
  const value = Number(`${sign}${whole || "0"}.${fraction || "0"}`);
  if (!Number.isFinite(value)) return { ok: false, reason: "not-a-number", message: NOT_A_NUMBER_MESSAGE };
  // No "-0": a typed "-0" is zero.
  return { ok: true, value: value === 0 ? 0 : value };
}

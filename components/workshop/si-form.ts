import { zodResolver } from "@hookform/resolvers/zod";
import type { FieldValues, Resolver } from "react-hook-form";
import type { z } from "zod";
import type { UnitSystem } from "@/lib/domain";
import { parseNumber, type ParsedNumber } from "@/lib/parse-number";
import { decimalsOf, fromDisplay, toDisplay, unitOf, type Quantity } from "@/lib/units";

// The Workshop's forms hold figures as the maker types them, in the maker's units; the resolver
// turns each into SI and checks the whole with the SAME zod schema the route handler parses with.
// Error paths are the schema's, which are the form's own field names.

export interface NumberFieldSpec {
  /** Dotted path in the SI values, e.g. "hull.lengthM". */
  path: string;
  /** Display quantity; absent: a plain number (a coefficient, a count, degrees). */
  quantity?: Quantity;
  /** Empty input means this (an optional limit: undefined; a nullable pressure: null). Absent: required. */
  empty?: "undefined" | "null";
}

type Tree = Record<string, unknown>;

function getAt(tree: Tree, path: string): unknown {
  return path.split(".").reduce<unknown>((node, key) => (node && typeof node === "object" ? (node as Tree)[key] : undefined), tree);
}

function setAt(tree: Tree, path: string, value: unknown): void {
  const keys = path.split(".");
  let node = tree;
  for (const key of keys.slice(0, -1)) {
    if (!node[key] || typeof node[key] !== "object") node[key] = {};
    node = node[key] as Tree;
  }
  if (value === undefined) delete node[keys[keys.length - 1]];
  else node[keys[keys.length - 1]] = value;
}

const clone = <T>(value: T): T => JSON.parse(JSON.stringify(value ?? {})) as T;

/** SI values → the form's text: each number field in the maker's units, rounded to a sensible figure. */
export function toFormValues(si: object, fields: readonly NumberFieldSpec[], system: UnitSystem): Tree {
  const form = clone(si) as Tree;
  for (const field of fields) {
    const value = getAt(si as Tree, field.path);
    if (typeof value !== "number" || !Number.isFinite(value)) {
      setAt(form, field.path, "");
      continue;
    }
    const shown = field.quantity ? toDisplay(field.quantity, value, system) : value;
    const decimals = field.quantity ? decimalsOf(field.quantity, system) + 2 : 6;
    setAt(form, field.path, String(Number(shown.toFixed(decimals))));
  }
  return form;
}

/** The typed figure of a field as the one number parser reads it (numbers already, e.g. defaults, pass). */
function readFigure(raw: unknown): ParsedNumber | null {
  if (typeof raw === "number") return Number.isFinite(raw) ? { ok: true, value: raw } : null;
  if (raw === undefined || raw === null) return null;
  return parseNumber(String(raw));
}

/** The form's text → SI values; text that is no number stays as it is, so the schema says what is wrong. */
export function toSiValues(form: Tree, fields: readonly NumberFieldSpec[], system: UnitSystem): Tree {
  const si = clone(form);
  for (const field of fields) {
    const raw = getAt(form, field.path);
    const parsed = readFigure(raw);
    if (parsed === null || (!parsed.ok && parsed.reason === "empty")) {
      setAt(si, field.path, field.empty === "null" ? null : field.empty === "undefined" ? undefined : Number.NaN);
      continue;
    }
    setAt(si, field.path, parsed.ok ? (field.quantity ? fromDisplay(field.quantity, parsed.value, system) : parsed.value) : raw);
  }
  return si;
}

/** react-hook-form resolver: display text → SI → the shared zod schema. */
export function siResolver<S extends z.ZodType<FieldValues, FieldValues>>(
  schema: S,
  fields: readonly NumberFieldSpec[],
  system: UnitSystem,
): Resolver<FieldValues, unknown, z.output<S>> {
  const check = zodResolver(schema as never) as unknown as Resolver<FieldValues, unknown, z.output<S>>;
  return async (values, context, options) => {
    const outcome = await check(toSiValues(values, fields, system), context, options);
    // A figure the parser refused gets the parser's words ("could be read two ways"), not the schema's.
    for (const field of fields) {
      const parsed = readFigure(getAt(values, field.path));
      if (parsed && !parsed.ok && parsed.reason !== "empty" && getAt(outcome.errors as Tree, field.path)) {
        setAt(outcome.errors as Tree, field.path, { type: "custom", message: parsed.message });
      }
    }
    return outcome;
  };
}

/** "m", "ft", "%": the unit label of a field in the maker's system. */
export const unitLabel = (field: Pick<NumberFieldSpec, "quantity">, system: UnitSystem, plain = ""): string =>
  field.quantity ? unitOf(field.quantity, system) : plain;

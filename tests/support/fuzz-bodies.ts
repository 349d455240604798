import fc from "fast-check";

// Request bodies for the HTTP fuzz: fast-check's generators mixed with hand-made nasties, each
// derived from one valid body of the route so that most of them get past the first look (the
// right shape, one thing wrong). The caller decides what each may be sent to, by whether the
// route's own rules would accept it.

export interface FuzzBody {
  /** What kind of nasty it is, for the per-route counts and for a failure's report. */
  kind: string;
  /** The Content-Type header; null sends none. */
  contentType: string | null;
  /** The bytes; undefined sends no body at all. */
  bytes: string | Buffer | undefined;
}

const JSON_TYPE = "application/json";

/** Number literals JSON.stringify cannot write (it has no -0, and writes Infinity as null). */
const RAW_NUMBERS = ["-0", "1e309", "-1e309", "1e-400", "123456789012345678901234567890", "0.1e-999999", "-1.7976931348623157e308"];
const rawMarker = (literal: string) => `\u0000raw:${literal}`;
/** JSON text of a value in which raw markers stand for bare number literals. */
function toJsonText(value: unknown): string {
  return JSON.stringify(value).replace(/"\\u0000raw:([^"]+)"/g, "$1");
}

const DEEP_LEVELS = 10_000;
const deepArray = (levels: number) => `${"[".repeat(levels)}${"]".repeat(levels)}`;
const deepObject = (levels: number) => `${'{"a":'.repeat(levels)}1${"}".repeat(levels)}`;
/** A value nested `levels` deep, as the object a field holds. */
const deepValue = (levels: number): unknown => {
  let value: unknown = 1;
  for (let i = 0; i < levels; i += 1) value = [value];
  return value;
};

/** Values of every JSON type and then some: each replaces a field of the valid body in turn. */
const WRONG_VALUES: unknown[] = [
  null,
  42,
  -1,
  0,
  1.5,
  rawMarker("-0"),
  rawMarker("1e309"),
  "text",
  "",
  "NaN",
  "Infinity",
  "-Infinity",
  "1e309",
  true,
  false,
  [],
  {},
  [1, 2],
  { a: 1 },
  "\u0000",
  "\ud800",
  "🎈".repeat(50),
];

/** Every path into a value: the whole of each object or array, and each leaf. */
export function pathsOf(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  if (value === null || typeof value !== "object") return prefix.length ? [prefix] : [];
  const entries: [string | number, unknown][] = Array.isArray(value) ? value.map((v, i) => [i, v]) : Object.entries(value);
  return [...(prefix.length ? [prefix] : []), ...entries.flatMap(([key, child]) => pathsOf(child, [...prefix, key]))];
}

/** A copy of `value` with the thing at `path` replaced (or removed, when `replacement` is the remover). */
const REMOVE = Symbol("remove");
function withAt(value: unknown, path: (string | number)[], replacement: unknown): unknown {
  if (path.length === 0) return replacement;
  const [head, ...rest] = path;
  if (Array.isArray(value)) {
    const copy = [...value];
    if (rest.length === 0 && replacement === REMOVE) copy.splice(Number(head), 1);
    else copy[Number(head)] = withAt(copy[Number(head)], rest, replacement);
    return copy;
  }
  const copy: Record<string, unknown> = { ...(value as Record<string, unknown>) };
  if (rest.length === 0 && replacement === REMOVE) delete copy[String(head)];
  else copy[String(head)] = withAt(copy[String(head)], rest, replacement);
  return copy;
}

/** `{ ...value, [key]: extra }` with the key as an own property even when it is `__proto__`. */
function withOwnKey(value: unknown, key: string, extra: unknown): unknown {
  if (value === null || typeof value !== "object" || Array.isArray(value)) return value;
  const copy: Record<string, unknown> = { ...(value as Record<string, unknown>) };
  Object.defineProperty(copy, key, { value: extra, enumerable: true, configurable: true, writable: true });
  return copy;
}

const json = (kind: string, value: unknown): FuzzBody => ({ kind, contentType: JSON_TYPE, bytes: toJsonText(value) });
const raw = (kind: string, bytes: string | Buffer, contentType: string | null = JSON_TYPE): FuzzBody => ({ kind, contentType, bytes });

/** Values fast-check makes, including the doubles JSON cannot carry (they travel as null). */
const anyJson = () =>
  fc.oneof(
    fc.jsonValue({ maxDepth: 3 }),
    fc.double(),
    fc.integer({ min: Number.MIN_SAFE_INTEGER, max: Number.MAX_SAFE_INTEGER }),
    fc.string({ unit: "grapheme", maxLength: 200 }),
    fc.string({ unit: "binary", maxLength: 50 }),
    fc.constantFrom(...RAW_NUMBERS.map(rawMarker), ...WRONG_VALUES),
  );

/** Hand-made bodies that need nothing of the route. */
function nasties(sample: unknown): FuzzBody[] {
  const sampleText = sample === undefined ? "{}" : toJsonText(sample);
  const top: FuzzBody[] = [
    raw("null", "null"),
    raw("number", "42"),
    raw("array", "[]"),
    raw("empty object", "{}"),
    raw("empty string", '""'),
    raw("boolean", "true"),
    raw("minus zero", "-0"),
    raw("overflowing number", "1e309"),
    raw("overflowing number", "-1e309"),
    raw("long number", `1${"0".repeat(400)}`),
    raw("NaN-like string", '"NaN"'),
    raw("NaN-like string", '"Infinity"'),
    raw("NaN-like string", '"-Infinity"'),
    raw("bare NaN", "NaN"),
    raw("bare NaN", "Infinity"),
    raw("bare NaN", "undefined"),
    raw("deep nesting", deepArray(DEEP_LEVELS)),
    raw("deep nesting", deepObject(DEEP_LEVELS)),
    raw("deep nesting", `{"x":${deepArray(DEEP_LEVELS)}}`),
    raw("huge string", JSON.stringify("x".repeat(200_000))),
    raw("huge string", JSON.stringify("🎈".repeat(60_000))),
    raw("over the size cap", JSON.stringify({ x: "x".repeat(400_000) })),
    raw("over the size cap", `[${"1,".repeat(200_000)}1]`),
    raw("prototype keys", '{"__proto__":{"polluted":true,"role":"maker"}}'),
    raw("prototype keys", '{"constructor":{"prototype":{"polluted":true}}}'),
    raw("prototype keys", '{"__proto__":null}'),
    raw("prototype keys", '[{"__proto__":{"polluted":true}}]'),
    raw("duplicate keys", sampleText.replace(/^\{/, '{"__proto__":1,"__proto__":2,')),
    raw("not UTF-8", Buffer.from([0x7b, 0x22, 0x61, 0x22, 0x3a, 0x22, 0xff, 0xfe, 0xc3, 0x28, 0x22, 0x7d])),
    raw("byte-order mark", `\ufeff${sampleText}`),
    raw("NUL bytes", `${sampleText}\u0000`),
    raw("trailing garbage", `${sampleText}}`),
    raw("two documents", `${sampleText}${sampleText}`),
    raw("comment", `/* x */${sampleText}`),
    raw("single quotes", sampleText.replaceAll('"', "'")),
    raw("empty body", ""),
    raw("empty body", "   \n\t"),
    { kind: "no body", contentType: JSON_TYPE, bytes: undefined },
    { kind: "no body", contentType: null, bytes: undefined },
  ];
  return top;
}

/** Bodies built from the valid one: each field of the wrong type, missing, nested too deep, huge, or with prototype keys. */
function fieldByField(sample: unknown): FuzzBody[] {
  if (sample === undefined || sample === null || typeof sample !== "object") return [];
  const paths = pathsOf(sample);
  const bodies: FuzzBody[] = [];
  for (const path of paths) {
    for (const wrong of WRONG_VALUES) bodies.push(json("wrong type", withAt(sample, path, wrong)));
    bodies.push(json("missing field", withAt(sample, path, REMOVE)));
    bodies.push(json("huge string", withAt(sample, path, "y".repeat(100_000))));
    bodies.push(json("deep nesting", withAt(sample, path, deepValue(2_000))));
  }
  for (const key of ["__proto__", "constructor", "prototype"]) {
    bodies.push(json("prototype keys", withOwnKey(sample, key, { polluted: true, role: "maker" })));
    for (const path of paths.filter((p) => p.length === 1))
      bodies.push(json("prototype keys", withAt(sample, path, withOwnKey({}, key, { polluted: true }))));
  }
  return bodies;
}

/** The valid body cut short, sent under other content types, and with a field replaced by fast-check values. */
function generated(sample: unknown, seed: number, count: number): FuzzBody[] {
  const sampleText = sample === undefined ? "{}" : toJsonText(sample);
  const bodies: FuzzBody[] = [];
  for (const cut of fc.sample(fc.integer({ min: 0, max: Math.max(0, sampleText.length - 1) }), { numRuns: 40, seed }))
    bodies.push(raw("truncated JSON", sampleText.slice(0, cut)));
  const wrongTypes = [
    "text/plain",
    "application/x-www-form-urlencoded",
    "multipart/form-data; boundary=xyz",
    "application/xml",
    "application/jsonx",
    "json",
    "",
    "*/*",
    "application/octet-stream",
    "text/json",
  ];
  for (const type of wrongTypes) {
    bodies.push(raw("wrong content type", sampleText, type));
    bodies.push(raw("wrong content type", "null", type));
  }
  bodies.push(raw("wrong content type", sampleText, null));

  const paths = sample !== null && typeof sample === "object" ? pathsOf(sample) : [];
  const mutation =
    paths.length > 0 ? fc.tuple(fc.constantFrom(...paths), anyJson()).map(([path, value]) => withAt(sample, path, value)) : anyJson();
  const keys = sample !== null && typeof sample === "object" && !Array.isArray(sample) ? Object.keys(sample) : [];
  const sameKeys = keys.length
    ? fc.record(Object.fromEntries(keys.map((k) => [k, anyJson()])), { requiredKeys: [] })
    : fc.dictionary(fc.string(), anyJson());
  const remaining = Math.max(0, count - bodies.length);
  const mutated = Math.ceil(remaining * 0.5);
  for (const value of fc.sample(mutation, { numRuns: mutated, seed: seed + 1 })) bodies.push(json("one field mutated", value));
  for (const value of fc.sample(sameKeys, { numRuns: Math.ceil(remaining * 0.3), seed: seed + 2 }))
    bodies.push(json("fast-check record", value));
  for (const value of fc.sample(anyJson(), { numRuns: Math.ceil(remaining * 0.2), seed: seed + 3 }))
    bodies.push(json("fast-check value", value));
  return bodies;
}

const FIELD_VARIANTS_MAX = 500;

/**
 * Candidate bodies for a route whose valid body looks like `sample` (undefined: it reads none):
 * every hand-made nasty and field-by-field variant, then fast-check's until there are `count`.
 * The same seed gives the same bodies.
 */
export function candidateBodies(sample: unknown, { seed, count }: { seed: number; count: number }): FuzzBody[] {
  const variants = fieldByField(sample);
  // A large body has thousands of field variants: an even spread of them keeps the run short.
  const stride = Math.max(1, variants.length / FIELD_VARIANTS_MAX);
  const spread =
    variants.length <= FIELD_VARIANTS_MAX
      ? variants
      : Array.from({ length: FIELD_VARIANTS_MAX }, (_, i) => variants[Math.floor(i * stride)]);
  const fixed = [...nasties(sample), ...spread];
  return [...fixed, ...generated(sample, seed, Math.max(count - fixed.length, 200))];
}

/**
 * The value a lenient server could find in the body, or `unparsable`: JSON.parse of the text as
 * sent, and again without a byte-order mark or trailing NULs and blanks (some readers drop them).
 */
export const UNPARSABLE = Symbol("unparsable");
export function parsedBody(body: FuzzBody): unknown {
  if (body.bytes === undefined) return UNPARSABLE;
  const text = body.bytes.toString();
  for (const candidate of [text, text.replace(/^\ufeff/, "").replace(/[\u0000\s]+$/, "")]) {
    try {
      return JSON.parse(candidate) as unknown;
    } catch {
      // not JSON as it stands
    }
  }
  return UNPARSABLE;
}

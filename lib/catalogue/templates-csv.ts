import Papa from "papaparse";
import { payloadTemplateValuesSchema, TEMPLATE_CSV_COLUMNS, type PayloadTemplateValues } from "./schemas";

// Payload templates as CSV: one row per template, SI units in the header names. Export and import
// read the same columns, so a file exported, edited in a spreadsheet and imported round-trips.
// Row numbers are as a spreadsheet shows them: the header is row 1, the first template row 2.

export { TEMPLATE_CSV_COLUMNS };
type Column = (typeof TEMPLATE_CSV_COLUMNS)[number];

/** Each column's field in the template's values ("id" is the row's own). */
const FIELD_OF: Record<Exclude<Column, "id">, keyof PayloadTemplateValues> = {
  name: "name",
  description: "description",
  category: "category",
  mass_kg: "massKg",
  shape: "shape",
  length_m: "lengthM",
  width_m: "widthM",
  height_m: "heightM",
  attachment: "attachment",
  drag_area_m2: "dragAreaM2",
  offset_x_m: "offsetXM",
  offset_z_m: "offsetZM",
};
const NUMERIC: ReadonlySet<Column> = new Set(["mass_kg", "length_m", "width_m", "height_m", "drag_area_m2", "offset_x_m", "offset_z_m"]);
const COLUMN_OF = Object.fromEntries(Object.entries(FIELD_OF).map(([column, field]) => [field, column])) as Record<string, Column>;

export const MAX_TEMPLATE_IMPORT_ROWS = 1000;

export interface CsvProblem {
  /** Row in the file (header = 1); 1 for a problem with the header itself. */
  row: number;
  /** The column at fault, by its header name. */
  field: string;
  problem: string;
}

export interface ParsedTemplateRow {
  row: number;
  id: string | null;
  values: PayloadTemplateValues;
}

export type TemplateCsvParse = { ok: true; rows: ParsedTemplateRow[] } | { ok: false; problems: CsvProblem[] };

export interface TemplateForCsv extends PayloadTemplateValues {
  id: string;
}

/** Numbers are written as JavaScript prints them (shortest round-trip form), so nothing is lost. */
export function templatesToCsv(templates: readonly TemplateForCsv[]): string {
  const data = templates.map((t) => [
    t.id,
    t.name,
    t.description,
    t.category,
    t.massKg,
    t.shape,
    t.lengthM,
    t.widthM,
    t.heightM,
    t.attachment,
    t.dragAreaM2,
    t.offsetXM,
    t.offsetZM,
  ]);
  return Papa.unparse({ fields: [...TEMPLATE_CSV_COLUMNS], data }, { newline: "\r\n" });
}

/** Reads every row and reports every problem (row, column, what is wrong); rows only when there are none. */
export function parseTemplatesCsv(text: string): TemplateCsvParse {
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), {
    header: true,
    skipEmptyLines: "greedy",
    transformHeader: (header) => header.trim().toLowerCase(),
  });
  const problems: CsvProblem[] = [];
  const headers = parsed.meta.fields ?? [];
  for (const column of TEMPLATE_CSV_COLUMNS) {
    if (column !== "id" && column !== "description" && !headers.includes(column))
      problems.push({ row: 1, field: column, problem: "this column is missing from the header" });
  }
  for (const header of headers) {
    if (!(TEMPLATE_CSV_COLUMNS as readonly string[]).includes(header))
      problems.push({ row: 1, field: header, problem: `unknown column; the columns are ${TEMPLATE_CSV_COLUMNS.join(", ")}` });
  }
  if (problems.length) return { ok: false, problems };
  if (parsed.data.length === 0) return { ok: false, problems: [{ row: 2, field: "name", problem: "the file has no template rows" }] };
  if (parsed.data.length > MAX_TEMPLATE_IMPORT_ROWS)
    return {
      ok: false,
      problems: [
        { row: MAX_TEMPLATE_IMPORT_ROWS + 2, field: "name", problem: `at most ${MAX_TEMPLATE_IMPORT_ROWS} templates in one file` },
      ],
    };
  for (const error of parsed.errors) {
    problems.push({ row: (error.row ?? 0) + 2, field: "(row)", problem: error.message });
  }

  const rows: ParsedTemplateRow[] = [];
  const seenNames = new Map<string, number>();
  parsed.data.forEach((record, index) => {
    const row = index + 2;
    const values: Record<string, unknown> = { description: "" };
    for (const [column, field] of Object.entries(FIELD_OF) as [Exclude<Column, "id">, string][]) {
      const raw = (record[column] ?? "").trim();
      if (!NUMERIC.has(column)) {
        if (raw !== "" || column !== "description") values[field] = raw;
        continue;
      }
      const value = Number(raw.replace(",", "."));
      if (raw === "" || !Number.isFinite(value))
        problems.push({ row, field: column, problem: raw === "" ? "empty: give a number in SI units" : `"${raw}" is not a number` });
      else values[field] = value;
    }
    const checked = payloadTemplateValuesSchema.safeParse(values);
    if (!checked.success) {
      for (const issue of checked.error.issues) {
        const column = COLUMN_OF[String(issue.path[0])] ?? String(issue.path[0]);
        // A number that did not parse was reported above; say each problem once.
        if (!problems.some((p) => p.row === row && p.field === column)) problems.push({ row, field: column, problem: issue.message });
      }
      return;
    }
    const key = checked.data.name.toLowerCase();
    const earlier = seenNames.get(key);
    if (earlier !== undefined) problems.push({ row, field: "name", problem: `the same name as row ${earlier}` });
    seenNames.set(key, row);
    const id = (record.id ?? "").trim();
    rows.push({ row, id: id === "" ? null : id, values: checked.data });
  });
  return problems.length ? { ok: false, problems } : { ok: true, rows };
}

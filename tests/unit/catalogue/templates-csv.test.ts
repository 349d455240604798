import { describe, expect, it } from "vitest";
import { DEMO_TEMPLATES } from "@/db/seed-data";
import { parseTemplatesCsv, TEMPLATE_CSV_COLUMNS, templatesToCsv } from "@/lib/catalogue/templates-csv";

// The invented demo templates, as the catalogue stores them.
const TEMPLATES = DEMO_TEMPLATES.map((t) => ({ ...t }));
const HEADER = TEMPLATE_CSV_COLUMNS.join(",");
const GOOD_ROW = ",Tiny beacon,,light,0.02,cylinder,0.02,0.02,0.04,1/4-20 UNC,0.001,0,-0.05";

describe("templatesToCsv → parseTemplatesCsv", () => {
  it("returns every template's values and id unchanged after a round trip", () => {
    const parsed = parseTemplatesCsv(templatesToCsv(TEMPLATES));
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.problems));
    expect(parsed.rows.map((r) => r.id)).toEqual(TEMPLATES.map((t) => t.id));
    parsed.rows.forEach((row, i) => {
      const { id: _id, ...values } = TEMPLATES[i];
      expect(row.values).toEqual(values);
      expect(row.row).toBe(i + 2);
    });
  });

  it("returns a header with SI units in the column names", () => {
    expect(templatesToCsv([]).split("\r\n")[0]).toBe(HEADER);
    expect(HEADER).toMatch(/mass_kg/);
    expect(HEADER).toMatch(/drag_area_m2/);
  });

  it("keeps commas, quotes and line breaks inside a description", () => {
    const tricky = { ...TEMPLATES[0], description: 'Whip, "tip down",\nwith a base' };
    const parsed = parseTemplatesCsv(templatesToCsv([tricky]));
    expect(parsed.ok && parsed.rows[0].values.description).toBe(tricky.description);
  });
});

describe("parseTemplatesCsv", () => {
  it("returns a new row (no id) from a hand-written file with a byte-order mark", () => {
    const parsed = parseTemplatesCsv(`\uFEFF${HEADER}\n${GOOD_ROW}\n`);
    expect(parsed.ok && parsed.rows).toEqual([
      expect.objectContaining({ row: 2, id: null, values: expect.objectContaining({ name: "Tiny beacon", massKg: 0.02 }) }),
    ]);
  });

  it("returns every problem with its row, column and what is wrong, and no rows", () => {
    const text = [
      HEADER,
      GOOD_ROW,
      ",Bad mass,,light,heavy,box,0.1,0.1,0.1,1/4-20 UNC,0,0,-0.1",
      ",Bad kind,,toaster,0.1,box,0.1,0.1,0.1,1/4-20 UNC,0,0,-0.1",
      ",Tiny beacon,,light,0.02,cylinder,0.02,0.02,0.04,1/4-20 UNC,0.001,0,-0.05",
    ].join("\n");
    const parsed = parseTemplatesCsv(text);
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.problems).toEqual([
      { row: 3, field: "mass_kg", problem: '"heavy" is not a number' },
      expect.objectContaining({ row: 4, field: "category" }),
      { row: 5, field: "name", problem: "the same name as row 2" },
    ]);
  });

  it("returns a problem for a value out of the setup's bounds, naming the column", () => {
    const parsed = parseTemplatesCsv(`${HEADER}\n,Anvil,,other,80,box,0.1,0.1,0.1,strap,0,0,-0.1`);
    expect(!parsed.ok && parsed.problems).toEqual([{ row: 2, field: "mass_kg", problem: "mass (kg) must be at most 50" }]);
  });

  it("returns header problems for a missing or unknown column", () => {
    const parsed = parseTemplatesCsv("name,category,weight\nA,light,1");
    expect(!parsed.ok && parsed.problems.map((p) => `${p.row}:${p.field}`)).toEqual(
      expect.arrayContaining(["1:mass_kg", "1:shape", "1:weight"]),
    );
  });

  it("returns a problem for a file with a header and no rows", () => {
    expect(parseTemplatesCsv(`${HEADER}\n`)).toEqual({
      ok: false,
      problems: [{ row: 2, field: "name", problem: "the file has no template rows" }],
    });
  });
});

import { describe, expect, it } from "vitest";
import { inputFor } from "@/components/planner/store";
import { evaluateBalance, operatingEnvelope, operatingEnvelopeTable } from "@/lib/balance";
import { buildFieldReport, envelopeReportTable, type FieldReportFacts } from "@/lib/report/field-report";
import { renderFieldReportPdf } from "@/lib/report/field-report-pdf";
import { formatQuantity } from "@/lib/units";
import { plannerDataFor } from "../../support/planner-fixture";
import { pdfText } from "../../support/pdf-text";

// A seeded demo setup with a whip: the relay plan on the 1.1 m³ model.
const data = plannerDataFor("set-wren-whip");
const result = evaluateBalance(inputFor(data.draft, data.catalogue));
const model = data.catalogue.models.find((m) => m.id === data.draft.modelId)!;
const APPROVAL = {
  outcome: "approved" as const,
  reviewerName: "Sunniva Rook",
  at: new Date(Date.UTC(2026, 10, 20)),
  setupVersion: 3,
  note: "Keep the safety line on.",
};

const facts = (over: Partial<FieldReportFacts> = {}): FieldReportFacts => ({
  setupId: "set-wren-whip",
  version: 3,
  status: "approved",
  updatedAt: new Date(Date.UTC(2026, 10, 19)),
  ownerName: "Wren Halloway",
  draft: data.draft,
  result,
  modelName: model.name,
  unitText: null,
  mount: { name: "Slider 14", thread: "1/4-20 UNC", ratedLoadKg: 1.5 },
  rail: { startXM: model.railStartXM, endXM: model.railEndXM },
  adapterNames: {},
  latestDecision: APPROVAL,
  generatedAt: new Date(Date.UTC(2026, 11, 1)),
  unitSystem: "metric",
  ...over,
});

describe("buildFieldReport", () => {
  it("returns an approval only when it is of the version printed", () => {
    expect(buildFieldReport(facts()).review).toMatchObject({ state: "approved", headline: "APPROVED FOR FIRST FLIGHT" });
    expect(buildFieldReport(facts()).review.detail).toContain("Sunniva Rook");
    // edited after approval: back to draft, version 4
    expect(buildFieldReport(facts({ status: "draft", version: 4 })).review).toMatchObject({
      state: "not_reviewed",
      headline: "NOT REVIEWED",
    });
    expect(buildFieldReport(facts({ latestDecision: null, status: "draft" })).review.state).toBe("not_reviewed");
  });

  it("returns the reason in large words when changes were requested", () => {
    const report = buildFieldReport(
      facts({
        status: "changes_requested",
        latestDecision: { ...APPROVAL, outcome: "changes_requested", note: "Move the mount forward." },
      }),
    );
    expect(report.review.state).toBe("changes_requested");
    expect(report.review.detail).toContain("Move the mount forward.");
  });

  it("returns every flag and every payload of the setup", () => {
    const report = buildFieldReport(facts());
    expect(report.flags.length).toBe(result.flags.length);
    expect(report.payloads.rows.map((r) => r[0])).toEqual(data.draft.payloads.map((p) => p.name));
    expect(report.cautions.some((c) => /Antennas/.test(c))).toBe(true); // the whip is an antenna
  });

  it("returns figures in the reader's units: no SI masses or lengths for an imperial reader", () => {
    const imperial = buildFieldReport(facts({ unitSystem: "imperial" }));
    const text = JSON.stringify(imperial.sections) + JSON.stringify(imperial.flags) + JSON.stringify(imperial.payloads);
    expect(text).not.toMatch(/\d ?(kg|g|m|cm|N|m\/s|m³)\b(?!\w)/);
    const gross = imperial.sections.flatMap((s) => s.rows).find((r) => r.label === "Gross lift")?.value;
    expect(gross).toBe(formatQuantity("mass", result.grossLiftKg, "imperial"));
  });
});

describe("renderFieldReportPdf", () => {
  it("returns a PDF whose text holds the title, the review, the gross lift and every payload", async () => {
    const report = buildFieldReport(facts());
    const bytes = await renderFieldReportPdf(report);
    expect(Buffer.from(bytes.slice(0, 5)).toString()).toBe("%PDF-");
    const text = await pdfText(bytes);
    expect(text).toContain("Field report: Field day VHF whip");
    expect(text).toContain("APPROVED FOR FIRST FLIGHT");
    expect(text).toContain(formatQuantity("mass", result.grossLiftKg, "metric"));
    for (const p of data.draft.payloads) expect(text).toContain(p.name);
    expect(text).toContain("Cautions");
  });

  it("returns NOT REVIEWED in the PDF of an unreviewed setup", async () => {
    const text = await pdfText(await renderFieldReportPdf(buildFieldReport(facts({ latestDecision: null, status: "draft" }))));
    expect(text).toContain("NOT REVIEWED");
  });
});

describe("envelopeReportTable", () => {
  it("returns a row per line out and a column per wind, each cell's height, blowdown and worst flag, printed in the PDF", async () => {
    const envelope = operatingEnvelope(inputFor(data.draft, data.catalogue), { windCount: 6, lineCount: 6 });
    const table = envelopeReportTable(operatingEnvelopeTable(envelope), "metric");
    expect(table).not.toBeNull();
    expect(table?.header).toHaveLength(1 + envelope.windsMS.length);
    expect(table?.rows).toHaveLength(envelope.linesOutM.length);
    const first = envelope.points[0][0];
    expect(table?.rows[0][1]).toContain(first.worstLevel);
    if (first.heightAboveGroundM !== null)
      expect(table?.rows[0][1]).toContain(formatQuantity("distance", first.heightAboveGroundM, "metric"));
    const text = await pdfText(await renderFieldReportPdf(buildFieldReport(facts({ envelope: table }))));
    expect(text).toContain("Operating envelope");
    expect(text).toContain(table?.rows[0][0] ?? "");
  });

  it("returns null when the setup has no tether (no envelope to print)", () => {
    const envelope = operatingEnvelope(inputFor({ ...data.draft, tether: null }, data.catalogue));
    expect(envelopeReportTable(operatingEnvelopeTable(envelope), "metric")).toBeNull();
  });
});

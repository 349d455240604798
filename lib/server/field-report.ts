import "server-only";
import { catalogueIdsOfDraft, getPlannerCatalogue } from "@/db/queries/catalogue";
import { getSetupHeaderForViewer, listThread } from "@/db/queries/review";
import { getSetupById } from "@/db/queries/setups";
import type { Viewer } from "@/lib/auth/access";
import { fail, ok, type Result } from "@/lib/errors";
import { operatingEnvelope, operatingEnvelopeTable } from "@/lib/balance";
import { buildFieldReport, envelopeReportTable, type FieldReport } from "@/lib/report/field-report";
import { formatQuantity } from "@/lib/units";
import { evaluateDraft, isCurrentResultShape } from "./evaluate-draft";

/** A grid that fits a printed page: six winds (0–15 m/s) by six lengths of line. */
const REPORT_ENVELOPE_GRID = { windCount: 6, lineCount: 6 } as const;

/** The field report of a setup in the viewer's units: its owner's, or review staff's once it was submitted. */
export async function getFieldReport({ viewer, id }: { viewer: Viewer; id: string }): Promise<Result<FieldReport>> {
  const header = await getSetupHeaderForViewer({ id, viewer });
  const stored = header ? await getSetupById({ id, ownerId: null }) : null;
  if (!header || !stored) return fail("not_found", "No such setup, or not one you can see.");
  const { row, draft } = stored;
  // The server's own evaluation of the stored input gives the operating envelope (and the result,
  // for a setup stored before results carried their figures).
  const fresh = await evaluateDraft({ draft, ownerId: header.ownerId });
  let result = stored.result;
  if (!isCurrentResultShape(result)) {
    if (!fresh.ok) return fresh;
    result = fresh.data.result;
  }
  const envelope = fresh.ok
    ? envelopeReportTable(operatingEnvelopeTable(operatingEnvelope(fresh.data.input, REPORT_ENVELOPE_GRID)), viewer.unitSystem)
    : null;
  const [catalogue, thread] = await Promise.all([
    getPlannerCatalogue({ ownerId: header.ownerId, includeIds: catalogueIdsOfDraft(draft) }),
    listThread({ setupId: id }),
  ]);
  const model = catalogue.models.find((m) => m.id === draft.modelId);
  const unit = catalogue.units.find((u) => u.id === draft.unitId);
  const mount = catalogue.mounts.find((m) => m.id === draft.mountId);
  const decision = [...thread].reverse().find((t) => t.kind === "decision");
  const units = viewer.unitSystem;
  return ok(
    buildFieldReport({
      setupId: id,
      version: row.version,
      status: row.status,
      updatedAt: row.updatedAt,
      ownerName: header.ownerName,
      draft,
      result,
      modelName: header.modelName,
      unitText: unit
        ? unit.latestTest && unit.calibrationFactor !== null
          ? `${unit.serial}: weighed ${formatQuantity("mass", unit.measuredMassKg, units)}, gross lift ${formatQuantity("mass", unit.latestTest.measuredGrossLiftKg, units)} on ${unit.latestTest.testedOn} (lift ×${unit.calibrationFactor.toFixed(3)} of the model's)`
          : `${unit.serial}: weighed ${formatQuantity("mass", unit.measuredMassKg, units)}, no lift test (the model's volume)`
        : null,
      mount: mount
        ? { name: mount.name, thread: mount.thread, ratedLoadKg: mount.ratedLoadKg }
        : { name: "unknown mount", thread: "", ratedLoadKg: 0 },
      rail: { startXM: model?.railStartXM ?? 0, endXM: model?.railEndXM ?? 1 },
      adapterNames: Object.fromEntries(catalogue.adapters.map((a) => [a.id, a.name])),
      latestDecision:
        decision && decision.decision
          ? {
              outcome: decision.decision,
              reviewerName: decision.authorName,
              at: decision.at,
              setupVersion: decision.setupVersion ?? 0,
              note: decision.body,
            }
          : null,
      envelope,
      generatedAt: new Date(),
      unitSystem: units,
    }),
  );
}

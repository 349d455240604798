import { renderFieldReportPdf } from "@/lib/report/field-report-pdf";
import { getFieldReport } from "@/lib/server/field-report";
import { ok } from "@/lib/errors";
import { route } from "@/lib/server/route";
import { setupParamsSchema } from "../../schema";

/** GET /api/setups/:id/report.pdf — the printable field report as a PDF; the owner, support, maker. */
export const GET = route({ params: setupParamsSchema, respond: "file" }, async ({ viewer, params: { id } }) => {
  const report = await getFieldReport({ viewer, id });
  if (!report.ok) return report;
  return ok({
    bytes: await renderFieldReportPdf(report.data),
    contentType: "application/pdf",
    fileName: `field-report-${id}.pdf`,
    disposition: "attachment" as const,
  });
});

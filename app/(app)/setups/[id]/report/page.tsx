import { notFound } from "next/navigation";
import { FieldReportView } from "@/components/report/field-report-view";
import { PrintButton } from "@/components/report/print-button";
import { requirePageViewer } from "@/lib/auth/guard";
import { getFieldReport } from "@/lib/server/field-report";

export const metadata = { title: "Field report" };

export default async function FieldReportPage({ params }: PageProps<"/setups/[id]/report">) {
  const { id } = await params;
  const viewer = await requirePageViewer(undefined, `/setups/${id}/report`);
  const report = await getFieldReport({ viewer, id });
  if (!report.ok) notFound();
  return (
    <div className="space-y-3">
      <p className="flex flex-wrap gap-3 text-sm print:hidden">
        <PrintButton />
        <a
          href={`/api/setups/${encodeURIComponent(id)}/report.pdf`}
          className="rounded border border-hairline bg-white px-3 py-1.5"
          data-testid="report-pdf"
          download
        >
          Download the PDF
        </a>
      </p>
      <FieldReportView report={report.data} />
    </div>
  );
}

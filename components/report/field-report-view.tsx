import { FlagIcon } from "@/components/ui/flag-badge";
import type { FieldReport, ReportTable } from "@/lib/report/field-report";

function Table({ table, testId }: { table: ReportTable; testId: string }) {
  return (
    <table className="w-full border-collapse text-sm" data-testid={testId}>
      <thead>
        <tr>
          {table.header.map((h) => (
            <th key={h} scope="col" className="border-b border-ink/30 py-1 pr-2 text-left font-medium">
              {h}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {table.rows.map((row, i) => (
          <tr key={i}>
            {row.map((cell, j) => (
              <td key={j} className="figure border-b border-hairline py-1 pr-2">
                {cell}
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** The field report on paper: black on white, every figure in the reader's units, the review first. */
export function FieldReportView({ report }: { report: FieldReport }) {
  const approved = report.review.state === "approved";
  return (
    <article className="mx-auto max-w-3xl space-y-5 bg-white p-6 print:max-w-none print:p-0" data-testid="field-report">
      <header>
        <h1 className="text-2xl">{report.title}</h1>
        <p className="text-sm text-muted">{report.subtitle}</p>
      </header>
      <section
        className={`border-4 p-4 ${approved ? "border-flag-ok" : "border-flag-stop"}`}
        data-testid="report-review"
        data-state={report.review.state}
      >
        <p className={`font-display font-bold ${approved ? "text-2xl text-flag-ok" : "text-4xl text-flag-stop"}`}>
          {report.review.headline}
        </p>
        {report.review.detail && <p className="mt-1 text-sm">{report.review.detail}</p>}
      </section>
      <div className="grid gap-5 sm:grid-cols-2 print:grid-cols-2">
        {report.sections.map((section) => (
          <section key={section.title} className="break-inside-avoid">
            <h2 className="text-lg">{section.title}</h2>
            <dl className="mt-1 text-sm">
              {section.rows.map((row) => (
                <div key={row.label} className="flex justify-between gap-3 border-b border-hairline py-0.5">
                  <dt className="text-muted">{row.label}</dt>
                  <dd className="figure text-right">{row.value}</dd>
                </div>
              ))}
            </dl>
          </section>
        ))}
      </div>
      <section>
        <h2 className="text-lg">Payloads</h2>
        {report.payloads.rows.length ? <Table table={report.payloads} testId="report-payloads" /> : <p className="text-sm">No payloads.</p>}
      </section>
      <section className="break-inside-avoid">
        <h2 className="text-lg">Flags</h2>
        <ul className="mt-1 space-y-1 text-sm" data-testid="report-flags">
          {report.flags.map((flag, i) => (
            <li key={i} className="flex gap-2">
              <span className="mt-0.5 shrink-0">
                <FlagIcon level={flag.level} />
              </span>
              <span>
                <span className="font-medium">{flag.level}</span> · {flag.text}
              </span>
            </li>
          ))}
        </ul>
      </section>
      {report.envelope && (
        <section>
          <h2 className="text-lg">Operating envelope</h2>
          <Table table={report.envelope} testId="report-envelope" />
        </section>
      )}
      <section className="break-inside-avoid border-l-4 border-flag-caution pl-3">
        <h2 className="text-lg">Cautions</h2>
        <ul className="mt-1 list-disc space-y-1 pl-4 text-sm">
          {report.cautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </section>
    </article>
  );
}

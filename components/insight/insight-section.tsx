"use client";
import Papa from "papaparse";
import { useId, useState, type ReactNode } from "react";

export interface Column<Row> {
  key: keyof Row & string;
  /** Header in the table; the CSV uses the key, which names its SI unit (binStartKg). */
  label: string;
  format?: (row: Row) => string;
}

interface InsightSectionProps<Row> {
  title: string;
  description: string;
  rows: Row[];
  columns: Column<Row>[];
  csvName: string;
  testId: string;
  children: ReactNode;
}

function download(name: string, text: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: "text/csv;charset=utf-8" }));
  const link = Object.assign(document.createElement("a"), { href: url, download: name });
  link.click();
  URL.revokeObjectURL(url);
}

/** One Insight figure: its chart, the same numbers as a table on request, and a CSV of them. */
export function InsightSection<Row extends Record<string, unknown>>({
  title,
  description,
  rows,
  columns,
  csvName,
  testId,
  children,
}: InsightSectionProps<Row>) {
  const [asTable, setAsTable] = useState(false);
  const id = useId();
  return (
    <section className="panel space-y-2 p-4" aria-labelledby={id} data-testid={testId}>
      <div className="flex flex-wrap items-baseline gap-3">
        <h2 id={id} className="text-lg">
          {title}
        </h2>
        <button
          type="button"
          className="text-sm text-accent underline"
          aria-pressed={asTable}
          onClick={() => setAsTable(!asTable)}
          data-testid={`${testId}-toggle`}
        >
          {asTable ? "Show the chart" : "Show as a table"}
        </button>
        <button
          type="button"
          className="text-sm text-accent underline"
          onClick={() => download(csvName, Papa.unparse(rows.map((r) => Object.fromEntries(columns.map((c) => [c.key, r[c.key]])))))}
        >
          Download CSV
        </button>
      </div>
      <p className="text-sm text-muted">{description}</p>
      {rows.length === 0 ? (
        <p className="text-sm text-muted">No setups match these filters.</p>
      ) : asTable ? (
        <div className="max-h-80 overflow-auto">
          <table className="w-full text-sm" data-testid={`${testId}-table`}>
            <thead className="sticky top-0 bg-white text-left text-muted">
              <tr>
                {columns.map((c) => (
                  <th key={c.key} scope="col" className="py-1 pr-3 font-medium">
                    {c.label}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {rows.map((row, i) => (
                <tr key={i} className="border-t border-hairline">
                  {columns.map((c) => (
                    <td key={c.key} className="figure py-1 pr-3">
                      {c.format ? c.format(row) : String(row[c.key])}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : (
        <div className="h-64" data-testid={`${testId}-chart`}>
          {children}
        </div>
      )}
    </section>
  );
}

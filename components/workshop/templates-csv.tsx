"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiError, importTemplatesRequest } from "@/lib/client/api";
import { TEMPLATE_CSV_COLUMNS } from "@/lib/catalogue/schemas";

interface Problem {
  row: number;
  field: string;
  problem: string;
}

/** Export every template as CSV; import a CSV of them, all rows or none, with every problem listed by row and column. */
export function TemplatesCsv() {
  const router = useRouter();
  const [problems, setProblems] = useState<Problem[]>([]);
  const [message, setMessage] = useState<string | null>(null);
  const importing = useMutation({
    mutationFn: importTemplatesRequest,
    onSuccess: ({ created, updated }) => {
      setProblems([]);
      setMessage(`Imported: ${created} added, ${updated} updated.`);
      router.refresh();
    },
    onError: (error) => {
      const detail = error instanceof ApiError ? (error.error.detail?.problems as Problem[] | undefined) : undefined;
      setProblems(detail ?? []);
      setMessage(error.message);
    },
  });
  return (
    <div className="panel space-y-2 p-4 text-sm" data-testid="templates-csv">
      <h2 className="font-display text-base font-bold">CSV</h2>
      <p className="text-muted">
        Columns: {TEMPLATE_CSV_COLUMNS.join(", ")} (SI units, as the names say). A row with an id updates that template; a row without one
        adds a template. One bad row and nothing is imported.
      </p>
      <div className="flex flex-wrap items-center gap-3">
        <a
          href="/api/catalogue/templates.csv"
          download
          className="rounded border border-accent bg-white px-3 py-1.5 text-accent-dark"
          data-testid="templates-export"
        >
          Export CSV
        </a>
        <label className="rounded border border-hairline bg-white px-3 py-1.5">
          Import CSV…
          <input
            type="file"
            accept=".csv,text/csv"
            className="sr-only"
            data-testid="templates-import"
            onChange={async (event) => {
              const file = event.target.files?.[0];
              event.target.value = "";
              if (file) importing.mutate(await file.text());
            }}
          />
        </label>
        {message && (
          <span role="status" data-testid="templates-import-message">
            {message}
          </span>
        )}
      </div>
      {problems.length > 0 && (
        <table className="w-full border-separate border-spacing-0" data-testid="templates-import-problems">
          <thead className="text-left text-muted">
            <tr>
              <th className="px-2 py-1">Row</th>
              <th className="px-2 py-1">Column</th>
              <th className="px-2 py-1">Problem</th>
            </tr>
          </thead>
          <tbody>
            {problems.map((p, i) => (
              <tr key={i}>
                <td className="figure border-t border-hairline px-2 py-1">{p.row}</td>
                <td className="border-t border-hairline px-2 py-1">{p.field}</td>
                <td className="border-t border-hairline px-2 py-1">{p.problem}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}

import Link from "next/link";
import type { ReactNode } from "react";
import type { SetupListItem } from "@/db/queries/setups";
import { FlagBadge } from "@/components/ui/flag-badge";

const STATUS_LABEL: Record<SetupListItem["status"], string> = {
  draft: "draft",
  submitted: "submitted",
  changes_requested: "changes requested",
  approved: "approved",
};

interface SetupTableProps {
  rows: SetupListItem[];
  /** Where a row's name links to, if anywhere. */
  hrefFor?: (row: SetupListItem) => string;
  /** Extra controls at the end of each row. */
  actionsFor?: (row: SetupListItem) => ReactNode;
  /** Comments by others the viewer has not read, per setup id. */
  unread?: Record<string, number>;
}

// One table at every width. Below the md breakpoint a phone has room for two columns: the setup (with
// its envelope, status, flag and last change listed under the name) and its actions; from md up each
// fact has its own column again. Only one of the two forms of a fact is ever displayed, so a screen
// reader hears each once.
const wide = "hidden md:table-cell";
const cell = "border-t border-hairline px-3 py-2 align-top md:align-middle";
/** The columns in order; `narrow` ones stay on a phone. */
const COLUMNS = [
  { label: "Setup", narrow: true },
  { label: "Envelope", narrow: false },
  { label: "Status", narrow: false },
  { label: "Worst flag", narrow: false },
  { label: "Last change", narrow: false },
  { label: "Actions", narrow: true },
] as const;

function SetupFacts({ row }: { row: SetupListItem }) {
  const fact = (term: string, value: ReactNode) => (
    <div className="flex flex-wrap gap-x-1.5">
      <dt className="text-muted">{term}</dt>
      <dd>{value}</dd>
    </div>
  );
  return (
    <dl className="mt-1 space-y-0.5 text-xs font-normal md:hidden" data-testid="setup-facts">
      {fact("Envelope", row.modelName)}
      {fact("Status", STATUS_LABEL[row.status])}
      {fact("Worst flag", row.worstFlag ? <FlagBadge level={row.worstFlag} /> : "not computed")}
      {fact("Last change", <span className="figure">{row.updatedAt.toISOString().slice(0, 10)}</span>)}
    </dl>
  );
}

export function SetupTable({ rows, hrefFor, actionsFor, unread }: SetupTableProps) {
  return (
    <table className="panel w-full border-separate border-spacing-0 text-sm" data-testid="setup-table">
      <thead className="text-left text-muted">
        <tr>
          {COLUMNS.filter((column) => column.label !== "Actions" || actionsFor).map(({ label, narrow }) => (
            <th key={label} className={`${narrow ? "" : wide} px-3 py-2 font-medium`}>
              {label === "Actions" ? <span className="sr-only">{label}</span> : label}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.map((row) => (
          <tr key={row.id} data-testid="setup-row">
            <td className={`${cell} font-medium [overflow-wrap:anywhere]`}>
              {hrefFor ? (
                <Link href={hrefFor(row)} className="text-accent underline-offset-2 hover:underline">
                  {row.name}
                </Link>
              ) : (
                row.name
              )}
              {unread?.[row.id] ? (
                <span
                  className="ml-2 inline-block rounded-full bg-accent px-1.5 py-0.5 text-xs font-normal text-white"
                  data-testid="unread-comments"
                >
                  {unread[row.id]} new {unread[row.id] === 1 ? "comment" : "comments"}
                </span>
              ) : null}
              <SetupFacts row={row} />
            </td>
            <td className={`${cell} ${wide}`}>{row.modelName}</td>
            <td className={`${cell} ${wide}`}>{STATUS_LABEL[row.status]}</td>
            <td className={`${cell} ${wide}`}>{row.worstFlag ? <FlagBadge level={row.worstFlag} /> : "not computed"}</td>
            <td className={`${cell} ${wide} figure`}>{row.updatedAt.toISOString().slice(0, 10)}</td>
            {actionsFor && <td className={`${cell} w-px md:w-auto`}>{actionsFor(row)}</td>}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

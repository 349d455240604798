import Link from "next/link";
import type { ReactNode } from "react";
import type { SetupListItem } from "@/db/queries/setups";
import { FlagBadge } from "./flag-badge";

const STATUS_LABEL: Record<SetupListItem["status"], string> = {
  draft: "draft",
  submitted: "submitted",
  changes_requested: "changes requested",
  approved: "approved",
};

interface SetupTableProps {
  rows: SetupListItem[];
  showOwner?: boolean;
  testId?: string;
  /** Where a row's name links to, if anywhere. */
  hrefFor?: (row: SetupListItem) => string;
  /** Extra controls at the end of each row. */
  actionsFor?: (row: SetupListItem) => ReactNode;
  /** Comments by others the viewer has not read, per setup id. */
  unread?: Record<string, number>;
}

export function SetupTable({ rows, showOwner = false, testId = "setup-table", hrefFor, actionsFor, unread }: SetupTableProps) {
  return (
    <table className="panel w-full border-separate border-spacing-0 text-sm" data-testid={testId}>
      <thead className="text-left text-muted">
        <tr>
          <th className="px-3 py-2 font-medium">Setup</th>
          {showOwner && <th className="px-3 py-2 font-medium">Customer</th>}
          <th className="px-3 py-2 font-medium">Envelope</th>
          <th className="px-3 py-2 font-medium">Status</th>
          <th className="px-3 py-2 font-medium">Worst flag</th>
          <th className="px-3 py-2 font-medium">Last change</th>
          {actionsFor && (
            <th className="px-3 py-2 font-medium">
              <span className="sr-only">Actions</span>
            </th>
          )}
        </tr>
      </thead>
      <tbody>
        {rows.map((row) => (
          <tr key={row.id} className="border-t border-hairline" data-testid="setup-row">
            <td className="border-t border-hairline px-3 py-2 font-medium">
              {hrefFor ? (
                <Link href={hrefFor(row)} className="text-accent underline-offset-2 hover:underline">
                  {row.name}
                </Link>
              ) : (
                row.name
              )}
              {unread?.[row.id] ? (
                <span className="ml-2 rounded-full bg-accent px-1.5 py-0.5 text-xs font-normal text-white" data-testid="unread-comments">
                  {unread[row.id]} new {unread[row.id] === 1 ? "comment" : "comments"}
                </span>
              ) : null}
            </td>
            {showOwner && <td className="border-t border-hairline px-3 py-2">{row.ownerName}</td>}
            <td className="border-t border-hairline px-3 py-2">{row.modelName}</td>
            <td className="border-t border-hairline px-3 py-2">{STATUS_LABEL[row.status]}</td>
            <td className="border-t border-hairline px-3 py-2">{row.worstFlag ? <FlagBadge level={row.worstFlag} /> : "not computed"}</td>
            <td className="figure border-t border-hairline px-3 py-2">{row.updatedAt.toISOString().slice(0, 10)}</td>
            {actionsFor && <td className="border-t border-hairline px-3 py-2">{actionsFor(row)}</td>}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

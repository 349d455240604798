"use client";
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useMemo } from "react";
import { useAppPathname, useAppSearchParams } from "@/components/ui/app-location";
import { FlagBadge } from "@/components/ui/flag-badge";
import { fetchReviewQueue, type QueueRowView } from "@/lib/client/api";
import { FLAG_LEVELS, STATUS_WORDS, type QueueSort, type SetupStatus, type UnitSystem } from "@/lib/domain";
import { formatQuantity } from "@/lib/units";
import { QueueFilters } from "./queue-filters";
import { PAGE_SIZES, readQueueParams, toApiQuery, toSearch, type QueueParams } from "./queue-params";
import { waitingText } from "./waiting-text";

const column = createColumnHelper<QueueRowView>();

interface ReviewQueueProps {
  models: { id: string; name: string }[];
  unitSystem: UnitSystem;
}

/** The review desk's queue: filtered, searched, sorted and paged on the server; its state in the URL. */
export function ReviewQueue({ models, unitSystem }: ReviewQueueProps) {
  const router = useRouter();
  const pathname = useAppPathname();
  const search = useAppSearchParams();
  const params = readQueueParams(new URLSearchParams(search.toString()));
  const go = (next: Partial<QueueParams>) => router.replace(`${pathname}${toSearch({ ...params, page: 1, ...next })}`, { scroll: false });

  const query = useQuery({
    queryKey: ["review-queue", toApiQuery(params)],
    queryFn: () => fetchReviewQueue(toApiQuery(params)),
    placeholderData: keepPreviousData,
  });

  const columns = useMemo(
    () => [
      column.accessor("name", {
        header: "Setup",
        enableSorting: false,
        cell: (info) => (
          <Link href={`/review/${info.row.original.id}`} className="font-medium text-accent underline-offset-2 hover:underline">
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor("ownerName", { header: "Customer", enableSorting: false }),
      column.accessor("modelName", { header: "Envelope", enableSorting: false }),
      column.accessor("payloadMassKg", {
        id: "payloadMassKg",
        header: "Payload",
        cell: (info) => <span className="figure">{formatQuantity("mass", info.getValue(), unitSystem)}</span>,
      }),
      column.accessor("freeLiftRatio", {
        id: "freeLiftRatio",
        header: "Free-lift ratio",
        cell: (info) => <span className="figure">{info.getValue() === null ? "—" : `${((info.getValue() ?? 0) * 100).toFixed(1)} %`}</span>,
      }),
      column.accessor("worstFlag", {
        header: "Worst flag",
        enableSorting: false,
        cell: (info) => (info.getValue() ? <FlagBadge level={info.getValue() as (typeof FLAG_LEVELS)[number]} /> : "—"),
      }),
      column.accessor("status", { header: "Status", enableSorting: false, cell: (info) => STATUS_WORDS[info.getValue() as SetupStatus] }),
      column.accessor("submittedAt", {
        id: "submittedAt",
        header: "Submitted",
        cell: (info) => (
          <span className="figure">
            {info.getValue() ? new Date(info.getValue() as string).toISOString().slice(0, 16).replace("T", " ") : "—"}
          </span>
        ),
      }),
      column.accessor("submittedAt", {
        id: "waiting",
        header: "Waiting",
        cell: (info) => <span className="figure">{info.getValue() ? waitingText(new Date(info.getValue() as string)) : "—"}</span>,
      }),
    ],
    [unitSystem],
  );

  const sorting: SortingState = [{ id: params.sort, desc: params.dir === "desc" }];
  // eslint-disable-next-line react-hooks/incompatible-library -- TanStack Table hands back new functions each render; this component is not memoised.
  const table = useReactTable({
    data: query.data?.rows ?? [],
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    rowCount: query.data?.total ?? 0,
    state: { sorting, pagination: { pageIndex: params.page - 1, pageSize: params.pageSize } },
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      const first = next[0];
      if (first) go({ sort: first.id as QueueSort, dir: first.desc ? "desc" : "asc" });
    },
    enableMultiSort: false,
    sortDescFirst: true,
  });

  const total = query.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / params.pageSize));

  return (
    <div className="space-y-3">
      <QueueFilters params={params} models={models} onChange={go} />
      <div className="overflow-x-auto">
        <table
          className="panel w-full min-w-[48rem] border-separate border-spacing-0 text-sm"
          data-testid="review-queue"
          aria-busy={query.isFetching}
        >
          <caption className="sr-only">
            Setups for review, sorted by {params.sort}, {params.dir === "asc" ? "ascending" : "descending"}
          </caption>
          <thead className="text-left text-muted">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      className="px-3 py-2 font-medium"
                      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                    >
                      {header.column.getCanSort() ? (
                        <button
                          type="button"
                          className="inline-flex items-center gap-1 underline-offset-2 hover:underline"
                          onClick={header.column.getToggleSortingHandler()}
                          data-testid={`sort-${header.column.id}`}
                        >
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden="true">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} data-testid="queue-row" data-setup-id={row.original.id}>
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="border-t border-hairline px-3 py-2">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {query.isPending && (
        <p role="status" className="text-sm text-muted">
          Loading the queue…
        </p>
      )}
      {query.isError && (
        <p role="alert" className="text-sm text-flag-stop">
          The queue could not be loaded: {query.error.message}{" "}
          <button type="button" className="underline" onClick={() => query.refetch()}>
            Try again
          </button>
        </p>
      )}
      {query.isSuccess && total === 0 && (
        <p className="panel p-6 text-center text-sm text-muted" data-testid="queue-empty">
          {params.q || params.worst || params.model ? "No setup matches these filters." : "Nothing is waiting for review."}
        </p>
      )}
      <nav aria-label="Queue pages" className="flex flex-wrap items-center gap-3 text-sm">
        <span className="figure" data-testid="queue-total">
          {total} {total === 1 ? "setup" : "setups"}
        </span>
        <button
          type="button"
          className="rounded border border-hairline bg-white px-2 py-1 disabled:opacity-50"
          disabled={params.page <= 1}
          onClick={() => go({ page: params.page - 1 })}
        >
          Previous
        </button>
        <span>
          Page <span className="figure">{Math.min(params.page, pages)}</span> of <span className="figure">{pages}</span>
        </span>
        <button
          type="button"
          className="rounded border border-hairline bg-white px-2 py-1 disabled:opacity-50"
          disabled={params.page >= pages}
          onClick={() => go({ page: params.page + 1 })}
          data-testid="queue-next"
        >
          Next
        </button>
        <label className="ml-auto flex items-center gap-1 text-muted">
          Rows per page
          <select
            className="rounded border border-hairline bg-white px-1 py-0.5 text-ink"
            value={params.pageSize}
            onChange={(e) => go({ pageSize: Number(e.target.value) })}
          >
            {PAGE_SIZES.map((n) => (
              <option key={n} value={n}>
                {n}
              </option>
            ))}
          </select>
        </label>
      </nav>
    </div>
  );
}

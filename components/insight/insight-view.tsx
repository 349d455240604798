"use client";
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import dynamic from "next/dynamic";
import { useRouter } from "next/navigation";
import { useAppPathname, useAppSearchParams } from "@/components/ui/app-location";
import { fetchInsight } from "@/lib/client/api";
import type { UnitSystem } from "@/lib/domain";
import type { InsightModel } from "./insight-charts";

// Recharts loads after the page's first paint, with the filters already usable.
const InsightCharts = dynamic(() => import("./insight-charts").then((m) => m.InsightCharts), {
  ssr: false,
  loading: () => (
    <p role="status" className="text-sm text-muted">
      Loading the charts…
    </p>
  ),
});

const field = "mt-0.5 block rounded border border-hairline bg-white px-2 py-1 text-ink";
const DAY = /^\d{4}-\d{2}-\d{2}$/;

/** Insight with its filters in the URL: a model, and the days the setups were started in. */
export function InsightView({ models, unitSystem }: { models: InsightModel[]; unitSystem: UnitSystem }) {
  const router = useRouter();
  const pathname = useAppPathname();
  const search = useAppSearchParams();
  const model = models.some((m) => m.id === search.get("model")) ? (search.get("model") as string) : "";
  const from = DAY.test(search.get("from") ?? "") ? (search.get("from") as string) : "";
  const to = DAY.test(search.get("to") ?? "") ? (search.get("to") as string) : "";
  const query = new URLSearchParams(Object.entries({ model, from, to }).filter(([, v]) => v)).toString();
  const set = (key: "model" | "from" | "to", value: string) => {
    const next = new URLSearchParams(query);
    if (value) next.set(key, value);
    else next.delete(key);
    router.replace(`${pathname}${next.size ? `?${next}` : ""}`, { scroll: false });
  };
  const insight = useQuery({ queryKey: ["insight", query], queryFn: () => fetchInsight(query), placeholderData: keepPreviousData });

  return (
    <div className="space-y-4">
      <form className="flex flex-wrap items-end gap-3 text-sm text-muted" aria-label="Insight filters" onSubmit={(e) => e.preventDefault()}>
        <label>
          Envelope model
          <select className={field} value={model} onChange={(e) => set("model", e.target.value)} data-testid="insight-model">
            <option value="">every model</option>
            {models.map((m) => (
              <option key={m.id} value={m.id}>
                {m.name}
              </option>
            ))}
          </select>
        </label>
        <label>
          Started from
          <input
            type="date"
            className={field}
            value={from}
            max={to || undefined}
            onChange={(e) => set("from", e.target.value)}
            data-testid="insight-from"
          />
        </label>
        <label>
          to
          <input
            type="date"
            className={field}
            value={to}
            min={from || undefined}
            onChange={(e) => set("to", e.target.value)}
            data-testid="insight-to"
          />
        </label>
      </form>
      {insight.isError && (
        <p role="alert" className="text-sm text-flag-stop">
          Insight could not be loaded: {insight.error.message}
        </p>
      )}
      {insight.isPending && (
        <p role="status" className="text-sm text-muted">
          Counting the setups…
        </p>
      )}
      {insight.data && <InsightCharts data={insight.data} models={models} unitSystem={unitSystem} />}
    </div>
  );
}

"use client";
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { InsightData } from "@/lib/client/api";
import { FLAG_LEVELS, PAYLOAD_CATEGORIES, SETUP_STATUSES, STATUS_WORDS, type UnitSystem } from "@/lib/domain";
import { formatQuantity } from "@/lib/units";
import { InsightSection } from "./insight-section";

// Our own series colours: the accent, ink and four earth tones, each ≥ 3:1 against white.
const SERIES = ["#1d7f7a", "#14202e", "#8f5b0a", "#6b4f9e", "#b83232", "#3f6f2a"];
const LEVEL_COLOUR = { ok: "#2e7d4f", caution: "#8f5b0a", stop: "#b83232" } as const;

/** Rows keyed by `x`, one numeric field per series, for stacked bars. */
function pivot<T>(
  items: T[],
  x: (item: T) => string,
  series: (item: T) => string,
  value: (item: T) => number,
): Record<string, string | number>[] {
  const byX = new Map<string, Record<string, string | number>>();
  for (const item of items) {
    const key = x(item);
    const row = byX.get(key) ?? { x: key };
    row[series(item)] = ((row[series(item)] as number | undefined) ?? 0) + value(item);
    byX.set(key, row);
  }
  return [...byX.values()];
}

function Bars({
  data,
  series,
  layout = "horizontal",
}: {
  data: Record<string, string | number>[];
  series: { key: string; label: string; colour: string }[];
  layout?: "horizontal" | "vertical";
}) {
  return (
    <ResponsiveContainer width="100%" height="100%">
      <BarChart data={data} layout={layout} margin={{ top: 8, right: 16, bottom: 8, left: layout === "vertical" ? 120 : 0 }}>
        <CartesianGrid strokeDasharray="3 3" stroke="#d9d5cc" />
        {layout === "vertical" ? (
          <YAxis type="category" dataKey="x" width={120} tick={{ fontSize: 11 }} />
        ) : (
          <XAxis dataKey="x" tick={{ fontSize: 11 }} />
        )}
        {layout === "vertical" ? (
          <XAxis type="number" allowDecimals={false} tick={{ fontSize: 11 }} />
        ) : (
          <YAxis allowDecimals={false} tick={{ fontSize: 11 }} />
        )}
        <Tooltip />
        {series.length > 1 && <Legend wrapperStyle={{ fontSize: 12 }} />}
        {series.map((s) => (
          <Bar key={s.key} dataKey={s.key} name={s.label} stackId="all" fill={s.colour} isAnimationActive={false} />
        ))}
      </BarChart>
    </ResponsiveContainer>
  );
}

export interface InsightModel {
  id: string;
  name: string;
  railStartXM: number;
  railEndXM: number;
}

export function InsightCharts({ data, models, unitSystem }: { data: InsightData; models: InsightModel[]; unitSystem: UnitSystem }) {
  const mass = (kg: number) => formatQuantity("mass", kg, unitSystem);
  const range = (a: number, b: number) => `${mass(a)}–${mass(b)}`;
  const pct = (f: number) => `${Math.round(f * 100)} %`;
  const modelName = (id: string) => models.find((m) => m.id === id)?.name ?? id;
  /** 1 for the forward tenth of the model's rail … 10 for the aft one. */
  const railTenth = (r: InsightData["railPosition"][number]) => {
    const model = models.find((m) => m.id === r.modelId);
    return model ? Math.round((r.binStartM - model.railStartXM) / ((model.railEndXM - model.railStartXM) / 10)) + 1 : 0;
  };
  const categories = PAYLOAD_CATEGORIES.map((c, i) => ({ key: c, label: c, colour: SERIES[i % SERIES.length] }));

  return (
    <div className="grid gap-4 xl:grid-cols-2">
      <InsightSection
        title="Payload masses"
        description="Every payload item on every setup, in 50 g bins, by kind."
        rows={data.payloadMassHistogram}
        columns={[
          { key: "binStartKg", label: "From", format: (r) => mass(r.binStartKg) },
          { key: "binEndKg", label: "To", format: (r) => mass(r.binEndKg) },
          { key: "category", label: "Kind" },
          { key: "count", label: "Payloads" },
        ]}
        csvName="payload-masses.csv"
        testId="insight-payload-mass"
      >
        <Bars
          data={pivot(
            data.payloadMassHistogram,
            (r) => range(r.binStartKg, r.binEndKg),
            (r) => r.category,
            (r) => r.count,
          )}
          series={categories}
        />
      </InsightSection>

      <InsightSection
        title="Payload per setup"
        description="The total payload mass of each setup, in 100 g bins: what the next envelope must carry."
        rows={data.setupPayloadMassHistogram}
        columns={[
          { key: "binStartKg", label: "From", format: (r) => mass(r.binStartKg) },
          { key: "binEndKg", label: "To", format: (r) => mass(r.binEndKg) },
          { key: "count", label: "Setups" },
        ]}
        csvName="payload-per-setup.csv"
        testId="insight-setup-mass"
      >
        <Bars
          data={data.setupPayloadMassHistogram.map((r) => ({ x: range(r.binStartKg, r.binEndKg), count: r.count }))}
          series={[{ key: "count", label: "setups", colour: SERIES[0] }]}
        />
      </InsightSection>

      <InsightSection
        title="Payload templates in use"
        description="How many payload items on setups came from each template."
        rows={data.templateUsage}
        columns={[
          { key: "name", label: "Template" },
          { key: "templateId", label: "Id" },
          { key: "count", label: "Uses" },
        ]}
        csvName="template-usage.csv"
        testId="insight-templates"
      >
        <Bars
          layout="vertical"
          data={data.templateUsage.map((t) => ({ x: t.name, count: t.count }))}
          series={[{ key: "count", label: "uses", colour: SERIES[0] }]}
        />
      </InsightSection>

      <InsightSection
        title="Mount positions on the rail"
        description="Where customers put the mount, in tenths of each model's rail from its forward end."
        rows={data.railPosition}
        columns={[
          { key: "modelId", label: "Model", format: (r) => modelName(r.modelId) },
          { key: "binStartM", label: "From", format: (r) => formatQuantity("length", r.binStartM, unitSystem, 3) },
          { key: "binEndM", label: "To", format: (r) => formatQuantity("length", r.binEndM, unitSystem, 3) },
          { key: "count", label: "Setups" },
        ]}
        csvName="rail-positions.csv"
        testId="insight-rail"
      >
        <Bars
          data={pivot(
            data.railPosition,
            (r) => `${railTenth(r)}/10`,
            (r) => modelName(r.modelId),
            (r) => r.count,
          ).sort((a, b) => parseInt(String(a.x)) - parseInt(String(b.x)))}
          series={[...new Set(data.railPosition.map((r) => r.modelId))].map((id, i) => ({
            key: modelName(id),
            label: modelName(id),
            colour: SERIES[i % SERIES.length],
          }))}
        />
      </InsightSection>

      <InsightSection
        title="Free-lift ratio"
        description="Free lift as a share of gross lift, in 5 % bins; below 15 % is a caution."
        rows={data.freeLiftRatio}
        columns={[
          { key: "binStart", label: "From", format: (r) => pct(r.binStart) },
          { key: "binEnd", label: "To", format: (r) => pct(r.binEnd) },
          { key: "count", label: "Setups" },
        ]}
        csvName="free-lift-ratio.csv"
        testId="insight-free-lift"
      >
        <Bars
          data={data.freeLiftRatio.map((r) => ({ x: `${pct(r.binStart)}–${pct(r.binEnd)}`, count: r.count }))}
          series={[{ key: "count", label: "setups", colour: SERIES[0] }]}
        />
      </InsightSection>

      <InsightSection
        title="What the balance flags"
        description="How many setups raise each flag, at caution and at stop."
        rows={data.flagCounts}
        columns={[
          { key: "code", label: "Flag" },
          { key: "level", label: "Level" },
          { key: "count", label: "Setups" },
        ]}
        csvName="flags.csv"
        testId="insight-flags"
      >
        <Bars
          layout="vertical"
          data={pivot(
            data.flagCounts,
            (r) => r.code,
            (r) => r.level,
            (r) => r.count,
          )}
          series={FLAG_LEVELS.filter((l) => l !== "ok").map((l) => ({ key: l, label: l, colour: LEVEL_COLOUR[l] }))}
        />
      </InsightSection>

      <InsightSection
        title="Setups per month"
        description="New setups by the month they were started, by where they stand now."
        rows={data.setupsPerMonth}
        columns={[
          { key: "month", label: "Month" },
          { key: "status", label: "Status", format: (r) => STATUS_WORDS[r.status] },
          { key: "count", label: "Setups" },
        ]}
        csvName="setups-per-month.csv"
        testId="insight-months"
      >
        <Bars
          data={pivot(
            data.setupsPerMonth,
            (r) => r.month,
            (r) => r.status,
            (r) => r.count,
          )}
          series={SETUP_STATUSES.map((s, i) => ({ key: s, label: STATUS_WORDS[s], colour: SERIES[i % SERIES.length] }))}
        />
      </InsightSection>

      <InsightSection
        title="Why setups were sent back"
        description="The reasons reviewers gave when they asked for changes."
        rows={data.sendBackReasons}
        columns={[
          { key: "code", label: "Reason" },
          { key: "count", label: "Times" },
        ]}
        csvName="send-back-reasons.csv"
        testId="insight-reasons"
      >
        <Bars
          layout="vertical"
          data={data.sendBackReasons.map((r) => ({ x: r.code, count: r.count }))}
          series={[{ key: "count", label: "times", colour: SERIES[2] }]}
        />
      </InsightSection>
    </div>
  );
}

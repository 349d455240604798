import type { BalanceResult, Flag } from "@/lib/balance";
import { cautionsFor } from "@/lib/cautions";
import { FLAG_LEVEL_RANK, STATUS_WORDS, type DecisionOutcome, type FlagLevel, type SetupStatus, type UnitSystem } from "@/lib/domain";
import { flagMessage } from "@/lib/flag-messages";
import type { SetupDraft } from "@/lib/setups/setup-draft";
import { formatFixed, formatQuantity } from "@/lib/units";

// The field report as data: every line the printed page and the PDF show, already in the reader's
// units. Pure, so both renderers print the same words and a test can read them without a browser.

export interface ReportRow {
  label: string;
  value: string;
}

export interface ReportTable {
  header: string[];
  rows: string[][];
}

export interface ReportReview {
  /** "approved" only when the approval is of the version printed. */
  state: "approved" | "changes_requested" | "not_reviewed";
  headline: string;
  detail: string | null;
}

export interface FieldReport {
  title: string;
  subtitle: string;
  review: ReportReview;
  sections: { title: string; rows: ReportRow[] }[];
  payloads: ReportTable;
  flags: { level: FlagLevel; text: string }[];
  cautions: string[];
  /** The operating envelope, when the engine provides one for this setup. */
  envelope: ReportTable | null;
}

export interface FieldReportFacts {
  setupId: string;
  version: number;
  status: SetupStatus;
  updatedAt: Date;
  ownerName: string;
  draft: SetupDraft;
  result: BalanceResult;
  modelName: string;
  unitText: string | null;
  mount: { name: string; thread: string; ratedLoadKg: number };
  rail: { startXM: number; endXM: number };
  adapterNames: Record<string, string>;
  latestDecision: { outcome: DecisionOutcome; reviewerName: string; at: Date; setupVersion: number; note: string } | null;
  envelope?: ReportTable | null;
  generatedAt: Date;
  unitSystem: UnitSystem;
}

const DAY = new Intl.DateTimeFormat("en-GB", { dateStyle: "long", timeZone: "UTC" });
const deg = (value: number | null | undefined): string => (value === null || value === undefined ? "none" : `${formatFixed(value, 1)}°`);

function reviewOf(f: FieldReportFacts): ReportReview {
  const d = f.latestDecision;
  if (!d)
    return {
      state: "not_reviewed",
      headline: "NOT REVIEWED",
      detail: "Support has not reviewed this setup. Submit it for review before its first flight.",
    };
  const when = `${d.reviewerName}, ${DAY.format(d.at)}, on version ${d.setupVersion}`;
  if (d.outcome === "approved" && f.status === "approved" && d.setupVersion === f.version) {
    return { state: "approved", headline: "APPROVED FOR FIRST FLIGHT", detail: `${when}.${d.note ? ` “${d.note}”` : ""}` };
  }
  if (d.outcome === "changes_requested" && f.status === "changes_requested") {
    return { state: "changes_requested", headline: "CHANGES REQUESTED — NOT APPROVED", detail: `${when}: “${d.note}”` };
  }
  return {
    state: "not_reviewed",
    headline: "NOT REVIEWED",
    detail: `This version has not been reviewed; the last decision (${d.outcome === "approved" ? "approved" : "changes requested"}) was by ${when}.`,
  };
}

export function buildFieldReport(f: FieldReportFacts): FieldReport {
  const u = f.unitSystem;
  const q = (quantity: Parameters<typeof formatQuantity>[0], si: number, decimals?: number) => formatQuantity(quantity, si, u, decimals);
  const { draft, result } = f;
  const railFraction = (draft.mountPositionXM - f.rail.startXM) / Math.max(1e-9, f.rail.endXM - f.rail.startXM);
  const flags = [...result.flags].sort((a: Flag, b: Flag) => FLAG_LEVEL_RANK[b.level] - FLAG_LEVEL_RANK[a.level]);

  return {
    title: `Field report: ${draft.name}`,
    subtitle: `${f.ownerName} · version ${f.version} (${STATUS_WORDS[f.status]}) · saved ${DAY.format(f.updatedAt)} · printed ${DAY.format(f.generatedAt)}`,
    review: reviewOf(f),
    sections: [
      {
        title: "Lifter",
        rows: [
          { label: "Envelope model", value: f.modelName },
          { label: "Serial unit", value: f.unitText ?? "none: the model's nominal figures" },
          { label: "Mount", value: `${f.mount.name} (${f.mount.thread}, rated ${q("mass", f.mount.ratedLoadKg)})` },
          {
            label: "Mount position",
            value: `${q("length", draft.mountPositionXM, 3)} from the nose (${formatFixed(railFraction * 100, 0)} % along the rail)`,
          },
        ],
      },
      {
        title: "Site",
        rows: [
          { label: "Site", value: draft.site.siteName || "not named" },
          { label: "Altitude", value: q("length", draft.site.altitudeM, 0) },
          {
            label: "Air temperature",
            value:
              draft.site.temperatureC === null
                ? `standard (${q("temperature", result.airTemperatureK - 273.15)})`
                : q("temperature", draft.site.temperatureC),
          },
          { label: "Wind", value: q("speed", draft.site.windMS) },
          { label: "Gusts", value: draft.site.gustMS === null ? "none given" : q("speed", draft.site.gustMS) },
        ],
      },
      {
        title: "Gas and helium",
        rows: [
          { label: "Helium purity", value: q("ratio", draft.gas.purity) },
          { label: "Fill", value: q("ratio", draft.gas.fillFraction) },
          { label: "Superheat", value: q("temperatureDifference", draft.gas.superheatK) },
          { label: "Helium to fill", value: q("volume", result.helium.fillVolumeM3) },
          { label: "Cylinders", value: `${result.helium.cylindersNeeded} × ${q("volume", result.helium.cylinderContentM3, 2)}` },
          {
            label: "Days to a top-up",
            value: result.helium.daysToTopUp === null ? "none predicted" : `${formatFixed(result.helium.daysToTopUp, 1)} days`,
          },
        ],
      },
      {
        title: "Tether",
        rows: draft.tether
          ? [
              { label: "Line mass", value: q("massPerLength", draft.tether.massPerMetreKg) },
              { label: "Line out", value: q("distance", draft.tether.lengthOutM) },
              { label: "Breaking load", value: q("force", draft.tether.breakingLoadN) },
              { label: "Most line it lifts in calm", value: result.maxTetherOutM === null ? "none" : q("distance", result.maxTetherOutM) },
            ]
          : [{ label: "Tether", value: "not included in the check" }],
      },
      {
        title: "Balance",
        rows: [
          { label: "Gross lift", value: q("mass", result.grossLiftKg) },
          { label: "Total mass", value: q("mass", result.totalMassKg) },
          { label: "Free lift", value: q("mass", result.freeLiftKg) },
          { label: "Free-lift ratio", value: q("ratio", result.freeLiftRatio) },
          { label: "Calm trim (nose up +)", value: deg(result.calmTrimDeg) },
          {
            label: `Wind ${q("speed", result.wind?.speedMS ?? draft.site.windMS)}`,
            value: result.wind
              ? `trim ${deg(result.wind.trimDeg)}, tether ${deg(result.wind.tetherAngleDeg)} from vertical, tension ${q("force", result.wind.tensionN)}`
              : "none",
          },
          {
            label: `Gusts ${q("speed", result.gust?.speedMS ?? draft.site.gustMS ?? 0)}`,
            value: result.gust
              ? `trim ${deg(result.gust.trimDeg)}, tether ${deg(result.gust.tetherAngleDeg)} from vertical, tension ${q("force", result.gust.tensionN)}`
              : "none",
          },
        ],
      },
    ],
    payloads: {
      header: ["Payload", "Kind", "Mass", "Attachment", "Size (L × W × H)"],
      rows: draft.payloads.map((p) => [
        p.name,
        p.category,
        q("mass", p.massKg),
        p.adapterId ? `${p.attachment} via ${f.adapterNames[p.adapterId] ?? "adapter"}` : p.attachment,
        [p.lengthM, p.widthM, p.heightM].map((m) => q("smallLength", m)).join(" × "),
      ]),
    },
    flags: flags.map((flag) => ({ level: flag.level, text: flagMessage(flag, u) })),
    cautions: cautionsFor({ hasAntenna: draft.payloads.some((p) => p.category === "antenna"), freeLiftKg: result.freeLiftKg }),
    envelope: f.envelope ?? null,
  };
}

/** The operating envelope as printed: a row per line out, a column per wind, each cell's height, blowdown and worst flag in words. */
export function envelopeReportTable(
  table: {
    windsMS: readonly number[];
    rows: readonly {
      lineOutM: number;
      cells: readonly { heightAboveGroundM: number | null; blowdownM: number | null; worstLevel: FlagLevel }[];
    }[];
  },
  unitSystem: UnitSystem,
): ReportTable | null {
  if (table.windsMS.length === 0 || table.rows.length === 0) return null;
  const distance = (m: number) => formatQuantity("distance", m, unitSystem);
  return {
    header: ["Line out", ...table.windsMS.map((w) => `Wind ${formatQuantity("speed", w, unitSystem)}`)],
    rows: table.rows.map((row) => [
      distance(row.lineOutM),
      ...row.cells.map((c) =>
        c.heightAboveGroundM === null
          ? `does not fly · ${c.worstLevel}`
          : `${distance(c.heightAboveGroundM)} up, ${distance(c.blowdownM ?? 0)} out · ${c.worstLevel}`,
      ),
    ]),
  };
}

import { INSIGHT_MEASURES } from "./schema";

// The SQL that keeps insight_rollups in step with the setups, built from one definition per measure,
// so the triggers and the backfill cannot count differently.
//
// Why triggers rather than writes in the query functions: a trigger runs inside whatever statement
// changes a counted row (the app's saves, status changes and deletes, the seeds, foreign-key cascades
// and SET NULLs, a catalogue edit), so no path can forget it, and it runs in the writer's transaction.

export const PAYLOAD_BIN_KG = 0.05;
export const SETUP_PAYLOAD_BIN_KG = 0.1;
export const FREE_LIFT_BIN = 0.05;
export const RAIL_BINS = 10;
export const DAY_MS = 86_400_000;

type Measure = (typeof INSIGHT_MEASURES)[number];
type Source = "setups" | "setup_payloads" | "setup_flags" | "decisions";

/** `r` is the counted row, `s` its setup (the same row for a setup's own measures). */
interface MeasureSql {
  measure: Measure;
  source: Source;
  bin?: (r: string, s: string) => string;
  label?: (r: string, s: string) => string;
  level?: (r: string, s: string) => string;
  /** More FROM items, e.g. a join to the model, and the condition that goes with them. */
  from?: (r: string, s: string) => string;
  where?: (r: string, s: string) => string;
}

const binOf = (value: string, width: number) => `cast(floor(${value} / ${width}) as integer)`;

const MEASURES: readonly MeasureSql[] = [
  { measure: "setups", source: "setups" },
  { measure: "setup_payload_mass", source: "setups", bin: (_r, s) => binOf(`${s}.payload_mass_kg`, SETUP_PAYLOAD_BIN_KG) },
  {
    measure: "free_lift_ratio",
    source: "setups",
    bin: (_r, s) => binOf(`${s}.free_lift_ratio`, FREE_LIFT_BIN),
    where: (_r, s) => `${s}.free_lift_ratio is not null`,
  },
  {
    // A tenth of the model's rail; a mount off the rail counts at its end (a rail of no length: the first bin).
    measure: "rail_position",
    source: "setups",
    from: () => "envelope_models m",
    where: (_r, s) => `m.id = ${s}.model_id`,
    bin: (_r, s) =>
      `coalesce(max(0, min(${RAIL_BINS - 1}, cast(floor((${s}.mount_position_x_m - m.rail_start_x_m) / (m.rail_end_x_m - m.rail_start_x_m) * ${RAIL_BINS}) as integer))), 0)`,
  },
  { measure: "payload_mass", source: "setup_payloads", bin: (r) => binOf(`${r}.mass_kg`, PAYLOAD_BIN_KG), label: (r) => `${r}.category` },
  { measure: "template_usage", source: "setup_payloads", label: (r) => `${r}.template_id`, where: (r) => `${r}.template_id is not null` },
  { measure: "flags", source: "setup_flags", label: (r) => `${r}.code`, level: (r) => `${r}.level` },
  {
    // Each reason code of each decision that sent the setup back.
    measure: "send_back_reasons",
    source: "decisions",
    from: (r) => `json_each(${r}.reasons_json) j`,
    where: (r) => `${r}.outcome = 'changes_requested' and j.value is not null`,
    label: () => "cast(j.value as text)",
  },
];

const dayOf = (s: string) => `(${s}.created_at / ${DAY_MS})`;
const startOf = (unit: "month" | "year", s: string) => `(unixepoch(${s}.created_at / 1000, 'unixepoch', 'start of ${unit}') / 86400)`;

/** Where the counted rows come from: FROM items and a condition, with the names `r` and `s` stand for. */
interface Rows {
  r: string;
  s: string;
  from: string[];
  where: string[];
}

function contributions(m: MeasureSql, rows: Rows): string {
  const { r, s } = rows;
  const from = [...rows.from, ...(m.from ? [m.from(r, s)] : [])];
  const where = [...rows.where, ...(m.where ? [m.where(r, s)] : [])];
  return [
    `select '${m.measure}' as measure, ${dayOf(s)} as day, ${startOf("month", s)} as month, ${startOf("year", s)} as year, ${s}.model_id as model_id, ${s}.status as status,`,
    `  ${m.bin ? m.bin(r, s) : "0"} as bin, ${m.label ? m.label(r, s) : "''"} as label, ${m.level ? m.level(r, s) : "''"} as level`,
    from.length ? `from ${from.join(", ")}` : "",
    `where ${where.length ? where.join(" and ") : "true"}`,
  ]
    .filter(Boolean)
    .join("\n");
}

/**
 * Adds (sign 1) or takes away (sign -1) the given rows' counts, in the day, the month and the year.
 * A trigger's few rows go one by one (rows with the same key meet in the conflict clause); the
 * backfill groups its many rows first.
 */
function upsert(sign: 1 | -1, parts: string[], { grouped = false } = {}): string {
  return `insert into insight_rollups (measure, span, first_day, model_id, status, bin, label, level, count)
select c.measure, g.span, case g.span when 'day' then c.day when 'month' then c.month else c.year end, c.model_id, c.status, c.bin, c.label, c.level, ${grouped ? `${sign} * count(*)` : sign}
from (${parts.join("\nunion all\n")}) as c, (select 'day' as span union all select 'month' union all select 'year') as g
where true
${grouped ? "group by 1, 2, 3, 4, 5, 6, 7, 8\n" : ""}on conflict (measure, span, first_day, model_id, status, bin, label, level) do update set count = insight_rollups.count + excluded.count;`;
}

const removeEmpty = `delete from insight_rollups where measure in (${INSIGHT_MEASURES.map((m) => `'${m}'`).join(", ")}) and count = 0;`;

const of = (source: Source) => MEASURES.filter((m) => m.source === source);
const CHILDREN = ["setup_payloads", "setup_flags", "decisions"] as const;

/** A setup's own measures, from the pseudo-row `new` or `old`. */
const ownRows = (ref: string): Rows => ({ r: ref, s: ref, from: [], where: [] });
/** A setup's child rows, with the setup's key from `ref`. */
const childRowsOf = (table: Source, ref: string): Rows => ({ r: "r", s: ref, from: [`${table} r`], where: [`r.setup_id = ${ref}.id`] });
/** One child row (`new` or `old`) with its setup read from the table (none while a cascade deletes it). */
const oneChild = (ref: string): Rows => ({ r: ref, s: "s", from: ["setups s"], where: [`s.id = ${ref}.setup_id`] });

const ownParts = (ref: string) => of("setups").map((m) => contributions(m, ownRows(ref)));
const childParts = (ref: string) => CHILDREN.flatMap((table) => of(table).map((m) => contributions(m, childRowsOf(table, ref))));
const changed = (columns: string[]) => columns.map((c) => `old.${c} is not new.${c}`).join(" or ");

const SETUP_KEY = ["created_at", "model_id", "status"];
const SETUP_MEASURED = [...SETUP_KEY, "payload_mass_kg", "free_lift_ratio", "mount_position_x_m"];
const CHILD_COLUMNS: Record<Exclude<Source, "setups">, string[]> = {
  setup_payloads: ["setup_id", "mass_kg", "category", "template_id"],
  setup_flags: ["setup_id", "code", "level"],
  decisions: ["setup_id", "outcome", "reasons_json"],
};

const trigger = (name: string, when: string, body: string[]) =>
  `create trigger derived_insight_${name} ${when}\nbegin\n${body.join("\n")}\nend;`;

/** Every trigger that keeps insight_rollups in step (names start `derived_`, so a new definition replaces them). */
export function insightRollupTriggers(): string[] {
  const triggers = [
    trigger("setup_insert", "after insert on setups", [upsert(1, ownParts("new"))]),
    // Before: the child rows that a cascade is about to delete are still there to be taken away.
    trigger("setup_delete", "before delete on setups", [upsert(-1, [...ownParts("old"), ...childParts("old")]), removeEmpty]),
    trigger("setup_update", `after update of ${SETUP_MEASURED.join(", ")} on setups when ${changed(SETUP_MEASURED)}`, [
      upsert(-1, ownParts("old")),
      upsert(1, ownParts("new")),
      removeEmpty,
    ]),
    // A new day, model or status moves the setup's payloads, flags and decisions with it.
    trigger("setup_rekey", `after update of ${SETUP_KEY.join(", ")} on setups when ${changed(SETUP_KEY)}`, [
      upsert(-1, childParts("old")),
      upsert(1, childParts("new")),
      removeEmpty,
    ]),
    // The model's rail decides each setup's rail bin: a moved rail counts its setups again.
    trigger(
      "model_rail",
      "after update of rail_start_x_m, rail_end_x_m on envelope_models when old.rail_start_x_m is not new.rail_start_x_m or old.rail_end_x_m is not new.rail_end_x_m",
      [
        "delete from insight_rollups where measure = 'rail_position' and model_id = new.id;",
        upsert(
          1,
          of("setups")
            .filter((m) => m.measure === "rail_position")
            .map((m) => contributions(m, { r: "s", s: "s", from: ["setups s"], where: ["s.model_id = new.id"] })),
        ),
      ],
    ),
  ];
  for (const table of CHILDREN) {
    const parts = (ref: string) => of(table).map((m) => contributions(m, oneChild(ref)));
    triggers.push(
      trigger(`${table}_insert`, `after insert on ${table}`, [upsert(1, parts("new"))]),
      trigger(`${table}_delete`, `after delete on ${table}`, [upsert(-1, parts("old")), removeEmpty]),
      trigger(`${table}_update`, `after update of ${CHILD_COLUMNS[table].join(", ")} on ${table} when ${changed(CHILD_COLUMNS[table])}`, [
        upsert(-1, parts("old")),
        upsert(1, parts("new")),
        removeEmpty,
      ]),
    );
  }
  return triggers;
}

/** Counts every stored row afresh: the backfill of a database that had no roll-ups, or an older definition of them. */
export function insightRollupBackfill(): string[] {
  const parts = MEASURES.map((m) =>
    contributions(
      m,
      m.source === "setups"
        ? { r: "s", s: "s", from: ["setups s"], where: [] }
        : { r: "r", s: "s", from: [`${m.source} r`, "setups s"], where: ["s.id = r.setup_id"] },
    ),
  );
  return ["delete from insight_rollups;", upsert(1, parts, { grouped: true })];
}

import { sql } from "drizzle-orm";
import { check, index, integer, primaryKey, real, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";

// One file for the whole product so later work extends these tables instead of rewriting them.
// TS names are camelCase, SQL names snake_case; every enum column carries a CHECK constraint.

import {
  ATTACHMENTS,
  DECISION_OUTCOMES,
  FLAG_CODES,
  FLAG_LEVELS,
  LIFT_CHECK_LOADS,
  LIFT_CHECK_UNKNOWNS,
  PAYLOAD_CATEGORIES,
  PAYLOAD_SHAPES,
  ROLES,
  SETUP_STATUSES,
  THREADS,
  UNIT_SYSTEMS,
} from "../lib/domain";
import type { BalanceInput, BalanceResult, HullParams, LimitsInput } from "../lib/balance";

type AeroInput = NonNullable<BalanceInput["envelope"]["aero"]>;

const inList = (column: string, values: readonly string[]) =>
  sql.raw(`${column} in (${values.map((v) => `'${v.replace(/'/g, "''")}'`).join(", ")})`);

const createdAt = () =>
  integer("created_at", { mode: "timestamp_ms" })
    .notNull()
    .default(sql`(cast(unixepoch('subsec') * 1000 as integer))`);
const updatedAt = () =>
  integer("updated_at", { mode: "timestamp_ms" })
    .notNull()
    .default(sql`(cast(unixepoch('subsec') * 1000 as integer))`);

// ---------------------------------------------------------------- better-auth (core tables + our role and units)

export const user = sqliteTable(
  "user",
  {
    id: text("id").primaryKey(),
    name: text("name").notNull(),
    email: text("email").notNull().unique(),
    emailVerified: integer("email_verified", { mode: "boolean" }).notNull().default(false),
    image: text("image"),
    role: text("role", { enum: ROLES }).notNull().default("customer"),
    unitSystem: text("unit_system", { enum: UNIT_SYSTEMS }).notNull().default("metric"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    // The Workshop's people list, by role then name, a page at a time.
    index("user_role_name_idx").on(t.role, t.name, t.id),
    check("user_role_check", inList("role", ROLES)),
    check("user_unit_system_check", inList("unit_system", UNIT_SYSTEMS)),
  ],
);

export const session = sqliteTable(
  "session",
  {
    id: text("id").primaryKey(),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    token: text("token").notNull().unique(),
    ipAddress: text("ip_address"),
    userAgent: text("user_agent"),
    userId: text("user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("session_user_id_idx").on(t.userId)],
);

export const account = sqliteTable(
  "account",
  {
    id: text("id").primaryKey(),
    accountId: text("account_id").notNull(),
    providerId: text("provider_id").notNull(),
    userId: text("user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    accessToken: text("access_token"),
    refreshToken: text("refresh_token"),
    idToken: text("id_token"),
    accessTokenExpiresAt: integer("access_token_expires_at", { mode: "timestamp_ms" }),
    refreshTokenExpiresAt: integer("refresh_token_expires_at", { mode: "timestamp_ms" }),
    scope: text("scope"),
    password: text("password"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("account_user_id_idx").on(t.userId)],
);

export const verification = sqliteTable(
  "verification",
  {
    id: text("id").primaryKey(),
    identifier: text("identifier").notNull(),
    value: text("value").notNull(),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("verification_identifier_idx").on(t.identifier)],
);

// better-auth's rate limiter keeps its counters here so limits survive a restart.
export const rateLimit = sqliteTable("rate_limit", {
  id: text("id").primaryKey(),
  key: text("key").notNull().unique(),
  count: integer("count").notNull(),
  lastRequest: integer("last_request").notNull(),
});

// ---------------------------------------------------------------- sign-in limit (lib/auth/sign-in-limit.ts)

// Failed sign-ins per client address and per account, each in a fixed window from its first
// failure. `key` is "address:<ip>" or "account:<sha-256 of the e-mail>"; an attempt in flight is
// counted until its outcome is known, so parallel guesses cannot slip past the check together.
// Rows whose window has ended are deleted, which keeps the table as small as the current window.
export const signInAttempts = sqliteTable(
  "sign_in_attempts",
  {
    key: text("key").primaryKey(),
    failures: integer("failures").notNull(),
    windowEndsAt: integer("window_ends_at", { mode: "timestamp_ms" }).notNull(),
  },
  (t) => [index("sign_in_attempts_window_ends_at_idx").on(t.windowEndsAt)],
);

// ---------------------------------------------------------------- catalogue (the maker's Workshop)

export const envelopeModels = sqliteTable(
  "envelope_models",
  {
    id: text("id").primaryKey(),
    slug: text("slug").notNull().unique(),
    name: text("name").notNull(),
    description: text("description").notNull().default(""),
    // Parametric hull (lib/balance geometry's HullParams), kept as JSON so the GLB can be rebuilt.
    hullJson: text("hull_json", { mode: "json" }).$type<HullParams>().notNull(),
    gasVolumeM3: real("gas_volume_m3").notNull(),
    nominalMassKg: real("nominal_mass_kg").notNull(),
    buoyancyCentreXM: real("buoyancy_centre_x_m").notNull(),
    buoyancyCentreZM: real("buoyancy_centre_z_m").notNull(),
    massCentreXM: real("mass_centre_x_m").notNull(),
    massCentreZM: real("mass_centre_z_m").notNull(),
    tetherPointXM: real("tether_point_x_m").notNull(),
    tetherPointZM: real("tether_point_z_m").notNull(),
    railStartXM: real("rail_start_x_m").notNull(),
    railEndXM: real("rail_end_x_m").notNull(),
    railZM: real("rail_z_m").notNull(),
    railTabCount: integer("rail_tab_count").notNull(),
    // { sailAreaM2, liftSlopePerRad, zeroLiftTrimDeg, dragCoefficient, pressureCentre: { x, z } }
    aeroJson: text("aero_json", { mode: "json" }).$type<AeroInput>(),
    // Flag limits for this model; missing keys fall back to the engine's defaults.
    limitsJson: text("limits_json", { mode: "json" })
      .$type<LimitsInput>()
      .notNull()
      .default(sql`'{}'`),
    glbPath: text("glb_path").notNull(),
    active: integer("active", { mode: "boolean" }).notNull().default(true),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("envelope_models_name_idx").on(t.name, t.id)],
);

export const envelopeUnits = sqliteTable(
  "envelope_units",
  {
    id: text("id").primaryKey(),
    modelId: text("model_id")
      .notNull()
      .references(() => envelopeModels.id),
    serial: text("serial").notNull().unique(),
    ownerId: text("owner_id").references(() => user.id, { onDelete: "set null" }),
    measuredMassKg: real("measured_mass_kg").notNull(),
    // The unit's first weighing, from before lift tests had their own table (unit_lift_tests). The
    // migration copied it there as the first test; the calibration reads only unit_lift_tests.
    measuredGrossLiftKg: real("measured_gross_lift_kg").notNull(),
    measuredAtTemperatureC: real("measured_at_temperature_c").notNull(),
    measuredAtAltitudeM: real("measured_at_altitude_m").notNull(),
    measuredOn: text("measured_on").notNull(), // ISO date, yyyy-mm-dd
    notes: text("notes").notNull().default(""),
    // Retired units stay for the setups that name them but are not offered to new ones.
    active: integer("active", { mode: "boolean" }).notNull().default(true),
    createdAt: createdAt(),
  },
  (t) => [index("envelope_units_owner_idx").on(t.ownerId), index("envelope_units_model_idx").on(t.modelId, t.serial)],
);

/**
 * A serial unit's lift tests, one row per weighing: the gross lift measured at full fill, and the
 * air and gas it was measured in. The latest test gives the unit's calibration factor.
 */
export const unitLiftTests = sqliteTable(
  "unit_lift_tests",
  {
    id: text("id").primaryKey(),
    unitId: text("unit_id")
      .notNull()
      .references(() => envelopeUnits.id, { onDelete: "cascade" }),
    measuredGrossLiftKg: real("measured_gross_lift_kg").notNull(),
    temperatureC: real("temperature_c").notNull(),
    // Station pressure at the test; null: ISA at the altitude.
    pressurePa: real("pressure_pa"),
    altitudeM: real("altitude_m").notNull().default(0),
    purity: real("purity").notNull().default(1),
    testedOn: text("tested_on").notNull(), // ISO date, yyyy-mm-dd
    notes: text("notes").notNull().default(""),
    createdAt: createdAt(),
  },
  (t) => [index("unit_lift_tests_unit_idx").on(t.unitId, t.testedOn, t.createdAt)],
);

export const mounts = sqliteTable(
  "mounts",
  {
    id: text("id").primaryKey(),
    name: text("name").notNull().unique(),
    thread: text("thread", { enum: THREADS }).notNull(),
    massKg: real("mass_kg").notNull(),
    ratedLoadKg: real("rated_load_kg").notNull(),
    // Breaking load of the safety line that ties the payloads to the mount.
    safetyLineBreakingLoadN: real("safety_line_breaking_load_n").notNull(),
    active: integer("active", { mode: "boolean" }).notNull().default(true),
  },
  () => [check("mounts_thread_check", inList("thread", THREADS))],
);

export const adapters = sqliteTable(
  "adapters",
  {
    id: text("id").primaryKey(),
    name: text("name").notNull().unique(),
    fromThread: text("from_thread", { enum: ATTACHMENTS }).notNull(),
    toThread: text("to_thread", { enum: THREADS }).notNull(),
    massKg: real("mass_kg").notNull(),
    ratedLoadKg: real("rated_load_kg").notNull(),
    active: integer("active", { mode: "boolean" }).notNull().default(true),
  },
  () => [check("adapters_from_check", inList("from_thread", ATTACHMENTS)), check("adapters_to_check", inList("to_thread", THREADS))],
);

/** What a payload is, the same in the catalogue's templates and on a setup's mount. */
const payloadColumns = () => ({
  category: text("category", { enum: PAYLOAD_CATEGORIES }).notNull(),
  massKg: real("mass_kg").notNull(),
  shape: text("shape", { enum: PAYLOAD_SHAPES }).notNull(),
  lengthM: real("length_m").notNull(),
  widthM: real("width_m").notNull(),
  heightM: real("height_m").notNull(),
  attachment: text("attachment", { enum: ATTACHMENTS }).notNull(),
  dragAreaM2: real("drag_area_m2").notNull().default(0),
  // The payload's centre of mass from the mount's attachment point (z negative hangs below).
  offsetXM: real("offset_x_m").notNull().default(0),
  offsetZM: real("offset_z_m").notNull(),
});

export const payloadTemplates = sqliteTable(
  "payload_templates",
  {
    id: text("id").primaryKey(),
    name: text("name").notNull().unique(),
    description: text("description").notNull().default(""),
    ...payloadColumns(),
    active: integer("active", { mode: "boolean" }).notNull().default(true),
  },
  () => [
    check("payload_templates_category_check", inList("category", PAYLOAD_CATEGORIES)),
    check("payload_templates_shape_check", inList("shape", PAYLOAD_SHAPES)),
    check("payload_templates_attachment_check", inList("attachment", ATTACHMENTS)),
  ],
);

// ---------------------------------------------------------------- setups and their review

export const setups = sqliteTable(
  "setups",
  {
    id: text("id").primaryKey(),
    ownerId: text("owner_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    modelId: text("model_id")
      .notNull()
      .references(() => envelopeModels.id),
    unitId: text("unit_id").references(() => envelopeUnits.id, { onDelete: "set null" }),
    mountId: text("mount_id")
      .notNull()
      .references(() => mounts.id),
    mountPositionXM: real("mount_position_x_m").notNull(),
    siteName: text("site_name").notNull().default(""),
    altitudeM: real("altitude_m").notNull().default(0),
    temperatureC: real("temperature_c"), // null: ISA at the altitude
    pressurePa: real("pressure_pa"), // null: ISA at the altitude
    windMS: real("wind_m_s").notNull().default(0),
    gustMS: real("gust_m_s"),
    // Where the wind was measured and how it grows with height (the power law); defaults: a 10 m
    // mast (WMO-No. 8) and α = 1/7 (common practice), as the engine assumes for older rows.
    windMeasuredAtM: real("wind_measured_at_m").notNull().default(10),
    windShearExponent: real("wind_shear_exponent")
      .notNull()
      .default(1 / 7),
    relativeHumidity: real("relative_humidity"), // null: dry air, as ISA
    purity: real("purity").notNull().default(1),
    superheatK: real("superheat_k").notNull().default(0),
    fillFraction: real("fill_fraction").notNull().default(1),
    tetherMassPerMetreKg: real("tether_mass_per_metre_kg"),
    tetherLengthOutM: real("tether_length_out_m"),
    tetherBreakingLoadN: real("tether_breaking_load_n"),
    // The day's lift check: free lift weighed at the field and the air temperature then (all null: none).
    // The two word columns are checked by the draft's zod schema, not by a CHECK: SQLite can add a
    // CHECK only by rebuilding the table, and this change stays additive.
    liftCheckFreeLiftKg: real("lift_check_free_lift_kg"),
    liftCheckTemperatureC: real("lift_check_temperature_c"),
    liftCheckWeighedWith: text("lift_check_weighed_with", { enum: LIFT_CHECK_LOADS }),
    liftCheckSolveFor: text("lift_check_solve_for", { enum: LIFT_CHECK_UNKNOWNS }),
    tetherDiameterM: real("tether_diameter_m"), // null: no line drag
    // The payload height the customer wants, for the operating envelope's line out.
    targetHeightM: real("target_height_m"),
    status: text("status", { enum: SETUP_STATUSES }).notNull().default("draft"),
    // Optimistic concurrency: every write must name the version it read, and bumps it.
    version: integer("version").notNull().default(1),
    worstFlag: text("worst_flag", { enum: FLAG_LEVELS }),
    // Copied from the stored result on every write so lists sort and filter without reading JSON.
    payloadMassKg: real("payload_mass_kg").notNull().default(0),
    freeLiftRatio: real("free_lift_ratio"),
    cautionsAcknowledged: integer("cautions_acknowledged", { mode: "boolean" }).notNull().default(false),
    submittedAt: integer("submitted_at", { mode: "timestamp_ms" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    // One index per list order, with the id that breaks ties, so no list sorts in memory.
    index("setups_owner_updated_idx").on(t.ownerId, t.updatedAt, t.id),
    index("setups_status_submitted_idx").on(t.status, t.submittedAt, t.id),
    index("setups_status_free_lift_idx").on(t.status, t.freeLiftRatio, t.id),
    index("setups_status_payload_mass_idx").on(t.status, t.payloadMassKg, t.id),
    index("setups_status_worst_idx").on(t.status, t.worstFlag, t.submittedAt, t.id),
    index("setups_status_model_idx").on(t.status, t.modelId, t.submittedAt, t.id),
    index("setups_submitted_idx").on(t.submittedAt, t.id),
    index("setups_created_idx").on(t.createdAt, t.modelId, t.status),
    // "Used by N setups" in the Workshop: an indexed count per catalogue item.
    index("setups_model_idx").on(t.modelId),
    index("setups_unit_idx").on(t.unitId),
    index("setups_mount_idx").on(t.mountId),
    check("setups_status_check", inList("status", SETUP_STATUSES)),
    check("setups_worst_flag_check", sql`worst_flag is null or ${inList("worst_flag", FLAG_LEVELS)}`),
  ],
);

/**
 * The server's own evaluation of a setup's stored input (never the client's), kept apart from the
 * setup row: lists and counts scan setups, and an 8 KB result in each row would make every scan read it.
 */
export const setupResults = sqliteTable("setup_results", {
  setupId: text("setup_id")
    .primaryKey()
    .references(() => setups.id, { onDelete: "cascade" }),
  resultJson: text("result_json", { mode: "json" }).$type<BalanceResult>().notNull(),
});

/** Each distinct problem (a flag's code at `caution` or `stop`) a setup's stored result raised: Insight counts these in SQL. */
export const setupFlags = sqliteTable(
  "setup_flags",
  {
    setupId: text("setup_id")
      .notNull()
      .references(() => setups.id, { onDelete: "cascade" }),
    code: text("code", { enum: FLAG_CODES }).notNull(),
    level: text("level", { enum: FLAG_LEVELS }).notNull(),
  },
  (t) => [
    primaryKey({ columns: [t.setupId, t.code, t.level] }),
    index("setup_flags_code_idx").on(t.code, t.level, t.setupId),
    check("setup_flags_code_check", inList("code", FLAG_CODES)),
    check("setup_flags_level_check", inList("level", FLAG_LEVELS)),
  ],
);

export const setupPayloads = sqliteTable(
  "setup_payloads",
  {
    id: text("id").primaryKey(),
    setupId: text("setup_id")
      .notNull()
      .references(() => setups.id, { onDelete: "cascade" }),
    templateId: text("template_id").references(() => payloadTemplates.id, { onDelete: "set null" }),
    sortOrder: integer("sort_order").notNull(),
    name: text("name").notNull(),
    adapterId: text("adapter_id").references(() => adapters.id),
    ...payloadColumns(),
  },
  (t) => [
    uniqueIndex("setup_payloads_order_idx").on(t.setupId, t.sortOrder),
    // Covering: "used by N setups" counts distinct setups from the index alone.
    index("setup_payloads_adapter_idx").on(t.adapterId, t.setupId),
    index("setup_payloads_template_idx").on(t.templateId, t.setupId),
    check("setup_payloads_category_check", inList("category", PAYLOAD_CATEGORIES)),
    check("setup_payloads_shape_check", inList("shape", PAYLOAD_SHAPES)),
    check("setup_payloads_attachment_check", inList("attachment", ATTACHMENTS)),
  ],
);

export const comments = sqliteTable(
  "comments",
  {
    id: text("id").primaryKey(),
    setupId: text("setup_id")
      .notNull()
      .references(() => setups.id, { onDelete: "cascade" }),
    authorId: text("author_id")
      .notNull()
      .references(() => user.id),
    body: text("body").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("comments_setup_idx").on(t.setupId, t.createdAt)],
);

export const decisions = sqliteTable(
  "decisions",
  {
    id: text("id").primaryKey(),
    setupId: text("setup_id")
      .notNull()
      .references(() => setups.id, { onDelete: "cascade" }),
    reviewerId: text("reviewer_id")
      .notNull()
      .references(() => user.id),
    outcome: text("outcome", { enum: DECISION_OUTCOMES }).notNull(),
    setupVersion: integer("setup_version").notNull(),
    // Reason codes (e.g. "trim", "free-lift", "attachment") so Insight can count why setups fail.
    reasonsJson: text("reasons_json", { mode: "json" })
      .$type<string[]>()
      .notNull()
      .default(sql`'[]'`),
    note: text("note").notNull().default(""),
    createdAt: createdAt(),
  },
  (t) => [index("decisions_setup_idx").on(t.setupId, t.createdAt), check("decisions_outcome_check", inList("outcome", DECISION_OUTCOMES))],
);

export const attachments = sqliteTable(
  "attachments",
  {
    id: text("id").primaryKey(),
    setupId: text("setup_id")
      .notNull()
      .references(() => setups.id, { onDelete: "cascade" }),
    uploaderId: text("uploader_id")
      .notNull()
      .references(() => user.id),
    fileName: text("file_name").notNull(),
    contentType: text("content_type").notNull(),
    sizeBytes: integer("size_bytes").notNull(),
    storageKey: text("storage_key").notNull().unique(),
    createdAt: createdAt(),
  },
  (t) => [index("attachments_setup_idx").on(t.setupId)],
);

/** When a person last read a setup's thread: comments by others after it are unread. */
export const setupReads = sqliteTable(
  "setup_reads",
  {
    setupId: text("setup_id")
      .notNull()
      .references(() => setups.id, { onDelete: "cascade" }),
    userId: text("user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    lastReadAt: integer("last_read_at", { mode: "timestamp_ms" }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.setupId, t.userId] })],
);

export const MAIL_STATUSES = ["pending", "sent", "failed"] as const;

/**
 * Mail to send, written in the same transaction as the change it reports, and delivered after it
 * commits: a failed send never undoes the change, and is retried from here.
 */
export const mailOutbox = sqliteTable(
  "mail_outbox",
  {
    id: text("id").primaryKey(),
    kind: text("kind").notNull(), // the template, e.g. "setup-submitted"
    toAddress: text("to_address").notNull(),
    subject: text("subject").notNull(),
    textBody: text("text_body").notNull(),
    htmlBody: text("html_body").notNull(),
    status: text("status", { enum: MAIL_STATUSES }).notNull().default("pending"),
    attempts: integer("attempts").notNull().default(0),
    nextAttemptAt: integer("next_attempt_at", { mode: "timestamp_ms" }).notNull(),
    lastError: text("last_error"),
    sentAt: integer("sent_at", { mode: "timestamp_ms" }),
    createdAt: createdAt(),
  },
  (t) => [index("mail_outbox_due_idx").on(t.status, t.nextAttemptAt), check("mail_outbox_status_check", inList("status", MAIL_STATUSES))],
);

export const auditLog = sqliteTable(
  "audit_log",
  {
    id: text("id").primaryKey(),
    actorId: text("actor_id").references(() => user.id, { onDelete: "set null" }),
    action: text("action").notNull(), // e.g. "setup.save", "user.role"
    entityType: text("entity_type").notNull(),
    entityId: text("entity_id").notNull(),
    detailJson: text("detail_json", { mode: "json" })
      .$type<Record<string, unknown>>()
      .notNull()
      .default(sql`'{}'`),
    createdAt: createdAt(),
  },
  (t) => [index("audit_log_entity_idx").on(t.entityType, t.entityId, t.createdAt)],
);

// ---------------------------------------------------------------- Insight's roll-ups and the queue's name search
// Derived tables, kept in step with the setups by the triggers that db/derived-tables.ts installs.

export const INSIGHT_MEASURES = [
  "setups",
  "setup_payload_mass",
  "free_lift_ratio",
  "rail_position",
  "payload_mass",
  "template_usage",
  "flags",
  "send_back_reasons",
] as const;
export const ROLLUP_SPANS = ["day", "month", "year"] as const;

/**
 * Insight's counts, one row per measure, span (a UTC day, and again in its calendar month and year),
 * envelope model, status and bin/label/level of the measure: Insight sums the fewest rows that cover
 * the days asked for instead of reading every setup. Unused key parts are 0 and '' (SQLite's NULLs
 * would never conflict in the key).
 */
export const insightRollups = sqliteTable(
  "insight_rollups",
  {
    measure: text("measure", { enum: INSIGHT_MEASURES }).notNull(),
    span: text("span", { enum: ROLLUP_SPANS }).notNull(),
    // Days since 1970-01-01 (UTC) of the day, or of the first day of the month or year.
    firstDay: integer("first_day").notNull(),
    modelId: text("model_id").notNull(),
    status: text("status", { enum: SETUP_STATUSES }).notNull(),
    bin: integer("bin").notNull().default(0),
    label: text("label").notNull().default(""),
    level: text("level").notNull().default(""),
    count: integer("count").notNull(),
  },
  (t) => [
    primaryKey({ columns: [t.measure, t.span, t.firstDay, t.modelId, t.status, t.bin, t.label, t.level] }),
    // Whole months and years are read in the order they are grouped in, so no sort; covering.
    index("insight_rollups_group_idx").on(t.measure, t.span, t.bin, t.label, t.level, t.firstDay, t.modelId, t.status, t.count),
    // A count that falls to 0 is deleted at once; this index finds those rows without a scan.
    index("insight_rollups_empty_idx")
      .on(t.measure)
      .where(sql`count = 0`),
    check("insight_rollups_measure_check", inList("measure", INSIGHT_MEASURES)),
    check("insight_rollups_span_check", inList("span", ROLLUP_SPANS)),
  ],
);

/**
 * A stable integer per setup for the full-text index of setup names (FTS5 keys rows by integer; a
 * table's implicit rowid may change on VACUUM, this key does not).
 */
export const setupSearchKeys = sqliteTable("setup_search_keys", {
  key: integer("key").primaryKey({ autoIncrement: true }),
  setupId: text("setup_id")
    .notNull()
    .unique()
    .references(() => setups.id, { onDelete: "cascade" }),
});

/** Which definition of the derived tables' triggers a database carries, so a changed one is rebuilt once. */
export const derivedStamps = sqliteTable("derived_stamps", {
  name: text("name").primaryKey(),
  stamp: text("stamp").notNull(),
});

export type UserRow = typeof user.$inferSelect;
export type EnvelopeModelRow = typeof envelopeModels.$inferSelect;
export type EnvelopeUnitRow = typeof envelopeUnits.$inferSelect;
export type UnitLiftTestRow = typeof unitLiftTests.$inferSelect;
export type MountRow = typeof mounts.$inferSelect;
export type AdapterRow = typeof adapters.$inferSelect;
export type PayloadTemplateRow = typeof payloadTemplates.$inferSelect;
export type SetupRow = typeof setups.$inferSelect;
export type SetupPayloadRow = typeof setupPayloads.$inferSelect;
export type SetupResultRow = typeof setupResults.$inferSelect;
export type CommentRow = typeof comments.$inferSelect;
export type DecisionRow = typeof decisions.$inferSelect;
export type AttachmentRow = typeof attachments.$inferSelect;
export type MailOutboxRow = typeof mailOutbox.$inferSelect;
export type SignInAttemptRow = typeof signInAttempts.$inferSelect;

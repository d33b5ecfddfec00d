/**
 * Every table of Satura's database. drizzle-kit reads this file to generate the SQL
 * migrations in drizzle/; the server applies them at start-up.
 *
 * Column names are written out in snake_case so the SQL reads the same from any client.
 * Every organisation-owned row carries organisation_id: queries are always scoped by it.
 */
import { sql } from "drizzle-orm";
import { ROLES, type Role } from "@shared/schemas/auth.ts";
import {
  CASE_DIFFICULTIES,
  CASE_STATUSES,
  type AttemptAnswers,
  type AttemptScore,
  type CaseDifficulty,
  type CaseExpected,
  type CaseStatus,
  type CaseStory,
  type SafetyNote,
  type WorkedStep,
} from "@shared/schemas/casebook.ts";
import {
  APPLICATIONS,
  CHARGE_STATES,
  type Application,
  type ChargeState,
  type DiagnosisInput,
} from "@shared/schemas/diagnosis.ts";
import { CHARGE_REFERENCE_SOURCES, type ChargeReferenceSource } from "@shared/schemas/charge-references.ts";
import type { CircuitNameplate } from "@shared/schemas/equipment.ts";
import { CYLINDER_KINDS, MOVEMENT_KINDS, type CylinderKind, type MovementKind } from "@shared/schemas/register.ts";
import type {
  ElectricalCheckInput,
  ElectricalCheckResult,
  EvacuationResult,
  LeakSearchInput,
  PressureTestRecordInput,
  PressureTestRecordResult,
  StandingPressureRecordInput,
} from "@shared/schemas/procedure-records.ts";
import type { StandingPressureResult, Verdict } from "@shared/schemas/procedures.ts";
import {
  VISIT_EVENT_ACTIONS,
  VISIT_STATUSES,
  VOIDABLE_KINDS,
  type VisitEventAction,
  type VisitStatus,
  type VoidableKind,
} from "@shared/schemas/visits.ts";
import {
  boolean,
  check,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
  type AnyPgColumn,
} from "drizzle-orm/pg-core";
import { storedResult } from "./stored-result.ts";

const createdAt = timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow();
const updatedAt = timestamp("updated_at", { withTimezone: true, mode: "date" }).notNull().defaultNow();
const timestamps = { createdAt, updatedAt };

/** A closed set's values as an SQL list: constants of the app, written as literals so a migration holds them. */
const valueList = (values: readonly string[]) =>
  sql.raw(`(${values.map((value) => `'${value.replaceAll("'", "''")}'`).join(", ")})`);
/**
 * A text column that holds one of a closed set (a role, a status, a kind). The set is the zod
 * schema's own list, so the database refuses what the API would: a value written by hand, by a
 * script or by an older server cannot reach the screens that switch on it.
 */
const oneOf = (name: string, column: AnyPgColumn, values: readonly string[]) =>
  check(name, sql`${column} in ${valueList(values)}`);

/**
 * A visit record is corrected by voiding it with a reason, never by deleting or editing it:
 * the row stays, struck through on screen and left out of results, balances and the report.
 * These columns go on every voidable record; the check keeps a void and its reason together.
 */
const voidColumns = () => ({
  voidedAt: timestamp("voided_at", { withTimezone: true, mode: "date" }),
  voidedBy: uuid("voided_by").references(() => users.id, { onDelete: "set null" }),
  voidReason: text("void_reason"),
});
const voidComplete = (table: string, columns: { voidedAt: AnyPgColumn; voidReason: AnyPgColumn }) =>
  check(`${table}_void_complete`, sql`(${columns.voidedAt} is null) = (${columns.voidReason} is null)`);

/**
 * The id a device gave an entry when it was first submitted (README decision 026): a send
 * repeated because its answer was lost names the same id, and the unique index below makes the
 * database store it once. Null for entries made without one (imports, the seed, older clients).
 */
const clientId = () => ({ clientId: uuid("client_id") });
/**
 * One entry per client id on a visit (so within one organisation: a visit is one
 * organisation's), per table. An insert that meets it reads the entry stored first instead
 * (server/db/store-once.ts); partial, so entries without a client id cost the index nothing.
 */
const clientIdUnique = (table: string, columns: { visitId: AnyPgColumn; clientId: AnyPgColumn }) =>
  uniqueIndex(`${table}_client_id_unique`)
    .on(columns.visitId, columns.clientId)
    .where(sql`${columns.clientId} is not null`);

/**
 * Optimistic concurrency for records people edit: every change bumps the version, and a write
 * naming an older version (If-Match) is refused with 409 instead of silently overwriting.
 */
const version = (name = "version") => integer(name).notNull().default(1);

/** The first columns of every record of a visit: its id, and the organisation and visit it belongs to (deleted with them). */
const ofVisit = () => ({
  id: uuid("id").primaryKey().defaultRandom(),
  organisationId: uuid("organisation_id")
    .notNull()
    .references(() => organisations.id, { onDelete: "cascade" }),
  visitId: uuid("visit_id")
    .notNull()
    .references(() => visits.id, { onDelete: "cascade" }),
});
/** Who recorded an entry at the unit, and when it was taken on the device (it may arrive later, from the outbox). */
const takenBy = () => ({
  recordedBy: uuid("recorded_by").references(() => users.id, { onDelete: "set null" }),
  takenAt: timestamp("taken_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
});
/** A procedure record's keys: read in the visit's order, voided whole, stored once per client id. */
const procedureRecordKeys = (
  table: string,
  columns: {
    visitId: AnyPgColumn;
    takenAt: AnyPgColumn;
    voidedAt: AnyPgColumn;
    voidReason: AnyPgColumn;
    clientId: AnyPgColumn;
  },
) => [
  index(`${table}_visit_idx`).on(columns.visitId, columns.takenAt),
  voidComplete(table, columns),
  clientIdUnique(table, columns),
];

/** The service company: the customer of Satura. */
export const organisations = pgTable("organisations", {
  id: uuid("id").primaryKey().defaultRandom(),
  name: text("name").notNull(),
  /** Overrides of trade limits where local codes differ (e.g. evacuation target). */
  settings: jsonb("settings").$type<Record<string, unknown>>().notNull().default({}),
  /** Version of `settings` (the company limits), for If-Match on PATCH. */
  settingsVersion: version("settings_version"),
  ...timestamps,
});

export { ROLES, type Role } from "@shared/schemas/auth.ts";

export const users = pgTable(
  "users",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    organisationId: uuid("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    name: text("name").notNull(),
    role: text("role").$type<Role>().notNull(),
    passwordHash: text("password_hash").notNull(),
    /** Display preferences; storage stays SI-metric whatever is chosen here. */
    preferences: jsonb("preferences").$type<Record<string, unknown>>().notNull().default({}),
    /**
     * Set when an owner removes the member. The row stays, so records they signed keep
     * their name; a deactivated user cannot sign in and has no sessions.
     */
    deactivatedAt: timestamp("deactivated_at", { withTimezone: true, mode: "date" }),
    /** Refrigerant handling licence or certificate number, printed in the register export. */
    licenceNumber: text("licence_number"),
    /** Version of what the person edits on their profile (name, preferences, licence), for If-Match. */
    profileVersion: version("profile_version"),
    ...timestamps,
  },
  (table) => [
    uniqueIndex("users_email_unique").on(sql`lower(${table.email})`),
    index("users_organisation_idx").on(table.organisationId),
    oneOf("users_role_known", table.role, ROLES),
  ],
);

/** Sessions in the shape lucia v3's Drizzle adapter expects (id, user_id, expires_at). */
export const sessions = pgTable(
  "sessions",
  {
    id: text("id").primaryKey(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    expiresAt: timestamp("expires_at", { withTimezone: true, mode: "date" }).notNull(),
  },
  (table) => [index("sessions_user_idx").on(table.userId)],
);

export const invitations = pgTable(
  "invitations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    organisationId: uuid("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    role: text("role").$type<Role>().notNull(),
    /** SHA-256 of the token sent by e-mail; the token itself is never stored. */
    tokenHash: text("token_hash").notNull(),
    invitedBy: uuid("invited_by").references(() => users.id, { onDelete: "set null" }),
    expiresAt: timestamp("expires_at", { withTimezone: true, mode: "date" }).notNull(),
    acceptedAt: timestamp("accepted_at", { withTimezone: true, mode: "date" }),
    createdAt,
  },
  (table) => [
    uniqueIndex("invitations_token_hash_unique").on(table.tokenHash),
    index("invitations_organisation_idx").on(table.organisationId),
    oneOf("invitations_role_known", table.role, ROLES),
  ],
);

export const passwordResets = pgTable(
  "password_resets",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    tokenHash: text("token_hash").notNull(),
    expiresAt: timestamp("expires_at", { withTimezone: true, mode: "date" }).notNull(),
    usedAt: timestamp("used_at", { withTimezone: true, mode: "date" }),
    createdAt,
  },
  (table) => [uniqueIndex("password_resets_token_hash_unique").on(table.tokenHash)],
);

/**
 * Hit counters of the sign-in, reset and sign-up throttles (server/auth/rate-limits.ts), in the
 * database rather than in one process's memory, so that several app servers share one count.
 * The key is a SHA-256 of the throttle's name and what it counts (an address, an account and
 * client pair): no e-mail address or IP is stored. A row counts until `reset_at`, then starts over.
 */
export const rateLimitCounters = pgTable(
  "rate_limit_counters",
  {
    key: text("key").primaryKey(),
    hits: integer("hits").notNull(),
    resetAt: timestamp("reset_at", { withTimezone: true, mode: "date" }).notNull(),
  },
  (table) => [index("rate_limit_counters_reset_at_idx").on(table.resetAt)],
);

/** Mail handed to the SMTP layer, kept so owners can read the outbox in development. */
export const outboundMail = pgTable(
  "outbound_mail",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    organisationId: uuid("organisation_id").references(() => organisations.id, { onDelete: "cascade" }),
    to: text("to").notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html"),
    createdAt,
  },
  (table) => [index("outbound_mail_organisation_idx").on(table.organisationId, table.createdAt)],
);

export const customers = pgTable(
  "customers",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    organisationId: uuid("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    contactName: text("contact_name"),
    contactEmail: text("contact_email"),
    contactPhone: text("contact_phone"),
    ...timestamps,
  },
  (table) => [index("customers_organisation_idx").on(table.organisationId)],
);

export const sites = pgTable(
  "sites",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    organisationId: uuid("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    customerId: uuid("customer_id")
      .notNull()
      .references(() => customers.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    address: text("address"),
    /** Metres above sea level; sets the default atmospheric pressure for gauge readings. */
    altitudeM: doublePrecision("altitude_m"),
    ...timestamps,
  },
  (table) => [index("sites_organisation_idx").on(table.organisationId)],
);

export const equipment = pgTable(
  "equipment",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    organisationId: uuid("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    siteId: uuid("site_id")
      .notNull()
      .references(() => sites.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    kind: text("kind").notNull(),
    /** What the unit does (comfort cooling, refrigeration…): the bands its readings are judged by. */
    application: text("application").$type<Application>().notNull().default("comfort-cooling"),
    location: text("location"),
    maker: text("maker"),
    model: text("model"),
    serial: text("serial"),
    refrigerant: text("refrigerant").notNull(),
    circuits: jsonb("circuits").$type<CircuitNameplate[]>().notNull(),
    compressorRlaA: doublePrecision("compressor_rla_a"),
    compressorLraA: doublePrecision("compressor_lra_a"),
    fanFlaA: doublePrecision("fan_fla_a"),
    supplyVoltageV: integer("supply_voltage_v"),
    phases: integer("phases"),
    /** Maker's maximum allowable (rated) pressure on the high side, for pressure tests. */
    ratedHighSideKPa: doublePrecision("rated_high_side_kpa"),
    ratedLowSideKPa: doublePrecision("rated_low_side_kpa"),
    archived: boolean("archived").notNull().default(false),
    /**
     * The unit's words for the list's search, lower-case with spaces and dashes taken out
     * (shared/format/search-terms.ts): name, kind, site, customer, refrigerant, location, maker,
     * model, serial. Written by a trigger on every change to those (and on a site's or customer's
     * rename), never by the app; searched through a trigram index. Migration list_search.
     */
    searchText: text("search_text").notNull().default(""),
    /**
     * lower() of the unit's site and customer names: the list's "Place" sort, read in index order
     * (equipment_organisation_place_idx) rather than joining and sorting every unit. Written by the
     * same trigger as searchText, on every change and on a site's or customer's rename, never by
     * the app. Migration visit_reading_count.
     */
    siteSortName: text("site_sort_name").notNull().default(""),
    customerSortName: text("customer_sort_name").notNull().default(""),
    ...timestamps,
  },
  (table) => [
    index("equipment_organisation_idx").on(table.organisationId),
    index("equipment_site_idx").on(table.siteId),
    // The list's sorts, each read in index order from a page's cursor (server/db/equipment.ts);
    // the factory-charge sort's index is on a function, so it is written in the migration.
    index("equipment_organisation_name_idx")
      .on(table.organisationId, sql`lower(${table.name})`, table.id)
      .where(sql`NOT ${table.archived}`),
    index("equipment_organisation_kind_idx")
      .on(table.organisationId, table.kind, sql`lower(${table.name})`, table.id)
      .where(sql`NOT ${table.archived}`),
    index("equipment_organisation_refrigerant_idx")
      .on(table.organisationId, table.refrigerant, sql`lower(${table.name})`, table.id)
      .where(sql`NOT ${table.archived}`),
    index("equipment_organisation_circuits_idx")
      .on(table.organisationId, sql`jsonb_array_length(${table.circuits})`, sql`lower(${table.name})`, table.id)
      .where(sql`NOT ${table.archived}`),
    index("equipment_organisation_place_idx")
      .on(table.organisationId, table.siteSortName, table.customerSortName, sql`lower(${table.name})`, table.id)
      .where(sql`NOT ${table.archived}`),
    oneOf("equipment_application_known", table.application, APPLICATIONS),
  ],
);

/** A visit to one unit: the run log, adjustments, comments and photos hang off it. */
export const visits = pgTable(
  "visits",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    organisationId: uuid("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    equipmentId: uuid("equipment_id")
      .notNull()
      .references(() => equipment.id, { onDelete: "cascade" }),
    reason: text("reason").notNull(),
    status: text("status").$type<VisitStatus>().notNull().default("open"),
    /** The senior's reason when sent back, or note when signed off. */
    reviewNote: text("review_note"),
    signedOffBy: uuid("signed_off_by").references(() => users.id, { onDelete: "set null" }),
    signedOffAt: timestamp("signed_off_at", { withTimezone: true, mode: "date" }),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    startedAt: timestamp("started_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
    /**
     * Bumped once by every write to the visit (server/visits/write-to-visit.ts, under the row
     * lock), so it orders the visit's writes: the detail's ETag and the `since` of a delta.
     */
    revision: integer("revision").notNull().default(0),
    /**
     * The visit's readings that count in results (records, not voided: countsInResults in
     * server/db/visits.ts), so a list shows it without reading a logger's thousands of rows.
     * Kept by triggers on readings' inserts, updates (void, import commit) and deletes, never
     * written by the app. Migration visit_reading_count.
     */
    readingCount: integer("reading_count").notNull().default(0),
    ...timestamps,
  },
  (table) => [
    index("visits_organisation_idx").on(table.organisationId),
    index("visits_equipment_idx").on(table.equipmentId),
    // id too: the jobs list's status sort pages by (status, id).
    index("visits_status_idx").on(table.organisationId, table.status, table.id),
    // The company's visits newest first (lists, the review queue) read in index order instead of
    // sorting every visit the company has.
    index("visits_organisation_started_idx").on(table.organisationId, table.startedAt),
    // Today's lists (one status, newest first) read a page of that status, not every visit since.
    index("visits_organisation_status_started_idx").on(table.organisationId, table.status, table.startedAt),
    oneOf("visits_status_known", table.status, VISIT_STATUSES),
  ],
);

export const visitTechnicians = pgTable(
  "visit_technicians",
  {
    visitId: uuid("visit_id")
      .notNull()
      .references(() => visits.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
  },
  // By person too: a search word naming someone finds their visits (server/db/visits.ts).
  (table) => [
    primaryKey({ columns: [table.visitId, table.userId] }),
    index("visit_technicians_user_idx").on(table.userId, table.visitId),
  ],
);

/**
 * When each person last recorded a reading on a visit (the latest created_at of their readings
 * that are records, voided ones included): the jobs list's "you last worked on it", read per
 * page row without reading the visit's readings. One row per visit and recorder, kept by the
 * same triggers as visits.reading_count (migration visit_reading_count), never written by the app.
 */
export const visitReadingRecorders = pgTable(
  "visit_reading_recorders",
  {
    visitId: uuid("visit_id")
      .notNull()
      .references(() => visits.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    lastRecordedAt: timestamp("last_recorded_at", { withTimezone: true, mode: "date" }).notNull(),
  },
  (table) => [primaryKey({ columns: [table.visitId, table.userId] })],
);

/**
 * What the jobs list searches and sorts a visit by, kept apart from the visit's row so that the
 * writes every reading makes to a visit (its revision) never touch these indexes. One row per
 * visit, written only by triggers (migration list_search): on a visit's insert or change of
 * unit or reason, and on a rename of its unit, site or customer.
 */
export const visitSearch = pgTable(
  "visit_search",
  {
    visitId: uuid("visit_id")
      .primaryKey()
      .references(() => visits.id, { onDelete: "cascade" }),
    organisationId: uuid("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    /**
     * Unit, site, customer, refrigerant and reason, lower-case with spaces and dashes taken out
     * (shared/format/search-terms.ts); searched through a trigram index.
     */
    searchText: text("search_text").notNull(),
    /** lower(unit name): the list's "Unit" sort. */
    unitName: text("unit_name").notNull(),
    /** lower(reason): the list's "Reason" sort. */
    reason: text("reason").notNull(),
  },
  (table) => [
    index("visit_search_unit_name_idx").on(table.organisationId, table.unitName, table.visitId),
    index("visit_search_reason_idx").on(table.organisationId, table.reason, table.visitId),
  ],
);

/**
 * One timed set of readings on one circuit. `input` is what the technician entered
 * (SI-metric, gauge pressures); `result` is what the server's diagnosis engine made of it.
 */
/** A number of the stored result (or input) as a column, null where the field is null or missing. */
const figureOf = (column: "result" | "input", field: string) =>
  sql.raw(`(("${column}"->>'${field}')::double precision)`);

/** See `readings`: generated from `result` and `input`, never written by the application. */
function readingFigureColumns() {
  return {
    superheatK: doublePrecision("superheat_k").generatedAlwaysAs(figureOf("result", "superheatK")),
    subcoolingK: doublePrecision("subcooling_k").generatedAlwaysAs(figureOf("result", "subcoolingK")),
    evaporatingTempC: doublePrecision("evaporating_temp_c").generatedAlwaysAs(figureOf("result", "evaporatingTempC")),
    condensingTempC: doublePrecision("condensing_temp_c").generatedAlwaysAs(figureOf("result", "condensingTempC")),
    /** The recorded run time, minutes (input.runMinutes): the trend's minimum-run rule reads it. */
    runMinutes: doublePrecision("run_minutes").generatedAlwaysAs(figureOf("input", "runMinutes")),
    chargeState: text("charge_state").$type<ChargeState>().generatedAlwaysAs(sql.raw(`("result"->>'chargeState')`)),
    /**
     * Whether the stored result is the current engine's (it has CURRENT_RESULT_FIELD,
     * shared/engine/diagnosis/read-trend-series.ts): an older one is read whole and diagnosed again.
     */
    resultIsCurrent: boolean("result_is_current").generatedAlwaysAs(sql.raw(`("result" ? 'chargeDeviation')`)),
  };
}

export const readings = pgTable(
  "readings",
  {
    ...ofVisit(),
    circuit: integer("circuit").notNull(),
    takenAt: timestamp("taken_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
    note: text("note"),
    input: jsonb("input").$type<DiagnosisInput>().notNull(),
    /** jsonb holding the result packed (server/db/stored-result.ts, README decision 030); read and written as a DiagnosisResult. */
    result: storedResult("result").notNull(),
    recordedBy: uuid("recorded_by").references(() => users.id, { onDelete: "set null" }),
    /**
     * Set while a CSV import stores its rows in short slices (so other requests are not held
     * up); the import makes them readings in one step at the end. Rows still carrying it are
     * not records: every read skips them, and start-up removes any an interruption left.
     */
    pendingImportId: uuid("pending_import_id"),
    /** The visit's revision when this row was last written (inserted, voided, imported): a trigger sets it (migration 0014). */
    revision: integer("revision").notNull().default(0),
    ...clientId(),
    ...voidColumns(),
    createdAt,
    // The few figures the trend, the chart series and lists read, copied out of `result` and
    // `input` by the database itself (stored generated columns): every insert path (saves, CSV
    // imports, the seed, the large data set) and every rewrite of a stored result keeps them
    // right, and reading them does not unpack the reading's whole stored result, which was most
    // of the cost of a long visit's trend. A packed result (decision 030) carries these fields
    // beside its compressed text, so the same expressions read either form.
    ...readingFigureColumns(),
  },
  (table) => [
    index("readings_visit_idx").on(table.visitId, table.circuit, table.takenAt),
    // A delta (what changed since a revision) reads only the changed rows of a long visit.
    index("readings_visit_revision_idx").on(table.visitId, table.revision),
    index("readings_pending_import_idx")
      .on(table.pendingImportId)
      .where(sql`${table.pendingImportId} is not null`),
    voidComplete("readings", table),
    clientIdUnique("readings", table),
  ],
);

/**
 * A change made to the unit during the visit, drawn on the trend chart. A charge adjustment
 * (charge-added / charge-removed) is the run log's view of one register movement: movement_id
 * links the two, they are written and voided together, and the kilograms are the movement's.
 * Rows stored before the link existed may stay unlinked; the refrigerant section says so.
 */
export const adjustments = pgTable(
  "adjustments",
  {
    ...ofVisit(),
    circuit: integer("circuit"),
    at: timestamp("at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
    kind: text("kind").notNull(),
    description: text("description").notNull(),
    amountKg: doublePrecision("amount_kg"),
    /** The register movement this charge adjustment is; no ON DELETE action, like the register's own references. */
    movementId: uuid("movement_id").references((): AnyPgColumn => refrigerantMovements.id),
    recordedBy: uuid("recorded_by").references(() => users.id, { onDelete: "set null" }),
    /** The visit's revision when this row was last written (inserted, voided, imported): a trigger sets it (migration 0014). */
    revision: integer("revision").notNull().default(0),
    ...clientId(),
    ...voidColumns(),
    createdAt,
  },
  (table) => [
    index("adjustments_visit_idx").on(table.visitId, table.at),
    voidComplete("adjustments", table),
    // One movement has one run-log entry, so a kilogram can never be shown twice.
    uniqueIndex("adjustments_movement_unique")
      .on(table.movementId)
      .where(sql`${table.movementId} is not null`),
    clientIdUnique("adjustments", table),
  ],
);

export const visitComments = pgTable(
  "visit_comments",
  {
    ...ofVisit(),
    readingId: uuid("reading_id").references(() => readings.id, { onDelete: "cascade" }),
    authorId: uuid("author_id").references(() => users.id, { onDelete: "set null" }),
    body: text("body").notNull(),
    /** The visit's revision when this row was last written (inserted, voided, imported): a trigger sets it (migration 0014). */
    revision: integer("revision").notNull().default(0),
    ...clientId(),
    createdAt,
  },
  (table) => [
    index("visit_comments_visit_idx").on(table.visitId, table.createdAt),
    clientIdUnique("visit_comments", table),
  ],
);

/** Photos are stored as files under the data folder with random names; this is their index. */
export const photos = pgTable(
  "photos",
  {
    ...ofVisit(),
    kind: text("kind").notNull(),
    caption: text("caption"),
    storedName: text("stored_name").notNull(),
    thumbnailName: text("thumbnail_name").notNull(),
    mimeType: text("mime_type").notNull(),
    bytes: integer("bytes").notNull(),
    uploadedBy: uuid("uploaded_by").references(() => users.id, { onDelete: "set null" }),
    /** When the photo was added on the device: it may reach the server much later, from the outbox. */
    takenAt: timestamp("taken_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
    /** The visit's revision when this row was last written (inserted, voided, imported): a trigger sets it (migration 0014). */
    revision: integer("revision").notNull().default(0),
    ...clientId(),
    createdAt,
  },
  (table) => [index("photos_visit_idx").on(table.visitId), clientIdUnique("photos", table)],
);

/*
 * Procedure records of a visit (electrical checks, leak search, nitrogen pressure test,
 * evacuation). Like readings, each keeps what the technician entered (`input`, SI-metric)
 * and what the server's procedures engine made of it (`result`), recomputed on every save.
 */

/** Electrical checks on one target: a compressor, a fan motor or the supply. */
export const electricalChecks = pgTable(
  "electrical_checks",
  {
    ...ofVisit(),
    /** compressor, fan or supply. */
    target: text("target").notNull(),
    /** Phase voltages, insulation readings with their test voltage, winding resistances, running currents. */
    input: jsonb("input").$type<ElectricalCheckInput>().notNull(),
    /** The verdicts per check and overall, as the engine judged them. */
    result: jsonb("result").$type<ElectricalCheckResult>().notNull(),
    ...takenBy(),
    ...clientId(),
    ...voidColumns(),
    createdAt,
  },
  (table) => procedureRecordKeys("electrical_checks", table),
);

/** One leak search: the method, the places checked, leaks found and repaired, the recheck. */
export const leakSearches = pgTable(
  "leak_searches",
  {
    ...ofVisit(),
    method: text("method").notNull(),
    input: jsonb("input").$type<LeakSearchInput>().notNull(),
    result: jsonb("result").$type<Verdict>().notNull(),
    ...takenBy(),
    ...clientId(),
    ...voidColumns(),
    createdAt,
  },
  (table) => procedureRecordKeys("leak_searches", table),
);

/**
 * An off-cycle standing-pressure check for non-condensables: the gauge pressure of the stopped
 * unit against the saturation pressure of the equalised condenser temperature. The input holds
 * the refrigerant and atmosphere the server supplied, so the stored verdict can be re-derived.
 */
export const standingPressureChecks = pgTable(
  "standing_pressure_checks",
  {
    ...ofVisit(),
    /** The circuit read, or null for a single-circuit unit or a check not tied to one. */
    circuit: integer("circuit"),
    input: jsonb("input").$type<StandingPressureRecordInput>().notNull(),
    result: jsonb("result").$type<StandingPressureResult>().notNull(),
    ...takenBy(),
    ...clientId(),
    ...voidColumns(),
    createdAt,
  },
  (table) => procedureRecordKeys("standing_pressure_checks", table),
);

/** A nitrogen strength/tightness test: test pressure against the rated pressure, start and end of the hold. */
export const pressureTests = pgTable(
  "pressure_tests",
  {
    ...ofVisit(),
    input: jsonb("input").$type<PressureTestRecordInput>().notNull(),
    result: jsonb("result").$type<PressureTestRecordResult>().notNull(),
    ...takenBy(),
    ...clientId(),
    ...voidColumns(),
    createdAt,
  },
  (table) => procedureRecordKeys("pressure_tests", table),
);

/**
 * An evacuation with its decay test. Samples (microns, minutes from the start) are added
 * while the pump runs and after it is valved off; the analysis is redone on every change.
 */
export const evacuations = pgTable(
  "evacuations",
  {
    ...ofVisit(),
    targetMicrons: doublePrecision("target_microns").notNull(),
    /** Minutes from the start at which the pump was valved off; null while still pulling down. */
    isolatedAtMinutes: doublePrecision("isolated_at_minutes"),
    /** A sample added from a device keeps its client id, so a repeated send adds it once (README decision 026). */
    samples: jsonb("samples").$type<{ minutes: number; microns: number; clientId?: string }[]>().notNull().default([]),
    note: text("note"),
    result: jsonb("result").$type<EvacuationResult>().notNull(),
    recordedBy: uuid("recorded_by").references(() => users.id, { onDelete: "set null" }),
    startedAt: timestamp("started_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
    /** Valving off, the target and the note can change (PATCH with If-Match). */
    version: version(),
    ...clientId(),
    ...voidColumns(),
    ...timestamps,
  },
  (table) => [
    index("evacuations_visit_idx").on(table.visitId, table.startedAt),
    voidComplete("evacuations", table),
    clientIdUnique("evacuations", table),
  ],
);

/**
 * A worked case written by a senior or owner for their own organisation (built-in cases live
 * in data/casebook/ and are shared by everyone). `expected` is what the diagnosis engine made
 * of `input` when the case was last saved; apprentices see only published cases.
 */
export const casebookCases = pgTable(
  "casebook_cases",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    organisationId: uuid("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    title: text("title").notNull(),
    difficulty: text("difficulty").$type<CaseDifficulty>().notNull(),
    story: jsonb("story").$type<CaseStory>().notNull(),
    input: jsonb("input").$type<DiagnosisInput>().notNull(),
    expected: jsonb("expected").$type<CaseExpected>().notNull(),
    reasoning: text("reasoning").notNull(),
    safetyTopics: jsonb("safety_topics").$type<SafetyNote["topic"][]>().notNull().default([]),
    status: text("status").$type<CaseStatus>().notNull().default("draft"),
    /** The run-log reading it was made from, if any (customer details are not copied). */
    fromReadingId: uuid("from_reading_id").references(() => readings.id, { onDelete: "set null" }),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    publishedAt: timestamp("published_at", { withTimezone: true, mode: "date" }),
    version: version(),
    ...timestamps,
  },
  (table) => [
    index("casebook_cases_organisation_idx").on(table.organisationId, table.status),
    oneOf("casebook_cases_difficulty_known", table.difficulty, CASE_DIFFICULTIES),
    oneOf("casebook_cases_status_known", table.status, CASE_STATUSES),
  ],
);

/**
 * One scored attempt at a case. `caseId` is a built-in case id, an organisation case's uuid or
 * a generated case's id (which carries its seed), so it is text without a foreign key. The
 * score, worked solution and safety notes are kept as shown, so the record never changes
 * when a case is edited later.
 */
export const casebookAttempts = pgTable(
  "casebook_attempts",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    organisationId: uuid("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    caseId: text("case_id").notNull(),
    caseTitle: text("case_title").notNull(),
    refrigerant: text("refrigerant").notNull(),
    expectedState: text("expected_state").$type<ChargeState>().notNull(),
    answers: jsonb("answers").$type<AttemptAnswers>().notNull(),
    score: jsonb("score").$type<AttemptScore>().notNull(),
    correctCount: integer("correct_count").notNull(),
    allCorrect: boolean("all_correct").notNull(),
    expected: jsonb("expected").$type<CaseExpected>().notNull(),
    reasoning: text("reasoning"),
    worked: jsonb("worked").$type<WorkedStep[]>().notNull(),
    safety: jsonb("safety").$type<SafetyNote[]>().notNull(),
    createdAt,
  },
  (table) => [
    index("casebook_attempts_user_idx").on(table.organisationId, table.userId, table.createdAt),
    index("casebook_attempts_case_idx").on(table.organisationId, table.caseId),
    oneOf("casebook_attempts_expected_state_known", table.expectedState, CHARGE_STATES),
  ],
);

/**
 * The organisation's refrigerant cylinders. Contents are not stored: they are derived as the
 * contents on the day the cylinder was entered (initial_contents_kg: a new cylinder's net
 * fill, or a part-full recovery cylinder) plus register movements into it minus those out of
 * it, so the register stays the one record of truth and the two can never disagree.
 */
export const cylinders = pgTable(
  "cylinders",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    organisationId: uuid("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    label: text("label").notNull(),
    serial: text("serial"),
    kind: text("kind").$type<CylinderKind>().notNull(),
    /** One refrigerant per cylinder (TRADE.md §6 cylinder checks). */
    refrigerant: text("refrigerant").notNull(),
    waterCapacityKg: doublePrecision("water_capacity_kg").notNull(),
    tareKg: doublePrecision("tare_kg").notNull(),
    initialContentsKg: doublePrecision("initial_contents_kg").notNull().default(0),
    ...timestamps,
  },
  (table) => [
    index("cylinders_organisation_idx").on(table.organisationId),
    uniqueIndex("cylinders_label_unique").on(table.organisationId, sql`lower(${table.label})`),
    oneOf("cylinders_kind_known", table.kind, CYLINDER_KINDS),
  ],
);

/**
 * The refrigerant register: every kilogram recovered, reused, added or sent for reclaim.
 * It is the record of truth for refrigerant; each movement on a visit has its run-log charge
 * adjustment (adjustments.movement_id) carrying the same kilograms, and only the movement is
 * counted, so nothing is counted twice. References have no ON DELETE action: a register entry
 * outlives nothing it points to, except when the whole organisation goes.
 */
export const refrigerantMovements = pgTable(
  "refrigerant_movements",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    organisationId: uuid("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    /** Null only for a cylinder sent for reclaim from the cylinders page. */
    visitId: uuid("visit_id").references(() => visits.id),
    equipmentId: uuid("equipment_id").references(() => equipment.id),
    circuit: integer("circuit"),
    refrigerant: text("refrigerant").notNull(),
    kind: text("kind").$type<MovementKind>().notNull(),
    kg: doublePrecision("kg").notNull(),
    cylinderId: uuid("cylinder_id").references(() => cylinders.id),
    technicianId: uuid("technician_id").references(() => users.id),
    at: timestamp("at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
    note: text("note"),
    ...clientId(),
    ...voidColumns(),
    createdAt,
  },
  (table) => [
    voidComplete("refrigerant_movements", table),
    index("refrigerant_movements_organisation_idx").on(table.organisationId, table.at),
    index("refrigerant_movements_visit_idx").on(table.visitId),
    index("refrigerant_movements_equipment_idx").on(table.equipmentId, table.at),
    index("refrigerant_movements_cylinder_idx").on(table.cylinderId),
    // The register's pages in their order (server/db/register.ts), over the standing lines only,
    // for everyone's lines and for one technician's.
    index("refrigerant_movements_register_idx")
      .on(table.organisationId, table.at, table.createdAt, table.id)
      .where(sql`${table.voidedAt} is null`),
    index("refrigerant_movements_technician_register_idx")
      .on(table.organisationId, table.technicianId, table.at, table.createdAt, table.id)
      .where(sql`${table.voidedAt} is null`),
    clientIdUnique("refrigerant_movements", table),
    oneOf("refrigerant_movements_kind_known", table.kind, MOVEMENT_KINDS),
  ],
);

/**
 * A declared full weigh-in of one circuit on a visit, with its line-length adjustment. The
 * weighed-in mass itself is not stored: it is the register's reused + added kg on that circuit.
 */
export const circuitCharges = pgTable(
  "circuit_charges",
  {
    ...ofVisit(),
    circuit: integer("circuit").notNull(),
    lineAdjustmentKg: doublePrecision("line_adjustment_kg").notNull().default(0),
    recordedBy: uuid("recorded_by").references(() => users.id, { onDelete: "set null" }),
    ...voidColumns(),
    ...timestamps,
  },
  (table) => [
    // One standing declaration per circuit; voided ones stay beside it as history.
    uniqueIndex("circuit_charges_visit_circuit_unique")
      .on(table.visitId, table.circuit)
      .where(sql`${table.voidedAt} is null`),
    voidComplete("circuit_charges", table),
  ],
);

/**
 * A circuit's charge reference point: the settled readings at a known correct charge that its
 * later charge estimates are measured from (virtual refrigerant charge, Li & Braun 2009). One
 * stands per circuit; a cleared or replaced one keeps its row with when, by whom and why (the
 * void columns), so the history of the unit's calibration is never lost.
 */
export const chargeReferences = pgTable(
  "charge_references",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    organisationId: uuid("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    equipmentId: uuid("equipment_id")
      .notNull()
      .references(() => equipment.id, { onDelete: "cascade" }),
    circuit: integer("circuit").notNull(),
    subcoolingK: doublePrecision("subcooling_k").notNull(),
    superheatK: doublePrecision("superheat_k").notNull(),
    evaporatingTempC: doublePrecision("evaporating_temp_c").notNull(),
    condensingTempC: doublePrecision("condensing_temp_c").notNull(),
    outdoorAirDryBulbC: doublePrecision("outdoor_air_dry_bulb_c"),
    returnAirDryBulbC: doublePrecision("return_air_dry_bulb_c"),
    source: text("source").$type<ChargeReferenceSource>().notNull(),
    visitId: uuid("visit_id").references(() => visits.id, { onDelete: "set null" }),
    readingId: uuid("reading_id").references(() => readings.id, { onDelete: "set null" }),
    readingCount: integer("reading_count").notNull().default(0),
    note: text("note"),
    setBy: uuid("set_by").references(() => users.id, { onDelete: "set null" }),
    setAt: timestamp("set_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
    ...voidColumns(),
  },
  (table) => [
    // One standing reference per circuit; cleared ones stay beside it as history.
    uniqueIndex("charge_references_circuit_unique")
      .on(table.equipmentId, table.circuit)
      .where(sql`${table.voidedAt} is null`),
    index("charge_references_equipment_idx").on(table.equipmentId, table.circuit, table.setAt),
    voidComplete("charge_references", table),
    oneOf("charge_references_source_known", table.source, CHARGE_REFERENCE_SOURCES),
  ],
);

/**
 * A visit's audit trail: who did what to the record and why — review steps, reopening,
 * voids (naming the record) and imports. Rows are only ever added.
 */
export const visitEvents = pgTable(
  "visit_events",
  {
    ...ofVisit(),
    action: text("action").$type<VisitEventAction>().notNull(),
    /** The record concerned (a void), by kind and id; null for events about the whole visit. */
    recordKind: text("record_kind").$type<VoidableKind>(),
    recordId: uuid("record_id"),
    /** What it was about, in words, e.g. "Reading at 10:42, circuit 1". */
    summary: text("summary").notNull(),
    reason: text("reason"),
    actorId: uuid("actor_id").references(() => users.id, { onDelete: "set null" }),
    at: timestamp("at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
    /** The visit's revision when this row was last written (inserted, voided, imported): a trigger sets it (migration 0014). */
    revision: integer("revision").notNull().default(0),
  },
  (table) => [
    index("visit_events_visit_idx").on(table.visitId, table.at),
    oneOf("visit_events_action_known", table.action, VISIT_EVENT_ACTIONS),
    check(
      "visit_events_record_kind_known",
      sql`${table.recordKind} is null or ${table.recordKind} in ${valueList(VOIDABLE_KINDS)}`,
    ),
  ],
);

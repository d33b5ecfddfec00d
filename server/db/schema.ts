/**
 * Every table of Satura's database. drizzle-kit reads this file to generate the SQL
 * migrations in drizzle/; the server applies them at start-up.
 *
 * Column names are written out in snake_case so the SQL reads the same from any client.
 * Every organisation-owned row carries organisation_id: queries are always scoped by it.
 */
import { sql } from "drizzle-orm";
import {
  boolean,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";

const createdAt = timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow();
const updatedAt = timestamp("updated_at", { withTimezone: true, mode: "date" }).notNull().defaultNow();
const timestamps = { createdAt, updatedAt };

/** The service company: the customer of Satura. */
export const organisations = pgTable("organisations", {
  id: uuid("id").primaryKey().defaultRandom(),
  name: text("name").notNull(),
  /** Overrides of trade limits where local codes differ (e.g. evacuation target). */
  settings: jsonb("settings").$type<Record<string, unknown>>().notNull().default({}),
  ...timestamps,
});

export const ROLES = ["owner", "senior", "technician", "apprentice"] as const;
export type Role = (typeof ROLES)[number];

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
    ...timestamps,
  },
  (table) => [
    uniqueIndex("users_email_unique").on(sql`lower(${table.email})`),
    index("users_organisation_idx").on(table.organisationId),
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

export const METERING_DEVICES = ["txv", "eev", "fixed-orifice", "capillary"] as const;
export type MeteringDevice = (typeof METERING_DEVICES)[number];

/** One refrigerant circuit of a unit, as its nameplate states it. */
export interface CircuitNameplate {
  number: number;
  factoryChargeKg: number;
  meteringDevice: MeteringDevice;
  targetSuperheatK?: number | null;
  targetSubcoolingK?: number | null;
}

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
    ...timestamps,
  },
  (table) => [index("equipment_organisation_idx").on(table.organisationId), index("equipment_site_idx").on(table.siteId)],
);

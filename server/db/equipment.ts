/**
 * Queries for customers, sites and equipment. Every function takes the caller's
 * organisation id and never returns another organisation's rows.
 */
import { and, asc, eq, sql, type SQL } from "drizzle-orm";
import type { z } from "zod";
import type { CustomerInputSchema, EquipmentValues, SiteInputSchema } from "@shared/schemas/equipment.ts";
import { defaultDirection, type EquipmentListQuery, type EquipmentSort } from "@shared/schemas/list-pages.ts";
import type { Database } from "./client.ts";
import {
  afterCursor,
  containsTerm,
  cursorColumns,
  decodeCursor,
  keysetOrder,
  matchesSearchSql,
  pageOf,
  type SortKey,
  type SortKeys,
} from "./keyset.ts";
import { customers, equipment, sites } from "./schema.ts";
import { oneRow } from "./one-row.ts";

type CustomerValues = z.output<typeof CustomerInputSchema>;
type SiteValues = z.output<typeof SiteInputSchema>;

const customerColumns = {
  id: customers.id,
  name: customers.name,
  contactName: customers.contactName,
  contactEmail: customers.contactEmail,
  contactPhone: customers.contactPhone,
};

export function listCustomers(db: Database, organisationId: string) {
  return db
    .select(customerColumns)
    .from(customers)
    .where(eq(customers.organisationId, organisationId))
    .orderBy(asc(customers.name));
}

export async function createCustomer(db: Database, organisationId: string, values: CustomerValues) {
  const [row] = await db
    .insert(customers)
    .values({ ...values, organisationId })
    .returning(customerColumns);
  return row;
}

const siteColumns = {
  id: sites.id,
  customerId: sites.customerId,
  customerName: customers.name,
  name: sites.name,
  address: sites.address,
  altitudeM: sites.altitudeM,
};

export function listSites(db: Database, organisationId: string) {
  return db
    .select(siteColumns)
    .from(sites)
    .innerJoin(customers, eq(customers.id, sites.customerId))
    .where(eq(sites.organisationId, organisationId))
    .orderBy(asc(customers.name), asc(sites.name));
}

export async function getSite(db: Database, organisationId: string, siteId: string) {
  const [row] = await db
    .select(siteColumns)
    .from(sites)
    .innerJoin(customers, eq(customers.id, sites.customerId))
    .where(and(eq(sites.organisationId, organisationId), eq(sites.id, siteId)));
  return row;
}

/** @returns the new site, or undefined when the customer is not the organisation's. */
export async function createSite(db: Database, organisationId: string, values: SiteValues) {
  const [customer] = await db
    .select({ id: customers.id })
    .from(customers)
    .where(and(eq(customers.organisationId, organisationId), eq(customers.id, values.customerId)));
  if (!customer) return undefined;
  const rows = await db
    .insert(sites)
    .values({ ...values, organisationId })
    .returning({ id: sites.id });
  return getSite(db, organisationId, oneRow(rows, "insert site").id);
}

const equipmentColumns = {
  id: equipment.id,
  siteId: equipment.siteId,
  siteName: sites.name,
  customerId: customers.id,
  customerName: customers.name,
  name: equipment.name,
  kind: equipment.kind,
  application: equipment.application,
  location: equipment.location,
  maker: equipment.maker,
  model: equipment.model,
  serial: equipment.serial,
  refrigerant: equipment.refrigerant,
  circuits: equipment.circuits,
  compressorRlaA: equipment.compressorRlaA,
  compressorLraA: equipment.compressorLraA,
  fanFlaA: equipment.fanFlaA,
  supplyVoltageV: equipment.supplyVoltageV,
  phases: equipment.phases,
  ratedHighSideKPa: equipment.ratedHighSideKPa,
  ratedLowSideKPa: equipment.ratedLowSideKPa,
  createdAt: equipment.createdAt,
};

function selectEquipment(db: Database) {
  return db
    .select(equipmentColumns)
    .from(equipment)
    .innerJoin(sites, eq(sites.id, equipment.siteId))
    .innerJoin(customers, eq(customers.id, sites.customerId));
}

export type EquipmentRow = Awaited<ReturnType<typeof getEquipment>>;

/** Every unit of the organisation, unpaged (the seed and the register's few units); screens use `listEquipmentPage`. */
export function listEquipment(db: Database, organisationId: string) {
  return selectEquipment(db)
    .where(and(eq(equipment.organisationId, organisationId), eq(equipment.archived, false)))
    .orderBy(asc(customers.name), asc(sites.name), asc(equipment.name));
}

/**
 * The factory charge of all circuits, kg, summed in the database so the list can sort by it;
 * the function (migration list_search) has an index, so the sort reads it in order.
 */
const totalFactoryCharge = sql`equipment_factory_charge_kg(${equipment.circuits})`;

// lower(): the table sorted "a" with "A" before; Postgres would put every capital first. Each
// sort has an index in its order (server/db/schema.ts, equipment_organisation_*_idx), so a page
// reads a page of units; the place sort reads the unit's own lower-case copies of its site's and
// customer's names (kept by a trigger, migration visit_reading_count), not the joined tables.
const byName: SortKey = { expr: sql`lower(${equipment.name})`, type: "text" };
const EQUIPMENT_SORT_KEYS: Record<EquipmentSort, SortKeys> = {
  name: [byName],
  kind: [{ expr: equipment.kind, type: "text" }, byName],
  place: [{ expr: equipment.siteSortName, type: "text" }, { expr: equipment.customerSortName, type: "text" }, byName],
  refrigerant: [{ expr: equipment.refrigerant, type: "text" }, byName],
  circuits: [{ expr: sql`jsonb_array_length(${equipment.circuits})`, type: "numeric" }, byName],
  factoryCharge: [{ expr: totalFactoryCharge, type: "numeric" }, byName],
};

/** One page of the organisation's units in use, searched, filtered by kind and sorted, after `query.cursor`. */
export async function listEquipmentPage(db: Database, organisationId: string, query: EquipmentListQuery) {
  const direction = query.dir ?? defaultDirection(query.sort);
  const keys = EQUIPMENT_SORT_KEYS[query.sort];
  const conditions: (SQL | undefined)[] = [eq(equipment.organisationId, organisationId), eq(equipment.archived, false)];
  if (query.kind) conditions.push(eq(equipment.kind, query.kind));
  // Name, kind, site, customer, refrigerant, location, maker, model and serial (equipment.searchText).
  conditions.push(matchesSearchSql(query.q, (term) => containsTerm(equipment.searchText, term)));
  if (query.cursor)
    conditions.push(
      afterCursor(keys, equipment.id, direction, decodeCursor(query.cursor, query.sort, direction, keys)),
    );
  const rows = await db
    .select({ ...equipmentColumns, ...cursorColumns(keys) })
    .from(equipment)
    .innerJoin(sites, eq(sites.id, equipment.siteId))
    .innerJoin(customers, eq(customers.id, sites.customerId))
    .where(and(...conditions))
    .orderBy(...keysetOrder(keys, equipment.id, direction))
    .limit(query.limit + 1);
  const { page, nextCursor } = pageOf(rows, query.limit, keys, query.sort, direction);
  return { rows: page, nextCursor };
}

export async function getEquipment(db: Database, organisationId: string, equipmentId: string) {
  const [row] = await selectEquipment(db).where(
    and(eq(equipment.organisationId, organisationId), eq(equipment.id, equipmentId)),
  );
  return row;
}

/** @returns the new unit, or undefined when the site is not the organisation's. */
export async function createEquipment(db: Database, organisationId: string, values: EquipmentValues) {
  const site = await getSite(db, organisationId, values.siteId);
  if (!site) return undefined;
  const rows = await db
    .insert(equipment)
    .values({ ...values, organisationId })
    .returning({ id: equipment.id });
  return getEquipment(db, organisationId, oneRow(rows, "insert equipment").id);
}

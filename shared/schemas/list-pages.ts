/**
 * The contracts of the paged lists (GET /api/visits, GET /api/equipment, GET /api/register): what a page may ask
 * for and what it answers. Pages follow a keyset cursor, not an offset: the server reads the
 * next rows after the last one shown in index order, so a page costs the same at the first
 * visit and at the twenty-thousandth, and a row added meanwhile neither repeats nor hides one.
 */
import { z } from "zod";
import { boundEnd, boundStart, dayOrInstant } from "./dates.ts";
import { EQUIPMENT_KINDS, EquipmentSchema } from "./equipment.ts";
import { text } from "./text.ts";
import { VISIT_STATUSES, VisitStatusSchema, VisitSummarySchema } from "./visits.ts";

/** A calendar date or a date-time with offset; a bare date is a whole UTC day. */
const DateBoundSchema = dayOrInstant();

/**
 * The register's filters: a period and a technician, shared by its page (below) and its CSV
 * export (register.ts). Here, not there, so that the lists' contracts, which every signed-in
 * screen loads, do not build the register's.
 */
export const REGISTER_FILTER_FIELDS = {
  from: DateBoundSchema.optional(),
  to: DateBoundSchema.optional(),
  technicianId: z.uuid("Choose a technician").optional(),
};

/** A period whose end comes before its start is a typing slip, not an empty register. */
export const periodInOrder: [(value: { from?: string; to?: string }) => boolean, { path: string[]; message: string }] =
  [
    (value) => !value.from || !value.to || boundStart(value.from) <= boundEnd(value.to),
    { path: ["to"], message: "The end of the period is before its start" },
  ];

/** Rows in a page when the client does not say: a screenful on a tablet, a few scrolls on a phone. */
export const DEFAULT_PAGE_SIZE = 50;
/** The most a page may hold, so one request stays small whatever the organisation's size. */
export const MAX_PAGE_SIZE = 200;
/** The longest search the lists take (a serial number and a few words fit well inside). */
export const MAX_SEARCH_LENGTH = 100;

export const SORT_DIRECTIONS = ["asc", "desc"] as const;
export type SortDirection = (typeof SORT_DIRECTIONS)[number];

const limit = z.coerce
  .number({ error: `The limit must be a whole number from 1 to ${MAX_PAGE_SIZE}` })
  .int(`The limit must be a whole number from 1 to ${MAX_PAGE_SIZE}`)
  .min(1, `The limit must be a whole number from 1 to ${MAX_PAGE_SIZE}`)
  .max(MAX_PAGE_SIZE, `The limit is at most ${MAX_PAGE_SIZE} rows a page`)
  .default(DEFAULT_PAGE_SIZE);

/** Opaque to the client: it sends back the `nextCursor` it was given, unchanged. */
const cursor = z
  .string()
  .max(1000, "That cursor is not one this list gave out; start from the first page")
  .regex(/^[A-Za-z0-9_-]+$/, "That cursor is not one this list gave out; start from the first page")
  .optional();

// text(): a NUL or a lone surrogate would make PostgreSQL refuse the query (see text.ts).
const search = text().max(MAX_SEARCH_LENGTH, `Search with at most ${MAX_SEARCH_LENGTH} characters`).optional();

const direction = z.enum(SORT_DIRECTIONS, { error: "The direction is asc or desc" }).optional();

/** `status=open,sent-back`: one status or several, comma-separated (a query string has no arrays). */
const statuses = z
  .string()
  .transform((value) => value.split(",").filter(Boolean))
  .pipe(
    z
      .array(VisitStatusSchema, { error: `A status is one of ${VISIT_STATUSES.join(", ")}` })
      .min(1)
      .max(VISIT_STATUSES.length),
  )
  .optional();

/** The columns the jobs list sorts by on the server; counts and crew are per page, so not sortable. */
export const VISIT_SORTS = ["startedAt", "equipmentName", "reason", "status"] as const;
export type VisitSort = (typeof VISIT_SORTS)[number];

export const VisitListQuerySchema = z.object({
  status: statuses,
  equipmentId: z.uuid("The equipment id is not a valid id").optional(),
  /** Words over the unit, site, customer, refrigerant, reason and crew (see shared/format/search-terms.ts). */
  q: search,
  /** `me`: only visits the person asking is on the crew of (Today's visit to resume). */
  crew: z.literal("me", { error: "crew takes only the value me" }).optional(),
  sort: z.enum(VISIT_SORTS, { error: `Sort by one of ${VISIT_SORTS.join(", ")}` }).default("startedAt"),
  /** Newest first for the start time, A first for the others, unless asked. */
  dir: direction,
  cursor,
  limit,
});
export type VisitListQuery = z.output<typeof VisitListQuerySchema>;
/** What a client sends (the limit as a number; the query string carries it as text). */
export type VisitListParams = Omit<z.input<typeof VisitListQuerySchema>, "limit"> & { limit?: number };

/** The columns the equipment list sorts by on the server. */
export const EQUIPMENT_SORTS = ["name", "kind", "place", "refrigerant", "circuits", "factoryCharge"] as const;
export type EquipmentSort = (typeof EQUIPMENT_SORTS)[number];

export const EquipmentListQuerySchema = z.object({
  /** Words over the name, kind, site, customer, refrigerant, location, maker, model and serial. */
  q: search,
  kind: z.enum(EQUIPMENT_KINDS, { error: "Choose one of the kinds of equipment" }).optional(),
  sort: z.enum(EQUIPMENT_SORTS, { error: `Sort by one of ${EQUIPMENT_SORTS.join(", ")}` }).default("name"),
  dir: direction,
  cursor,
  limit,
});
export type EquipmentListQuery = z.output<typeof EquipmentListQuerySchema>;
export type EquipmentListParams = Omit<z.input<typeof EquipmentListQuerySchema>, "limit"> & { limit?: number };

/**
 * GET /api/register: the period and technician of the CSV export, a page at a time, oldest
 * first unless `dir=desc` (the screen shows the latest lines first).
 */
export const RegisterPageQuerySchema = z
  .object({ ...REGISTER_FILTER_FIELDS, dir: direction, cursor, limit })
  .refine(...periodInOrder);
export type RegisterPageQuery = z.output<typeof RegisterPageQuerySchema>;
export type RegisterPageParams = Omit<z.input<typeof RegisterPageQuerySchema>, "limit"> & { limit?: number };

/** The default direction of each sort: dates newest first, everything else A (or least) first. */
export const defaultDirection = (sort: string): SortDirection => (sort === "startedAt" ? "desc" : "asc");

/** `nextCursor` is null on the last page. There is no total: counting every row would cost what paging saves. */
export const VisitPageSchema = z.object({ visits: z.array(VisitSummarySchema), nextCursor: z.string().nullable() });
export type VisitPage = z.infer<typeof VisitPageSchema>;

export const EquipmentPageSchema = z.object({ equipment: z.array(EquipmentSchema), nextCursor: z.string().nullable() });
export type EquipmentPage = z.infer<typeof EquipmentPageSchema>;

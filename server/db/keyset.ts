/**
 * Keyset paging for the lists: a page ends at a row, and the next page starts strictly after
 * that row's sort key and id. The database then reads rows in index order from that point,
 * however deep the page, where an OFFSET would read and throw away every row before it; and
 * rows added or removed meanwhile cannot make a row repeat or drop out between pages.
 */
import { and, asc, desc, sql, type AnyColumn, type SQL } from "drizzle-orm";
import { searchTerms, type SearchTerm } from "@shared/format/search-terms.ts";
import type { SortDirection } from "@shared/schemas/list-pages.ts";
import { HttpError } from "../http/http-error.ts";

/** How a key's value travels in the cursor: as Postgres prints it, cast back on the way in. */
type KeyType = "text" | "timestamptz" | "numeric";

/** One sort expression of a list. The row's id always follows as the tie-break. */
export interface SortKey {
  expr: SQL | AnyColumn;
  type: KeyType;
}

/** A list's sort: at least one key, the first of which an index can start from. */
export type SortKeys = readonly [SortKey, ...SortKey[]];

interface Cursor {
  values: string[];
  id: string;
}

const BAD_CURSOR = "That cursor is not one this list gave out; start from the first page";
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
// Values as Postgres prints them (timestamps to the microsecond, which a JS Date would round:
// two visits a few microseconds apart would then repeat or vanish between pages).
const VALUE_SHAPES: Record<KeyType, RegExp> = {
  // No NUL (PostgreSQL refuses it in text); other characters are compared, never run.
  // eslint-disable-next-line no-control-regex -- finding the NUL is the point
  text: /^[^\u0000]{0,500}$/,
  timestamptz: /^\d{4}-\d{2}-\d{2} \d{2}:\d{2}:\d{2}(\.\d{1,6})?[+-]\d{2}(:\d{2})?$/,
  numeric: /^-?\d{1,20}(\.\d{1,20})?$/,
};

/** The cursor names its sort and direction, so one given out for another order is refused, not misread. */
export function encodeCursor(sort: string, direction: SortDirection, values: string[], id: string): string {
  return Buffer.from(JSON.stringify({ s: sort, d: direction, v: values, id })).toString("base64url");
}

/** @throws HttpError 400 when the cursor was not made by `encodeCursor` for this sort and direction. */
export function decodeCursor(raw: string, sort: string, direction: SortDirection, keys: SortKeys): Cursor {
  const refuse = () => new HttpError(400, BAD_CURSOR, { cursor: BAD_CURSOR });
  let parsed: unknown;
  try {
    parsed = JSON.parse(Buffer.from(raw, "base64url").toString("utf8"));
  } catch {
    throw refuse();
  }
  if (typeof parsed !== "object" || parsed === null) throw refuse();
  const { s, d, v, id } = parsed as Record<string, unknown>;
  if (s !== sort || d !== direction) {
    throw new HttpError(400, "That cursor belongs to another sort order; start from the first page", {
      cursor: "The sort order changed",
    });
  }
  if (typeof id !== "string" || !UUID.test(id) || !Array.isArray(v) || v.length !== keys.length) throw refuse();
  const values = keys.map((key, index) => {
    const value: unknown = v[index];
    if (typeof value !== "string" || !VALUE_SHAPES[key.type].test(value)) throw refuse();
    return value;
  });
  return { values, id };
}

const typed = (value: string, type: KeyType) =>
  type === "timestamptz"
    ? sql`cast(${value} as timestamptz)`
    : type === "numeric"
      ? sql`cast(${value} as numeric)`
      : sql`${value}`;

/**
 * Rows strictly after the cursor in this order. The first key's bound is also written on its
 * own, so the planner can start an index scan there instead of filtering every row.
 */
export function afterCursor(keys: SortKeys, idColumn: AnyColumn, direction: SortDirection, cursor: Cursor): SQL {
  const beyond = direction === "asc" ? sql.raw(">") : sql.raw("<");
  const reaches = direction === "asc" ? sql.raw(">=") : sql.raw("<=");
  const left = sql.join([...keys.map((key) => sql`${key.expr}`), sql`${idColumn}`], sql`, `);
  const right = sql.join(
    [...keys.map((key, index) => typed(cursorValue(cursor, index), key.type)), sql`cast(${cursor.id} as uuid)`],
    sql`, `,
  );
  return and(
    sql`${keys[0].expr} ${reaches} ${typed(cursorValue(cursor, 0), keys[0].type)}`,
    sql`(${left}) ${beyond} (${right})`,
  )!;
}

/** The cursor's value for the key at `index`: `decodeCursor` gave it one per key of the same sort. */
function cursorValue(cursor: Cursor, index: number): string {
  const value = cursor.values[index];
  if (value === undefined) throw new Error(`afterCursor requires a cursor value for sort key ${index}`);
  return value;
}

export function keysetOrder(keys: readonly SortKey[], idColumn: AnyColumn, direction: SortDirection): SQL[] {
  const by = direction === "asc" ? asc : desc;
  return [...keys.map((key) => by(key.expr)), by(idColumn)];
}

/** The keys as text in the select list, to build the next cursor from the page's last row. */
export function cursorColumns(keys: readonly SortKey[]): Record<string, SQL.Aliased<string>> {
  return Object.fromEntries(
    keys.map((key, index) => [`cursorKey${index}`, sql<string>`(${key.expr})::text`.as(`cursor_key_${index}`)]),
  );
}

/**
 * Takes `limit + 1` rows as read: the extra one only says that another page exists.
 * @returns the page's rows and the cursor after its last row (null on the last page).
 */
export function pageOf<Row extends { id: string }>(
  rows: Row[],
  limit: number,
  keys: readonly SortKey[],
  sort: string,
  direction: SortDirection,
) {
  const page = rows.slice(0, limit) as (Row & Record<string, unknown>)[];
  const last = page.at(-1);
  const nextCursor =
    rows.length > limit && last
      ? encodeCursor(
          sort,
          direction,
          keys.map((_key, index) => String(last[`cursorKey${index}`])),
          last.id,
        )
      : null;
  // The keys were read for the cursor only; the rows go out without them.
  const withoutKeys = page.map((row) => {
    const copy: Record<string, unknown> = { ...row };
    keys.forEach((_key, index) => delete copy[`cursorKey${index}`]);
    return copy as Row;
  });
  return { page: withoutKeys, nextCursor };
}

/** A LIKE pattern for "contains `text`", with LIKE's wildcards (%, _) and its escape (\\) taken literally. */
export const containsPattern = (text: string): string => `%${text.replace(/[\\%_]/g, (char) => `\\${char}`)}%`;

/**
 * The search of shared/format/search-terms.ts in SQL: every word of the query must match, as
 * `termMatches` says (usually `containsTerm` on the record's search column).
 */
export function matchesSearchSql(query: string | undefined, termMatches: (term: SearchTerm) => SQL): SQL | undefined {
  const terms = query ? searchTerms(query) : [];
  return terms.length === 0 ? undefined : and(...terms.map(termMatches));
}

/**
 * One word of a search against a maintained search column (the record's words, lower-case,
 * spaces and dashes taken out: search_compact in migration list_search). A word found as typed
 * in the plain text is found without its dashes in the compact text, and then without its
 * leading "r" too; so the rule "as typed, or without dashes, or without the r" is the same as
 * "its `withoutR` is in the compact text": one LIKE, which a trigram index answers.
 */
export const containsTerm = (searchColumn: AnyColumn | SQL, term: SearchTerm): SQL =>
  sql`${searchColumn} like ${containsPattern(term.withoutR)}`;

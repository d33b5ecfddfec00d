import { dehydrate, hydrate, type Query, type QueryClient } from "@tanstack/react-query";
import type { AuthUser } from "@shared/schemas/auth.ts";
import { meQueryOptions } from "@/lib/api/auth.ts";
import { deleteKeptData, readKeptData, writeKeptData } from "./device-cache.ts";

/**
 * What the app keeps of its data on the device, so that the screens of the day open without
 * signal: who is signed in, visits and their units, their procedure records, the register's view
 * of them, charge references, cylinders and the company's limits. Not kept: property tables (the service worker
 * holds those), server health, mail, invitations, members, and anything of pages past the first
 * or of a search.
 */
const KEPT_KINDS = new Set([
  "auth",
  "visits",
  "equipment",
  "charge-references",
  "register",
  "cylinders",
  "organisation",
  "profile",
  "procedures",
]);
/** Kept data older than this is dropped rather than shown as the day's. */
const MAX_AGE_MS = 7 * 24 * 60 * 60 * 1000;
/** Kept queries stay in memory this long without a screen, so they are still there to save. */
const KEPT_GC_MS = MAX_AGE_MS;
/** Writes are gathered: a live visit refreshes every few seconds. */
const SAVE_DELAY_MS = 1500;

function isKept(query: Query): boolean {
  if (query.state.status !== "success") return false;
  const [kind, view, params] = query.queryKey as [unknown, unknown, unknown];
  if (!KEPT_KINDS.has(String(kind))) return false;
  if (kind === "register" && view === "list") return false;
  // A list's first page, unsearched (Today, the jobs and equipment lists as they open).
  if (view === "list" && params && typeof params === "object")
    return !("cursor" in params && params.cursor) && !("q" in params && params.q);
  return true;
}

let restoring: Promise<void> = Promise.resolve();

/**
 * Puts the kept data back in the cache at start-up, if it belongs to this build and is recent.
 * The session loader waits for it, so a screen opened offline finds its data. Whose data it is
 * matters once the server answers: `keepDataOnDevice` drops it when someone else signs in.
 */
export function restoreKeptData(queryClient: QueryClient): Promise<void> {
  restoring = readKeptData()
    .then((kept) => {
      if (!kept || kept.build !== __SATURA_BUILD__ || Date.now() - kept.savedAt > MAX_AGE_MS) return;
      hydrate(queryClient, kept.state);
      // Saved a moment after each change, the kept copy can be older than what this device last
      // showed (a reload right after a save): shown at once, and asked again by each screen that
      // reads it (with signal). A query already answered since the page started keeps its answer.
      for (const { queryKey, state } of kept.state.queries) {
        if (queryClient.getQueryState(queryKey)?.dataUpdatedAt === state.dataUpdatedAt)
          void queryClient.invalidateQueries({ queryKey, exact: true, refetchType: "none" });
      }
    })
    .catch(() => undefined);
  return restoring;
}

/** Resolves once the kept data is back in the cache (or there was none). */
export const keptDataRestored = (): Promise<void> => restoring;

/**
 * Saves the kept part of the cache a moment after each change, for the person signed in. When
 * no one is (signed out, session ended), the kept data is deleted: a person signing in next on
 * this device never sees the last one's visits. Signing in clears the cache first (auth.ts).
 */
export function keepDataOnDevice(queryClient: QueryClient): () => void {
  for (const kind of KEPT_KINDS) queryClient.setQueryDefaults([kind], { gcTime: KEPT_GC_MS });
  let timer: ReturnType<typeof setTimeout> | undefined;
  const save = async () => {
    const me = queryClient.getQueryData<AuthUser | null>(meQueryOptions().queryKey);
    if (!me) return void (await deleteKeptData());
    await writeKeptData({
      userId: me.id,
      build: __SATURA_BUILD__,
      savedAt: Date.now(),
      state: dehydrate(queryClient, { shouldDehydrateQuery: isKept }),
    });
  };
  const unsubscribe = queryClient.getQueryCache().subscribe((event) => {
    if (event.type === "updated" && event.action.type !== "success") return;
    if (event.type !== "updated" && event.type !== "removed") return;
    clearTimeout(timer);
    timer = setTimeout(() => void save().catch(() => undefined), SAVE_DELAY_MS);
  });
  return () => {
    clearTimeout(timer);
    unsubscribe();
  };
}

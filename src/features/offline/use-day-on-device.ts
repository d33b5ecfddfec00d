import { useQueries, useQueryClient } from "@tanstack/react-query";
import { useEffect } from "react";
import { loadVisitScreen } from "@/lib/api/screen-data.ts";
import { MY_OPEN_VISITS, OPEN_VISITS_FIRST_PAGE, visitsQueryOptions } from "@/lib/api/visits.ts";
import { useOnlineStatus } from "./online-status.ts";
import { whenIdleAfterFirstScreen } from "@/lib/first-screen.ts";

/** At most this many visits are fetched ahead for offline use. */
const VISITS_KEPT = 20;

/**
 * The day at hand, fetched ahead while there is signal, so that it opens on a roof without: the
 * visits the person is on the crew of and the company's first page of open visits (what Today
 * lists), each with what its screen needs (unit, charge references, refrigerant table), its
 * refrigerant balance and its procedure records. One visit after another, when the browser is idle, whenever the lists
 * change (a visit started, one signed off) or the signal returns; what is already in the cache
 * is not asked again. The cache is kept on the device by persist-queries.ts.
 */
export function useDayOnDevice(): void {
  const queryClient = useQueryClient();
  const online = useOnlineStatus();
  const lists = useQueries({
    queries: [MY_OPEN_VISITS, OPEN_VISITS_FIRST_PAGE].map((params) => visitsQueryOptions(params)),
  });
  const ids = [...new Set(lists.flatMap((list) => list.data?.visits.map((visit) => visit.id) ?? []))]
    .slice(0, VISITS_KEPT)
    .join(" ");
  useEffect(() => {
    if (!online || !ids) return;
    let stopped = false;
    const keep = async () => {
      // The register's and the procedures' contracts come now, not with the frame: building
      // their schemas held up every signed-in screen's first render (vite.config.ts).
      const [{ visitRefrigerantQueryOptions }, { prefetchProcedureLists }] = await Promise.all([
        import("@/lib/api/register.ts"),
        import("@/lib/api/procedures.ts"),
      ]);
      for (const id of ids.split(" ")) {
        if (stopped || !navigator.onLine) return;
        await loadVisitScreen(queryClient, id);
        await queryClient.prefetchQuery(visitRefrigerantQueryOptions(id));
        // The sections' records: an evacuation begun with signal takes its samples offline.
        await prefetchProcedureLists(queryClient, id);
      }
    };
    const cancel = whenIdleAfterFirstScreen(() => void keep(), 10_000);
    return () => {
      stopped = true;
      cancel();
    };
  }, [online, ids, queryClient]);
}

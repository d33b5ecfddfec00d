import { useQuery } from "@tanstack/react-query";
import { useEffect } from "react";
import { getRefrigerantsInUse } from "@/lib/api/equipment.ts";
import { whenIdleAfterFirstScreen } from "@/lib/first-screen.ts";

/**
 * Once per start of the signed-in app, when the browser is idle and online: the property tables
 * of the refrigerants in the company's units are fetched, so that the run log of any of them
 * works on a roof without signal (with the service worker, which caches them). Off in
 * development, where no worker caches anything.
 */
export function useOfflineTables(): void {
  const refrigerants = useQuery({
    queryKey: ["equipment", "refrigerants-in-use"],
    queryFn: ({ signal }) => getRefrigerantsInUse(signal),
    staleTime: Infinity,
    enabled: import.meta.env.PROD && typeof navigator !== "undefined" && "serviceWorker" in navigator,
  });
  const ids = refrigerants.data;
  useEffect(() => {
    if (!ids || ids.length === 0) return;
    return whenIdleAfterFirstScreen(
      () => void import("./warm-refrigerant-tables.ts").then(({ warmRefrigerantTables }) => warmRefrigerantTables(ids)),
      10_000,
    );
  }, [ids]);
}

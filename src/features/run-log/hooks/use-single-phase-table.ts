import { useQuery } from "@tanstack/react-query";
import { loadSinglePhaseTable } from "@shared/property-tables/load-single-phase-table.ts";

/**
 * Loads a refrigerant's single-phase table once per session (its own chunk; it never changes
 * while the app runs). The measured cycle draws with it, and the live diagnosis judges the
 * compressor with it, as the server does for every stored reading.
 */
export function useSinglePhaseTable(refrigerant: string, enabled = true) {
  return useQuery({
    queryKey: ["single-phase-table", refrigerant],
    queryFn: async () => {
      await loadSinglePhaseTable(refrigerant);
      return refrigerant;
    },
    enabled: enabled && refrigerant !== "",
    staleTime: Infinity,
    gcTime: Infinity,
  });
}

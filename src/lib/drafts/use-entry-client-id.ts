import { useCallback, useMemo, useRef } from "react";

/**
 * The client id of the entry being submitted (README decision 026): made when the entry is first
 * submitted and kept across retries of it, so a save whose answer was lost, tried again, is stored
 * once by the server. `take` gives the pending id (a new one when none is pending); `release`
 * lets it go once the entry is stored, or when its values change and it becomes another entry.
 */
export function useEntryClientId() {
  const pending = useRef<string | null>(null);
  const take = useCallback(() => (pending.current ??= crypto.randomUUID()), []);
  const release = useCallback(() => {
    pending.current = null;
  }, []);
  return useMemo(() => ({ take, release }), [take, release]);
}

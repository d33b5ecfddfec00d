import { useCallback, useState } from "react";
import { clearDraft, readDraft, writeDraft } from "./draft-store.ts";

/**
 * Form state kept on this device under `key` while it holds unsaved values: starts from the
 * stored draft when there is one (after a reload or coming back to the section), else from
 * `initial`. Every change is stored; `discard` forgets it once the values are saved.
 * `restored` says the values on screen came back from an earlier, unsaved session.
 */
export function useStoredDraft<T>(key: string, initial: () => T) {
  const [state, setState] = useState(() => {
    const stored = readDraft<T>(key);
    return { value: stored ?? initial(), restored: stored !== null };
  });
  const update = useCallback(
    (change: T | ((current: T) => T)) =>
      setState((current) => {
        const value = typeof change === "function" ? (change as (current: T) => T)(current.value) : change;
        writeDraft(key, value);
        return { value, restored: current.restored };
      }),
    [key],
  );
  /** The values were saved: forget the stored copy; the form keeps `next` (e.g. values carried forward). */
  const discard = useCallback(
    (next?: (current: T) => T) => {
      clearDraft(key);
      setState((current) => ({ value: next ? next(current.value) : current.value, restored: false }));
    },
    [key],
  );
  return { value: state.value, restored: state.restored, update, discard };
}

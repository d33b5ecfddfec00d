import { useSyncExternalStore } from "react";

/**
 * A new version of the app that the service worker has fetched and holds, waiting: `apply`
 * activates it and reloads the page. Set by service-worker.ts, read by the update banner.
 */
interface WaitingUpdate {
  apply: () => Promise<void>;
}

let waiting: WaitingUpdate | null = null;
const listeners = new Set<() => void>();

export function offerUpdate(update: WaitingUpdate | null): void {
  waiting = update;
  for (const listener of listeners) listener();
}

export function useWaitingUpdate(): WaitingUpdate | null {
  return useSyncExternalStore(
    (onChange) => {
      listeners.add(onChange);
      return () => listeners.delete(onChange);
    },
    () => waiting,
    () => null,
  );
}

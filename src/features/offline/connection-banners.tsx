import { useState } from "react";
import { Button } from "@/components/ui/button/button.tsx";
import { useWaitingUpdate } from "./app-update.ts";
import { useOnlineStatus } from "./online-status.ts";

/**
 * The bar at the top of every screen that says the device is offline, or that a new version of
 * the app is ready. It stays in the page's flow and sticks to the top, so that it never covers
 * the run log's figures or its Save button.
 */
export function ConnectionBanners() {
  const online = useOnlineStatus();
  const update = useWaitingUpdate();
  const [updateDeferred, setUpdateDeferred] = useState(false);
  const [applying, setApplying] = useState(false);
  const showUpdate = update && !updateDeferred;
  if (online && !showUpdate) return null;
  return (
    <div className="no-print sticky top-0 z-40">
      {!online && (
        <p role="status" className="border-b-2 border-caution bg-surface px-4 py-2 text-sm font-medium">
          <span aria-hidden>⚠ </span>Offline. Visits kept on this device open as usual; saving needs the signal, and
          what you type stays here until then.
        </p>
      )}
      {showUpdate && (
        <div
          role="status"
          className="flex flex-wrap items-center gap-3 border-b-2 border-rule bg-surface px-4 py-2 text-sm"
        >
          <span className="font-medium">A new version of Satura is ready.</span>
          <span className="text-muted">What you have typed is kept.</span>
          <span className="ml-auto flex gap-2">
            <Button
              disabled={applying}
              onClick={() => {
                setApplying(true);
                void update.apply();
              }}
            >
              {applying ? "Reloading…" : "Reload now"}
            </Button>
            <Button variant="quiet" onClick={() => setUpdateDeferred(true)}>
              Later
            </Button>
          </span>
        </div>
      )}
    </div>
  );
}

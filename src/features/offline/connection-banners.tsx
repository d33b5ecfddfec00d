import { useState } from "react";
import { Button } from "@/components/ui/button/button.tsx";
import { useWaitingUpdate } from "./app-update.ts";
import { useOnlineStatus } from "./online-status.ts";
import { useOutboxEntries } from "./use-outbox.ts";

const entriesText = (count: number) => (count === 1 ? "1 entry" : `${count} entries`);

/**
 * The bar at the top of every screen that says the device is offline, how many entries wait on
 * the device to be sent (or were refused), or that a new version of the app is ready. It stays in the page's flow and sticks to the top, so that it never covers
 * the run log's figures or its Save button.
 */
export function ConnectionBanners() {
  const online = useOnlineStatus();
  const update = useWaitingUpdate();
  const [updateDeferred, setUpdateDeferred] = useState(false);
  const [applying, setApplying] = useState(false);
  const entries = useOutboxEntries();
  const refused = entries.filter((entry) => entry.state === "refused").length;
  const waiting = entries.length - refused;
  const showUpdate = update && !updateDeferred;
  if (online && !showUpdate && entries.length === 0) return null;
  return (
    <div className="no-print sticky top-0 z-40">
      {(!online || entries.length > 0) && (
        <p role="status" className="border-b-2 border-caution bg-surface px-4 py-2 text-sm font-medium">
          {!online && (
            <>
              <span aria-hidden>⚠ </span>Offline. Visits kept on this device open as usual; entries you save wait here
              and are sent when the signal returns.{" "}
            </>
          )}
          {waiting > 0 && <span data-testid="outbox-waiting">{entriesText(waiting)} waiting to send. </span>}
          {refused > 0 && (
            <span className="text-fault">{entriesText(refused)} refused by the server: see the visit. </span>
          )}
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

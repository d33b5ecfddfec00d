import { CloudOff, OctagonAlert } from "lucide-react";
import { formatTime } from "@shared/format/date-time.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { discardEntry, type OutboxEntry } from "./outbox-store.ts";

interface WaitingEntriesProps {
  entries: readonly OutboxEntry[];
  /** The values of a refused entry, put back in the form to be corrected and saved again. */
  onPutBack?: (entry: OutboxEntry) => void;
}

/**
 * A visit's entries still on the device: each waiting one marked as such with the time it was
 * taken, each refused one with the server's reason and what the technician can do about it.
 * Nothing leaves this list unless it reaches the server or the technician discards it.
 */
export function WaitingEntries({ entries, onPutBack }: WaitingEntriesProps) {
  if (entries.length === 0) return null;
  return (
    <section aria-label="Entries on this device" className="rounded-card border-2 border-caution bg-surface p-3">
      <h3 className="font-semibold">On this device, not yet on the server</h3>
      <ul className="mt-2 space-y-2">
        {entries.map((entry) => (
          <li key={entry.clientId} className="flex flex-wrap items-center gap-x-3 gap-y-1">
            {entry.state === "waiting" ? (
              <>
                <CloudOff aria-hidden className="size-5 shrink-0" />
                <span className="font-medium">{entry.label}</span>
                <span className="num text-muted">taken {formatTime(entry.takenAt)}</span>
                <span className="text-sm font-medium">Waiting to send</span>
              </>
            ) : (
              <>
                <OctagonAlert aria-hidden className="size-5 shrink-0 text-fault" />
                <span className="font-medium">{entry.label}</span>
                <span className="num text-muted">taken {formatTime(entry.takenAt)}</span>
                <span className="w-full text-sm">
                  <strong className="text-fault">Refused by the server:</strong> {entry.reason}
                </span>
                <span className="flex gap-2">
                  {onPutBack && (
                    <Button variant="secondary" onClick={() => onPutBack(entry)}>
                      Put back in the form
                    </Button>
                  )}
                  <Button variant="quiet" onClick={() => void discardEntry(entry.clientId)}>
                    Discard
                  </Button>
                </span>
              </>
            )}
          </li>
        ))}
      </ul>
    </section>
  );
}

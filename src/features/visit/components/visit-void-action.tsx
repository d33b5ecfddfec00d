import { CloudOff, OctagonAlert } from "lucide-react";
import type { VoidableKind } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { VoidAction } from "@/components/ui/void-record/void-action.tsx";
import { useVoidRecord, voidsPath } from "@/lib/api/visits.ts";
import { discardEntry } from "@/features/offline/outbox-store.ts";
import { useKeepWhenOffline, useOutboxEntries } from "@/features/offline/use-outbox.ts";

interface VisitVoidActionProps {
  visitId: string;
  kind: VoidableKind;
  recordId: string;
  /** The record in words, e.g. "the reading of 10:42 on circuit 1". */
  what: string;
  /** What else goes with it, said before the technician confirms. */
  alsoVoids?: string;
  disabled?: boolean;
}

/**
 * "Void" on one of a visit's records. Without signal the void waits on the device like any other
 * entry (README decision 027), and the record says so instead of offering Void again; the server
 * takes a repeated void (same record, same reason, same person) as the one already made. A void
 * the server refuses stays here with its reason until the technician discards it.
 */
export function VisitVoidAction({ visitId, kind, recordId, what, alsoVoids, disabled }: VisitVoidActionProps) {
  const voidRecord = useVoidRecord();
  const keepWhenOffline = useKeepWhenOffline();
  const onDevice = useOutboxEntries().find(
    (entry) => entry.kind === "void" && entry.visitId === visitId && entry.body.recordId === recordId,
  );

  if (onDevice?.state === "waiting") {
    return (
      <span className="inline-flex min-h-touch items-center gap-1 text-sm font-medium">
        <CloudOff aria-hidden className="size-4 shrink-0" /> Void waiting to send
      </span>
    );
  }
  if (onDevice) {
    return (
      <span className="inline-flex flex-wrap items-center gap-2 text-sm">
        <OctagonAlert aria-hidden className="size-4 shrink-0 text-fault" />
        <span>
          <strong className="text-fault">Void refused by the server:</strong> {onDevice.reason}
        </span>
        <Button variant="quiet" onClick={() => void discardEntry(onDevice.clientId)}>
          Discard the void
        </Button>
      </span>
    );
  }
  return (
    <VoidAction
      what={what}
      alsoVoids={alsoVoids}
      disabled={disabled}
      onVoid={(reason) => {
        const body = { kind, recordId, reason };
        return keepWhenOffline(() => voidRecord.mutateAsync({ visitId, ...body }), {
          kind: "void",
          visitId,
          clientId: crypto.randomUUID(),
          label: `Void of ${what}`,
          path: voidsPath(visitId),
          body,
        });
      }}
    />
  );
}

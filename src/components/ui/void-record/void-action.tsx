import { Ban } from "lucide-react";
import { MAX_REASON_LENGTH, VoidReasonSchema } from "@shared/schemas/visits.ts";
import { ReasonDialog } from "@/components/ui/reason-dialog/reason-dialog.tsx";

interface VoidActionProps {
  /** The record in words, e.g. "the reading of 10:42 on circuit 1". */
  what: string;
  /** What else goes with it, said before the technician confirms (e.g. its register line). */
  alsoVoids?: string;
  /** Voids the record with the reason; rejects with the server's message. */
  onVoid: (reason: string) => Promise<unknown>;
  disabled?: boolean;
}

/** "Void" on a record: asks why (required) and says that the record stays, struck through. */
export function VoidAction({ what, alsoVoids, onVoid, disabled = false }: VoidActionProps) {
  return (
    <ReasonDialog
      trigger={{ label: "Void", icon: Ban, variant: "quiet", ariaLabel: `Void ${what}`, disabled }}
      title={`Void ${what}?`}
      explanation={`The record stays on the visit, struck through with your reason, and is left out of results, balances and the report.${alsoVoids ? ` ${alsoVoids}` : ""} Enter it again if it was a typing slip.`}
      maxLength={MAX_REASON_LENGTH}
      confirmLabel="Void the record"
      pendingLabel="Voiding…"
      schema={VoidReasonSchema}
      onConfirm={({ reason }) => onVoid(reason)}
    />
  );
}

import { Eraser } from "lucide-react";
import { ChargeReferenceClearSchema, MAX_CLEAR_REASON_LENGTH } from "@shared/schemas/charge-references.ts";
import { ReasonDialog } from "@/components/ui/reason-dialog/reason-dialog.tsx";
import { useClearChargeReference } from "@/lib/api/charge-references.ts";

/** "Clear…" on a circuit's reference point: asks why (required; kept in the history). */
export function ClearChargeReference({ equipmentId, circuit }: { equipmentId: string; circuit: number }) {
  const clear = useClearChargeReference(equipmentId);
  return (
    <ReasonDialog
      trigger={{ label: "Clear…", icon: Eraser, variant: "secondary" }}
      title={<>Clear circuit {circuit}&rsquo;s reference point?</>}
      explanation="Charge estimates on this circuit go back to generic coefficients and a wide range until it is weighed in and settles again. The reference point stays in the history with your reason."
      maxLength={MAX_CLEAR_REASON_LENGTH}
      confirmLabel="Clear the reference point"
      pendingLabel="Clearing…"
      schema={ChargeReferenceClearSchema}
      onConfirm={(body) => clear.mutateAsync({ circuit, body })}
    />
  );
}

import type { ReactNode } from "react";
import { MOVEMENT_KIND_LABELS, type Movement } from "@shared/schemas/register.ts";
import { VoidedRecord } from "@/components/ui/void-record/voided-record.tsx";
import { formatKg } from "../utils/format-register.ts";
import { formatDateTime } from "@shared/format/date-time.ts";

/**
 * One register movement as the lists show it: mass and kind, circuit, when, cylinder and
 * technician, the note; struck through with its reason once voided. `extra` goes on the
 * details line (e.g. a link to the visit).
 */
export function MovementRecord({ movement, extra }: { movement: Movement; extra?: ReactNode }) {
  return (
    <VoidedRecord voided={movement.voided}>
      <p className="font-semibold">
        <span className="num">{formatKg(movement.kg)}</span> {MOVEMENT_KIND_LABELS[movement.kind].toLowerCase()}
        {movement.circuit !== null && <span className="font-normal"> · circuit {movement.circuit}</span>}
      </p>
      <p className="text-sm text-muted">
        <span className="num">{formatDateTime(movement.at)}</span>
        {movement.cylinder && <> · cylinder {movement.cylinder.label}</>}
        {movement.technician && <> · {movement.technician.name}</>}
        {extra}
      </p>
      {movement.note && <p>{movement.note}</p>}
    </VoidedRecord>
  );
}

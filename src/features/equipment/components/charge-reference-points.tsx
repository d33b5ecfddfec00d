import { Crosshair, History } from "lucide-react";
import { Link } from "react-router-dom";
import {
  CHARGE_REFERENCE_SOURCE_LABELS,
  type CircuitChargeReferences,
  type StoredChargeReference,
} from "@shared/schemas/charge-references.ts";
import type { VisitSummary } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { paths } from "@/config/paths.ts";
import { useChargeReferences } from "@/lib/api/charge-references.ts";
import { formatNumber, type DisplayUnits } from "@/lib/units/display-units.ts";
import { formatDateTime } from "@shared/format/date-time.ts";
import { ChargeReferenceValues } from "./charge-reference-values.tsx";
import { ClearChargeReference } from "./clear-charge-reference.tsx";
import { SetChargeReference } from "./set-charge-reference.tsx";

export const NO_REFERENCE_TEXT =
  "No reference point yet — estimates use generic coefficients and a wide range; it is set after a weigh-in of the nameplate charge once the circuit settles.";

interface ChargeReferencePointsProps {
  equipmentId: string;
  visits: VisitSummary[];
  units: DisplayUnits;
  /** Seniors and owners may set and clear; everyone else reads. */
  canManage: boolean;
}

/** Where a reference point came from, in words, with a link to its visit. */
function Provenance({ reference }: { reference: StoredChargeReference }) {
  return (
    <p className="text-sm">
      {CHARGE_REFERENCE_SOURCE_LABELS[reference.source]} · set {formatDateTime(reference.setAt)}
      {reference.setBy && <> by {reference.setBy.name}</>}
      {reference.visitId && (
        <>
          {" "}
          · from{" "}
          <Link
            to={paths.visits.detail.getHref(reference.visitId)}
            className="text-accent underline underline-offset-4"
          >
            the visit of {reference.visitStartedAt ? formatDateTime(reference.visitStartedAt) : "that day"}
          </Link>
        </>
      )}
      {reference.readingCount > 1 && <> · mean of {reference.readingCount} settled readings</>}
      {reference.note && <span className="block text-muted">{reference.note}</span>}
    </p>
  );
}

function CircuitReference({
  circuit,
  showNumber,
  ...props
}: ChargeReferencePointsProps & { circuit: CircuitChargeReferences; showNumber: boolean }) {
  const { current } = circuit;
  const earlier = circuit.history.filter((reference) => reference.id !== current?.id);
  return (
    <article
      aria-label={`Circuit ${circuit.circuit} reference point`}
      className="space-y-3 rounded-card border-2 border-rule bg-surface p-4"
    >
      <header className="space-y-0.5">
        {showNumber && <h3 className="text-lg font-semibold">Circuit {circuit.circuit}</h3>}
        <p className="text-sm text-muted">
          Correct charge <span className="num">{formatNumber(circuit.correctChargeKg, 2)} kg</span>
          {circuit.lineAdjustmentKg !== 0 && (
            <>
              {" "}
              (nameplate plus <span className="num">{formatNumber(circuit.lineAdjustmentKg, 2)} kg</span> for the line
              set)
            </>
          )}
        </p>
      </header>
      {current ? (
        <>
          <p className="flex items-center gap-2 font-medium">
            <Crosshair aria-hidden className="size-5" /> Reference point set: estimates use this circuit&rsquo;s own
            history and a narrow range
          </p>
          <ChargeReferenceValues values={current.values} units={props.units} />
          <Provenance reference={current} />
        </>
      ) : (
        <p className="text-muted">{NO_REFERENCE_TEXT}</p>
      )}
      {props.canManage && (
        <div className="flex flex-wrap gap-2">
          <SetChargeReference
            equipmentId={props.equipmentId}
            circuit={circuit.circuit}
            visits={props.visits}
            units={props.units}
          />
          {current && <ClearChargeReference equipmentId={props.equipmentId} circuit={circuit.circuit} />}
        </div>
      )}
      {earlier.length > 0 && (
        <details className="rounded-card border-2 border-rule p-3">
          <summary className="flex min-h-touch cursor-pointer items-center gap-2 font-medium">
            <History aria-hidden className="size-5" /> Earlier reference points ({earlier.length})
          </summary>
          <ul className="mt-2 space-y-3">
            {earlier.map((reference) => (
              <li key={reference.id} className="space-y-2 border-t-2 border-rule pt-3">
                <ChargeReferenceValues values={reference.values} units={props.units} />
                <Provenance reference={reference} />
                {reference.cleared && (
                  <p className="text-sm">
                    Cleared {formatDateTime(reference.cleared.at)}
                    {reference.cleared.by && <> by {reference.cleared.by.name}</>}: {reference.cleared.reason}
                  </p>
                )}
              </li>
            ))}
          </ul>
        </details>
      )}
    </article>
  );
}

/**
 * Each circuit's charge reference point: the settled readings at a known correct charge that
 * charge estimates are measured from (virtual refrigerant charge method, Li & Braun 2009), when
 * and by whom it was set, and its history.
 */
export function ChargeReferencePoints(props: ChargeReferencePointsProps) {
  const references = useChargeReferences(props.equipmentId);
  if (references.isPending) return <p aria-busy="true">Loading the reference points…</p>;
  if (references.isError) {
    return (
      <div className="space-y-2">
        <p role="alert" className="font-medium text-fault">
          ⚠ The reference points did not load: {references.error.message}
        </p>
        <Button variant="secondary" onClick={() => void references.refetch()}>
          Try again
        </Button>
      </div>
    );
  }
  const { circuits } = references.data;
  return (
    <div className="space-y-3">
      {circuits.map((circuit) => (
        <CircuitReference key={circuit.circuit} circuit={circuit} showNumber={circuits.length > 1} {...props} />
      ))}
    </div>
  );
}

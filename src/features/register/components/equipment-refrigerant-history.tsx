import { Link } from "react-router-dom";
import { paths } from "@/config/paths.ts";
import { useEquipmentRefrigerant } from "@/lib/api/register.ts";
import { formatNumber } from "@/lib/units/display-units.ts";
import { formatKg } from "../utils/format-register.ts";
import { HiddenLinesNote } from "./hidden-lines-note.tsx";
import { MovementRecord } from "./movement-record.tsx";

/**
 * A unit's refrigerant history from the register, newest first, with the estimated leak rate
 * from what had to be put back on each visit.
 */
export function EquipmentRefrigerantHistory({ equipmentId }: { equipmentId: string }) {
  const history = useEquipmentRefrigerant(equipmentId);
  if (history.isPending) return <p aria-busy="true">Reading the register…</p>;
  if (history.isError)
    return (
      <p role="alert" className="font-medium text-fault">
        ⚠ The register did not load: {history.error.message}
      </p>
    );
  const { movements, hiddenMovements, leakRate, topUps, nameplateKg, refrigerant } = history.data;
  const newestFirst = [...movements].reverse();
  return (
    <div className="space-y-3">
      <div className="rounded-card border-2 border-rule bg-surface p-4" data-testid="leak-rate">
        <p className="font-semibold">Estimated leak rate</p>
        {leakRate ? (
          <>
            <p className="num text-2xl">
              {formatNumber(leakRate.kgPerYear, 2)} kg/yr · {formatNumber(leakRate.percentOfChargePerYear, 1)} % of the{" "}
              {formatKg(nameplateKg)} charge per year
            </p>
            <p className="text-sm text-muted">
              From {topUps.length} top-ups over {Math.round(leakRate.periodDays)} days (the first opens the period).
              Leak-repair rules compare this with triggers such as 10 % for comfort cooling and 20 % for commercial
              refrigeration (US 40 CFR 82.157).
            </p>
          </>
        ) : (
          <p className="text-muted">
            {topUps.length === 0
              ? "No refrigerant has had to be put back into this unit."
              : "One top-up so far: a rate needs two, at least a day apart."}
          </p>
        )}
      </div>
      <HiddenLinesNote count={hiddenMovements} />
      {newestFirst.length === 0 ? (
        hiddenMovements === 0 && (
          <p className="text-muted">No {refrigerant} recovered, reused or added on this unit yet.</p>
        )
      ) : (
        <ul
          aria-label="Refrigerant history"
          className="divide-y-2 divide-rule overflow-hidden rounded-card border-2 border-rule bg-surface"
        >
          {newestFirst.map((movement) => (
            <li key={movement.id} className="p-3">
              <MovementRecord
                movement={movement}
                extra={
                  movement.visitId && (
                    <>
                      {" "}
                      ·{" "}
                      <Link
                        to={paths.visits.detail.getHref(movement.visitId)}
                        className="text-accent underline underline-offset-4"
                      >
                        open the visit
                      </Link>
                    </>
                  )
                }
              />
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

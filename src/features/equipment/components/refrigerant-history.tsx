import { useQueries } from "@tanstack/react-query";
import { CircleMinus, CirclePlus } from "lucide-react";
import { Link } from "react-router-dom";
import type { CircuitNameplate } from "@shared/schemas/equipment.ts";
import type { VisitSummary } from "@shared/schemas/visits.ts";
import { paths } from "@/config/paths.ts";
import { visitQueryOptions } from "@/lib/api/visits.ts";
import { formatNumber } from "@/lib/units/display-units.ts";
import { formatTakenAt } from "../utils/format-taken-at.ts";

/** How many past visits are read for charge changes; older ones belong to the register. */
export const HISTORY_VISIT_LIMIT = 20;

interface ChargeMovement {
  id: string;
  visitId: string;
  at: string;
  circuit: number | null;
  direction: "added" | "removed";
  amountKg: number;
  description: string;
}

/**
 * Refrigerant added to or removed from the unit, from the charge adjustments logged on its
 * visits. The full register (recovered, reused, sent for reclaim, by cylinder) is kept apart.
 */
export function RefrigerantHistory({
  visits,
  circuits,
}: {
  visits: readonly VisitSummary[];
  circuits: readonly CircuitNameplate[];
}) {
  const recent = [...visits]
    .sort((a, b) => Date.parse(b.startedAt) - Date.parse(a.startedAt))
    .slice(0, HISTORY_VISIT_LIMIT);
  const details = useQueries({
    // A history needs no live refresh, unlike the visit page sharing this cache entry.
    queries: recent.map((visit) => ({ ...visitQueryOptions(visit.id), refetchInterval: false as const })),
  });
  const pending = details.some((query) => query.isPending);
  const failed = details.find((query) => query.isError);
  const movements: ChargeMovement[] = details
    .flatMap((query) =>
      query.data ? query.data.adjustments.map((adjustment) => ({ adjustment, visitId: query.data.id })) : [],
    )
    .filter(
      ({ adjustment }) =>
        (adjustment.kind === "charge-added" || adjustment.kind === "charge-removed") && adjustment.amountKg != null,
    )
    .map(({ adjustment, visitId }) => ({
      id: adjustment.id,
      visitId,
      at: adjustment.at,
      circuit: adjustment.circuit,
      direction: adjustment.kind === "charge-added" ? ("added" as const) : ("removed" as const),
      amountKg: adjustment.amountKg ?? 0,
      description: adjustment.description,
    }))
    .sort((a, b) => Date.parse(b.at) - Date.parse(a.at));
  const net = (circuit: number | null) =>
    movements
      .filter((movement) => movement.circuit === circuit)
      .reduce((sum, movement) => sum + (movement.direction === "added" ? movement.amountKg : -movement.amountKg), 0);

  return (
    <div className="space-y-3">
      {visits.length === 0 && (
        <p className="text-muted">No visits yet, so no refrigerant has been recorded against this unit.</p>
      )}
      {pending && <p>Reading the visits' charge changes…</p>}
      {failed?.error && (
        <p role="alert" className="font-medium text-fault">
          ⚠ Some visits could not be read: {failed.error.message}
        </p>
      )}
      {!pending && visits.length > 0 && movements.length === 0 && (
        <p>No refrigerant added or removed on the last {recent.length === 1 ? "visit" : `${recent.length} visits`}.</p>
      )}
      {movements.length > 0 && (
        <>
          <ul className="divide-y-2 divide-rule overflow-hidden rounded-card border-2 border-rule bg-surface">
            {movements.map((movement) => {
              const Icon = movement.direction === "added" ? CirclePlus : CircleMinus;
              return (
                <li key={movement.id} className="flex items-start gap-3 p-3">
                  <Icon aria-hidden className="mt-0.5 size-5 shrink-0" />
                  <div className="min-w-0 flex-1">
                    <p className="font-semibold">
                      <span className="num">{formatNumber(movement.amountKg, 2)} kg</span> {movement.direction}
                      {movement.circuit != null && <span className="font-normal"> · circuit {movement.circuit}</span>}
                    </p>
                    <p>{movement.description}</p>
                    <p className="text-sm text-muted">
                      <span className="num">{formatTakenAt(movement.at)}</span> ·{" "}
                      <Link
                        to={paths.visits.detail.getHref(movement.visitId)}
                        className="text-accent underline underline-offset-4"
                      >
                        open the visit
                      </Link>
                    </p>
                  </div>
                </li>
              );
            })}
          </ul>
          <dl className="flex flex-wrap gap-x-6 gap-y-1 text-sm">
            {[
              ...circuits.map((circuit) => circuit.number),
              ...(movements.some((movement) => movement.circuit === null) ? [null] : []),
            ].map((number) => {
              const change = net(number);
              const nameplate = circuits.find((circuit) => circuit.number === number);
              return (
                <div key={number ?? "none"} className="flex gap-1">
                  <dt>{number === null ? "Net change, no circuit given:" : `Net change, circuit ${number}:`}</dt>
                  <dd className="font-semibold">
                    <span className="num">
                      {change >= 0 ? "+" : "−"}
                      {formatNumber(Math.abs(change), 2)} kg
                    </span>
                    {nameplate && (
                      <span className="font-normal text-muted">
                        {" "}
                        (factory charge <span className="num">{formatNumber(nameplate.factoryChargeKg, 2)} kg</span>)
                      </span>
                    )}
                  </dd>
                </div>
              );
            })}
          </dl>
        </>
      )}
      <p className="text-sm text-muted">
        Recovered, reused and reclaimed refrigerant by cylinder will show here once the refrigerant register is kept in
        Satura.
      </p>
    </div>
  );
}

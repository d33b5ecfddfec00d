import { isStanding } from "@shared/schemas/visits.ts";
import { MOVEMENT_KIND_LABELS } from "@shared/schemas/register.ts";
import { useVisitRefrigerant } from "@/lib/api/register.ts";
import { formatKg, formatSignedKg } from "../utils/format-register.ts";
import { formatDateTime } from "@shared/format/date-time.ts";
import { HiddenLinesNote } from "./hidden-lines-note.tsx";
import { RunLogCheck } from "./run-log-check.tsx";
import { VerdictLine } from "./verdict-line.tsx";

/**
 * The report's refrigerant section: recovered, reused, added, the balance and the weigh-in per
 * circuit, and — where the circuit was recovered — the readings' charge estimate beside what the
 * scale found, so the estimate is checked against the scale on every recovery.
 */
export function RefrigerantReport({ visitId }: { visitId: string }) {
  const register = useVisitRefrigerant(visitId);
  // Voided movements are corrections: the report leaves them out (the audit trail names them).
  const movements = (register.data?.movements ?? []).filter(isStanding);
  return (
    <section aria-labelledby="refrigerant-report-heading" className="space-y-2 break-inside-avoid-page">
      <h2 id="refrigerant-report-heading" className="text-lg font-semibold">
        Refrigerant
      </h2>
      {register.isPending && <p aria-busy="true">Reading the register…</p>}
      {register.isError && (
        <p role="alert" className="text-fault">
          ⚠ The register did not load: {register.error.message}
        </p>
      )}
      {register.data && movements.length + register.data.hiddenMovements === 0 && (
        <p className="text-muted">No refrigerant recovered or added.</p>
      )}
      {register.data && movements.length + register.data.hiddenMovements > 0 && (
        <>
          <table className="num w-full text-left text-sm">
            <thead>
              <tr className="border-b-2 border-ink font-sans">
                <th className="py-1 pr-2">Circuit</th>
                <th className="py-1 pr-2">Nameplate</th>
                <th className="py-1 pr-2">Recovered</th>
                <th className="py-1 pr-2">Reused</th>
                <th className="py-1 pr-2">Added</th>
                <th className="py-1 pr-2">Short when recovered</th>
                <th className="py-1">Final vs nameplate</th>
              </tr>
            </thead>
            <tbody>
              {register.data.circuits.map((circuit) => (
                <tr key={circuit.circuit} className="border-b border-rule">
                  <td className="py-1 pr-2">{circuit.circuit}</td>
                  <td className="py-1 pr-2">{formatKg(circuit.nameplateKg)}</td>
                  <td className="py-1 pr-2">{formatKg(circuit.recoveredKg)}</td>
                  <td className="py-1 pr-2">{formatKg(circuit.reusedKg)}</td>
                  <td className="py-1 pr-2">{formatKg(circuit.addedKg)}</td>
                  <td className="py-1 pr-2">
                    {circuit.recoveredOnVisit ? formatKg(circuit.balance.shortfallKg) : "—"}
                  </td>
                  <td className="py-1">
                    {circuit.recoveredOnVisit ? formatSignedKg(circuit.balance.differenceFromNameplateKg) : "—"}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          {register.data.circuits.map((circuit) => {
            const estimate = circuit.estimateBeforeRecovery;
            if (!estimate) return null;
            // shortfall = nameplate − recovered; the estimate's kg is negative when short.
            const scaleKg = -circuit.balance.shortfallKg;
            const inside = scaleKg >= estimate.lowKg && scaleKg <= estimate.highKg;
            return (
              <p key={`estimate-${circuit.circuit}`} className="text-sm" data-testid="estimate-against-scale">
                Circuit {circuit.circuit}: the readings estimated{" "}
                <span className="num">{formatSignedKg(estimate.kg)}</span> (
                <span className="num">
                  {formatSignedKg(estimate.lowKg)} to {formatSignedKg(estimate.highKg)}
                </span>
                ,{" "}
                {estimate.basis === "unit-reference" ? "against the circuit's reference point" : "generic coefficients"}
                ); the scale found <span className="num">{formatSignedKg(scaleKg)}</span> against nameplate —{" "}
                {inside ? "inside the estimate's range" : <strong>outside the estimate's range</strong>}.
              </p>
            );
          })}
          {register.data.circuits
            .filter((circuit) => circuit.charging)
            .map((circuit) => (
              <div key={circuit.circuit}>
                <p className="font-medium">Circuit {circuit.circuit} weigh-in</p>
                <VerdictLine result={circuit.charging!.check} />
              </div>
            ))}
          {register.data.liquidChargingNote && (
            <p className="text-sm">{register.data.refrigerant} is a zeotropic blend: charged as liquid.</p>
          )}
          <ul className="space-y-0.5 text-sm">
            {movements.map((movement) => (
              <li key={movement.id}>
                <span className="num text-muted">{formatDateTime(movement.at)}</span> —{" "}
                {MOVEMENT_KIND_LABELS[movement.kind]}
                {movement.circuit !== null && ` (circuit ${movement.circuit})`}:{" "}
                <span className="num">{formatKg(movement.kg)}</span>
                {movement.cylinder && ` · cylinder ${movement.cylinder.label}`}
                {movement.technician && ` · ${movement.technician.name}`}
              </li>
            ))}
          </ul>
          <HiddenLinesNote count={register.data.hiddenMovements} />
        </>
      )}
      {register.data &&
        (movements.length + register.data.hiddenMovements > 0 || register.data.runLogCheck.unlinked.length > 0) && (
          <RunLogCheck check={register.data.runLogCheck} />
        )}
    </section>
  );
}

import { Droplets } from "lucide-react";
import { Link } from "react-router-dom";
import type { Equipment } from "@shared/schemas/equipment.ts";
import { MOVEMENT_KIND_LABELS, type CircuitBalance, type Movement } from "@shared/schemas/register.ts";
import { VisitVoidAction } from "@/features/visit/components/visit-void-action.tsx";
import { CautionPanel } from "@/components/ui/caution-panel/caution-panel.tsx";
import { paths } from "@/config/paths.ts";
import { useCylinders, useVisitRefrigerant } from "@/lib/api/register.ts";
import { formatKg, formatSignedKg } from "../utils/format-register.ts";
import { ChargingCheck } from "./charging-check.tsx";
import { CylinderFillBar } from "./cylinder-fill.tsx";
import { HiddenLinesNote } from "./hidden-lines-note.tsx";
import { MovementForm } from "./movement-form.tsx";
import { MovementRecord } from "./movement-record.tsx";
import { RunLogCheck } from "./run-log-check.tsx";
import { useOutboxEntries } from "@/features/offline/use-outbox.ts";
import { WaitingEntries } from "@/features/offline/waiting-entries.tsx";

function BalanceCard({
  balance,
  visitId,
  canWrite,
  single,
}: {
  balance: CircuitBalance;
  visitId: string;
  canWrite: boolean;
  single: boolean;
}) {
  const { shortfallKg, finalChargeKg, differenceFromNameplateKg } = balance.balance;
  return (
    <section
      aria-label={`Circuit ${balance.circuit} balance`}
      className="space-y-3 rounded-card border-2 border-rule bg-surface p-4"
      data-testid={`balance-${balance.circuit}`}
    >
      <h3 className="font-semibold">
        {single ? "Balance against the nameplate" : `Circuit ${balance.circuit}: balance against the nameplate`}
      </h3>
      <dl className="grid gap-x-6 gap-y-1 sm:grid-cols-2">
        {(
          [
            ["Nameplate", balance.nameplateKg],
            ["Recovered", balance.recoveredKg],
            ["Reused", balance.reusedKg],
            ["Added", balance.addedKg],
            ...(balance.sentForReclaimKg > 0 ? ([["Sent for reclaim", balance.sentForReclaimKg]] as const) : []),
          ] as const
        ).map(([label, value]) => (
          <div key={label} className="flex justify-between gap-2 border-b border-rule py-0.5">
            <dt className="text-muted">{label}</dt>
            <dd className="num">{formatKg(value)}</dd>
          </div>
        ))}
      </dl>
      {balance.recoveredOnVisit ? (
        <div className="space-y-1">
          <p className="font-semibold" data-testid={`shortfall-${balance.circuit}`}>
            {shortfallKg > 0
              ? `The circuit was ${formatKg(shortfallKg)} short of its nameplate charge when recovered.`
              : shortfallKg < 0
                ? `${formatKg(-shortfallKg)} more than the nameplate charge came out: check the nameplate and any line-length allowance.`
                : "The recovered mass matches the nameplate charge."}
          </p>
          <p>
            Charge now: <span className="num font-semibold">{formatKg(finalChargeKg)}</span> (reused + added),{" "}
            {formatSignedKg(differenceFromNameplateKg)} against the nameplate.
          </p>
        </div>
      ) : (
        <p className="text-muted">Nothing recovered on this visit, so there is no shortfall to work out.</p>
      )}
      <h4 className="font-semibold">Charging</h4>
      <ChargingCheck visitId={visitId} balance={balance} canWrite={canWrite} />
    </section>
  );
}

/** The visit's movements; a voided one stays, struck through with its reason, and counts in no balance. */
function MovementList({
  visitId,
  movements,
  hidden,
  canWrite,
}: {
  visitId: string;
  movements: readonly Movement[];
  hidden: number;
  canWrite: boolean;
}) {
  if (movements.length === 0 && hidden === 0)
    return <p className="text-muted">No refrigerant logged on this visit yet.</p>;
  if (movements.length === 0) return <HiddenLinesNote count={hidden} />;
  return (
    <ul
      aria-label="Refrigerant logged on this visit"
      className="divide-y-2 divide-rule overflow-hidden rounded-card border-2 border-rule bg-surface"
    >
      {movements.map((movement) => {
        const what = `${formatKg(movement.kg)} ${MOVEMENT_KIND_LABELS[movement.kind].toLowerCase()}`;
        return (
          <li key={movement.id} className="space-y-1 p-3">
            <MovementRecord movement={movement} />
            {canWrite && !movement.voided && (
              <VisitVoidAction
                visitId={visitId}
                kind="movement"
                recordId={movement.id}
                what={`the movement “${what}” and its run-log entry`}
              />
            )}
          </li>
        );
      })}
    </ul>
  );
}

/** The visit's refrigerant: what was recovered, reused and added, the balance, the cylinders, the charging check. */
export function VisitRefrigerant({
  visitId,
  unit,
  circuit,
  canWrite,
}: {
  visitId: string;
  unit: Equipment;
  circuit: number;
  canWrite: boolean;
}) {
  const register = useVisitRefrigerant(visitId);
  const cylinders = useCylinders({ refrigerant: unit.refrigerant });
  const onDevice = useOutboxEntries();

  if (register.isPending) return <p aria-busy="true">Reading the register…</p>;
  if (register.isError)
    return (
      <p role="alert" className="font-medium text-fault">
        ⚠ The register did not load: {register.error.message}
      </p>
    );
  const data = register.data;
  const recoveryCylinders = (cylinders.data ?? []).filter((cylinder) => cylinder.kind === "recovery");
  const filling = recoveryCylinders.filter((cylinder) => cylinder.fill.check && cylinder.fill.check.verdict !== "pass");

  return (
    <div className="space-y-4">
      {data.liquidChargingNote && (
        <div
          className="flex gap-3 rounded-card border-2 border-accent bg-surface p-4"
          data-testid="liquid-charging-note"
        >
          <Droplets aria-hidden className="mt-0.5 size-5 shrink-0 text-accent" />
          <div>
            <p className="font-semibold">Charge {data.refrigerant} as liquid</p>
            <p>{data.liquidChargingNote}</p>
            <p className="text-sm text-muted">
              Source: ACHR News, “The New Wave of Blends” [S4]; a packaged-unit maker’s R407C service manual [S56];
              metering liquid into the suction side is common practice.
            </p>
          </div>
        </div>
      )}

      {filling.length > 0 && (
        <div
          role="status"
          className="space-y-3 rounded-card border-2 border-caution bg-surface p-4"
          data-testid="cylinder-warnings"
        >
          <p className="font-semibold text-caution">
            ⚠ Recovery cylinder{filling.length > 1 ? "s" : ""} near or past the 80 % fill limit
          </p>
          {filling.map((cylinder) => (
            <div key={cylinder.id}>
              <p className="font-medium">{cylinder.label}</p>
              <CylinderFillBar cylinder={cylinder} />
            </div>
          ))}
        </div>
      )}
      <CautionPanel topic="recovery-cylinder" />

      <div className="grid gap-4 lg:grid-cols-2">
        {data.circuits.map((balance) => (
          <BalanceCard
            key={balance.circuit}
            balance={balance}
            visitId={visitId}
            canWrite={canWrite}
            single={data.circuits.length === 1}
          />
        ))}
      </div>

      {canWrite && (
        <section
          aria-labelledby="movement-form-heading"
          className="space-y-3 rounded-card border-2 border-accent bg-surface p-4"
        >
          <h3 id="movement-form-heading" className="text-lg font-semibold">
            Log refrigerant
          </h3>
          {cylinders.isError && (
            <p role="alert" className="text-fault">
              ⚠ The cylinders did not load: {cylinders.error.message}
            </p>
          )}
          <WaitingEntries
            entries={onDevice.filter((entry) => entry.visitId === visitId && entry.kind === "refrigerant-movement")}
          />
          <MovementForm
            visitId={visitId}
            refrigerant={unit.refrigerant}
            circuits={unit.circuits}
            defaultCircuit={circuit}
            cylinders={cylinders.data ?? []}
          />
          <CautionPanel topic="liquid-refrigerant" compact />
          <p className="text-sm text-muted">
            Cylinders are kept on the{" "}
            <Link to={paths.cylinders.getHref()} className="text-accent underline underline-offset-4">
              Cylinders
            </Link>{" "}
            page.
          </p>
        </section>
      )}

      <RunLogCheck check={data.runLogCheck} />

      <h3 className="text-lg font-semibold">Logged on this visit</h3>
      <MovementList visitId={visitId} movements={data.movements} hidden={data.hiddenMovements} canWrite={canWrite} />
      {data.movements.length > 0 && <HiddenLinesNote count={data.hiddenMovements} />}
    </div>
  );
}

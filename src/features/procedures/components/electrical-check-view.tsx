import { ELECTRICAL_TARGET_LABELS, type ElectricalCheck } from "@shared/schemas/procedure-records.ts";
import { CURRENT_IMBALANCE_MAX_PERCENT } from "@shared/engine/index.ts";
import { formatNumber } from "@/lib/units/display-units.ts";
import { VerdictBadge, VerdictLine } from "./verdict-badge.tsx";
import { formatDateTime } from "@shared/format/date-time.ts";

const list = (values: readonly number[], unit: string, decimals = 0) =>
  `${values.map((value) => formatNumber(value, decimals)).join(" / ")} ${unit}`;

/** One saved electrical check: its overall verdict, then each judged check with its figure and source. */
export function ElectricalCheckView({ check }: { check: ElectricalCheck }) {
  const { input, result } = check;
  return (
    <article
      aria-label={`${ELECTRICAL_TARGET_LABELS[input.target]} check`}
      className="rounded-card border-2 border-rule bg-surface p-3"
    >
      <header className="flex flex-wrap items-center gap-2">
        <h3 className="font-semibold">
          {ELECTRICAL_TARGET_LABELS[input.target]}
          {input.circuit ? `, circuit ${input.circuit}` : ""}
        </h3>
        <VerdictBadge verdict={result.overall.verdict} />
        <span className="num text-sm text-muted">{formatDateTime(check.takenAt)}</span>
        {check.recordedBy && <span className="text-sm text-muted">· {check.recordedBy.name}</span>}
      </header>
      <ul className="mt-2">
        {result.supplyVoltage && input.supplyVolts && (
          <VerdictLine
            label="Supply voltage"
            figure={`${list(input.supplyVolts, "V")} against ${input.nameplateV} V`}
            verdict={result.supplyVoltage.verdict}
            reason={result.supplyVoltage.reason}
            source={result.supplyVoltage.source}
          />
        )}
        {result.voltageImbalance && result.voltageImbalancePercent !== null && (
          <VerdictLine
            label="Voltage imbalance"
            figure={`${formatNumber(result.voltageImbalancePercent, 1)} %`}
            verdict={result.voltageImbalance.verdict}
            reason={result.voltageImbalance.reason}
            source={result.voltageImbalance.source}
          />
        )}
        {result.insulation.map((reading, index) => (
          <VerdictLine
            key={`insulation-${index}`}
            label={`Insulation${reading.point ? ` ${reading.point}` : ""}`}
            figure={`${formatNumber(input.insulation[index]?.megohms ?? 0, 1)} MΩ at ${input.insulation[index]?.testVoltageV ?? "—"} V d.c. (minimum ${formatNumber(reading.minimumMegohms, 1)} MΩ)`}
            verdict={reading.verdict}
            reason={reading.reason}
            source={reading.source}
          />
        ))}
        {result.windingBalance && input.windingOhms && (
          <VerdictLine
            label="Winding resistance"
            figure={`${list(input.windingOhms, "Ω", 2)}, largest deviation ${formatNumber(result.windingBalance.maxDeviationPercent, 1)} %`}
            verdict={result.windingBalance.verdict}
            reason={result.windingBalance.reason}
            source={result.windingBalance.source}
          />
        )}
        {result.singlePhaseWindings && input.singlePhaseWindingOhms && (
          <VerdictLine
            label="Windings C–R / C–S / R–S"
            figure={list(
              [
                input.singlePhaseWindingOhms.commonRun,
                input.singlePhaseWindingOhms.commonStart,
                input.singlePhaseWindingOhms.runStart,
              ],
              "Ω",
              2,
            )}
            verdict={result.singlePhaseWindings.verdict}
            reason={result.singlePhaseWindings.reason}
            source={result.singlePhaseWindings.source}
          />
        )}
        {result.runningCurrent.map((current, index) => (
          <VerdictLine
            key={`current-${index}`}
            label={result.runningCurrent.length > 1 ? `Running current L${index + 1}` : "Running current"}
            figure={`${formatNumber(input.runningAmps?.[index] ?? 0, 1)} A, ${formatNumber(current.percentOfRated, 0)} % of ${input.target === "fan" ? "FLA" : "RLA"} ${input.ratedA} A`}
            verdict={current.verdict}
            reason={current.reason}
            source={current.source}
          />
        ))}
      </ul>
      {result.currentImbalancePercent !== null && (
        <p className="mt-1 text-sm">
          Current imbalance <span className="num">{formatNumber(result.currentImbalancePercent, 1)} %</span>{" "}
          <span className="text-muted">
            (one compressor maker allows up to {CURRENT_IMBALANCE_MAX_PERCENT} %; typically 6–10 × the voltage
            imbalance)
          </span>
        </p>
      )}
      {input.note && <p className="mt-1 text-sm">Note: {input.note}</p>}
    </article>
  );
}

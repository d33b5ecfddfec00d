import { ListChecks } from "lucide-react";
import { useMemo } from "react";
import { chargeStepChecks, chargingPlan, getRefrigerant } from "@shared/engine/index.ts";
import { safetyClasses } from "@shared/content/safety-classes.ts";
import type { DiagnosisInput, DiagnosisResult } from "@shared/schemas/diagnosis.ts";
import { CautionPanel, DeferToCodes } from "@/components/ui/caution-panel/caution-panel.tsx";
import type { CircuitSeries } from "../utils/circuit-series.ts";
import { formatTime } from "@shared/format/date-time.ts";

const kgText = (kg: number) => `${kg.toFixed(2)} kg`;
const signedKg = (kg: number) => `${kg > 0 ? "+" : kg < 0 ? "−" : ""}${Math.abs(kg).toFixed(2)} kg`;

interface ChargingPlanPanelProps {
  result: DiagnosisResult;
  input: DiagnosisInput;
  series: CircuitSeries;
  isBlend: boolean;
}

/**
 * What to do about an under- or overcharge: the amount in steps, how to charge, the cautions,
 * and every weighed step logged on this circuit beside what the next estimate did. Made again
 * from each new estimate, so it always speaks from the latest readings.
 */
export function ChargingPlanPanel({ result, input, series, isBlend }: ChargingPlanPanelProps) {
  const chargeKg = input.chargeKg;
  const plan =
    chargeKg === undefined ? null : chargingPlan(result.chargeDeviation, result.chargeState, chargeKg, isBlend);
  const checks = useMemo(
    () =>
      chargeStepChecks(
        series.adjustments
          .filter(
            (adjustment) =>
              adjustment.amountKg !== null &&
              (adjustment.kind === "charge-added" || adjustment.kind === "charge-removed"),
          )
          .map((adjustment) => ({
            at: adjustment.at,
            kg: adjustment.kind === "charge-added" ? adjustment.amountKg! : -adjustment.amountKg!,
          })),
        series.readings.map((reading) => ({
          takenAt: reading.takenAt,
          chargeDeviation: reading.result.chargeDeviation ?? null,
        })),
      ),
    [series],
  );
  if (!plan && checks.length === 0) return null;
  const flammable = safetyClasses[getRefrigerant(input.refrigerant).safety.class].caution;
  return (
    <section
      aria-labelledby="charging-plan-heading"
      className="space-y-3 rounded-card border-2 border-ink bg-surface p-4"
      data-testid="charging-plan"
    >
      <h2 id="charging-plan-heading" className="flex items-center gap-2 text-lg font-semibold">
        <ListChecks aria-hidden className="size-5" /> Charging plan
      </h2>
      {plan ? (
        <>
          <p className="font-medium">{plan.summary}.</p>
          <ol className="list-decimal space-y-1 pl-6">
            {plan.steps.map((step, index) => (
              <li key={index}>
                {plan.action === "add" ? "Add" : "Recover"} <span className="num">{kgText(step)}</span>, log it as an
                adjustment with its weight, then wait {plan.settleMinutes} min and save a reading
              </li>
            ))}
          </ol>
          {plan.liquidCharging && (
            <p className="text-sm">
              Blend: charge liquid from the cylinder, metered slowly into the suction side so no liquid reaches the
              compressor.
            </p>
          )}
          <p className="text-xs text-muted">{plan.source}</p>
        </>
      ) : (
        <p className="text-muted">No charge step to make on the latest estimate.</p>
      )}
      {checks.length > 0 && (
        <div>
          <h3 className="font-semibold">Steps logged against the estimate</h3>
          <ul className="mt-1 space-y-1 text-sm" aria-label="Charge steps checked">
            {checks.map((check) => (
              <li key={check.step.at} className="border-t border-rule pt-1">
                <span className="num">{signedKg(check.step.kg)}</span> at {formatTime(check.step.at)}:{" "}
                {check.refill ? (
                  <span className="text-muted">
                    weighed in after recovery
                    {check.afterKg === null ? (
                      ""
                    ) : (
                      <>
                        ; estimate since <span className="num">{signedKg(check.afterKg)}</span>
                      </>
                    )}
                  </span>
                ) : check.expectedKg === null || check.afterKg === null ? (
                  <span className="text-muted">
                    no estimate {check.beforeKg === null ? "before" : "since"} to compare
                  </span>
                ) : (
                  <>
                    estimate went from <span className="num">{signedKg(check.beforeKg!)}</span> to{" "}
                    <span className="num">{signedKg(check.afterKg)}</span> (expected{" "}
                    <span className="num">{signedKg(check.expectedKg)}</span>) —{" "}
                    {check.agrees ? (
                      <span className="text-good">agrees with the scale</span>
                    ) : (
                      <span className="text-caution">
                        does not agree: let it settle, check the probes; the scale wins
                      </span>
                    )}
                  </>
                )}
              </li>
            ))}
          </ul>
        </div>
      )}
      {plan && (
        <div className="space-y-2">
          <CautionPanel topic={plan.action === "add" ? "liquid-refrigerant" : "recovery-cylinder"} compact />
          {flammable && <CautionPanel topic={flammable} compact />}
          <DeferToCodes />
        </div>
      )}
    </section>
  );
}

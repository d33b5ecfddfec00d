import { chargeStateText } from "@shared/content/charge-states.ts";
import type { WorkedStep } from "@shared/schemas/casebook.ts";
import { ChargeStateBadge } from "@/components/ui/state/charge-state-badge.tsx";
import { ABSOLUTE_LABEL, formatNumber, PRESSURE_DECIMALS, type DisplayUnits } from "@/lib/units/display-units.ts";
import { pressureToDisplay } from "@shared/engine/index.ts";
import { withUnit } from "@/lib/units/quantities.ts";

function Figures({ children }: { children: React.ReactNode }) {
  return <p className="num rounded-card bg-sunken px-3 py-2 text-base">{children}</p>;
}

function StepBody({ step, units }: { step: WorkedStep; units: DisplayUnits }) {
  const t = (value: number | null) => withUnit(value, "temperature", units, 0);
  const k = (value: number | null) => withUnit(value, "difference", units, 0);
  switch (step.kind) {
    case "saturation": {
      const absolute = `${formatNumber(pressureToDisplay(step.pressureAbsoluteKPa, units.pressure, "absolute", step.atmosphericKPa), PRESSURE_DECIMALS[units.pressure])} ${ABSOLUTE_LABEL[units.pressure]}`;
      return (
        <>
          <h3 className="font-semibold">
            {step.side === "suction"
              ? "Evaporating temperature: suction pressure, dew column"
              : "Condensing temperature: liquid pressure, bubble column"}
          </h3>
          <Figures>
            {withUnit(step.pressureGaugeKPa, "pressure", units, step.atmosphericKPa)} + atmosphere = {absolute} →{" "}
            {step.point} point <strong>{t(step.saturationC)}</strong>
            {step.isBlend && step.otherSaturationC !== null && (
              <>
                {" "}
                (the {step.otherPoint} point would be {t(step.otherSaturationC)}; glide {k(step.glideK)})
              </>
            )}
          </Figures>
          <p>{step.why}</p>
        </>
      );
    }
    case "difference":
      return (
        <>
          <h3 className="font-semibold">{step.quantity === "superheat" ? "Superheat" : "Subcooling"}</h3>
          <Figures>
            {step.resultK === null ? (
              <>no valid {step.quantity}</>
            ) : step.quantity === "superheat" ? (
              <>
                {t(step.lineTempC)} − {t(step.saturationC)} = <strong>{k(step.resultK)}</strong>
              </>
            ) : (
              <>
                {t(step.saturationC)} − {t(step.lineTempC)} = <strong>{k(step.resultK)}</strong>
              </>
            )}
          </Figures>
          <p>{step.why}</p>
        </>
      );
    case "target":
      return (
        <>
          <h3 className="font-semibold">{step.quantity === "superheat" ? "Superheat target" : "Subcooling target"}</h3>
          <Figures>
            {step.band ? (
              <>
                {step.wetBulbC !== null && step.outdoorC !== null && (
                  <>
                    wet bulb {t(step.wetBulbC)}, outdoor {t(step.outdoorC)} →{" "}
                  </>
                )}
                target <strong>{k(step.band.targetK)}</strong>, in band {k(step.band.lowK)} to {k(step.band.highK)};
                measured {k(step.measuredK)}
              </>
            ) : (
              <>no valid target</>
            )}
          </Figures>
          <p>{step.why}</p>
          {step.band && <p className="text-sm text-muted">Basis: {step.band.source}</p>}
        </>
      );
    case "verdict":
      return (
        <>
          <h3 className="font-semibold">Verdict</h3>
          <p>
            <ChargeStateBadge state={step.chargeState} />
          </p>
          <p>{step.why}</p>
          {step.evidence.length > 0 && (
            <ul className="list-disc space-y-1 pl-6 text-sm">
              {step.evidence.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          )}
          <p className="text-sm text-muted">Next: {chargeStateText[step.chargeState].nextStep}</p>
        </>
      );
  }
}

/** The correct working, one numbered step per line of arithmetic, in the user's display units. */
export function WorkedSteps({ steps, units }: { steps: WorkedStep[]; units: DisplayUnits }) {
  return (
    <ol className="space-y-3" aria-label="Worked solution">
      {steps.map((step, index) => (
        <li key={`${step.kind}-${index}`} className="flex gap-3 border-t border-rule pt-3">
          <span
            aria-hidden
            className="num flex size-8 shrink-0 items-center justify-center rounded-full border-2 border-ink font-semibold"
          >
            {index + 1}
          </span>
          <div className="min-w-0 flex-1 space-y-1">
            <StepBody step={step} units={units} />
          </div>
        </li>
      ))}
    </ol>
  );
}

import { CircleCheck, CircleX } from "lucide-react";
import { chargeStateText } from "@shared/content/charge-states.ts";
import type { AnswerMark, Attempt } from "@shared/schemas/casebook.ts";
import type { ChargeState } from "@shared/schemas/diagnosis.ts";
import { CautionPanel } from "@/components/ui/caution-panel/caution-panel.tsx";
import { cn } from "@/lib/cn.ts";
import { formatNumber, type DisplayUnits } from "@/lib/units/display-units.ts";
import type { Quantity } from "@shared/schemas/reading-fields.ts";
import { withUnit } from "@/lib/units/quantities.ts";
import { signedKg } from "../utils/signed-kg.ts";
import { ChargeToAddResult } from "./charge-to-add-result.tsx";
import { WorkedSteps } from "./worked-steps.tsx";

/** "energy": a specific enthalpy difference, kJ/kg in every unit system. */
const FIELD_LABELS: Record<AnswerMark["field"], { label: string; quantity: Quantity | "energy" | null }> = {
  evaporatingTempC: { label: "Evaporating temperature", quantity: "temperature" },
  condensingTempC: { label: "Condensing temperature", quantity: "temperature" },
  superheatK: { label: "Superheat", quantity: "difference" },
  subcoolingK: { label: "Subcooling", quantity: "difference" },
  chargeState: { label: "Charge state", quantity: null },
  refrigeratingEffectKJPerKg: { label: "Refrigerating effect", quantity: "energy" },
  dischargeSuperheatK: { label: "Discharge superheat", quantity: "difference" },
  chargeToAddKg: { label: "Charge to add", quantity: "mass" },
};

/** Which answers were right, the working step by step, and the safety notes that apply. */
export function AttemptResult({
  attempt,
  units,
  chargeKg,
}: {
  attempt: Attempt;
  units: DisplayUnits;
  /** The case's correct charge, kg, for the charging plan of a case that asks the charge to add. */
  chargeKg?: number;
}) {
  const { score } = attempt;
  const show = (value: number | string | null, quantity: Quantity | "energy" | null) =>
    quantity === null
      ? value === null
        ? "none"
        : chargeStateText[value as ChargeState].title
      : quantity === "energy"
        ? value === null
          ? "none"
          : `${formatNumber(value as number, 1)} kJ/kg`
        : quantity === "mass"
          ? value === null
            ? "blank"
            : signedKg(value as number)
          : withUnit(value as number | null, quantity, units, 0);
  return (
    <div className="space-y-5">
      <section
        aria-labelledby="marks-heading"
        className="rounded-card border-2 border-rule bg-surface p-4"
        data-testid="attempt-result"
      >
        <h2 id="marks-heading" className="text-xl font-semibold">
          {score.allCorrect ? "All right — " : ""}
          {score.correctCount} of {score.total} right
        </h2>
        <ul className="mt-3 space-y-2">
          {score.marks.map((mark) => {
            const { label, quantity } = FIELD_LABELS[mark.field];
            const Icon = mark.correct ? CircleCheck : CircleX;
            return (
              <li
                key={mark.field}
                data-testid={`mark-${mark.field}`}
                className={cn("flex gap-3 rounded-card border-2 p-3", mark.correct ? "border-good" : "border-fault")}
              >
                <Icon aria-hidden className={cn("mt-0.5 size-6 shrink-0", mark.correct ? "text-good" : "text-fault")} />
                <div className="min-w-0">
                  <p className="font-semibold">
                    {label}:{" "}
                    <span className={mark.correct ? "text-good" : "text-fault"}>
                      {mark.correct ? "right" : "not right"}
                    </span>
                  </p>
                  <p className="num text-sm">
                    yours {show(mark.given, quantity)} · {mark.field === "chargeToAddKg" ? "estimate" : "correct"}{" "}
                    {mark.field === "chargeToAddKg" && mark.expected === null ? "none" : show(mark.expected, quantity)}
                    {!mark.correct && mark.differenceK !== null && (
                      <> · off by {withUnit(Math.abs(mark.differenceK), "difference", units, 0)}</>
                    )}
                    {!mark.correct && mark.differenceKJPerKg != null && (
                      <> · off by {formatNumber(Math.abs(mark.differenceKJPerKg), 1)} kJ/kg</>
                    )}
                    {mark.rangeKg && (
                      <>
                        {" "}
                        · right from {signedKg(mark.rangeKg.lowKg)} to {signedKg(mark.rangeKg.highKg)}
                      </>
                    )}
                  </p>
                </div>
              </li>
            );
          })}
        </ul>
        <p className="mt-3 text-sm">
          <span className="font-medium">Your reasoning:</span> {attempt.answers.reasoning}
        </p>
        {attempt.reasoning && (
          <p className="mt-1 text-sm">
            <span className="font-medium">The case's reasoning:</span> {attempt.reasoning}
          </p>
        )}
      </section>

      <ChargeToAddResult attempt={attempt} chargeKg={chargeKg} />

      <section aria-labelledby="working-heading" className="rounded-card border-2 border-rule bg-surface p-4">
        <h2 id="working-heading" className="text-xl font-semibold">
          The working, step by step
        </h2>
        <WorkedSteps steps={attempt.worked} units={units} />
      </section>

      <section aria-labelledby="safety-heading" className="space-y-3">
        <h2 id="safety-heading" className="text-xl font-semibold">
          Safety on this job
        </h2>
        {attempt.safety.map((note) => (
          <div key={note.topic} className="space-y-1">
            <p className="font-medium">{note.reason}</p>
            <CautionPanel topic={note.topic} compact />
          </div>
        ))}
      </section>
    </div>
  );
}

import { Scale } from "lucide-react";
import { chargeToAdd, chargingPlan, getRefrigerant } from "@shared/engine/index.ts";
import type { Attempt, CaseExpected } from "@shared/schemas/casebook.ts";
import { signedKg } from "../utils/signed-kg.ts";

/**
 * After an attempt at a case that asks the charge to add (issue 14): the engine's estimate with
 * its range and what it stands on, and the charging plan made from it; or, when the readings give
 * no estimate, the reason. The plan is made again from the stored estimate and the case's
 * correct charge, by the same `chargingPlan` the run log uses.
 */
export function ChargeToAddResult({ attempt, chargeKg }: { attempt: Attempt; chargeKg: number | undefined }) {
  const deviation = attempt.expected.chargeDeviation;
  if (deviation === undefined) return null;
  if (deviation === null) {
    return (
      <section
        aria-labelledby="charge-estimate-heading"
        className="rounded-card border-2 border-rule bg-surface p-4"
        data-testid="charge-to-add-result"
      >
        <h2 id="charge-estimate-heading" className="flex items-center gap-2 text-xl font-semibold">
          <Scale aria-hidden className="size-5 shrink-0" /> The charge estimate
        </h2>
        <p className="mt-2">No estimate from these readings, so the right answer was to leave it blank.</p>
        {attempt.expected.chargeDeviationNote && (
          <p className="mt-1 text-sm">{attempt.expected.chargeDeviationNote}.</p>
        )}
      </section>
    );
  }
  const toAdd = chargeToAdd(deviation);
  const verb = toAdd.kg < 0 ? "Recover" : "Add";
  // The range in the same direction as the verb: "recover 0.10–0.80 kg" rather than "add −0.80 to −0.10 kg".
  const [nearKg, farKg] = toAdd.kg < 0 ? [-toAdd.highKg, -toAdd.lowKg] : [toAdd.lowKg, toAdd.highKg];
  const plan =
    chargeKg === undefined
      ? null
      : chargingPlan(deviation, attempt.expectedState, chargeKg, getRefrigerant(attempt.refrigerant).kind === "blend");
  return (
    <section
      aria-labelledby="charge-estimate-heading"
      className="space-y-2 rounded-card border-2 border-rule bg-surface p-4"
      data-testid="charge-to-add-result"
    >
      <h2 id="charge-estimate-heading" className="flex items-center gap-2 text-xl font-semibold">
        <Scale aria-hidden className="size-5 shrink-0" /> The charge estimate
      </h2>
      <p className="font-medium">
        {verb} about <span className="num">{Math.abs(toAdd.kg).toFixed(2)} kg</span> (range{" "}
        <span className="num">
          {nearKg.toFixed(2)}–{farKg.toFixed(2)} kg
        </span>
        ); any answer in that range is right.
      </p>
      <p className="text-sm">
        {deviation.basis === "unit-reference"
          ? "Measured against this circuit's own reference point, set after a weigh-in: a narrow range."
          : "Generic coefficients: a wide range, because this circuit has no reference point of its own yet (one is set after a weigh-in)."}
      </p>
      {plan ? (
        <div data-testid="charge-to-add-plan">
          <h3 className="font-semibold">Charging plan</h3>
          <p>{plan.summary}.</p>
          <p className="text-xs text-muted">{plan.source}</p>
        </div>
      ) : (
        <p className="text-sm text-muted">No charge step to make on this estimate.</p>
      )}
      <details className="text-sm text-muted">
        <summary className="min-h-touch cursor-pointer py-2">How this is estimated</summary>
        <p>{deviation.source}</p>
      </details>
    </section>
  );
}

/** The author's preview of a case that asks the charge to add: the answer and the range it is right within. */
export function ChargeToAddPreview({ expected }: { expected: CaseExpected }) {
  if (!expected.chargeDeviation) {
    return <p data-testid="author-charge-to-add">Charge to add: blank is right (the engine gives no estimate).</p>;
  }
  const toAdd = chargeToAdd(expected.chargeDeviation);
  return (
    <p data-testid="author-charge-to-add">
      Charge to add: <span className="num">{signedKg(toAdd.kg)}</span>, right from{" "}
      <span className="num">{signedKg(toAdd.lowKg)}</span> to <span className="num">{signedKg(toAdd.highKg)}</span>.
    </p>
  );
}

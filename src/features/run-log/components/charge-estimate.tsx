import { Scale } from "lucide-react";
import type { DiagnosisResult } from "@shared/schemas/diagnosis.ts";

const kg = (value: number) => `${Math.abs(value).toFixed(2)} kg`;

/** "0.60 kg short (0.30–0.90 kg)" — the range written the way the charge is off. */
export function chargeEstimateWords(deviation: NonNullable<DiagnosisResult["chargeDeviation"]>): string {
  if (deviation.lowKg <= 0 && deviation.highKg >= 0 && Math.abs(deviation.kg) < 0.05) {
    return `On charge within the estimate (−${Math.abs(deviation.lowKg).toFixed(2)} to +${deviation.highKg.toFixed(2)} kg)`;
  }
  const short = deviation.kg < 0;
  const [near, far] = short ? [-deviation.highKg, -deviation.lowKg] : [deviation.lowKg, deviation.highKg];
  const range = near < 0 ? `up to ${far.toFixed(2)} kg; could be on charge` : `${near.toFixed(2)}–${far.toFixed(2)} kg`;
  return `About ${kg(deviation.kg)} ${short ? "short" : "over"} (${range})`;
}

/**
 * The charge deviation line under the verdict: how many kilograms, with the range and what the
 * estimate stands on (the circuit's own reference point, or generic coefficients with a wide
 * range), or why there is none.
 */
export function ChargeEstimate({ result }: { result: DiagnosisResult }) {
  const deviation = result.chargeDeviation;
  if (!deviation) {
    return result.chargeDeviationNote ? (
      <p className="mt-2 flex gap-2 text-sm text-muted" data-testid="charge-estimate">
        <Scale aria-hidden className="mt-0.5 size-4 shrink-0" />
        <span>{result.chargeDeviationNote}</span>
      </p>
    ) : null;
  }
  return (
    <div className="mt-2 flex gap-2" data-testid="charge-estimate">
      <Scale aria-hidden className="mt-0.5 size-5 shrink-0" />
      <div>
        <p className="font-medium">
          Charge: <span className="num">{chargeEstimateWords(deviation)}</span>
        </p>
        <p className="text-sm text-muted">
          {deviation.basis === "unit-reference"
            ? "Measured against this circuit's own reference point."
            : "Generic coefficients: a wide range until this circuit has its own reference point (set after a weigh-in)."}
        </p>
        <details className="text-xs text-muted">
          <summary className="cursor-pointer py-1">How this is estimated</summary>
          <p>{deviation.source}</p>
        </details>
      </div>
    </div>
  );
}

/**
 * Charge diagnosis benchmark: µs per `diagnose()` call (saturation lookups, every rule, ranking)
 * on validated input, over the worked cases in tests/fixtures/diagnosis-cases. Target: under
 * 5 µs per call. `diagnose()` takes a `DiagnosisInput` validated at the boundary it came through
 * (README decision 034), so the schema's check is timed on its own line, once per input, as the
 * API and the run-log form run it. The humidity path is reported apart because psychrolib's
 * wet-bulb solve (an iterative bisection) costs several µs on its own.
 */
import { diagnose } from "../shared/engine/index.ts";
import { DiagnosisInputSchema, type DiagnosisInput } from "../shared/schemas/diagnosis.ts";
import rawCases from "../tests/fixtures/diagnosis-cases/cases.json" with { type: "json" };
import { DiagnosisCaseFileSchema } from "../tests/fixtures/diagnosis-cases/diagnosis-case-schema.ts";
import { nanosecondsPerCall, registerBench } from "./bench-registry.ts";

const TARGET_MICROSECONDS = 5;
const ITERATIONS = 100_000;

function report(label: string, nanoseconds: number, withTarget = true): void {
  const verdict = withTarget
    ? nanoseconds / 1000 < TARGET_MICROSECONDS
      ? "  (under the 5 µs target)"
      : "  (ABOVE the 5 µs target)"
    : "";
  console.log(`${label.padEnd(60)} ${(nanoseconds / 1000).toFixed(2).padStart(6)} µs${verdict}`);
}

registerBench("charge diagnosis", () => {
  // Validated once, before timing, as the boundaries do: diagnose() is timed on what they hand it.
  const inputs: DiagnosisInput[] = DiagnosisCaseFileSchema.parse(rawCases).cases.map((worked) =>
    DiagnosisInputSchema.parse(worked.input),
  );
  const measured = inputs.filter((input) => input.returnAirRelativeHumidity === undefined);
  const humidity = inputs.filter((input) => input.returnAirRelativeHumidity !== undefined);
  const score = (input: DiagnosisInput) => diagnose(input).confidence + 1;

  report(
    `diagnose(), validated input, ${measured.length} worked cases (wet bulb measured or none)`,
    nanosecondsPerCall((i) => score(measured[i % measured.length]!), ITERATIONS),
  );
  report(
    `diagnose(), ${humidity.length} case(s) with wet bulb from RH (psychrolib)`,
    nanosecondsPerCall((i) => score(humidity[i % humidity.length]!), ITERATIONS / 4),
    false,
  );
  // The same cases as circuits with a known correct charge (3.2 kg, 7.5 m line set): the charge estimate joins every result.
  const withCharge = measured.map((input) => ({ ...input, chargeKg: 3.2, liquidLineLengthM: 7.5 }));
  report(
    `diagnose() with the charge estimate (chargeKg), ${withCharge.length} cases`,
    nanosecondsPerCall((i) => score(withCharge[i % withCharge.length]!), ITERATIONS),
  );
  // The boundary's one check, apart: DiagnosisInputSchema over the same inputs (the API runs it
  // on each saved reading and CSV row, the run-log form on each change of what is typed).
  const validate = (input: DiagnosisInput) => (DiagnosisInputSchema.parse(input).suctionPressureKPa > 0 ? 1 : 0);
  report(
    `validation of a DiagnosisInput (DiagnosisInputSchema), ${measured.length} cases`,
    nanosecondsPerCall((i) => validate(measured[i % measured.length]!), ITERATIONS),
    false,
  );
  report(
    `validation with chargeKg and line length, ${withCharge.length} cases`,
    nanosecondsPerCall((i) => validate(withCharge[i % withCharge.length]!), ITERATIONS),
    false,
  );
});

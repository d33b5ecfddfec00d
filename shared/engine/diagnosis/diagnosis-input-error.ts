import { z } from "zod";

/** Field → messages for the technician, e.g. `{ suctionPressureKPa: ["Suction pressure …"] }`. */
export type FieldErrors = Record<string, string[]>;

/**
 * Thrown by `diagnose()` and `assessTrend()` when the readings cannot come from a running
 * circuit or are not numbers. Carries one or more messages per input field, ready to show
 * beside the form fields (the server answers 400 with `fieldErrors`).
 */
export class DiagnosisInputError extends Error {
  readonly fieldErrors: FieldErrors;
  readonly formErrors: string[];

  constructor(fieldErrors: FieldErrors, formErrors: string[] = []) {
    const first = Object.values(fieldErrors)[0]?.[0] ?? formErrors[0] ?? "invalid readings";
    super(`diagnose requires valid readings: ${first}`);
    this.name = "DiagnosisInputError";
    this.fieldErrors = fieldErrors;
    this.formErrors = formErrors;
  }

  /** Builds the error from a failed zod parse of `DiagnosisInputSchema` (or the trend schema). */
  static fromZodError(error: z.ZodError): DiagnosisInputError {
    const fieldErrors: FieldErrors = {};
    const formErrors: string[] = [];
    for (const issue of error.issues) {
      if (issue.path.length === 0) {
        formErrors.push(issue.message);
        continue;
      }
      const key = issue.path.map(String).join(".");
      (fieldErrors[key] ??= []).push(issue.message);
    }
    return new DiagnosisInputError(fieldErrors, formErrors);
  }
}

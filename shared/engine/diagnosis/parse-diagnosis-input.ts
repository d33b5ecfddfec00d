import { DiagnosisInputSchema, type DiagnosisInput } from "../../schemas/diagnosis.ts";
import { DiagnosisInputError } from "./diagnosis-input-error.ts";

/**
 * One circuit's readings validated at a boundary (the run-log form, the casebook editor, a
 * generated or scripted case), ready for `diagnose()`, which trusts what it is given. The check
 * is `DiagnosisInputSchema` and nothing else: its types, ranges, the vacuum limit and the
 * cross-field rules, with its messages (README decision 034). The server validates its own
 * inputs with the same schema (server/visits/reading-input.ts) and answers a refusal as a 400.
 *
 * Units: as `DiagnosisInputSchema` (kPa gauge, °C, K, %, A, minutes); valid range: any value.
 *
 * @throws {DiagnosisInputError} when the schema refuses the readings (messages by field)
 * @example parseDiagnosisInput({ refrigerant: " R410A", meteringDevice: "txv", suctionPressureKPa: 820, suctionLineTempC: 13, liquidPressureKPa: 2650, liquidLineTempC: 38 }).refrigerant // "R410A"
 */
export function parseDiagnosisInput(readings: unknown): DiagnosisInput {
  const parsed = DiagnosisInputSchema.safeParse(readings);
  if (!parsed.success) throw DiagnosisInputError.fromZodError(parsed.error);
  return parsed.data;
}

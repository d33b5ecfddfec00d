import {
  DiagnosisInputSchema,
  TrendInputSchema,
  TrendReadingSchema,
  type DiagnosisResult,
  type TrendReading,
} from "../../schemas/diagnosis.ts";
import { diagnose } from "./diagnose.ts";
import { DiagnosisInputError } from "./diagnosis-input-error.ts";

/** One circuit's run log as the settling assessment reads it: columns, times parsed once. */
export interface TrendSeries {
  /** The readings' own ISO times, for the result. */
  takenAt: string[];
  /** Minutes since the first reading, strictly increasing. */
  minutes: Float64Array;
  /** Whether the technician adjusted the system just before each reading. */
  adjusted: Uint8Array;
  /** Recorded run time of each reading, minutes, when it was recorded. */
  runMinutes: (number | undefined)[];
  /** Each reading's diagnosis: its stored result, or worked out here once when it had none usable. */
  results: DiagnosisResult[];
}

/**
 * A field every result of the current engine has and older ones lack (the server brings stored
 * readings up to date by the same field, server/db/upgrade-stored-diagnoses.ts): an older result
 * would not parse on the screens that show the trend's diagnoses, so it is worked out again.
 */
export const CURRENT_RESULT_FIELD = "chargeDeviation";

const takenAtSchema = TrendReadingSchema.shape.takenAt;
const MINUTE_MS = 60_000;

const isObject = (value: unknown): value is Record<string, unknown> => typeof value === "object" && value !== null;

/** The stored result when it is one of the current engine's, else null (diagnose again). */
function currentResult(result: unknown): DiagnosisResult | null {
  return isObject(result) && "chargeState" in result && CURRENT_RESULT_FIELD in result
    ? (result as DiagnosisResult)
    : null;
}

/**
 * The quick road: a run log whose readings carry their stored results, in time order. A stored
 * result is the server's diagnosis of an input validated when it was saved (decision 004), so
 * neither is parsed again — the trend reads only the result's superheat and subcooling and the
 * input's run time. Returns null at the first doubt (a missing time, readings out of order, a
 * malformed field, an input that cannot be diagnosed), leaving the message to the schema.
 */
function readStoredSeries(readings: readonly unknown[]): TrendSeries | null {
  const count = readings.length;
  if (count === 0) return null;
  const series: TrendSeries = {
    takenAt: new Array<string>(count),
    minutes: new Float64Array(count),
    adjusted: new Uint8Array(count),
    runMinutes: new Array<number | undefined>(count),
    results: new Array<DiagnosisResult>(count),
  };
  let origin = 0;
  let previous = -Infinity;
  for (let index = 0; index < count; index += 1) {
    const reading = readings[index];
    if (!isObject(reading) || !isObject(reading.input)) return null;
    const { takenAt, adjustment, result } = reading;
    if (typeof takenAt !== "string" || !takenAtSchema.safeParse(takenAt).success) return null;
    const time = Date.parse(takenAt);
    if (!(time > previous)) return null;
    if (adjustment !== undefined && (typeof adjustment !== "string" || adjustment.trim() === "")) return null;
    const runMinutes = reading.input.runMinutes;
    if (runMinutes !== undefined && (typeof runMinutes !== "number" || !Number.isFinite(runMinutes))) return null;
    if (result !== undefined && !(isObject(result) && "chargeState" in result)) return null;
    let diagnosis = currentResult(result);
    if (diagnosis === null) {
      // diagnose() trusts its input: the one input it is given here passes the schema first.
      const input = DiagnosisInputSchema.safeParse(reading.input);
      if (!input.success) return null;
      try {
        diagnosis = diagnose(input.data);
      } catch (error) {
        if (error instanceof DiagnosisInputError) return null;
        throw error;
      }
    }
    if (index === 0) origin = time;
    previous = time;
    series.takenAt[index] = takenAt;
    series.minutes[index] = (time - origin) / MINUTE_MS;
    series.adjusted[index] = adjustment === undefined ? 0 : 1;
    series.runMinutes[index] = runMinutes;
    series.results[index] = diagnosis;
  }
  return series;
}

/** The careful road: the whole series through the trend schema, whose messages name each field. */
function readValidatedSeries(readings: readonly unknown[]): TrendSeries {
  const parsed = TrendInputSchema.safeParse(readings);
  if (!parsed.success) throw DiagnosisInputError.fromZodError(parsed.error);
  const valid: TrendReading[] = parsed.data;
  // The schema keeps at least one reading; with none there would be no minutes to count from it.
  const [first] = valid;
  const origin = first ? Date.parse(first.takenAt) : 0;
  return {
    takenAt: valid.map((reading) => reading.takenAt),
    minutes: Float64Array.from(valid, (reading) => (Date.parse(reading.takenAt) - origin) / MINUTE_MS),
    adjusted: Uint8Array.from(valid, (reading) => (reading.adjustment === undefined ? 0 : 1)),
    runMinutes: valid.map((reading) => reading.input.runMinutes),
    results: valid.map((reading) => currentResult(reading.result) ?? diagnose(reading.input)),
  };
}

/**
 * Reads one circuit's run log for `assessTrend`: times parsed once, each reading's stored
 * diagnosis taken as it is, and a reading without a current one diagnosed once. Anything the
 * quick check doubts goes through `TrendInputSchema`, which stays the source of every message.
 *
 * @throws {DiagnosisInputError} when the series is empty, out of time order, or a reading to be
 *   diagnosed is invalid (fields prefixed by the reading's index, e.g. "2.input.suctionPressureKPa")
 * @example readTrendSeries([{ takenAt: "2026-01-10T09:00:00Z", input, result }]).minutes // Float64Array [0]
 */
export function readTrendSeries(readings: readonly unknown[]): TrendSeries {
  return (Array.isArray(readings) ? readStoredSeries(readings) : null) ?? readValidatedSeries(readings);
}

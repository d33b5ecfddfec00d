/**
 * What the automatic calibration reads: a circuit's standing full weigh-in on a visit, when the
 * charge went in, and the circuit's run log (readings and adjustments) from then on.
 */
import { and, asc, desc, eq, gte, inArray, isNull, or } from "drizzle-orm";
import type { DiagnosisInput, DiagnosisResult } from "@shared/schemas/diagnosis.ts";
import type { Database } from "./client.ts";
import { adjustments, circuitCharges, readings, refrigerantMovements } from "./schema.ts";
import { countsInResults } from "./visits.ts";

/** Register movements that put refrigerant into the circuit. */
const CHARGING_KINDS = ["reused", "added-new", "added-reclaimed"] as const;

export interface WeighInRunLog {
  /** When the charge went in: the last charging movement on the circuit, else when the weigh-in was declared. */
  weighedInAt: Date;
  readings: { id: string; takenAt: Date; input: DiagnosisInput; result: DiagnosisResult }[];
  adjustments: { at: Date; description: string }[];
}

/** The run log after the circuit's full weigh-in on this visit, or null when it has none standing. */
export async function weighInRunLog(
  db: Database,
  organisationId: string,
  visitId: string,
  circuit: number,
): Promise<WeighInRunLog | null> {
  const [declaration] = await db
    .select({ createdAt: circuitCharges.createdAt })
    .from(circuitCharges)
    .where(
      and(
        eq(circuitCharges.organisationId, organisationId),
        eq(circuitCharges.visitId, visitId),
        eq(circuitCharges.circuit, circuit),
        isNull(circuitCharges.voidedAt),
      ),
    );
  if (!declaration) return null;
  const [charged] = await db
    .select({ at: refrigerantMovements.at })
    .from(refrigerantMovements)
    .where(
      and(
        eq(refrigerantMovements.organisationId, organisationId),
        eq(refrigerantMovements.visitId, visitId),
        eq(refrigerantMovements.circuit, circuit),
        inArray(refrigerantMovements.kind, [...CHARGING_KINDS]),
        isNull(refrigerantMovements.voidedAt),
      ),
    )
    .orderBy(desc(refrigerantMovements.at))
    .limit(1);
  const weighedInAt = charged?.at ?? declaration.createdAt;
  const [series, changes] = await Promise.all([
    db
      .select({ id: readings.id, takenAt: readings.takenAt, input: readings.input, result: readings.result })
      .from(readings)
      .where(
        and(
          eq(readings.visitId, visitId),
          eq(readings.circuit, circuit),
          gte(readings.takenAt, weighedInAt),
          countsInResults,
        ),
      )
      .orderBy(asc(readings.takenAt), asc(readings.createdAt), asc(readings.id)),
    db
      .select({ at: adjustments.at, description: adjustments.description })
      .from(adjustments)
      .where(
        and(
          eq(adjustments.visitId, visitId),
          or(eq(adjustments.circuit, circuit), isNull(adjustments.circuit)),
          gte(adjustments.at, weighedInAt),
          isNull(adjustments.voidedAt),
        ),
      )
      .orderBy(asc(adjustments.at)),
  ]);
  return { weighedInAt, readings: series, adjustments: changes };
}

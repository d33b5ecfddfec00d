import { z } from "zod";
import { DiagnosisResultSchema } from "./diagnosis.ts";
import { EquipmentSchema } from "./equipment.ts";
import { VisitSummarySchema } from "./visits.ts";

/** GET /api/equipment/:id: the unit, its visits, and each circuit's last settled reading. */
export const EquipmentDetailSchema = z.object({
  equipment: EquipmentSchema,
  visits: z.array(VisitSummarySchema),
  lastSettled: z.array(
    z.object({
      circuit: z.number().int(),
      takenAt: z.string().nullable(),
      result: DiagnosisResultSchema.nullable(),
    }),
  ),
});
export type EquipmentDetail = z.infer<typeof EquipmentDetailSchema>;

import { z } from "zod";

/** Answer of POST /api/visits/:id/readings/import (preview or store). */
export const ImportSummarySchema = z.object({
  headers: z.array(z.string()),
  mapping: z.record(z.string(), z.string()),
  rowCount: z.number().int(),
  validCount: z.number().int(),
  problems: z.array(z.object({ line: z.number().int(), field: z.string().optional(), message: z.string() })),
  stored: z.number().int(),
});
export type ImportSummary = z.infer<typeof ImportSummarySchema>;

/** Columns a CSV header can be mapped to, with the words shown in the mapping step. */
export const IMPORT_TARGET_LABELS: Record<string, string> = {
  ignore: "Ignore this column",
  takenAt: "Reading time",
  suctionPressureKPa: "Suction pressure (kPa gauge)",
  suctionLineTempC: "Suction line temperature (°C)",
  dischargePressureKPa: "Discharge pressure (kPa gauge)",
  dischargeLineTempC: "Discharge line temperature (°C)",
  liquidPressureKPa: "Liquid pressure (kPa gauge)",
  liquidLineTempC: "Liquid line temperature (°C)",
  returnAirDryBulbC: "Return air dry bulb (°C)",
  returnAirWetBulbC: "Return air wet bulb (°C)",
  returnAirRelativeHumidity: "Return air RH (%)",
  supplyAirDryBulbC: "Supply air dry bulb (°C)",
  outdoorAirDryBulbC: "Outdoor air dry bulb (°C)",
  compressorAmps: "Compressor current (A)",
  runMinutes: "Run time (min)",
};

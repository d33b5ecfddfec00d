import type { DiagnosisInput } from "@shared/schemas/diagnosis.ts";
import type { Quantity } from "./quantities.ts";

/** The readings of a case in the order a technician takes them: around the circuit, then air and electrical. */
export const CASE_READINGS: {
  field: keyof DiagnosisInput;
  label: string;
  quantity: Quantity;
  group: "refrigerant" | "air" | "electrical" | "nameplate";
}[] = [
  { field: "suctionPressureKPa", label: "Suction pressure (low side)", quantity: "pressure", group: "refrigerant" },
  { field: "suctionLineTempC", label: "Suction line temperature", quantity: "temperature", group: "refrigerant" },
  { field: "dischargePressureKPa", label: "Discharge pressure", quantity: "pressure", group: "refrigerant" },
  { field: "dischargeLineTempC", label: "Discharge line temperature", quantity: "temperature", group: "refrigerant" },
  { field: "liquidPressureKPa", label: "Liquid pressure (high side)", quantity: "pressure", group: "refrigerant" },
  { field: "liquidLineTempC", label: "Liquid line temperature", quantity: "temperature", group: "refrigerant" },
  { field: "returnAirDryBulbC", label: "Return air dry bulb", quantity: "temperature", group: "air" },
  { field: "returnAirWetBulbC", label: "Return air wet bulb", quantity: "temperature", group: "air" },
  { field: "returnAirRelativeHumidity", label: "Return air humidity", quantity: "percent", group: "air" },
  { field: "supplyAirDryBulbC", label: "Supply air dry bulb", quantity: "temperature", group: "air" },
  { field: "outdoorAirDryBulbC", label: "Outdoor air (condenser inlet)", quantity: "temperature", group: "air" },
  { field: "compressorAmps", label: "Compressor current", quantity: "current", group: "electrical" },
  { field: "compressorRla", label: "Compressor RLA (nameplate)", quantity: "current", group: "nameplate" },
  { field: "targetSuperheatK", label: "Target superheat (nameplate)", quantity: "difference", group: "nameplate" },
  { field: "targetSubcoolingK", label: "Target subcooling (nameplate)", quantity: "difference", group: "nameplate" },
  // The circuit's correct charge lets the engine estimate the charge to add (issue 14).
  { field: "chargeKg", label: "Correct charge (nameplate plus line set)", quantity: "mass", group: "nameplate" },
  { field: "liquidLineLengthM", label: "Liquid line length", quantity: "length", group: "nameplate" },
  { field: "runMinutes", label: "Running time", quantity: "minutes", group: "electrical" },
];

export const METERING_LABELS = {
  txv: "TXV",
  eev: "EEV",
  "fixed-orifice": "Fixed orifice (piston)",
  capillary: "Capillary tube",
} as const;

import type { DiagnosisInput, LiquidTempLocation, SuctionTempLocation } from "@shared/schemas/diagnosis.ts";
import { parseDecimal } from "@/components/ui/field/number-input.tsx";
import {
  formatNumber,
  gaugeFromDisplay,
  gaugeToDisplay,
  PRESSURE_DECIMALS,
  temperatureFromDisplay,
  temperatureToDisplay,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";

/** What each typed field is, so it converts from display units to the engine's SI-metric. */
type FieldKind = "pressure" | "temperature" | "percent" | "current" | "minutes";

export const DRAFT_FIELDS = {
  suctionPressureKPa: "pressure",
  suctionLineTempC: "temperature",
  dischargePressureKPa: "pressure",
  dischargeLineTempC: "temperature",
  liquidPressureKPa: "pressure",
  liquidLineTempC: "temperature",
  returnAirDryBulbC: "temperature",
  returnAirWetBulbC: "temperature",
  returnAirRelativeHumidity: "percent",
  supplyAirDryBulbC: "temperature",
  outdoorAirDryBulbC: "temperature",
  compressorAmps: "current",
  runMinutes: "minutes",
} as const satisfies Partial<Record<keyof DiagnosisInput, FieldKind>>;

export type DraftField = keyof typeof DRAFT_FIELDS;
export const REQUIRED_FIELDS: DraftField[] = [
  "suctionPressureKPa",
  "suctionLineTempC",
  "liquidPressureKPa",
  "liquidLineTempC",
];

/** Where the suction temperature was taken; "" when the technician did not say. */
export type SuctionLocationChoice = SuctionTempLocation | "";

/** The entry form's state: exactly what was typed, in display units, so nothing is lost. */
export type ReadingDraft = Record<DraftField, string> & {
  liquidTempLocation: LiquidTempLocation;
  suctionTempLocation: SuctionLocationChoice;
};

export function emptyDraft(): ReadingDraft {
  const draft = Object.fromEntries(Object.keys(DRAFT_FIELDS).map((key) => [key, ""])) as Record<DraftField, string>;
  return { ...draft, liquidTempLocation: "liquid-line", suctionTempLocation: "" };
}

/** Carries a stored reading forward into the form, in the user's units. */
export function draftFromInput(
  input: Partial<DiagnosisInput>,
  units: DisplayUnits,
  atmosphericKPa: number,
): ReadingDraft {
  const draft = emptyDraft();
  for (const [key, kind] of Object.entries(DRAFT_FIELDS) as [DraftField, FieldKind][]) {
    const value = input[key];
    if (typeof value !== "number") continue;
    draft[key] =
      kind === "pressure"
        ? formatNumber(gaugeToDisplay(value, units.pressure, atmosphericKPa), PRESSURE_DECIMALS[units.pressure])
        : kind === "temperature"
          ? formatNumber(temperatureToDisplay(value, units.temperature), 1)
          : String(value);
  }
  draft.liquidTempLocation = input.liquidTempLocation ?? "liquid-line";
  draft.suctionTempLocation = input.suctionTempLocation ?? "";
  return draft;
}

export interface ParsedDraft {
  /** Every field that holds a number, converted to SI-metric (kPa gauge, °C). */
  values: Partial<Pick<DiagnosisInput, DraftField | "suctionTempLocation">> & {
    liquidTempLocation: LiquidTempLocation;
  };
  /** Fields whose text is not a number. */
  typingErrors: Partial<Record<DraftField, string>>;
  /** Required fields still empty. */
  missing: DraftField[];
}

export function parseDraft(draft: ReadingDraft, units: DisplayUnits, atmosphericKPa: number): ParsedDraft {
  const values: ParsedDraft["values"] = {
    liquidTempLocation: draft.liquidTempLocation,
    ...(draft.suctionTempLocation === "" ? {} : { suctionTempLocation: draft.suctionTempLocation }),
  };
  const typingErrors: ParsedDraft["typingErrors"] = {};
  const missing: DraftField[] = [];
  for (const [key, kind] of Object.entries(DRAFT_FIELDS) as [DraftField, FieldKind][]) {
    const parsed = parseDecimal(draft[key]);
    if (parsed === undefined) {
      if (REQUIRED_FIELDS.includes(key)) missing.push(key);
      continue;
    }
    if (parsed === "invalid") {
      typingErrors[key] = "Type a number, e.g. 520 or -3.5";
      continue;
    }
    values[key] =
      kind === "pressure"
        ? Number(gaugeFromDisplay(parsed, units.pressure, atmosphericKPa).toFixed(3))
        : kind === "temperature"
          ? Number(temperatureFromDisplay(parsed, units.temperature).toFixed(3))
          : parsed;
  }
  return { values, typingErrors, missing };
}

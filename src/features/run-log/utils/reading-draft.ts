import type { DiagnosisInput, LiquidTempLocation, SuctionTempLocation } from "@shared/schemas/diagnosis.ts";
import {
  NUMERIC_MEASURED_FIELDS,
  quantityOf,
  REQUIRED_MEASURED_FIELDS,
  type NumericMeasuredField,
} from "@shared/schemas/reading-fields.ts";
import { parseDecimal } from "@/components/ui/field/number-input.tsx";
import type { DisplayUnits } from "@/lib/units/display-units.ts";
import { formatQuantity, toSi } from "@/lib/units/quantities.ts";

/** The fields typed on the run log's form: every measured number, from the catalogue of reading fields. */
export const DRAFT_FIELDS = NUMERIC_MEASURED_FIELDS;
export type DraftField = NumericMeasuredField;
export const REQUIRED_FIELDS: readonly DraftField[] = REQUIRED_MEASURED_FIELDS;

/** Where the suction temperature was taken; "" when the technician did not say. */
export type SuctionLocationChoice = SuctionTempLocation | "";

/** The entry form's state: exactly what was typed, in display units, so nothing is lost. */
export type ReadingDraft = Record<DraftField, string> & {
  liquidTempLocation: LiquidTempLocation;
  suctionTempLocation: SuctionLocationChoice;
};

export function emptyDraft(): ReadingDraft {
  const draft = Object.fromEntries(DRAFT_FIELDS.map((key) => [key, ""])) as Record<DraftField, string>;
  return { ...draft, liquidTempLocation: "liquid-line", suctionTempLocation: "" };
}

/** Carries a stored reading forward into the form, in the user's units. */
export function draftFromInput(
  input: Partial<DiagnosisInput>,
  units: DisplayUnits,
  atmosphericKPa: number,
): ReadingDraft {
  const draft = emptyDraft();
  for (const key of DRAFT_FIELDS) {
    const value = input[key];
    if (typeof value === "number") draft[key] = formatQuantity(value, quantityOf(key), units, atmosphericKPa);
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
  for (const key of DRAFT_FIELDS) {
    const parsed = parseDecimal(draft[key]);
    if (parsed === undefined) {
      if (REQUIRED_FIELDS.includes(key)) missing.push(key);
      continue;
    }
    if (parsed === "invalid") {
      typingErrors[key] = "Type a number, e.g. 520 or -3.5";
      continue;
    }
    const quantity = quantityOf(key);
    // A converted figure is kept to 3 decimals (the conversion leaves float noise); a count as typed.
    values[key] =
      quantity === "pressure" || quantity === "temperature"
        ? Number(toSi(parsed, quantity, units, atmosphericKPa).toFixed(3))
        : parsed;
  }
  return { values, typingErrors, missing };
}

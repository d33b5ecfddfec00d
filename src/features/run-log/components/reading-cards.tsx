import type { KeyboardEvent } from "react";
import { CautionLine } from "@/components/ui/caution-panel/caution-line.tsx";
import type { DiagnosisResult, LiquidTempLocation, TargetBand } from "@shared/schemas/diagnosis.ts";
import { Segmented } from "@/components/ui/field/segmented.tsx";
import {
  DIFFERENCE_LABEL,
  TEMPERATURE_LABEL,
  differenceToDisplay,
  formatNumber,
  temperatureToDisplay,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";
import { quantityOf, READING_FIELDS, readingField } from "@shared/schemas/reading-fields.ts";
import { unitLabel } from "@/lib/units/quantities.ts";
import {
  DRAFT_FIELDS,
  type DraftField,
  type ReadingDraft,
  type SuctionLocationChoice,
} from "../utils/reading-draft.ts";
import { NumberField } from "@/components/ui/field/number-field.tsx";
import { Derived, ReadingCard } from "./reading-card.tsx";

interface ReadingCardsProps {
  draft: ReadingDraft;
  onField: (field: DraftField, value: string) => void;
  onLocation: (location: LiquidTempLocation) => void;
  onSuctionLocation: (location: SuctionLocationChoice) => void;
  fieldErrors: Record<string, string>;
  result: DiagnosisResult | null;
  units: DisplayUnits;
  isBlend: boolean;
  /** The parsed discharge line temperature, °C, for its margin to the limit. */
  dischargeLineTempC: number | undefined;
}

/** The last field on the cards: its Enter ("done" on the keypad) saves the reading. */
const LAST_FIELD = DRAFT_FIELDS.at(-1);

/**
 * Enter (the keypad's "next") moves to the next reading field with its value selected, so a
 * gloved technician types the round without reaching for the screen and a carried-forward
 * value is replaced by typing over it. Enter in the last field submits the form as usual.
 */
function moveToNextField(event: KeyboardEvent<HTMLDivElement>) {
  if (event.key !== "Enter" || event.nativeEvent.isComposing) return;
  const target = event.target;
  if (!(target instanceof HTMLInputElement) || !("readingField" in target.dataset)) return;
  const fields = [...event.currentTarget.querySelectorAll<HTMLInputElement>("input[data-reading-field]")];
  const next = fields[fields.indexOf(target) + 1];
  if (!next) return;
  event.preventDefault();
  next.focus();
  next.select();
}

/** Shown before the first result arrives: the general limit (225 °F [S13]). */
const DEFAULT_DISCHARGE_LIMIT_C = 107;

/**
 * The entry cards in the order the refrigerant flows: suction (evaporator outlet), discharge,
 * liquid (condenser outlet), then air and electrical. Each card shows what was measured, its
 * saturation counterpart and the derived value on one line.
 */
export function ReadingCards({
  draft,
  onField,
  onLocation,
  onSuctionLocation,
  fieldErrors,
  result,
  units,
  isBlend,
  dischargeLineTempC,
}: ReadingCardsProps) {
  const t = TEMPERATURE_LABEL[units.temperature];
  const k = DIFFERENCE_LABEL[units.temperature];
  const temp = (value: number | null | undefined) =>
    value == null ? null : formatNumber(temperatureToDisplay(value, units.temperature), 1);
  const diff = (value: number | null | undefined) =>
    value == null ? null : formatNumber(differenceToDisplay(value, units.temperature), 1);
  const band = (target: TargetBand | null | undefined) =>
    target
      ? `target ${diff(target.targetK)} ${k} (${diff(target.lowK)}–${diff(target.highK)}, ${target.basis.replace("-", " ")})`
      : undefined;
  // Words and unit from the catalogue of reading fields: the card's own where they say more.
  const input = (field: DraftField) => {
    const entry = readingField(field);
    return (
      <NumberField
        name={field}
        label={entry.entryLabel ?? entry.label}
        unit={entry.entryUnit ?? unitLabel(quantityOf(field), units)}
        value={draft[field]}
        onValueChange={(value) => onField(field, value)}
        error={fieldErrors[field]}
        hint={entry.entryHint}
        data-reading-field
        enterKeyHint={field === LAST_FIELD ? "done" : "next"}
      />
    );
  };
  // The limit depends on the refrigerant and the application: the engine's result carries it.
  const dischargeLimit = result?.dischargeLineLimits.limitC ?? DEFAULT_DISCHARGE_LIMIT_C;
  const dischargeMargin = dischargeLineTempC === undefined ? null : dischargeLimit - dischargeLineTempC;

  return (
    // Not a control itself: it only passes Enter on to the next field (see moveToNextField).
    <div className="space-y-3" onKeyDown={moveToNextField}>
      <ReadingCard
        step={1}
        title="Suction"
        where="evaporator outlet / suction service port"
        side="low side"
        derived={
          <div className="flex flex-wrap gap-x-8 gap-y-2">
            <Derived
              label={isBlend ? "Dew point" : "Saturation"}
              value={temp(result?.evaporatingTempC)}
              unit={t}
              testId="evaporating-temp"
            />
            <Derived
              label="Superheat"
              value={diff(result?.superheatK)}
              unit={k}
              target={band(result?.targets.superheat)}
              testId="superheat"
            />
          </div>
        }
      >
        {input("suctionPressureKPa")}
        {input("suctionLineTempC")}
        <div className="@lg:col-span-2">
          <CautionLine topic="pressure" point={1} />
        </div>
        <div className="@lg:col-span-2">
          <Segmented<SuctionLocationChoice>
            label={READING_FIELDS.suctionTempLocation.label}
            value={draft.suctionTempLocation}
            onChange={onSuctionLocation}
            options={[
              { value: "evaporator-outlet", label: "Evaporator outlet" },
              { value: "outdoor-unit", label: "Outdoor unit" },
              { value: "", label: "Not stated" },
            ]}
          />
          {result && result.suctionLineAllowanceK !== 0 && (
            <p className="mt-2 text-sm text-muted">
              Target moved {result.suctionLineAllowanceK > 0 ? "up" : "down"}{" "}
              {diff(Math.abs(result.suctionLineAllowanceK))} {k} for the suction line between coil and outdoor unit.
            </p>
          )}
        </div>
      </ReadingCard>

      <ReadingCard
        step={2}
        title="Discharge"
        where="compressor outlet, within 15 cm"
        side="high side"
        derived={
          <div className="flex flex-wrap gap-x-8 gap-y-2">
            <Derived
              label="Line temperature margin"
              value={diff(dischargeMargin)}
              unit={k}
              target={`below the ${temp(dischargeLimit)} ${t} line limit`}
              testId="discharge-margin"
            />
            <Derived
              label="Compression ratio"
              value={result?.compressionRatio == null ? null : formatNumber(result.compressionRatio, 1)}
              unit=": 1"
            />
          </div>
        }
      >
        {input("dischargePressureKPa")}
        {input("dischargeLineTempC")}
        <div className="@lg:col-span-2">
          <CautionLine topic="hot-surface" />
        </div>
      </ReadingCard>

      <ReadingCard
        step={3}
        title="Liquid"
        where="condenser outlet / liquid service port"
        side="high side"
        derived={
          <div className="flex flex-wrap gap-x-8 gap-y-2">
            <Derived
              label={isBlend ? "Bubble point" : "Saturation"}
              value={temp(result?.condensingTempC)}
              unit={t}
              testId="condensing-temp"
            />
            <Derived
              label="Subcooling"
              value={draft.liquidTempLocation === "discharge-line" ? null : diff(result?.subcoolingK)}
              unit={k}
              target={
                draft.liquidTempLocation === "discharge-line"
                  ? "not valid on a discharge line"
                  : band(result?.targets.subcooling)
              }
              testId="subcooling"
            />
          </div>
        }
      >
        {input("liquidPressureKPa")}
        {input("liquidLineTempC")}
        <div className="@lg:col-span-2">
          <Segmented<LiquidTempLocation>
            label={READING_FIELDS.liquidTempLocation.entryLabel}
            value={draft.liquidTempLocation}
            onChange={onLocation}
            options={[
              { value: "liquid-line", label: "On the liquid line" },
              { value: "discharge-line", label: "On the discharge line" },
            ]}
          />
          {draft.liquidTempLocation === "discharge-line" && (
            <p className="mt-2 font-medium text-caution">
              ⚠ The discharge line carries superheated vapour: subcooling read there is not valid and is left out of the
              finding.
            </p>
          )}
        </div>
      </ReadingCard>

      <ReadingCard
        step={4}
        title="Air"
        where="return, supply and outdoor air"
        derived={
          <div className="flex flex-wrap gap-x-8 gap-y-2">
            <Derived label="Split across the coil" value={diff(result?.temperatureSplitK)} unit={k} />
            <Derived
              label={result?.wetBulbBasis === "from-relative-humidity" ? "Wet bulb (from RH)" : "Wet bulb"}
              value={temp(result?.returnAirWetBulbC)}
              unit={t}
            />
            <Derived label="Condenser approach" value={diff(result?.condenserApproachK)} unit={k} />
          </div>
        }
      >
        {input("returnAirDryBulbC")}
        {input("returnAirWetBulbC")}
        {input("returnAirRelativeHumidity")}
        {input("supplyAirDryBulbC")}
        {input("outdoorAirDryBulbC")}
      </ReadingCard>

      <ReadingCard
        step={5}
        title="Electrical and run time"
        where="compressor"
        derived={
          <Derived
            label="Compressor current"
            value={result?.compressorCurrentRatio == null ? null : formatNumber(result.compressorCurrentRatio * 100, 0)}
            unit="% of RLA"
          />
        }
      >
        {input("compressorAmps")}
        {input("runMinutes")}
      </ReadingCard>
    </div>
  );
}

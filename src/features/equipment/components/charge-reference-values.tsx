import type { ChargeReference } from "@shared/schemas/diagnosis.ts";
import {
  DIFFERENCE_LABEL,
  TEMPERATURE_DECIMALS,
  TEMPERATURE_LABEL,
  differenceToDisplay,
  formatNumber,
  temperatureToDisplay,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";

/** A reference point's six values: differences in K, temperatures in °C (or the user's display units). */
export function ChargeReferenceValues({ values, units }: { values: ChargeReference; units: DisplayUnits }) {
  const difference = (kelvin: number) =>
    `${formatNumber(differenceToDisplay(kelvin, units.temperature), TEMPERATURE_DECIMALS)} ${DIFFERENCE_LABEL[units.temperature]}`;
  const temperature = (celsius: number | null) =>
    celsius === null
      ? null
      : `${formatNumber(temperatureToDisplay(celsius, units.temperature), TEMPERATURE_DECIMALS)} ${TEMPERATURE_LABEL[units.temperature]}`;
  const rows: [string, string | null][] = [
    ["Subcooling", difference(values.subcoolingK)],
    ["Superheat", difference(values.superheatK)],
    ["Evaporating (dew)", temperature(values.evaporatingTempC)],
    ["Condensing (bubble)", temperature(values.condensingTempC)],
    ["Outdoor air", temperature(values.outdoorAirDryBulbC)],
    ["Return air", temperature(values.returnAirDryBulbC)],
  ];
  return (
    <dl className="grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-3">
      {rows.map(([label, value]) => (
        <div key={label}>
          <dt className="text-sm text-muted">{label}</dt>
          <dd className="num text-lg font-semibold">
            {value ?? <span className="text-base font-normal text-muted">not measured</span>}
          </dd>
        </div>
      ))}
    </dl>
  );
}

import { chargeStateText } from "@shared/content/charge-states.ts";
import type { Reading } from "@shared/schemas/visits.ts";
import {
  DIFFERENCE_LABEL,
  GAUGE_LABEL,
  PRESSURE_DECIMALS,
  TEMPERATURE_LABEL,
  differenceToDisplay,
  formatNumber,
  gaugeToDisplay,
  temperatureToDisplay,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";
import { formatTime } from "@shared/format/date-time.ts";

/** Every reading of one circuit as a table, in the order taken. */
export function ReadingsTable({
  readings,
  units,
  atmosphericKPa,
}: {
  readings: Reading[];
  units: DisplayUnits;
  atmosphericKPa: number;
}) {
  const t = TEMPERATURE_LABEL[units.temperature];
  const k = DIFFERENCE_LABEL[units.temperature];
  const p = GAUGE_LABEL[units.pressure];
  const temp = (value: number | null | undefined) =>
    value == null ? "—" : formatNumber(temperatureToDisplay(value, units.temperature), 1);
  const diff = (value: number | null | undefined) =>
    value == null ? "—" : formatNumber(differenceToDisplay(value, units.temperature), 1);
  const pressure = (value: number | undefined, atmosphere: number) =>
    value === undefined
      ? "—"
      : formatNumber(gaugeToDisplay(value, units.pressure, atmosphere), PRESSURE_DECIMALS[units.pressure]);
  if (readings.length === 0) return <p className="text-muted">No readings on this circuit.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="num w-full border-collapse text-right text-sm">
        <thead className="font-sans">
          <tr className="border-b-2 border-ink align-bottom">
            <th scope="col" className="px-2 py-1 text-left">
              Time
            </th>
            <th scope="col" className="px-2 py-1">
              Suction {p}
            </th>
            <th scope="col" className="px-2 py-1">
              Evap. {t}
            </th>
            <th scope="col" className="px-2 py-1">
              SH {k}
            </th>
            <th scope="col" className="px-2 py-1">
              Liquid {p}
            </th>
            <th scope="col" className="px-2 py-1">
              Cond. {t}
            </th>
            <th scope="col" className="px-2 py-1">
              SC {k}
            </th>
            <th scope="col" className="px-2 py-1">
              DLT {t}
            </th>
            <th scope="col" className="px-2 py-1 text-left">
              Finding
            </th>
          </tr>
        </thead>
        <tbody>
          {readings.map((reading) => {
            const atmosphere = reading.input.atmosphericPressureKPa ?? atmosphericKPa;
            return (
              <tr key={reading.id} className="border-b border-rule">
                <td className="px-2 py-1 text-left">{formatTime(reading.takenAt)}</td>
                <td className="px-2 py-1">{pressure(reading.input.suctionPressureKPa, atmosphere)}</td>
                <td className="px-2 py-1">{temp(reading.result.evaporatingTempC)}</td>
                <td className="px-2 py-1">{diff(reading.result.superheatK)}</td>
                <td className="px-2 py-1">{pressure(reading.input.liquidPressureKPa, atmosphere)}</td>
                <td className="px-2 py-1">{temp(reading.result.condensingTempC)}</td>
                <td className="px-2 py-1">
                  {reading.input.liquidTempLocation === "discharge-line" ? "n/v" : diff(reading.result.subcoolingK)}
                </td>
                <td className="px-2 py-1">{temp(reading.input.dischargeLineTempC)}</td>
                <td className="px-2 py-1 text-left font-sans">{chargeStateText[reading.result.chargeState].short}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

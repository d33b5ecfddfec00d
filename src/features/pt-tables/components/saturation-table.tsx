import { memo, useMemo } from "react";
import { pressureToDisplay } from "@shared/engine/index.ts";
import {
  ABSOLUTE_LABEL,
  GAUGE_LABEL,
  PRESSURE_DECIMALS,
  TEMPERATURE_DECIMALS,
  TEMPERATURE_LABEL,
  formatNumber,
  temperatureToDisplay,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";
import { saturationRows } from "../utils/saturation-rows.ts";

interface SaturationTableProps {
  refrigerantId: string;
  isBlend: boolean;
  fromC: number;
  toC: number;
  stepK: number;
  units: DisplayUnits;
  scale: "gauge" | "absolute";
  atmosphericKPa: number;
}

/**
 * The printable saturation table. Memoised on its inputs, so typing in the converter
 * beside it never recomputes or re-renders hundreds of rows.
 */
export const SaturationTable = memo(function SaturationTable(props: SaturationTableProps) {
  const { refrigerantId, isBlend, fromC, toC, stepK, units, scale, atmosphericKPa } = props;
  const rows = useMemo(() => saturationRows(refrigerantId, fromC, toC, stepK), [refrigerantId, fromC, toC, stepK]);
  const pressureLabel = scale === "gauge" ? GAUGE_LABEL[units.pressure] : ABSOLUTE_LABEL[units.pressure];
  const decimals = PRESSURE_DECIMALS[units.pressure];
  const show = (kPaAbs: number) =>
    formatNumber(pressureToDisplay(kPaAbs, units.pressure, scale, atmosphericKPa), decimals);

  return (
    <table className="num w-full border-collapse text-right text-lg">
      <caption className="sr-only">
        Saturation table for {refrigerantId}, {formatNumber(temperatureToDisplay(fromC, units.temperature), 1)} to{" "}
        {formatNumber(temperatureToDisplay(toC, units.temperature), 1)} {TEMPERATURE_LABEL[units.temperature]}
      </caption>
      <thead className="sticky top-0 bg-surface font-sans text-sm">
        <tr className="border-b-2 border-ink">
          <th scope="col" className="px-3 py-2">
            Temperature
            <br />
            <span className="num font-normal text-muted">{TEMPERATURE_LABEL[units.temperature]}</span>
          </th>
          {isBlend ? (
            <>
              <th scope="col" className="px-3 py-2">
                Bubble (liquid)
                <br />
                <span className="num font-normal text-muted">{pressureLabel}</span>
              </th>
              <th scope="col" className="px-3 py-2">
                Dew (vapour)
                <br />
                <span className="num font-normal text-muted">{pressureLabel}</span>
              </th>
            </>
          ) : (
            <th scope="col" className="px-3 py-2">
              Saturation pressure
              <br />
              <span className="num font-normal text-muted">{pressureLabel}</span>
            </th>
          )}
        </tr>
      </thead>
      <tbody>
        {rows.map((row) => (
          <tr key={row.temperatureC} className="border-b border-rule even:bg-sunken/50">
            <th scope="row" className="px-3 py-1.5 font-medium">
              {formatNumber(temperatureToDisplay(row.temperatureC, units.temperature), TEMPERATURE_DECIMALS)}
            </th>
            {isBlend ? (
              <>
                <td className="px-3 py-1.5">{show(row.bubbleKPaAbs)}</td>
                <td className="px-3 py-1.5">{show(row.dewKPaAbs)}</td>
              </>
            ) : (
              <td className="px-3 py-1.5">{show(row.dewKPaAbs)}</td>
            )}
          </tr>
        ))}
      </tbody>
    </table>
  );
});

import { CartesianGrid, Legend, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { DIFFERENCE_LABEL, TEMPERATURE_LABEL, differenceToDisplay, formatNumber, temperatureToDisplay, type DisplayUnits } from "@/lib/units/display-units.ts";
import type { CircuitSeries } from "../utils/circuit-series.ts";
import { downsample } from "../utils/downsample.ts";

/** Points drawn per line; thousands of logged points are reduced to this for display. */
export const MAX_CHART_POINTS = 400;

interface TrendChartProps {
  series: CircuitSeries;
  units: DisplayUnits;
  /** Fixed size for print and tests; fills its container otherwise. */
  width?: number;
  height?: number;
}

/**
 * Superheat and subcooling (K, left axis) and both saturation temperatures (right axis)
 * over the run, with each adjustment drawn as a labelled vertical line. Lines differ by dash
 * pattern as well as colour.
 */
export function TrendChart({ series, units, width, height = 320 }: TrendChartProps) {
  const k = DIFFERENCE_LABEL[units.temperature];
  const t = TEMPERATURE_LABEL[units.temperature];
  const data = downsample(series.points, MAX_CHART_POINTS, (point) => point.superheatK).map((point) => ({
    x: Number(point.x.toFixed(2)),
    superheat: point.superheatK === null ? null : Number(differenceToDisplay(point.superheatK, units.temperature).toFixed(2)),
    subcooling: point.subcoolingK === null ? null : Number(differenceToDisplay(point.subcoolingK, units.temperature).toFixed(2)),
    evaporating: point.evaporatingTempC === null ? null : Number(temperatureToDisplay(point.evaporatingTempC, units.temperature).toFixed(2)),
    condensing: point.condensingTempC === null ? null : Number(temperatureToDisplay(point.condensingTempC, units.temperature).toFixed(2)),
  }));
  if (data.length === 0) return <p className="p-4 text-muted">No readings on this circuit yet.</p>;

  const chart = (
    <LineChart data={data} width={width} height={height} margin={{ top: 16, right: 8, bottom: 8, left: 0 }}>
      <CartesianGrid strokeDasharray="2 4" stroke="var(--color-rule)" />
      <XAxis dataKey="x" type="number" domain={["dataMin", "dataMax"]} unit=" min" tick={{ fontFamily: "IBM Plex Mono", fontSize: 12 }} />
      <YAxis yAxisId="difference" unit={` ${k}`} width={56} tick={{ fontFamily: "IBM Plex Mono", fontSize: 12 }} />
      <YAxis yAxisId="saturation" orientation="right" unit={` ${t}`} width={60} tick={{ fontFamily: "IBM Plex Mono", fontSize: 12 }} />
      <Tooltip formatter={(value) => (typeof value === "number" ? formatNumber(value, 1) : String(value))} labelFormatter={(x) => `${formatNumber(Number(x), 1)} min`} />
      <Legend />
      {series.adjustments.map((adjustment, index) => (
        <ReferenceLine
          key={adjustment.id}
          yAxisId="difference"
          x={Number(adjustment.x.toFixed(2))}
          stroke="var(--color-ink)"
          strokeDasharray="6 3"
          // A number on the line, the words in the key below: long notes would overlap.
          label={{ value: `✎${index + 1}`, position: "insideTopLeft", fontSize: 12, fill: "var(--color-ink)" }}
        />
      ))}
      <Line yAxisId="difference" name={`Superheat (${k})`} dataKey="superheat" stroke="var(--color-low)" strokeWidth={3} dot={{ r: 3 }} isAnimationActive={false} connectNulls />
      <Line yAxisId="difference" name={`Subcooling (${k})`} dataKey="subcooling" stroke="var(--color-high)" strokeWidth={3} strokeDasharray="8 4" dot={{ r: 3 }} isAnimationActive={false} connectNulls />
      <Line yAxisId="saturation" name={`Evaporating (${t})`} dataKey="evaporating" stroke="var(--color-low)" strokeWidth={1.5} strokeDasharray="2 3" dot={false} isAnimationActive={false} connectNulls />
      <Line yAxisId="saturation" name={`Condensing (${t})`} dataKey="condensing" stroke="var(--color-high)" strokeWidth={1.5} strokeDasharray="2 3" dot={false} isAnimationActive={false} connectNulls />
    </LineChart>
  );
  return (
    <figure aria-label="Trend of superheat, subcooling and saturation temperatures" data-testid="trend-chart">
      {width ? chart : <ResponsiveContainer width="100%" height={height}>{chart}</ResponsiveContainer>}
      {series.adjustments.length > 0 && (
        <ol aria-label="Adjustments on the chart" className="mt-1 space-y-0.5 text-sm">
          {series.adjustments.map((adjustment, index) => (
            <li key={adjustment.id}>
              <span className="num font-semibold">✎{index + 1}</span> at <span className="num">{formatNumber(adjustment.x, 0)} min</span>: {adjustment.description}
            </li>
          ))}
        </ol>
      )}
      {series.points.length > MAX_CHART_POINTS && (
        <figcaption className="text-xs text-muted">
          {series.points.length} readings, drawn as {MAX_CHART_POINTS} points that keep peaks and dips.
        </figcaption>
      )}
    </figure>
  );
}

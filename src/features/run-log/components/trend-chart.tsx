import {
  CartesianGrid,
  Legend,
  Line,
  LineChart,
  ReferenceArea,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";
import {
  DIFFERENCE_LABEL,
  TEMPERATURE_LABEL,
  differenceToDisplay,
  formatNumber,
  temperatureToDisplay,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";
import type { CircuitSeries } from "../utils/circuit-series.ts";
import { clockLabel, clockTicks } from "../utils/clock-ticks.ts";
import { downsample } from "../utils/downsample.ts";

/** Points drawn per line; thousands of logged points are reduced to this for display. */
export const MAX_CHART_POINTS = 400;
/** Time labels across the chart: enough to read a time off, few enough not to collide on a phone. */
const MAX_TIME_TICKS = 6;

/** Axis and legend text in rem, so Sunlight mode's larger type reaches the chart too. */
const TICK_STYLE = { fontFamily: "IBM Plex Mono", fontSize: "0.8125rem", fill: "var(--color-ink)" } as const;

interface TrendChartProps {
  series: CircuitSeries;
  units: DisplayUnits;
  /** Fixed size for print and tests; fills its container otherwise. */
  width?: number;
  height?: number;
}

/**
 * Superheat and subcooling (K, left axis) over their shaded target bands, both saturation
 * temperatures (right axis), each adjustment as a numbered vertical line and the reading at
 * which the circuit was last settled as a green one, against clock time. Every line differs
 * by dash pattern as well as colour, so it reads in Sunlight mode and on a grey-scale print.
 */
export default function TrendChart({ series, units, width, height = 320 }: TrendChartProps) {
  const k = DIFFERENCE_LABEL[units.temperature];
  const t = TEMPERATURE_LABEL[units.temperature];
  const difference = (kelvin: number) => Number(differenceToDisplay(kelvin, units.temperature).toFixed(2));
  const data = downsample(series.points, MAX_CHART_POINTS, (point) => point.superheatK).map((point) => ({
    x: Number(point.x.toFixed(2)),
    superheat: point.superheatK === null ? null : difference(point.superheatK),
    subcooling: point.subcoolingK === null ? null : difference(point.subcoolingK),
    evaporating:
      point.evaporatingTempC === null
        ? null
        : Number(temperatureToDisplay(point.evaporatingTempC, units.temperature).toFixed(2)),
    condensing:
      point.condensingTempC === null
        ? null
        : Number(temperatureToDisplay(point.condensingTempC, units.temperature).toFixed(2)),
  }));
  const first = series.points[0];
  if (data.length === 0 || !first) return <p className="p-4 text-muted">No readings on this circuit yet.</p>;

  // x is minutes since the first reading (circuitSeries), so that reading's time is the clock origin.
  const origin = first.takenAt;
  const minutesAfterOrigin = (iso: string) => (Date.parse(iso) - Date.parse(origin)) / 60_000;
  const xMin = Math.min(...data.map((point) => point.x));
  const xMax = Math.max(...data.map((point) => point.x));
  // Unrounded: a tick rounded to 0.01 min can fall a second before its minute and read "14:59".
  const ticks = clockTicks(origin, xMin, xMax, MAX_TIME_TICKS);
  // The bands the verdict was judged against: the latest reading's (a fixed-orifice target moves with the air).
  const targets = series.readings.at(-1)?.result.targets;
  const superheatBand = targets?.superheat ?? null;
  const subcoolingBand = targets?.subcooling ?? null;
  const lastSettled = series.trend?.lastSettled ?? null;
  const settledX = lastSettled ? Number(minutesAfterOrigin(lastSettled.takenAt).toFixed(2)) : null;
  const band = (target: { lowK: number; highK: number }) =>
    `${formatNumber(difference(target.lowK), 1)}–${formatNumber(difference(target.highK), 1)} ${k}`;

  const chart = (
    <LineChart data={data} width={width} height={height} margin={{ top: 20, right: 8, bottom: 8, left: 0 }}>
      <CartesianGrid strokeDasharray="2 4" stroke="var(--color-rule)" />
      <XAxis
        dataKey="x"
        type="number"
        domain={[xMin, xMax]}
        ticks={ticks}
        tickFormatter={(x: number) => clockLabel(origin, x)}
        tick={TICK_STYLE}
        stroke="var(--color-ink)"
      />
      <YAxis yAxisId="difference" unit={` ${k}`} width={56} tick={TICK_STYLE} stroke="var(--color-ink)" />
      <YAxis
        yAxisId="saturation"
        orientation="right"
        unit={` ${t}`}
        width={60}
        tick={TICK_STYLE}
        stroke="var(--color-ink)"
      />
      {superheatBand && (
        <ReferenceArea
          yAxisId="difference"
          y1={difference(superheatBand.lowK)}
          y2={difference(superheatBand.highK)}
          fill="var(--color-low)"
          fillOpacity={0.14}
          ifOverflow="extendDomain"
        />
      )}
      {subcoolingBand && (
        <ReferenceArea
          yAxisId="difference"
          y1={difference(subcoolingBand.lowK)}
          y2={difference(subcoolingBand.highK)}
          fill="var(--color-high)"
          fillOpacity={0.14}
          ifOverflow="extendDomain"
        />
      )}
      <Tooltip
        formatter={(value) => (typeof value === "number" ? formatNumber(value, 1) : String(value))}
        labelFormatter={(x) => `${clockLabel(origin, Number(x))} (+${formatNumber(Number(x), 0)} min)`}
      />
      <Legend
        wrapperStyle={{ fontSize: "0.875rem" }}
        // Legend words in ink: the line colours alone are too light to read in the sun.
        formatter={(value: string) => <span style={{ color: "var(--color-ink)" }}>{value}</span>}
      />
      {series.adjustments.map((adjustment, index) => (
        <ReferenceLine
          key={adjustment.id}
          yAxisId="difference"
          x={Number(adjustment.x.toFixed(2))}
          stroke="var(--color-ink)"
          strokeDasharray="6 3"
          // A number on the line, the words in the key below: long notes would overlap.
          label={{ value: `✎${index + 1}`, position: "insideTopLeft", fontSize: "0.8125rem", fill: "var(--color-ink)" }}
        />
      ))}
      {settledX !== null && (
        <ReferenceLine
          yAxisId="difference"
          x={settledX}
          stroke="var(--color-good)"
          strokeWidth={3}
          label={{
            value: series.trend?.settled ? "✓ settled" : "✓ last settled",
            position: "insideBottomRight",
            fontSize: "0.8125rem",
            fill: "var(--color-good)",
          }}
        />
      )}
      {/* Saturation lines last, so they are drawn over the thicker lines, in their own colours and patterns. */}
      {[
        {
          axis: "difference",
          name: `Superheat (${k})`,
          key: "superheat",
          colour: "var(--color-low)",
          width: 3,
          dash: undefined,
          dots: true,
        },
        {
          axis: "difference",
          name: `Subcooling (${k})`,
          key: "subcooling",
          colour: "var(--color-high)",
          width: 3,
          dash: "8 4",
          dots: true,
        },
        {
          axis: "saturation",
          name: `Evaporating (${t})`,
          key: "evaporating",
          colour: "var(--color-accent)",
          width: 2,
          dash: "12 4 2 4",
          dots: false,
        },
        {
          axis: "saturation",
          name: `Condensing (${t})`,
          key: "condensing",
          colour: "var(--color-caution)",
          width: 2,
          dash: "2 3",
          dots: false,
        },
      ].map((line) => (
        <Line
          key={line.key}
          yAxisId={line.axis}
          name={line.name}
          dataKey={line.key}
          stroke={line.colour}
          strokeWidth={line.width}
          strokeDasharray={line.dash}
          dot={line.dots ? { r: 3 } : false}
          legendType="plainline"
          isAnimationActive={false}
          connectNulls
        />
      ))}
    </LineChart>
  );
  return (
    <figure aria-label="Trend of superheat, subcooling and saturation temperatures" data-testid="trend-chart">
      {width ? (
        chart
      ) : (
        <ResponsiveContainer width="100%" height={height}>
          {chart}
        </ResponsiveContainer>
      )}
      {(superheatBand || subcoolingBand || settledX !== null) && (
        <p className="mt-1 text-sm" data-testid="trend-key">
          {superheatBand && (
            <>
              <span aria-hidden className="mr-1 inline-block size-3 rounded-sm bg-low/30 align-middle" />
              Superheat target <span className="num">{band(superheatBand)}</span>
              {". "}
            </>
          )}
          {subcoolingBand && (
            <>
              <span aria-hidden className="mr-1 inline-block size-3 rounded-sm bg-high/30 align-middle" />
              Subcooling target <span className="num">{band(subcoolingBand)}</span>
              {". "}
            </>
          )}
          {lastSettled && (
            <>
              <span aria-hidden className="mr-1 inline-block h-3 w-1 bg-good align-middle" />
              {series.trend?.settled ? "Settled" : "Last settled"} at{" "}
              <span className="num">{clockLabel(origin, minutesAfterOrigin(lastSettled.takenAt))}</span>.
            </>
          )}
        </p>
      )}
      {series.adjustments.length > 0 && (
        <ol aria-label="Adjustments on the chart" className="mt-1 space-y-0.5 text-sm">
          {series.adjustments.map((adjustment, index) => (
            <li key={adjustment.id}>
              <span className="num font-semibold">✎{index + 1}</span> at{" "}
              <span className="num">{clockLabel(origin, adjustment.x)}</span>: {adjustment.description}
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

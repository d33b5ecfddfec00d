import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { Evacuation } from "@shared/schemas/procedure-records.ts";
import { formatNumber } from "@/lib/units/display-units.ts";
import { formatVacuum, VACUUM_LABEL, vacuumToDisplay, type VacuumUnit } from "./vacuum-units.ts";

/** The log axis cannot show zero: a perfect-vacuum reading is drawn at the gauge's last digit. */
const LOG_FLOOR_MICRONS = 1;

interface EvacuationChartProps {
  evacuation: Evacuation;
  unit: VacuumUnit;
  width?: number;
  height?: number;
}

/**
 * Pull-down and decay on one chart: vacuum (log scale, the only way 760 000 µm and 300 µm fit
 * together) against minutes, with the target as a horizontal line and the moment the pump was
 * valved off as a vertical one. The curve after that line is the decay test.
 */
export default function EvacuationChart({ evacuation, unit, width, height = 280 }: EvacuationChartProps) {
  const data = evacuation.samples.map((sample) => ({
    minutes: sample.minutes,
    vacuum: Number(vacuumToDisplay(Math.max(sample.microns, LOG_FLOOR_MICRONS), unit).toPrecision(4)),
  }));
  if (data.length === 0) return <p className="p-2 text-muted">No vacuum readings yet.</p>;
  const target = vacuumToDisplay(evacuation.targetMicrons, unit);
  const label = VACUUM_LABEL[unit];
  const chart = (
    <LineChart data={data} width={width} height={height} margin={{ top: 20, right: 16, bottom: 8, left: 8 }}>
      <CartesianGrid strokeDasharray="2 4" stroke="var(--color-rule)" />
      <XAxis
        dataKey="minutes"
        type="number"
        domain={[0, "dataMax"]}
        unit=" min"
        tick={{ fontFamily: "IBM Plex Mono", fontSize: 12 }}
      />
      <YAxis
        dataKey="vacuum"
        scale="log"
        domain={[(min: number) => Math.min(min, target) / 2, (max: number) => Math.max(max, target) * 2]}
        allowDataOverflow
        width={60}
        label={{ value: label, angle: -90, position: "insideLeft", fontSize: 12, fill: "var(--color-ink)" }}
        tickFormatter={(value: number) => formatNumber(value, value < 10 ? 1 : 0)}
        tick={{ fontFamily: "IBM Plex Mono", fontSize: 12 }}
      />
      <Tooltip
        formatter={(value) =>
          typeof value === "number" ? `${formatNumber(value, unit === "micron" ? 0 : 1)} ${label}` : String(value)
        }
        labelFormatter={(x) => `${formatNumber(Number(x), 1)} min`}
      />
      <ReferenceLine
        y={target}
        stroke="var(--color-good)"
        strokeWidth={2}
        strokeDasharray="8 4"
        label={{
          value: `Target ${formatVacuum(evacuation.targetMicrons, unit)}`,
          position: "insideBottomLeft",
          fontSize: 12,
          fill: "var(--color-ink)",
        }}
      />
      {evacuation.isolatedAtMinutes !== null && (
        <ReferenceLine
          x={evacuation.isolatedAtMinutes}
          stroke="var(--color-ink)"
          strokeDasharray="6 3"
          label={{ value: "Pump valved off", position: "insideTopRight", fontSize: 12, fill: "var(--color-ink)" }}
        />
      )}
      <Line
        dataKey="vacuum"
        name={`Vacuum (${label})`}
        stroke="var(--color-low)"
        strokeWidth={3}
        dot={{ r: 4 }}
        isAnimationActive={false}
      />
    </LineChart>
  );
  return (
    <figure aria-label="Evacuation pull-down and decay chart" data-testid="evacuation-chart">
      {width ? (
        chart
      ) : (
        <ResponsiveContainer width="100%" height={height}>
          {chart}
        </ResponsiveContainer>
      )}
      <figcaption className="text-xs text-muted">
        Log scale. Dashed horizontal line: the target; dashed vertical line: pump valved off (the decay test follows
        it).
      </figcaption>
    </figure>
  );
}

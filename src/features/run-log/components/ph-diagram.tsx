import { useEffect, useRef, useState } from "react";
import { CartesianGrid, ComposedChart, LabelList, Line, ResponsiveContainer, Scatter, XAxis, YAxis } from "recharts";
import {
  ABSOLUTE_LABEL,
  formatNumber,
  PRESSURE_DECIMALS,
  TEMPERATURE_LABEL,
  temperatureToDisplay,
  type PressureDisplayUnit,
  type TemperatureDisplayUnit,
} from "@/lib/units/display-units.ts";
import type { PhDiagramData, PhPoint } from "../utils/ph-diagram-data.ts";

interface PhDiagramProps {
  data: PhDiagramData;
  pressureUnit: PressureDisplayUnit;
  temperatureUnit: TemperatureDisplayUnit;
  refrigerant: string;
  /** Fixed size for print; fills its container otherwise. */
  width?: number;
  height?: number;
}

/** Round ticks for a logarithmic pressure axis: 1, 2, 5 × 10ⁿ inside the domain. */
function logTicks([low, high]: [number, number]): number[] {
  const ticks: number[] = [];
  for (let decade = Math.floor(Math.log10(low)); decade <= Math.ceil(Math.log10(high)); decade++) {
    for (const step of [1, 2, 5]) {
      const value = step * Math.pow(10, decade);
      if (value >= low && value <= high) ticks.push(value);
    }
  }
  return ticks;
}

const AXIS_FONT = { fontFamily: "IBM Plex Mono", fontSize: 12 };
/** Low side blue, high side red, as everywhere in Satura (and dashed, so colour is not the only cue). */
const isothermStroke = (label: string) => (label.startsWith("evaporating") ? "var(--color-low)" : "var(--color-high)");

/**
 * The pressure–enthalpy diagram of a measured cycle: the saturation dome (bubble and dew
 * lines), isotherms across it at the evaporating and condensing temperatures (sloped for a
 * blend: its glide), the four measured states numbered round the circuit and joined, and a
 * previous reading as a faint dashed cycle. Pressure absolute, logarithmic, in the user's unit.
 * Loaded lazily (with recharts) only when a screen shows it; it marks how long it took to draw.
 */
export default function PhDiagram({
  data,
  pressureUnit,
  temperatureUnit,
  refrigerant,
  width,
  height = 340,
}: PhDiagramProps) {
  const unit = ABSOLUTE_LABEL[pressureUnit];
  const figure = useRef<HTMLElement>(null);
  // When React first rendered the chart: the start of the drawing time the bench reads.
  const [started] = useState(() => performance.now());
  useEffect(() => {
    // Drawing time, for the bench: from the first render to the first frame in which the chart's
    // lines are in the document (a responsive chart measures its box first, then draws).
    let frame = 0;
    const check = () => {
      if (figure.current?.querySelector(".recharts-line path")) {
        const drawn = performance.now() - started;
        figure.current.setAttribute("data-draw-ms", drawn.toFixed(1));
        performance.mark("ph-diagram-drawn", { detail: { ms: drawn } });
      } else if (performance.now() - started < 5_000) frame = requestAnimationFrame(check);
    };
    frame = requestAnimationFrame(check);
    return () => cancelAnimationFrame(frame);
  }, [started]);

  const line = (key: string, points: PhPoint[], stroke: string, extra: Record<string, unknown> = {}) => (
    <Line
      key={key}
      data={points}
      dataKey="p"
      type="linear"
      stroke={stroke}
      dot={false}
      activeDot={false}
      isAnimationActive={false}
      legendType="none"
      {...extra}
    />
  );

  // The key is plain HTML: cheaper than recharts' own legend (which measures itself and lays the
  // chart out again) and read as a list by screen readers.
  const key: { label: string; stroke: string; dash?: string; width: number; opacity?: number }[] = [
    { label: "This reading", stroke: "var(--color-accent)", width: 3 },
    ...(data.previous
      ? [{ label: "Previous reading", stroke: "var(--color-muted)", dash: "4 4", width: 1.5, opacity: 0.6 }]
      : []),
    { label: "Saturated liquid (bubble)", stroke: "var(--color-ink)", width: 1.5 },
    { label: "Saturated vapour (dew)", stroke: "var(--color-ink)", dash: "6 3", width: 1.5 },
    ...data.isotherms.map((isotherm) => ({
      label: `Isotherm, ${isotherm.label} ${formatNumber(temperatureToDisplay(isotherm.temperatureC, temperatureUnit), 1)} ${TEMPERATURE_LABEL[temperatureUnit]}`,
      stroke: isothermStroke(isotherm.label),
      dash: "2 3",
      width: 1.5,
    })),
  ];

  const chart = (
    <ComposedChart width={width} height={height} margin={{ top: 16, right: 16, bottom: 24, left: 8 }}>
      <CartesianGrid strokeDasharray="2 4" stroke="var(--color-rule)" />
      <XAxis
        type="number"
        dataKey="h"
        domain={data.enthalpyDomain}
        ticks={data.enthalpyTicks}
        allowDataOverflow
        tick={AXIS_FONT}
        label={{
          value: "Enthalpy, kJ/kg",
          position: "insideBottom",
          offset: -14,
          fill: "var(--color-ink)",
          fontSize: 12,
        }}
      />
      <YAxis
        type="number"
        dataKey="p"
        scale="log"
        domain={data.pressureDomain}
        ticks={logTicks(data.pressureDomain)}
        allowDataOverflow
        width={64}
        tick={AXIS_FONT}
        tickFormatter={(value: number) =>
          formatNumber(value, value < 10 ? Math.max(PRESSURE_DECIMALS[pressureUnit], 1) : 0)
        }
        label={{
          value: `Pressure, ${unit}`,
          angle: -90,
          position: "insideLeft",
          fill: "var(--color-ink)",
          fontSize: 12,
          style: { textAnchor: "middle" },
        }}
      />
      {line("liquid", data.liquidLine, "var(--color-ink)", { strokeWidth: 1.5 })}
      {line("vapour", data.vapourLine, "var(--color-ink)", { strokeWidth: 1.5, strokeDasharray: "6 3" })}
      {data.isotherms.map((isotherm) =>
        line(`iso-${isotherm.label}`, isotherm.points, isothermStroke(isotherm.label), {
          strokeWidth: 1.5,
          strokeDasharray: "2 3",
        }),
      )}
      {data.previous?.segments.map((segment, index) =>
        line(`previous-${index}`, segment, "var(--color-muted)", {
          strokeWidth: 1.5,
          strokeDasharray: "4 4",
          strokeOpacity: 0.6,
        }),
      )}
      {data.cycle?.segments.map((segment, index) =>
        line(`cycle-${index}`, segment, "var(--color-accent)", { strokeWidth: 3 }),
      )}
      {data.cycle && (
        <Scatter
          data={data.cycle.points}
          dataKey="p"
          fill="var(--color-accent)"
          isAnimationActive={false}
          legendType="none"
          shape="circle"
        >
          <LabelList
            dataKey="number"
            position="top"
            offset={8}
            fill="var(--color-ink)"
            fontSize={13}
            fontWeight={600}
          />
        </Scatter>
      )}
    </ComposedChart>
  );
  return (
    <figure
      ref={figure}
      aria-label={`Pressure–enthalpy diagram of the ${refrigerant} cycle; the states are listed in the table below`}
      data-testid="ph-diagram"
    >
      <ul aria-label="Key to the diagram" className="mb-1 flex flex-wrap gap-x-4 gap-y-1 text-sm">
        {key.map((entry) => (
          <li key={entry.label} className="flex items-center gap-1.5">
            <svg aria-hidden width="22" height="8">
              <line
                x1="1"
                y1="4"
                x2="21"
                y2="4"
                stroke={entry.stroke}
                strokeWidth={entry.width}
                strokeDasharray={entry.dash}
                strokeOpacity={entry.opacity}
              />
            </svg>
            {entry.label}
          </li>
        ))}
      </ul>
      {width ? (
        chart
      ) : (
        // Drawn at once at a likely size, then fitted to its box: no empty first frame.
        <ResponsiveContainer width="100%" height={height} initialDimension={{ width: 640, height }}>
          {chart}
        </ResponsiveContainer>
      )}
    </figure>
  );
}

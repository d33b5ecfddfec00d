import { useEffect, useRef, useState } from "react";
import {
  CartesianGrid,
  ComposedChart,
  LabelList,
  Legend,
  Line,
  ResponsiveContainer,
  Scatter,
  XAxis,
  YAxis,
} from "recharts";
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
    // First paint after the SVG is in the document: the drawing time the bench reads.
    const frame = requestAnimationFrame(() => {
      const drawn = performance.now() - started;
      figure.current?.setAttribute("data-draw-ms", drawn.toFixed(1));
      performance.mark("ph-diagram-drawn", { detail: { ms: drawn } });
    });
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
      <Legend verticalAlign="top" wrapperStyle={{ fontSize: 13, paddingBottom: 8 }} />
      {line("liquid", data.liquidLine, "var(--color-ink)", {
        strokeWidth: 1.5,
        name: "Saturated liquid (bubble)",
        legendType: "plainline",
      })}
      {line("vapour", data.vapourLine, "var(--color-ink)", {
        strokeWidth: 1.5,
        strokeDasharray: "6 3",
        name: "Saturated vapour (dew)",
        legendType: "plainline",
      })}
      {data.isotherms.map((isotherm) =>
        line(
          `iso-${isotherm.label}`,
          isotherm.points,
          isotherm.label.startsWith("evaporating") ? "var(--color-low)" : "var(--color-high)",
          {
            strokeWidth: 1.5,
            strokeDasharray: "2 3",
            name: `${isotherm.label} ${formatNumber(temperatureToDisplay(isotherm.temperatureC, temperatureUnit), 1)} ${TEMPERATURE_LABEL[temperatureUnit]}`,
            legendType: "plainline",
          },
        ),
      )}
      {data.previous?.segments.map((segment, index) =>
        line(`previous-${index}`, segment, "var(--color-muted)", {
          strokeWidth: 1.5,
          strokeDasharray: "4 4",
          strokeOpacity: 0.6,
          ...(index === 0 ? { name: "Previous reading", legendType: "plainline" } : {}),
        }),
      )}
      {data.cycle?.segments.map((segment, index) =>
        line(`cycle-${index}`, segment, "var(--color-accent)", {
          strokeWidth: 3,
          ...(index === 0 ? { name: "This reading", legendType: "plainline" } : {}),
        }),
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
      {width ? (
        chart
      ) : (
        <ResponsiveContainer width="100%" height={height}>
          {chart}
        </ResponsiveContainer>
      )}
    </figure>
  );
}

import {
  getRefrigerant,
  pressureToDisplay,
  PropertyRangeError,
  saturatedState,
  saturationTemperature,
  type CycleState,
  type MeasuredCycle,
} from "@shared/engine/index.ts";
import type { PressureDisplayUnit } from "@/lib/units/display-units.ts";

/** One point of the diagram: enthalpy in kJ/kg, pressure absolute in the display unit. */
export interface PhPoint {
  h: number;
  p: number;
}

/** A state of the drawn cycle, numbered round the circuit (1 suction … 4 evaporator inlet). */
export interface PhCyclePoint extends PhPoint {
  number: 1 | 2 | 3 | 4;
  state: CycleState;
}

export interface PhCycleLine {
  points: PhCyclePoint[];
  /** Runs of consecutive known states, closed round the circuit when all four are known. */
  segments: PhPoint[][];
}

export interface PhDiagramData {
  /** Saturated liquid (bubble) and saturated vapour (dew) lines, low to high pressure. */
  liquidLine: PhPoint[];
  vapourLine: PhPoint[];
  /** Isotherms across the dome at the evaporating and condensing temperatures: sloped for a blend (its glide). */
  isotherms: { label: string; temperatureC: number; points: PhPoint[] }[];
  cycle: PhCycleLine | null;
  previous: PhCycleLine | null;
  enthalpyDomain: [number, number];
  /** Round enthalpy ticks (a step of 10, 20, 25, 50 or 100 kJ/kg, at most 9 of them). */
  enthalpyTicks: number[];
  pressureDomain: [number, number];
}

const ORDER = ["suction", "discharge", "liquid", "evaporatorInlet"] as const;

function cycleLine(cycle: MeasuredCycle | null, toDisplay: (kPa: number) => number): PhCycleLine | null {
  if (!cycle) return null;
  const points: PhCyclePoint[] = [];
  ORDER.forEach((key, index) => {
    const state = cycle.states[key];
    if (state)
      points.push({
        h: state.enthalpyKJPerKg,
        p: toDisplay(state.pressureKPa),
        number: (index + 1) as PhCyclePoint["number"],
        state,
      });
  });
  if (points.length === 0) return null;
  // Lines join states that follow each other round the circuit: 1→2→3→4→1.
  const segments: PhPoint[][] = [];
  let run: PhPoint[] = [];
  for (let index = 0; index < ORDER.length + 1; index++) {
    const point = points.find((candidate) => candidate.number === (index % ORDER.length) + 1);
    if (point) run.push({ h: point.h, p: point.p });
    else {
      if (run.length > 1) segments.push(run);
      run = [];
    }
  }
  if (run.length > 1) segments.push(run);
  return { points, segments };
}

/**
 * Everything the pressure–enthalpy chart draws for one refrigerant and one or two measured
 * cycles: the saturation dome from the refrigerant's saturation table (bubble line on the
 * liquid side, dew line on the vapour side, up to the table's end just below the critical
 * point), isotherms across it at the evaporating (dew) and condensing (bubble) temperatures —
 * flat for a pure fluid, sloped for a blend, which is its glide — and the cycle's states joined
 * round the circuit. Pressures are absolute in the user's unit; the chart's pressure axis is
 * logarithmic.
 */
export function phDiagramData(
  refrigerant: string,
  cycle: MeasuredCycle | null,
  previous: MeasuredCycle | null,
  pressureUnit: PressureDisplayUnit,
): PhDiagramData {
  const info = getRefrigerant(refrigerant);
  const toDisplay = (kPa: number) => pressureToDisplay(kPa, pressureUnit, "absolute");
  const lines = [cycleLine(cycle, toDisplay), cycleLine(previous, toDisplay)];
  const states = [cycle, previous].flatMap((each) =>
    each ? ORDER.map((key) => each.states[key]).filter((state) => state !== null) : [],
  );
  const lowestKPa = Math.min(...states.map((state) => state.pressureKPa), Infinity);
  const highestKPa = Math.max(...states.map((state) => state.pressureKPa), -Infinity);

  // The dome from about 30 K below the lowest state's saturation temperature to the table's top.
  const { minimumC, maximumC } = info.validRange;
  const lowC = Number.isFinite(lowestKPa)
    ? Math.max(minimumC, lowestSaturationC(refrigerant, lowestKPa) - 30)
    : Math.max(minimumC, -40);
  const steps = 60;
  const liquidLine: PhPoint[] = [];
  const vapourLine: PhPoint[] = [];
  for (let step = 0; step <= steps; step++) {
    // denser towards the top, where the dome turns over
    const fraction = 1 - Math.pow(1 - step / steps, 1.6);
    const state = saturatedState(refrigerant, Math.min(lowC + fraction * (maximumC - lowC), maximumC));
    liquidLine.push({ h: state.liquidEnthalpyKJPerKg, p: toDisplay(state.bubblePressureKPa) });
    vapourLine.push({ h: state.vapourEnthalpyKJPerKg, p: toDisplay(state.dewPressureKPa) });
  }

  const isotherms: PhDiagramData["isotherms"] = [];
  const evaporatorInlet = cycle?.states.evaporatorInlet;
  const suction = cycle?.states.suction;
  const liquid = cycle?.states.liquid;
  const across = (label: string, temperatureC: number) => {
    if (!(temperatureC >= minimumC && temperatureC <= maximumC)) return;
    const state = saturatedState(refrigerant, temperatureC);
    isotherms.push({
      label,
      temperatureC,
      points: [
        { h: state.liquidEnthalpyKJPerKg, p: toDisplay(state.bubblePressureKPa) },
        { h: state.vapourEnthalpyKJPerKg, p: toDisplay(state.dewPressureKPa) },
      ],
    });
  };
  if (evaporatorInlet || suction) {
    const pressureKPa = (evaporatorInlet ?? suction)!.pressureKPa;
    across("evaporating (dew)", lowestSaturationC(refrigerant, pressureKPa, "dew"));
  }
  if (liquid) across("condensing (bubble)", lowestSaturationC(refrigerant, liquid.pressureKPa, "bubble"));

  // Close the dome over its top: the tables stop just short of the critical point (and a
  // blend's bubble and dew lines end apart), so the last two points are joined.
  vapourLine.push(liquidLine[liquidLine.length - 1]!);

  const enthalpies = [...liquidLine, ...vapourLine]
    .filter((point) => !Number.isFinite(highestKPa) || point.p <= toDisplay(highestKPa) * 2)
    .map((point) => point.h)
    .concat(states.map((state) => state.enthalpyKJPerKg));
  const hMin = Math.min(...enthalpies);
  const hMax = Math.max(...enthalpies);
  const margin = 0.06 * (hMax - hMin);
  const pressures = [...liquidLine, ...vapourLine].map((point) => point.p);
  const pLow = Number.isFinite(lowestKPa) ? toDisplay(lowestKPa) / 2 : Math.min(...pressures);
  const pHigh =
    1.15 * (Number.isFinite(highestKPa) ? Math.max(toDisplay(highestKPa) * 1.6, ...pressures) : Math.max(...pressures));
  const enthalpyDomain: [number, number] = [
    Math.floor((hMin - margin) / 10) * 10,
    Math.ceil((hMax + margin) / 10) * 10,
  ];
  const step =
    [10, 20, 25, 50, 100, 200].find((candidate) => (enthalpyDomain[1] - enthalpyDomain[0]) / candidate <= 8) ?? 500;
  const enthalpyTicks: number[] = [];
  for (let tick = Math.ceil(enthalpyDomain[0] / step) * step; tick <= enthalpyDomain[1]; tick += step)
    enthalpyTicks.push(tick);
  return {
    liquidLine,
    vapourLine,
    isotherms,
    cycle: lines[0] ?? null,
    previous: lines[1] ?? null,
    enthalpyDomain,
    enthalpyTicks,
    pressureDomain: [Math.max(pLow, Math.min(...pressures)), pHigh],
  };
}

/** Saturation temperature at a pressure, clipped to the table's range (only for the drawing's extent). */
function lowestSaturationC(refrigerant: string, pressureKPa: number, point: "bubble" | "dew" = "bubble"): number {
  const { minimumC, maximumC } = getRefrigerant(refrigerant).validRange;
  try {
    return saturationTemperature(refrigerant, pressureKPa, point);
  } catch (error) {
    if (!(error instanceof PropertyRangeError)) throw error;
    return error.code === "BELOW_RANGE" ? minimumC : maximumC;
  }
}

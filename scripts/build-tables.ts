/**
 * Generates data/refrigerants/<id>.json: saturation tables computed from the
 * published Helmholtz equations of state in ../shared/reference (never copied
 * into the repository). Run with `npm run tables`.
 *
 * Pure fluids: phase equilibrium (equal p and g) solved at every row, each row
 * checked against the superancillary; the build fails beyond 1e-6 relative.
 * Pseudo-pure blends (R410A, R404A, R407C, R507A): bubble/dew pressures from the
 * published equations of Lemmon (2003), densities and enthalpies from the same
 * paper's EOS. Enthalpies on the IIR reference (200 kJ/kg at 0 °C saturated liquid).
 * Other blends of ../shared/reference/mixtures/blends.tsv whose components and pairs
 * are all covered: multi-fluid Helmholtz mixture model (scripts/eos/mixture), bubble
 * and dew points by equal fugacities at every row, up to 0.5 K below the blend's own
 * critical point (end of its phase envelope).
 *
 * Then writes the modules generated from the tables (scripts/write-refrigerant-modules.ts): the
 * engine's map of one dynamic import per table and the small refrigerant catalogue.
 */
import { mkdirSync, readdirSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import {
  applyIirReference,
  createFluidModel,
  listReferenceDesignations,
  readReferenceFluid,
  repoRoot,
  requireReferencePack,
  saturationStateAt,
  saturationTemperatureAt,
  SuperancillaryMismatchError,
  type FluidModel,
  type SaturationOptions,
  type SaturationState,
} from "./eos/index.ts";
import { writeRefrigerantModules } from "./write-refrigerant-modules.ts";
import { REFRIGERANT_METADATA, type RefrigerantMetadataSource } from "./eos/refrigerant-metadata.ts";
import {
  applyBlendIirReference,
  blendCoverageGap,
  blendCriticalPoint,
  blendPointAtPressure,
  blendSaturationState,
  createBlendModel,
  readBinaryPairs,
  readBlends,
  readDepartureFunctions,
  traceSaturationCurve,
  type BlendModel,
  type EnvelopePoint,
} from "./eos/mixture/index.ts";
import { RefrigerantTableSchema, type RefrigerantTable } from "../shared/engine/properties/refrigerant-table-schema.ts";

// Build fails when a solved point differs from the superancillary by more than SUPERANCILLARY_TOLERANCE (issue 3).
import {
  INTERPOLATION_TOLERANCE_K,
  SUPERANCILLARY_TOLERANCE,
} from "../shared/engine/properties/property-tolerances.ts";
import { interpolateHermite } from "../shared/engine/properties/interpolate-hermite.ts";
/** Grid step in K; the interpolation test proves ≤ 0.005 K error between rows. */
const STEP_K = 0.5;
/** Lowest table temperature unless the triple point is higher. */
const LOWEST_C = -60;
/**
 * Tables stop this far below the end of the saturation curve. Blends stop earlier:
 * within a few tenths of a kelvin of T_r the published bubble pressure of R507A falls
 * below the pseudo-pure EOS's liquid spinodal, so no saturated-liquid density exists.
 */
const CRITICAL_MARGIN_K = { pure: 0.1, "pseudo-pure": 0.5 } as const;
/** Multi-fluid blends stop this far below their computed critical temperature. */
const MIXTURE_CRITICAL_MARGIN_K = 0.5;
const KELVIN = 273.15;
const COOLPROP_BIBTEX = "doi:10.1021/ie4033999";
const MIXTURE_MODEL_BIBTEX = "Kunz-JCED-2012";
const GWP_SOURCE =
  "IPCC AR4 WG1 Table 2.14 and AR5 WG1 Table 8.A.1 (100-year); blends are mass-weighted sums of their components (AR4: R1234yf = 4 and R1234ze(E) = 7 as in the EU F-gas Regulation; AR5: HFOs taken as 1)";
const SAFETY_STANDARD = "ASHRAE 34 / ISO 817";
const REFERENCE_STATE = "IIR: h = 200 kJ/kg and s = 1 kJ/(kg·K) for saturated liquid at 0 °C";
const INTERPOLATION_NOTE =
  "pressure: cubic Hermite of p against T using the dp/dT columns (and of T against p with dT/dp for the inverse); density and enthalpy: linear in T";
const UNITS: RefrigerantTable["units"] = {
  temperature: "°C",
  bubblePressure: "kPa absolute",
  dewPressure: "kPa absolute",
  bubbleSlope: "kPa/K (dp/dT along the bubble curve)",
  dewSlope: "kPa/K (dp/dT along the dew curve)",
  liquidDensity: "kg/m³ (saturated liquid at the bubble pressure)",
  vapourDensity: "kg/m³ (saturated vapour at the dew pressure)",
  liquidEnthalpy: "kJ/kg (IIR reference)",
  vapourEnthalpy: "kJ/kg (IIR reference)",
};

const significant = (value: number, digits: number) => Number(value.toPrecision(digits));
const decimals = (value: number, places: number) => Number(value.toFixed(places));

function temperatureGrid(model: FluidModel): number[] {
  return gridBetween(model.minimumTemperature, model.criticalTemperature - CRITICAL_MARGIN_K[model.kind]);
}

/** °C rows from max(minimumK, −60 °C) to maximumK: both ends exact, every STEP_K between. */
function gridBetween(minimumK: number, maximumK: number): number[] {
  const lowC = Math.ceil((Math.max(minimumK, LOWEST_C + KELVIN) - KELVIN) * 1000) / 1000;
  const highC = Math.floor((maximumK - KELVIN) * 1000) / 1000;
  const grid = [lowC];
  for (let t = Math.floor(lowC / STEP_K + 1) * STEP_K; t < highC - 0.01; t += STEP_K) {
    const rounded = decimals(t, 3);
    if (rounded > grid[grid.length - 1]! + 0.01) grid.push(rounded);
  }
  grid.push(highC);
  return grid;
}

/**
 * Tries each starting guess in turn and says which one converged.
 * SuperancillaryMismatchError is never swallowed: it fails the build.
 */
function solveWithFallback(
  model: FluidModel,
  T: number,
  attempts: SaturationOptions[],
  checkTolerance: number | undefined,
): { state: SaturationState; usedSuperancillary: boolean } {
  let lastError: unknown;
  for (const attempt of attempts) {
    try {
      const state = saturationStateAt(model, T, { ...attempt, checkTolerance });
      return { state, usedSuperancillary: attempt.guess === "superancillary" && !attempt.startingDensities };
    } catch (error) {
      if (error instanceof SuperancillaryMismatchError) throw error;
      lastError = error;
    }
  }
  throw lastError;
}

function toKelvin(model: FluidModel, temperatureC: number): number {
  // rounding of the °C value must not put the first row below the EOS limit
  return Math.max(temperatureC + KELVIN, model.minimumTemperature);
}

function emptyColumns(): RefrigerantTable["columns"] {
  return {
    temperature: [],
    bubblePressure: [],
    dewPressure: [],
    bubbleSlope: [],
    dewSlope: [],
    liquidDensity: [],
    vapourDensity: [],
    liquidEnthalpy: [],
    vapourEnthalpy: [],
  };
}

/** Appends one row at the stored precision (enough for 0.005 K interpolation, see docs/properties.md). */
function pushRow(columns: RefrigerantTable["columns"], temperatureC: number, state: SaturationState, M: number): void {
  columns.temperature.push(temperatureC);
  columns.bubblePressure.push(significant(state.bubblePressure / 1000, 9));
  columns.dewPressure.push(significant(state.dewPressure / 1000, 9));
  columns.bubbleSlope.push(significant(state.bubbleSlope / 1000, 7));
  columns.dewSlope.push(significant(state.dewSlope / 1000, 7));
  columns.liquidDensity.push(significant(state.liquidDensity * M, 8));
  columns.vapourDensity.push(significant(state.vapourDensity * M, 8));
  columns.liquidEnthalpy.push(decimals(state.liquidEnthalpy / M / 1000, 4));
  columns.vapourEnthalpy.push(decimals(state.vapourEnthalpy / M / 1000, 4));
}

function metadataFor(designation: string): RefrigerantMetadataSource {
  const meta = REFRIGERANT_METADATA[designation];
  if (!meta) throw new Error(`${designation}: no safety/GWP metadata in scripts/eos/refrigerant-metadata.ts`);
  return meta;
}

function safetyAndGwp(meta: RefrigerantMetadataSource): Pick<RefrigerantTable, "safety" | "gwp100"> {
  return {
    safety: {
      class: meta.safetyClass as RefrigerantTable["safety"]["class"],
      standard: SAFETY_STANDARD,
      fromMemory: meta.safetyClassFromMemory,
    },
    gwp100: { ...meta.gwp100, source: GWP_SOURCE },
  };
}

function buildTable(designation: string, generated: string, dataNote: string): RefrigerantTable {
  const file = readReferenceFluid(designation);
  const model = createFluidModel(file);
  const meta = metadataFor(designation);
  applyIirReference(model);
  const M = model.eos.molarMass;
  const check = model.kind === "pure" ? SUPERANCILLARY_TOLERANCE : undefined;

  const grid = temperatureGrid(model);
  const columns = emptyColumns();
  // Pure fluids: the solve must not start from the superancillary it is checked against.
  // The first row starts from the density ancillaries; each next row continues from the
  // previous solutions (linear extrapolation in T). Only if that fails (close to T_c) does
  // a row start from the ancillaries again, then from the superancillary (counted below).
  let previous: SaturationState[] = [];
  let superancillaryStarts = 0;
  for (const temperatureC of grid) {
    const T = toKelvin(model, temperatureC);
    let state: SaturationState;
    if (model.kind === "pure") {
      const attempts: SaturationOptions[] = [];
      if (previous.length === 2) {
        const [a, b] = previous as [SaturationState, SaturationState];
        const fraction = (T - b.T) / (b.T - a.T);
        attempts.push({
          startingDensities: {
            liquid: b.liquidDensity + fraction * (b.liquidDensity - a.liquidDensity),
            vapour: b.vapourDensity * Math.pow(b.vapourDensity / a.vapourDensity, fraction),
          },
        });
      }
      attempts.push({ guess: "ancillary" }, { guess: "superancillary" });
      const solved = solveWithFallback(model, T, attempts, check);
      state = solved.state;
      if (solved.usedSuperancillary) superancillaryStarts++;
      previous = [...previous.slice(-1), state];
    } else {
      state = saturationStateAt(model, T);
    }
    pushRow(columns, temperatureC, state, M);
  }

  if (superancillaryStarts > 0) {
    console.log(
      `  ${designation}: ${superancillaryStarts} near-critical row(s) needed the superancillary as starting guess`,
    );
  }

  let criticalPoint: RefrigerantTable["criticalPoint"];
  if (model.superancillary) {
    const sa = model.superancillary;
    criticalPoint = {
      temperatureC: decimals(sa.criticalTemperature - KELVIN, 4),
      pressureKPa: significant(sa.pressure(sa.criticalTemperature) / 1000, 7),
      densityKgPerM3: significant(sa.criticalDensity * M, 7),
      note: "end of the equation of state's saturation curve (superancillary meta Tcrittrue)",
    };
  } else {
    const c = file.STATES.critical;
    criticalPoint = {
      temperatureC: decimals(c.T - KELVIN, 4),
      pressureKPa: significant(c.p / 1000, 7),
      densityKgPerM3: significant(c.rhomolar * M, 7),
      note: "pseudo-critical point of the pseudo-pure equation of state (Lemmon 2003)",
    };
  }

  const atmosphere = 101_325;
  const bubbleAtAtmosphere = model.bubblePressureCurve.value(model.minimumTemperature) < atmosphere;
  const normalBoilingPoint = bubbleAtAtmosphere
    ? {
        bubbleC: decimals(saturationTemperatureAt(model, atmosphere, "bubble") - KELVIN, 4),
        dewC: decimals(saturationTemperatureAt(model, atmosphere, "dew") - KELVIN, 4),
      }
    : null;

  let glideAt0C: RefrigerantTable["glideAt0C"] = null;
  if (model.kind === "pseudo-pure") {
    const dewPressure = model.dewPressureCurve.value(KELVIN);
    const bubbleC = saturationTemperatureAt(model, dewPressure, "bubble") - KELVIN;
    glideAt0C = {
      pressureKPa: significant(dewPressure / 1000, 7),
      bubbleC: decimals(bubbleC, 4),
      dewC: 0,
      glideK: decimals(-bubbleC, 4),
      definition: "dew temperature minus bubble temperature at the dew pressure of 0 °C",
    };
  }

  const eos = file.EOS[0];
  const bibtexKeys = [eos.BibTeX_EOS];
  if (eos.BibTeX_CP0 && eos.BibTeX_CP0 !== eos.BibTeX_EOS) bibtexKeys.push(eos.BibTeX_CP0);
  bibtexKeys.push(COOLPROP_BIBTEX);
  const isBlend = model.kind === "pseudo-pure";
  const lowerLimit =
    grid[0]! > LOWEST_C + 1e-9
      ? isBlend
        ? "200 K limit of the pseudo-pure equations"
        : "triple point"
      : "-60 °C table limit";

  const table: RefrigerantTable = {
    id: designation,
    name: meta.name,
    kind: isBlend ? "blend" : "pure",
    ...(meta.composition ? { composition: meta.composition } : {}),
    ...safetyAndGwp(meta),
    criticalPoint,
    normalBoilingPoint,
    glideAt0C,
    referenceState: REFERENCE_STATE,
    source: {
      model: isBlend ? "pseudo-pure" : "pure-fluid",
      equationOfState: isBlend
        ? `${eos.BibTeX_EOS}: pseudo-pure equation of state with published bubble- and dew-point pressure equations`
        : `${eos.BibTeX_EOS}: Helmholtz-energy equation of state; saturation by equal pressure and Gibbs energy, checked against the superancillary to ${SUPERANCILLARY_TOLERANCE} relative`,
      bibtexKeys,
      data: dataNote,
      licence: "EOS coefficients from CoolProp fluid files (MIT licence, Bell et al. 2014)",
      method: `computed by scripts/build-tables.ts every ${STEP_K} K`,
    },
    generated,
    validRange: { minimumC: grid[0]!, maximumC: grid[grid.length - 1]!, lowerLimit },
    interpolation: INTERPOLATION_NOTE,
    units: UNITS,
    columns,
  };
  return RefrigerantTableSchema.parse(table);
}

/** Largest interpolation error allowed at generation, K: half of INTERPOLATION_TOLERANCE_K. */
const INTERPOLATION_BUDGET_K = INTERPOLATION_TOLERANCE_K / 2;

/**
 * Number of leading rows whose intervals all interpolate within INTERPOLATION_BUDGET_K:
 * at each interval's midpoint the bubble and dew points are solved with the model and
 * compared with the cubic Hermite the lookups use, in both directions (p from T, T from p).
 */
function rowsWithinInterpolationBudget(blend: BlendModel, states: SaturationState[]): number {
  const midpoints = states.slice(0, -1).map((state, i) => 0.5 * (state.T + states[i + 1]!.T));
  let usable = states.length;
  for (const kind of ["bubble", "dew"] as const) {
    const solved = traceSaturationCurve(blend, kind, midpoints);
    const pressure = (state: SaturationState) => (kind === "bubble" ? state.bubblePressure : state.dewPressure);
    const slope = (state: SaturationState) => (kind === "bubble" ? state.bubbleSlope : state.dewSlope);
    for (let i = 0; i < midpoints.length && i + 1 < usable; i++) {
      const point = solved[i];
      if (!point) {
        usable = i + 1;
        break;
      }
      const [a, b] = [states[i]!, states[i + 1]!];
      const meanSlope = (pressure(b) - pressure(a)) / (b.T - a.T);
      const pressureError = Math.abs(
        interpolateHermite(a.T, pressure(a), slope(a), b.T, pressure(b), slope(b), point.T) - point.p,
      );
      const temperatureError = Math.abs(
        interpolateHermite(pressure(a), a.T, 1 / slope(a), pressure(b), b.T, 1 / slope(b), point.p) - point.T,
      );
      if (Math.max(pressureError / meanSlope, temperatureError) > INTERPOLATION_BUDGET_K) {
        usable = i + 1;
        break;
      }
    }
  }
  return usable;
}

/** Solves the bubble and dew point of a blend at one extra temperature by continuation from traced points. */
function extendCurve(blend: BlendModel, kind: "bubble" | "dew", points: EnvelopePoint[], T: number): EnvelopePoint {
  const extended = traceSaturationCurve(blend, kind, [T], points.slice(-2));
  if (extended.length !== 1) throw new Error(`${blend.designation}: ${kind} point at ${T} K did not converge`);
  return extended[0]!;
}

/**
 * Multi-fluid blend table: bubble and dew points by equal fugacities at every row
 * (scripts/eos/mixture), rows up to MIXTURE_CRITICAL_MARGIN_K below the blend's
 * critical point. Fails the build if any row inside that range does not converge.
 */
function buildBlendTable(blend: BlendModel, generated: string, dataNote: string): RefrigerantTable {
  const { designation, record } = blend;
  const meta = metadataFor(designation);
  const M = blend.molarMass;
  // Trace both curves on the 0.5 K grid until the phases merge, then find the critical point.
  const probe = gridBetween(blend.minimumTemperature, 500).map((c) => Math.max(c + KELVIN, blend.minimumTemperature));
  const bubbleAll = traceSaturationCurve(blend, "bubble", probe);
  const dewAll = traceSaturationCurve(blend, "dew", probe);
  if (bubbleAll.length < 2 || dewAll.length < 2)
    throw new Error(`${designation}: bubble/dew tracing failed at the first rows`);
  const critical = blendCriticalPoint(blend, bubbleAll[bubbleAll.length - 1]!);
  const lastConverged = Math.min(bubbleAll[bubbleAll.length - 1]!.T, dewAll[dewAll.length - 1]!.T);
  if (critical.T - lastConverged > 1.5) {
    throw new Error(
      `${designation}: tracing stopped at ${(lastConverged - KELVIN).toFixed(2)} °C, ${(critical.T - lastConverged).toFixed(2)} K below the critical point`,
    );
  }
  const grid = gridBetween(blend.minimumTemperature, Math.min(critical.T - MIXTURE_CRITICAL_MARGIN_K, lastConverged));
  const gridK = grid.map((c) => Math.max(c + KELVIN, blend.minimumTemperature));
  const highK = gridK[gridK.length - 1]!;
  const onGrid = (point: EnvelopePoint) => gridK.slice(0, -1).some((T) => Math.abs(T - point.T) < 1e-9);
  const bubble = bubbleAll.filter(onGrid);
  const dew = dewAll.filter(onGrid);
  bubble.push(extendCurve(blend, "bubble", bubble, highK));
  dew.push(extendCurve(blend, "dew", dew, highK));
  if (bubble.length !== grid.length || dew.length !== grid.length) {
    throw new Error(`${designation}: traced ${bubble.length}/${dew.length} rows for a ${grid.length}-row grid`);
  }

  const atZero = (points: EnvelopePoint[]) => {
    const found = points.find((point) => Math.abs(point.T - KELVIN) < 1e-9);
    if (!found) throw new Error(`${designation}: no row at 0 °C`);
    return found;
  };
  applyBlendIirReference(blend, atZero(bubble));

  const states = grid.map((_, row) => blendSaturationState(blend, bubble[row]!, dew[row]!));
  // Close to the critical point the bubble curve bends sharply; keep only the rows up to the
  // first interval whose Hermite interpolation misses the model by more than half the promise.
  const usable = rowsWithinInterpolationBudget(blend, states);
  if (usable < grid.length) {
    console.log(
      `  ${designation}: table ends at ${grid[usable - 1]} °C, the next interval interpolates worse than ${INTERPOLATION_BUDGET_K} K`,
    );
  }
  grid.length = usable;
  bubble.length = usable;
  dew.length = usable;
  const columns = emptyColumns();
  grid.forEach((temperatureC, row) => pushRow(columns, temperatureC, states[row]!, M));

  const atmosphere = 101_325;
  const normalBoilingPoint =
    bubble[0]!.p < atmosphere && atmosphere < dew[dew.length - 1]!.p
      ? {
          bubbleC: decimals(blendPointAtPressure(blend, "bubble", atmosphere, bubble).T - KELVIN, 4),
          dewC: decimals(blendPointAtPressure(blend, "dew", atmosphere, dew).T - KELVIN, 4),
        }
      : null;
  const dewPressureAtZero = atZero(dew).p;
  const bubbleAtDewPressure = blendPointAtPressure(blend, "bubble", dewPressureAtZero, bubble).T - KELVIN;
  const glideAt0C: RefrigerantTable["glideAt0C"] = {
    pressureKPa: significant(dewPressureAtZero / 1000, 7),
    bubbleC: decimals(bubbleAtDewPressure, 4),
    dewC: 0,
    glideK: decimals(-bubbleAtDewPressure, 4),
    definition: "dew temperature minus bubble temperature at the dew pressure of 0 °C",
  };

  const componentFiles = record.components.map((c) => readReferenceFluid(c));
  const bibtexKeys = [
    ...new Set([
      ...componentFiles.map((file) => file.EOS[0].BibTeX_EOS),
      ...blend.pairs.map((pair) => pair.bibtex),
      MIXTURE_MODEL_BIBTEX,
      COOLPROP_BIBTEX,
    ]),
  ];
  const pairText = blend.pairs
    .map((pair) => {
      const names = `${record.components[pair.i]}/${record.components[pair.j]}`;
      return `${names} ${pair.bibtex}${pair.departureName ? ` (F = ${pair.F}, ${pair.departureName})` : " (no departure function)"}`;
    })
    .join("; ");
  const highestTriple = componentFiles.reduce((a, b) =>
    b.EOS[0].STATES.sat_min_liquid.T > a.EOS[0].STATES.sat_min_liquid.T ? b : a,
  );
  const lowerLimit =
    grid[0]! > LOWEST_C + 1e-9
      ? `triple point of ${highestTriple.designation} (highest of the components)`
      : "-60 °C table limit";
  const table: RefrigerantTable = {
    id: designation,
    name: meta.name,
    kind: "blend",
    composition: `${record.components.join("/")} ${record.massPercent.map(String).join("/")} mass %`,
    ...safetyAndGwp(meta),
    criticalPoint: {
      temperatureC: decimals(critical.T - KELVIN, 2),
      pressureKPa: significant(critical.p / 1000, 5),
      densityKgPerM3: significant(critical.rho * M, 4),
      note: "critical point of the blend at its nominal composition from the multi-fluid model: the end of the phase envelope, where the bubble-point liquid and its incipient vapour become identical (bubble curve followed to a density ratio of 5e-4, then extrapolated); the table stops at least 0.5 K below it, at the last row where bubble and dew still converge and interpolate within 0.0025 K of the model",
    },
    normalBoilingPoint,
    glideAt0C,
    referenceState: REFERENCE_STATE,
    source: {
      model: "multi-fluid",
      equationOfState: `multi-fluid Helmholtz mixture model (${MIXTURE_MODEL_BIBTEX} form) of ${componentFiles
        .map((file) => `${file.designation} (${file.EOS[0].BibTeX_EOS})`)
        .join(
          ", ",
        )}; binary pairs: ${pairText}; bubble and dew points by equal fugacities of every component in both phases, converged to 1e-11 in ln f`,
      bibtexKeys,
      data: `${dataNote}; composition ${record.source}`,
      licence: "EOS and mixture coefficients from CoolProp fluid and mixture files (MIT licence, Bell et al. 2014)",
      method: `computed by scripts/build-tables.ts every ${STEP_K} K`,
    },
    generated,
    validRange: { minimumC: grid[0]!, maximumC: grid[grid.length - 1]!, lowerLimit },
    interpolation: INTERPOLATION_NOTE,
    units: UNITS,
    columns,
  };
  return RefrigerantTableSchema.parse(table);
}

function main(): void {
  const dataNote = requireReferencePack();
  const generated = new Date().toISOString().slice(0, 10);
  const outputDirectory = path.join(repoRoot, "data/refrigerants");
  mkdirSync(outputDirectory, { recursive: true });
  for (const name of readdirSync(outputDirectory)) {
    if (name.endsWith(".json")) rmSync(path.join(outputDirectory, name));
  }
  const pureDesignations = listReferenceDesignations();
  const pairRecords = readBinaryPairs();
  const departureRecords = readDepartureFunctions();
  const blends = new Map<string, BlendModel>();
  for (const record of readBlends()) {
    if (record.pseudoPureFile) continue; // kept on their published pseudo-pure equations
    const gap = blendCoverageGap(record, pairRecords, departureRecords);
    if (gap) {
      console.log(`${record.designation}: not modelled (${gap})`);
      continue;
    }
    blends.set(record.designation, createBlendModel(record, pairRecords, departureRecords));
  }
  const designations = [...pureDesignations, ...blends.keys()].sort();
  let totalBytes = 0;
  for (const designation of designations) {
    const started = performance.now();
    const blend = blends.get(designation);
    const table = blend ? buildBlendTable(blend, generated, dataNote) : buildTable(designation, generated, dataNote);
    const text = JSON.stringify(table);
    writeFileSync(path.join(outputDirectory, `${designation}.json`), text + "\n");
    totalBytes += text.length + 1;
    console.log(
      `${designation.padEnd(11)} ${String(table.columns.temperature.length).padStart(4)} rows  ${table.validRange.minimumC} … ${table.validRange.maximumC} °C  ${(text.length / 1024).toFixed(0)} kB  ${(performance.now() - started).toFixed(0)} ms`,
    );
  }
  writeFileSync(
    path.join(repoRoot, "data/refrigerants/index.json"),
    JSON.stringify({ generated, refrigerants: designations.map((id) => ({ id, file: `${id}.json` })) }, null, 1) + "\n",
  );

  writeRefrigerantModules(designations);
  console.log(`${designations.length} tables, ${(totalBytes / 1024).toFixed(0)} kB in data/refrigerants`);
}

main();

import type {
  Application,
  DiagnosisInput,
  EvidenceState,
  MeteringDevice,
  SuctionTempLocation,
} from "../../schemas/diagnosis.ts";
import { STANDARD_ATMOSPHERE_KPA } from "../properties/property-tolerances.ts";
import { saturationPressure } from "../properties/saturation-pressure.ts";
import { saturationTemperature } from "../properties/saturation-temperature.ts";
import { fixedOrificeTargetSuperheat } from "../diagnosis/fixed-orifice-target-superheat.ts";
import { targetTemperatureSplit } from "../diagnosis/psychrometrics/target-temperature-split.ts";
import { suctionLineAllowance } from "../diagnosis/suction-line-allowance.ts";
import { BAND_UNITS, FAULT_MOVES, OPERATING_POINTS, type Range } from "./fault-scenarios.ts";

export interface FaultScenarioOptions {
  refrigerant: string;
  meteringDevice: MeteringDevice;
  application: Application;
  fault: EvidenceState;
  /** Uniform numbers in [0, 1); pass `seededRandom(seed)` to draw the same scenario again. */
  random: () => number;
  /** Scatter of every temperature probe, ±K (uniform). */
  temperatureNoiseK: number;
  /** Scatter of every gauge, ± fraction of its reading (uniform). */
  pressureNoiseFraction: number;
  /** Where the suction temperature is read (unstated: the method's own reference point). */
  suctionTempLocation?: SuctionTempLocation;
  /** Give the maker's subcooling target on valve circuits (else the application's default applies). */
  nameplateSubcooling: boolean;
}

/** The drawn readings and the truth behind them. */
export interface FaultScenario {
  input: DiagnosisInput;
  fault: EvidenceState;
}

/** Draws of the operating point before giving up on a fixed-orifice chart target. */
const MAX_CHART_DRAWS = 50;
/** Smallest chart target accepted for a fixed device, K (below 2.8 K there is no superheat test [S10]). */
const MIN_CHART_TARGET_K = 4;
/**
 * Least the liquid leaving an air-cooled condenser stays above the air entering it, K: "never
 * colder than the entering air" (TRADE.md §3 [S26][S34]); the half kelvin keeps the probes'
 * scatter (±0.3 K each) from crossing it.
 */
const MIN_CONDENSER_APPROACH_K = 0.5;

const between = (random: () => number, [low, high]: Range) => low + (high - low) * random();
const tenth = (value: number) => Math.round(value * 10) / 10;

/** Pressure whose mid-glide (mean of bubble and dew) temperature is the one asked for, kPa abs. */
function pressureAtMeanTemperature(refrigerant: string, meanC: number): number {
  let pressure = saturationPressure(refrigerant, meanC, "dew");
  for (let iteration = 0; iteration < 4; iteration += 1) {
    const dew = saturationTemperature(refrigerant, pressure, "dew");
    const bubble = saturationTemperature(refrigerant, pressure, "bubble");
    pressure = saturationPressure(refrigerant, meanC + (dew - bubble) / 2, "dew");
  }
  return pressure;
}

/**
 * Readings a real circuit with the given fault would give: the application's healthy operating
 * point moved as `FAULT_MOVES` says, turned into gauge pressures and line temperatures through
 * the property engine (mid-glide coil temperatures for blends, dew point at suction, bubble point
 * in the condenser, non-condensable gas as extra partial pressure on the high side), with
 * uniform probe and gauge scatter. For a fixed orifice in comfort cooling the operating point is
 * drawn until the charging chart gives a target of at least 4 K.
 *
 * Units: SI-metric readings (kPa gauge at 101.325 kPa, °C, K, A). Range: refrigerants whose
 * tables reach the drawn temperatures. Source: TRADE.md §2–3 via fault-scenarios.ts.
 *
 * @throws {PropertyRangeError} when a drawn temperature is outside the refrigerant's table
 * @throws {RangeError} when no operating point gives a usable fixed-orifice target
 * @example drawFaultScenario({ refrigerant: "R410A", meteringDevice: "txv", application: "comfort-cooling", fault: "undercharged", random: seededRandom(1), temperatureNoiseK: 0.5, pressureNoiseFraction: 0.01, nameplateSubcooling: true }).input.suctionPressureKPa
 */
export function drawFaultScenario(options: FaultScenarioOptions): FaultScenario {
  const { refrigerant, meteringDevice, application, fault, random } = options;
  const point = OPERATING_POINTS[application];
  const move = FAULT_MOVES[fault];
  const units = BAND_UNITS[application];
  const fixed = meteringDevice === "fixed-orifice" || meteringDevice === "capillary";
  const temperatureNoise = () => between(random, [-options.temperatureNoiseK, options.temperatureNoiseK]);
  const gauge = (absoluteKPa: number) =>
    Math.round(
      absoluteKPa * (1 + between(random, [-options.pressureNoiseFraction, options.pressureNoiseFraction])) -
        STANDARD_ATMOSPHERE_KPA,
    );

  // Operating point; a fixed orifice in comfort cooling needs a chart target (TRADE.md §1.4).
  const drawConditions = () => {
    const outdoor = between(random, point.outdoorC);
    const returnDry = between(random, point.returnC);
    const returnWet = point.wetBulbDepressionK ? returnDry - between(random, point.wetBulbDepressionK) : null;
    return { outdoor, returnDry, returnWet };
  };
  let conditions = drawConditions();
  let chartTarget: number | null = null;
  if (fixed && point.capillarySuperheatTargetK === null) {
    for (let draw = 0; ; draw += 1) {
      const target =
        conditions.returnWet === null ? null : fixedOrificeTargetSuperheat(conditions.returnWet, conditions.outdoor);
      if (target?.status === "ok" && target.targetK >= MIN_CHART_TARGET_K) {
        chartTarget = target.targetK;
        break;
      }
      if (draw >= MAX_CHART_DRAWS)
        throw new RangeError(
          `drawFaultScenario requires conditions with a charging-chart target; none found for ${application}`,
        );
      conditions = drawConditions();
    }
  }
  const { outdoor, returnDry, returnWet } = conditions;

  // Evaporator and condenser.
  const evaporatorTd =
    between(random, point.evaporatorTdK) + between(random, move.evaporatorTdUnits) * units.evaporatorTdK;
  const evaporatingMean = returnDry - evaporatorTd;
  const condensingMean =
    outdoor + between(random, point.condensingOverAmbientK) + between(random, move.condensingUnits) * units.condensingK;
  const suctionAbs = pressureAtMeanTemperature(refrigerant, evaporatingMean);
  const trueLiquidAbs = pressureAtMeanTemperature(refrigerant, condensingMean);
  const trueBubble = saturationTemperature(refrigerant, trueLiquidAbs, "bubble");
  // Air in the condenser adds its partial pressure: the gauge reads the refrigerant's bubble
  // pressure of a hotter condenser than the liquid is really in.
  const liquidAbs = move.nonCondensableUnits
    ? saturationPressure(
        refrigerant,
        trueBubble + between(random, move.nonCondensableUnits) * units.condensingK,
        "bubble",
      )
    : trueLiquidAbs;

  // Subcooling (true, from the real condensing temperature) and superheat.
  const subcoolingTarget = Math.round(between(random, point.subcoolingTargetK) * 2) / 2;
  // An air-cooled condenser cannot cool its liquid below the air crossing it (TRADE.md §3,
  // condenser approach [S26][S34]): subcooling stops short of the outdoor air.
  const subcooling = Math.max(
    0,
    Math.min(
      subcoolingTarget + between(random, move.subcoolingFromTargetK),
      trueBubble - outdoor - MIN_CONDENSER_APPROACH_K,
    ),
  );
  const dewAtSuction = saturationTemperature(refrigerant, suctionAbs, "dew");
  const capillaryTarget = fixed ? point.capillarySuperheatTargetK : null;
  let superheat: number;
  if (move.anyDeviceSuperheatK) superheat = between(random, move.anyDeviceSuperheatK);
  else if (fixed)
    superheat = Math.max(0.3, (chartTarget ?? capillaryTarget ?? 5) + between(random, move.fixedSuperheatFromTargetK));
  else superheat = between(random, move.valveSuperheatK ?? point.valveSuperheatK);
  const lineLength = tenth(between(random, [3, 20]));
  // Read at the outdoor unit, a valve circuit's superheat includes the line set's allowance;
  // read at the evaporator outlet, a fixed device's chart superheat loses it.
  if (options.suctionTempLocation === "outdoor-unit" && !fixed) superheat += suctionLineAllowance(lineLength);
  if (options.suctionTempLocation === "evaporator-outlet" && fixed)
    superheat = Math.max(0.3, superheat - suctionLineAllowance(lineLength));

  // Air split, current and discharge.
  const comfortTarget =
    returnWet === null ? null : targetTemperatureSplit(returnDry, returnWet, STANDARD_ATMOSPHERE_KPA);
  const split = Math.max(
    0.3,
    (comfortTarget ?? 0) + between(random, point.splitK) + between(random, move.splitUnits) * units.splitK,
  );
  const rla = Math.round(between(random, [8, 40]));
  const current = rla * between(random, [0.68, 0.88]) * between(random, move.currentFactor);
  const dischargeDew = saturationTemperature(refrigerant, liquidAbs, "dew");
  const dischargeSuperheat = Math.max(
    3,
    between(random, point.dischargeSuperheatK) + between(random, move.dischargeSuperheatAddK),
  );

  const input: DiagnosisInput = {
    refrigerant,
    meteringDevice,
    application,
    suctionPressureKPa: gauge(suctionAbs),
    suctionLineTempC: tenth(dewAtSuction + superheat + temperatureNoise()),
    liquidPressureKPa: gauge(liquidAbs),
    liquidLineTempC: tenth(trueBubble - subcooling + temperatureNoise()),
    dischargeLineTempC: tenth(dischargeDew + dischargeSuperheat + temperatureNoise()),
    returnAirDryBulbC: tenth(returnDry + temperatureNoise()),
    supplyAirDryBulbC: tenth(returnDry - split + temperatureNoise()),
    outdoorAirDryBulbC: tenth(outdoor + temperatureNoise()),
    compressorAmps: tenth(current),
    compressorRla: rla,
    runMinutes: Math.round(between(random, [15, 30])),
    ...(returnWet === null ? {} : { returnAirWetBulbC: tenth(Math.min(returnWet + temperatureNoise(), returnDry)) }),
    ...(!fixed && options.nameplateSubcooling ? { targetSubcoolingK: subcoolingTarget } : {}),
    ...(capillaryTarget !== null ? { targetSuperheatK: capillaryTarget } : {}),
    ...(options.suctionTempLocation
      ? { suctionTempLocation: options.suctionTempLocation, liquidLineLengthM: lineLength }
      : {}),
  };
  return { input, fault };
}

import { STANDARD_ATMOSPHERE_KPA, type DiagnosisInput } from "../../schemas/diagnosis.ts";
import { PropertyRangeError } from "../properties/property-range-error.ts";
import { resolveSinglePhaseTable } from "../properties/resolve-single-phase-table.ts";
import { saturatedPhasesAtPressure } from "../properties/saturated-phases-at-pressure.ts";
import { saturationPressure } from "../properties/saturation-pressure.ts";
import { saturationTemperature } from "../properties/saturation-temperature.ts";
import { singlePhaseStateFromEntropy } from "../properties/single-phase-state-from-entropy.ts";
import { singlePhaseState, type SinglePhaseState } from "../properties/single-phase-state.ts";
import { twoPhaseStateFromEnthalpy } from "../properties/two-phase-state-from-enthalpy.ts";
import { gaugeToAbsolute } from "../units/gauge-to-absolute.ts";
import { airSideCapacity } from "./air-side-capacity.ts";
import {
  AIR_REFRIGERANT_AGREEMENT_FRACTION,
  DISCHARGE_PRESSURE_ALLOWANCE_K,
  NOMINAL_AIRFLOW_M3_PER_S_PER_KW,
  SATURATED_WITHIN_K,
} from "./cycle-limits.ts";
import { electricalInputPower } from "./electrical-input-power.ts";

/** Readings beyond DiagnosisInput that some figures need; all optional. */
export interface MeasuredCycleExtras {
  /** Supply voltage at the compressor, V (line to line on three phases). */
  voltageV?: number;
  /** Supply phases: 1 or 3. */
  phases?: 1 | 3;
  /** Power factor of the compressor motor, (0, 1]. */
  powerFactor?: number;
  /** Compressor electrical input measured with a power meter, kW (used before V·I·cos φ). */
  measuredPowerKW?: number;
  /** Evaporator airflow measured, m³/s. */
  airflowM3PerS?: number;
  /** Nameplate nominal cooling capacity, kW: estimates the airflow when none was measured. */
  nominalCapacityKW?: number;
  /** Supply air wet bulb, °C: with it the air-side capacity is total (sensible + latent). */
  supplyAirWetBulbC?: number;
}

export type CycleStatePoint = "suction" | "discharge" | "liquid" | "evaporatorInlet" | "isentropicDischarge";

export interface CycleState {
  point: CycleStatePoint;
  /** kPa absolute */
  pressureKPa: number;
  /** °C */
  temperatureC: number;
  /** kJ/kg (IIR reference) */
  enthalpyKJPerKg: number;
  /** kJ/(kg·K); null for the two-phase evaporator inlet */
  entropyKJPerKgK: number | null;
  /** kg/m³; null for the two-phase evaporator inlet */
  densityKgPerM3: number | null;
  phase: "vapour" | "liquid" | "two-phase";
  /** vapour mass fraction of a two-phase state */
  quality: number | null;
  /** how the state was fixed, in words */
  basis: string;
}

export type CycleFigure =
  | CycleStatePoint
  | "refrigeratingEffect"
  | "compressionWork"
  | "dischargeSuperheat"
  | "isentropicEfficiency"
  | "cop"
  | "electricalPower"
  | "massFlow"
  | "capacity"
  | "airSide";

export interface CycleNote {
  figure: CycleFigure;
  message: string;
}

export interface AirSideFigures {
  /** m³/s */
  airflowM3PerS: number;
  airflowBasis: "measured" | "nominal-capacity";
  /** kW */
  sensibleKW: number;
  /** kW; null without the supply wet bulb */
  totalKW: number | null;
}

export interface MeasuredCycle {
  refrigerant: string;
  states: Record<CycleStatePoint, CycleState | null>;
  dischargePressureBasis: "measured" | "liquid-plus-allowance";
  /** kJ/kg */
  refrigeratingEffectKJPerKg: number | null;
  /** kJ/kg */
  compressionWorkKJPerKg: number | null;
  /** K */
  dischargeSuperheatK: number | null;
  /** 0–1 (apparent; see the caveat) */
  isentropicEfficiency: number | null;
  /** kW */
  electricalPowerKW: number | null;
  /** kg/s */
  massFlowKgPerS: number | null;
  /** kW */
  capacityKW: number | null;
  cop: number | null;
  airSide: AirSideFigures | null;
  /** air-side capacity (total, else sensible) ÷ refrigerant-side capacity */
  airToRefrigerantRatio: number | null;
  notes: CycleNote[];
}

const tenths = (value: number) => value.toFixed(1);

/** Runs a property step; range errors become a note and null, program errors still throw. */
function attempt<T>(notes: CycleNote[], figure: CycleFigure, step: () => T | null): T | null {
  try {
    return step();
  } catch (error) {
    if (
      !(error instanceof PropertyRangeError) ||
      error.code === "TABLE_NOT_LOADED" ||
      error.code === "UNKNOWN_REFRIGERANT"
    )
      throw error;
    notes.push({ figure, message: error.message });
    return null;
  }
}

function fromSinglePhase(point: CycleStatePoint, state: SinglePhaseState, basis: string): CycleState {
  return {
    point,
    pressureKPa: state.pressureKPa,
    temperatureC: state.temperatureC,
    enthalpyKJPerKg: state.enthalpyKJPerKg,
    entropyKJPerKgK: state.entropyKJPerKgK,
    densityKgPerM3: state.densityKgPerM3,
    phase: state.phase,
    quality: null,
    basis,
  };
}

/**
 * Vapour at a pipe's pressure and temperature: superheated above the dew point, saturated vapour
 * when the line reads up to SATURATED_WITHIN_K below it (probe accuracy), none when colder.
 */
function vapourAtLine(
  refrigerant: string,
  point: CycleStatePoint,
  pressureKPa: number,
  lineC: number,
  dewC: number,
  basis: string,
): CycleState | null {
  if (lineC < dewC - SATURATED_WITHIN_K) return null;
  const state = singlePhaseState(refrigerant, pressureKPa, Math.max(lineC, dewC));
  return fromSinglePhase(point, state, lineC < dewC ? `${basis} (at the dew point: saturated vapour)` : basis);
}

/**
 * The technician's own refrigeration cycle from one reading: the four states on a
 * pressure–enthalpy diagram and what they say about the compressor and the coils.
 *
 * States (kPa absolute from the gauge readings and the site's atmosphere):
 * 1. suction (compressor inlet): suction pressure and suction line temperature — superheated
 *    vapour (singlePhaseState); a line within SATURATED_WITHIN_K of the dew point is taken as
 *    saturated vapour, a colder one gives no state (the vapour may carry liquid).
 * 2. discharge (compressor outlet): the discharge pressure, or the liquid pressure plus the
 *    pressure of DISCHARGE_PRESSURE_ALLOWANCE_K of dew temperature (discharge line and condenser
 *    drop), and the discharge line temperature.
 * 3. liquid (expansion-device inlet): liquid pressure and liquid line temperature — subcooled
 *    liquid; within SATURATED_WITHIN_K above the bubble point it is taken as saturated liquid, a
 *    warmer line (flash gas) or a temperature taken on the discharge line gives no state.
 * 4. evaporator inlet: h₄ = h₃ (the expansion is isenthalpic: adiabatic, no work, e.g. ASHRAE
 *    Handbook—Fundamentals ch. 2 "Thermodynamics and refrigeration cycles"), at the suction
 *    pressure (the real inlet is higher by the evaporator and suction-line drop); its quality by
 *    the lever rule (twoPhaseStateFromEnthalpy).
 *
 * Figures (same source, ch. 2, for the cycle relations), each null with the reason in `notes`
 * when an input is missing:
 * - refrigerating effect q = h₁ − h₄ (kJ/kg); it includes any heat the suction line picks up
 *   between the coil and the probe.
 * - compression work w = h₂ − h₁ (kJ/kg), from the measured discharge temperature.
 * - discharge superheat = discharge line temperature − dew point at the discharge pressure (K).
 * - isentropic efficiency η_s = (h₂s − h₁)/(h₂ − h₁), h₂s at the discharge pressure and the
 *   suction entropy. Caveat: h₂ comes from a pipe temperature, so heat lost from the shell and
 *   the line before the probe makes η_s read high, while a hermetic compressor's motor heat in
 *   the gas makes it read low; compare a compressor with itself over time.
 * - COP = q / w: the measured cycle's coefficient of performance; with an adiabatic compressor
 *   it equals capacity ÷ electrical input (heat lost from the shell makes the true COP lower).
 * - electrical input: measured kW, or V·I·cos φ (×√3 on three phases) with the compressor
 *   current (electricalInputPower).
 * - mass flow ṁ = P/w (energy balance on an adiabatic compressor: all electrical input ends up
 *   in the gas; an upper bound when the shell loses heat); capacity Q = ṁ·q (kW).
 * - air side: airflow (measured, or NOMINAL_AIRFLOW_M3_PER_S_PER_KW × the nominal capacity),
 *   return and supply air → airSideCapacity; its ratio to the refrigerant-side capacity, which
 *   should be within ±AIR_REFRIGERANT_AGREEMENT_FRACTION (total), or above 1 neither (sensible).
 *
 * Units: DiagnosisInput as validated (kPa gauge, °C); extras V, A, kW, m³/s, °C. Out: kPa absolute,
 * °C, kJ/kg, kJ/(kg·K), kg/m³, K, kg/s, kW.
 * Valid range: pressures and temperatures inside the refrigerant's single-phase table (a few
 * kelvin short of the critical point; vapour up to 180 °C at most); outside it a state is null
 * with the reason.
 *
 * @throws PropertyRangeError TABLE_NOT_LOADED when the refrigerant's single-phase table has not
 *   been loaded (load it first; see shared/property-tables), UNKNOWN_REFRIGERANT for an unknown id
 * @example measuredCycle({ refrigerant: "R410A", meteringDevice: "txv", suctionPressureKPa: 820, suctionLineTempC: 12, liquidPressureKPa: 2600, liquidLineTempC: 38, dischargeLineTempC: 75 }).refrigeratingEffectKJPerKg // ≈ 168.9 (kJ/kg)
 */
export function measuredCycle(input: DiagnosisInput, extras: MeasuredCycleExtras = {}): MeasuredCycle {
  const refrigerant = input.refrigerant;
  resolveSinglePhaseTable(refrigerant); // fail loudly before any figure when the table is not loaded
  const notes: CycleNote[] = [];
  const atmosphere = input.atmosphericPressureKPa ?? STANDARD_ATMOSPHERE_KPA;
  const suctionKPa = gaugeToAbsolute(input.suctionPressureKPa, atmosphere);
  const liquidKPa = gaugeToAbsolute(input.liquidPressureKPa, atmosphere);

  // 1. Suction: superheated vapour at the suction pressure and line temperature.
  const suction = attempt(notes, "suction", () => {
    const dewC = saturationTemperature(refrigerant, suctionKPa, "dew");
    const lineC = input.suctionLineTempC;
    if (lineC < dewC - SATURATED_WITHIN_K) {
      notes.push({
        figure: "suction",
        message: `The suction line (${tenths(lineC)} °C) is ${tenths(dewC - lineC)} K below the dew point (${tenths(dewC)} °C): the vapour may carry liquid, so pressure and temperature do not fix the state`,
      });
      return null;
    }
    if (lineC < dewC)
      notes.push({
        figure: "suction",
        message: `The suction line is within ${SATURATED_WITHIN_K} K of the dew point: taken as saturated vapour`,
      });
    return vapourAtLine(
      refrigerant,
      "suction",
      suctionKPa,
      lineC,
      dewC,
      "suction pressure and suction line temperature",
    );
  });

  // 2. Discharge pressure: measured, or liquid pressure plus the line and condenser allowance.
  const dischargeMeasured = input.dischargePressureKPa !== undefined;
  const dischargeKPa = attempt(notes, "discharge", () => {
    if (dischargeMeasured) return gaugeToAbsolute(input.dischargePressureKPa!, atmosphere);
    const condensingDewC = saturationTemperature(refrigerant, liquidKPa, "dew");
    return saturationPressure(refrigerant, condensingDewC + DISCHARGE_PRESSURE_ALLOWANCE_K, "dew");
  });
  if (!dischargeMeasured && dischargeKPa !== null) {
    notes.push({
      figure: "discharge",
      message: `No discharge pressure: taken as the liquid pressure plus ${tenths(dischargeKPa - liquidKPa)} kPa, the pressure of ${DISCHARGE_PRESSURE_ALLOWANCE_K} K of dew temperature for the discharge line and condenser`,
    });
  }
  const dischargeDewC =
    dischargeKPa === null
      ? null
      : attempt(notes, "dischargeSuperheat", () => saturationTemperature(refrigerant, dischargeKPa, "dew"));
  let dischargeSuperheatK: number | null = null;
  if (input.dischargeLineTempC === undefined) {
    notes.push({
      figure: "dischargeSuperheat",
      message: "No discharge line temperature: no discharge state, superheat, compression work or efficiency",
    });
  } else if (dischargeDewC !== null) {
    dischargeSuperheatK = input.dischargeLineTempC - dischargeDewC;
    if (dischargeSuperheatK < 0) {
      notes.push({
        figure: "dischargeSuperheat",
        message: `The discharge line (${tenths(input.dischargeLineTempC)} °C) is below the dew point at the discharge pressure (${tenths(dischargeDewC)} °C): check the probe; liquid leaving the compressor would mean severe floodback`,
      });
    }
  }
  const discharge =
    dischargeKPa === null || dischargeDewC === null || input.dischargeLineTempC === undefined
      ? null
      : attempt(notes, "discharge", () =>
          vapourAtLine(
            refrigerant,
            "discharge",
            dischargeKPa,
            input.dischargeLineTempC!,
            dischargeDewC,
            dischargeMeasured
              ? "discharge pressure and discharge line temperature"
              : "liquid pressure plus allowance, and discharge line temperature",
          ),
        );

  // 3. Liquid: subcooled liquid at the liquid pressure and line temperature.
  const liquid =
    input.liquidTempLocation === "discharge-line"
      ? (notes.push({
          figure: "liquid",
          message:
            "The liquid temperature was taken on the discharge line: no liquid state, so no evaporator inlet or refrigerating effect",
        }),
        null)
      : attempt(notes, "liquid", () => {
          const bubbleC = saturationTemperature(refrigerant, liquidKPa, "bubble");
          const lineC = input.liquidLineTempC;
          if (lineC > bubbleC + SATURATED_WITHIN_K) {
            notes.push({
              figure: "liquid",
              message: `The liquid line (${tenths(lineC)} °C) is ${tenths(lineC - bubbleC)} K above the bubble point (${tenths(bubbleC)} °C): it may carry flash gas, so pressure and temperature do not fix the state`,
            });
            return null;
          }
          if (lineC < bubbleC)
            return fromSinglePhase(
              "liquid",
              singlePhaseState(refrigerant, liquidKPa, lineC),
              "liquid pressure and liquid line temperature",
            );
          if (lineC > bubbleC)
            notes.push({
              figure: "liquid",
              message: `The liquid line is within ${SATURATED_WITHIN_K} K of the bubble point: taken as saturated liquid`,
            });
          return fromSinglePhase(
            "liquid",
            saturatedPhasesAtPressure(refrigerant, liquidKPa).liquid,
            "liquid pressure, saturated liquid (no subcooling)",
          );
        });

  // 4. Evaporator inlet: isenthalpic expansion to the suction pressure.
  const evaporatorInlet =
    liquid === null
      ? null
      : attempt(notes, "evaporatorInlet", () => {
          const mixture = twoPhaseStateFromEnthalpy(refrigerant, suctionKPa, liquid.enthalpyKJPerKg);
          return {
            point: "evaporatorInlet",
            pressureKPa: suctionKPa,
            temperatureC: mixture.temperatureC,
            enthalpyKJPerKg: mixture.enthalpyKJPerKg,
            entropyKJPerKgK: null,
            densityKgPerM3: null,
            phase: "two-phase",
            quality: mixture.quality,
            basis: "isenthalpic expansion of the liquid to the suction pressure",
          } satisfies CycleState;
        });

  const refrigeratingEffectKJPerKg =
    suction && evaporatorInlet ? suction.enthalpyKJPerKg - evaporatorInlet.enthalpyKJPerKg : null;
  if (refrigeratingEffectKJPerKg === null) {
    notes.push({
      figure: "refrigeratingEffect",
      message: "The refrigerating effect needs both the suction state and the liquid state",
    });
  }

  let compressionWorkKJPerKg: number | null = null;
  if (suction && discharge) {
    const work = discharge.enthalpyKJPerKg - suction.enthalpyKJPerKg;
    if (work > 0) compressionWorkKJPerKg = work;
    else
      notes.push({
        figure: "compressionWork",
        message:
          "The discharge enthalpy is not above the suction enthalpy: the discharge probe reads low (or is not on the discharge line)",
      });
  } else {
    notes.push({
      figure: "compressionWork",
      message: "The compression work needs both the suction and the discharge state",
    });
  }

  let isentropicDischarge: CycleState | null = null;
  let isentropicEfficiency: number | null = null;
  if (suction && discharge && dischargeKPa !== null && compressionWorkKJPerKg !== null) {
    isentropicDischarge = attempt(notes, "isentropicEfficiency", () =>
      fromSinglePhase(
        "isentropicDischarge",
        singlePhaseStateFromEntropy(refrigerant, dischargeKPa, suction.entropyKJPerKgK!),
        "discharge pressure at the suction entropy (ideal compression)",
      ),
    );
    if (isentropicDischarge) {
      isentropicEfficiency = (isentropicDischarge.enthalpyKJPerKg - suction.enthalpyKJPerKg) / compressionWorkKJPerKg;
      notes.push({
        figure: "isentropicEfficiency",
        message:
          "Apparent isentropic efficiency from the discharge line temperature: heat lost from the shell and line before the probe makes it read high, a hermetic motor's heat in the gas makes it read low; compare the compressor with itself over time",
      });
      if (isentropicEfficiency > 1) {
        notes.push({
          figure: "isentropicEfficiency",
          message:
            "Above 1: more heat is lost before the probe than the compressor's losses add; check the probe is on the discharge line close to the compressor",
        });
      }
    }
  } else {
    notes.push({
      figure: "isentropicEfficiency",
      message: "The isentropic efficiency needs the suction and discharge states",
    });
  }

  const cop =
    refrigeratingEffectKJPerKg !== null && compressionWorkKJPerKg !== null
      ? refrigeratingEffectKJPerKg / compressionWorkKJPerKg
      : null;
  if (cop === null)
    notes.push({ figure: "cop", message: "The COP needs the refrigerating effect and the compression work" });

  // Electrical input, mass flow and capacity.
  let electricalPowerKW: number | null = null;
  if (extras.measuredPowerKW !== undefined) electricalPowerKW = extras.measuredPowerKW;
  else if (
    input.compressorAmps !== undefined &&
    extras.voltageV !== undefined &&
    extras.powerFactor !== undefined &&
    extras.phases !== undefined
  ) {
    electricalPowerKW = electricalInputPower({
      currentA: input.compressorAmps,
      voltageV: extras.voltageV,
      powerFactor: extras.powerFactor,
      phases: extras.phases,
    });
  } else {
    const missing = [
      input.compressorAmps === undefined && "the compressor current",
      extras.voltageV === undefined && "the supply voltage",
      extras.powerFactor === undefined && "the power factor",
      extras.phases === undefined && "the number of phases",
    ].filter(Boolean);
    notes.push({
      figure: "electricalPower",
      message: `No electrical input: enter a measured kW, or ${missing.join(", ")}`,
    });
  }
  const massFlowKgPerS =
    electricalPowerKW !== null && compressionWorkKJPerKg !== null ? electricalPowerKW / compressionWorkKJPerKg : null;
  const capacityKW =
    massFlowKgPerS !== null && refrigeratingEffectKJPerKg !== null ? massFlowKgPerS * refrigeratingEffectKJPerKg : null;
  if (massFlowKgPerS !== null) {
    notes.push({
      figure: "massFlow",
      message:
        "Mass flow = electrical input ÷ compression work: all electrical input taken as heat in the gas (adiabatic compressor), so it is an upper bound",
    });
  } else {
    notes.push({ figure: "capacity", message: "The capacity needs the electrical input and the cycle's enthalpies" });
  }

  // Air side.
  let airSide: AirSideFigures | null = null;
  let airToRefrigerantRatio: number | null = null;
  const airflow =
    extras.airflowM3PerS !== undefined
      ? { value: extras.airflowM3PerS, basis: "measured" as const }
      : extras.nominalCapacityKW !== undefined
        ? { value: extras.nominalCapacityKW * NOMINAL_AIRFLOW_M3_PER_S_PER_KW, basis: "nominal-capacity" as const }
        : null;
  if (airflow === null || input.returnAirDryBulbC === undefined || input.supplyAirDryBulbC === undefined) {
    notes.push({
      figure: "airSide",
      message:
        "The air-side capacity needs the airflow (or the nominal capacity) and the return and supply air temperatures",
    });
  } else {
    try {
      const air = airSideCapacity({
        airflowM3PerS: airflow.value,
        returnDryBulbC: input.returnAirDryBulbC,
        ...(input.returnAirWetBulbC !== undefined ? { returnWetBulbC: input.returnAirWetBulbC } : {}),
        ...(input.returnAirRelativeHumidity !== undefined
          ? { returnRelativeHumidityPercent: input.returnAirRelativeHumidity }
          : {}),
        supplyDryBulbC: input.supplyAirDryBulbC,
        ...(extras.supplyAirWetBulbC !== undefined ? { supplyWetBulbC: extras.supplyAirWetBulbC } : {}),
        atmosphericKPa: atmosphere,
      });
      airSide = {
        airflowM3PerS: airflow.value,
        airflowBasis: airflow.basis,
        sensibleKW: air.sensibleKW,
        totalKW: air.totalKW,
      };
      if (airflow.basis === "nominal-capacity") {
        notes.push({
          figure: "airSide",
          message: "Airflow estimated from the nominal capacity (400 cfm per ton): real airflow is often 10–20 % off",
        });
      }
      if (capacityKW !== null && capacityKW > 0) {
        const airKW = air.totalKW ?? air.sensibleKW;
        airToRefrigerantRatio = airKW / capacityKW;
        if (air.totalKW !== null) {
          const agree = Math.abs(airToRefrigerantRatio - 1) <= AIR_REFRIGERANT_AGREEMENT_FRACTION;
          notes.push({
            figure: "airSide",
            message: agree
              ? `Air side and refrigerant side agree within ±${AIR_REFRIGERANT_AGREEMENT_FRACTION * 100} %`
              : `Air side and refrigerant side differ by ${Math.round((airToRefrigerantRatio - 1) * 100)} %: check the airflow, the probes and the electrical figures`,
          });
        } else {
          notes.push({
            figure: "airSide",
            message:
              airToRefrigerantRatio <= 1 + AIR_REFRIGERANT_AGREEMENT_FRACTION
                ? "Sensible air-side capacity only (no supply wet bulb): it should sit below the refrigerant side by the latent part"
                : "The sensible air-side capacity alone exceeds the refrigerant side: check the airflow, the probes and the electrical figures",
          });
        }
      }
    } catch (error) {
      if (!(error instanceof RangeError)) throw error;
      notes.push({ figure: "airSide", message: error.message });
    }
  }

  return {
    refrigerant,
    states: { suction, discharge, liquid, evaporatorInlet, isentropicDischarge },
    dischargePressureBasis: dischargeMeasured ? "measured" : "liquid-plus-allowance",
    refrigeratingEffectKJPerKg,
    compressionWorkKJPerKg,
    dischargeSuperheatK,
    isentropicEfficiency,
    electricalPowerKW,
    massFlowKgPerS,
    capacityKW,
    cop,
    airSide,
    airToRefrigerantRatio,
    notes,
  };
}

import { saturatedPhasesAtPressure, saturationPressure, singlePhaseState } from "../../shared/engine/index.ts";
import type { ChargeCircuit, InventoryConditions, OperatingPoint } from "./charge-circuit.ts";
import { homogeneousVoidFraction } from "./homogeneous-void-fraction.ts";
import { meanTwoPhaseDensity } from "./mean-two-phase-density.ts";
import { ziviVoidFraction } from "./zivi-void-fraction.ts";

/** The design point's flow figures, against which a fixed orifice or a wide-open valve is scaled. */
export interface DesignFlow {
  /** √(ρ_inlet·Δp)·(1 + b·SC) at the design point. */
  flowFactor: number;
  /** Enthalpy rise across the evaporator's two-phase zone at the design point, kJ/kg. */
  twoPhaseEnthalpyRiseKJPerKg: number;
}

/** Gaps below which a subcooling or superheat is taken as the saturated state, K. */
const SATURATED_WITHIN_K = 0.01;
/** Desuperheating vapour sits this far above the dew point on average, K (discharge about 25–35 K above it, from memory). */
const MEAN_DESUPERHEAT_K = 15;
/** The superheated zone never takes the whole evaporator. */
const MAX_SUPERHEATED_SHARE = 0.95;

const tubeVolume = (innerDiameterM: number, lengthM: number) => (Math.PI / 4) * innerDiameterM ** 2 * lengthM;

/**
 * The circuit's operating point and refrigerant inventory at one position of its "charge
 * coordinate": s ≥ 0 is the share of the condenser holding subcooled liquid; s < 0 means no
 * subcooled zone and a condenser outlet quality of −s (flash gas in the liquid line). The
 * metering device then fixes the evaporator's superheated share, and the inventory follows.
 * `solveOperatingPoint` searches s for a given charge.
 *
 * Model (simple, lumped, steady state; each relation named with its source or "from memory"):
 * - Condenser: desuperheating share fixed per circuit; two-phase share 1 − desuperheating −
 *   subcooled. The condensing temperature over outdoor air scales inversely with the two-phase
 *   share (heat rejection held, UA ∝ condensing area: more stored liquid, higher head; the
 *   symptom table's overcharge row, TRADE.md §2).
 *   Subcooling SC = CTOA·(1 − e^(−N·s)): the liquid is cooled toward the outdoor air in its own
 *   share s of the coil (ε-NTU with the liquid the smaller capacity rate; N from the design
 *   point's SC and share).
 * - Evaporator: evaporating (dew) temperature = return air − a fixed difference per circuit.
 *   Inlet enthalpy = the liquid's (isenthalpic expansion). Two-phase share 1 − superheated;
 *   superheat SH = ΔT·(1 − e^(−N·share)) like the subcooler.
 *   Two-phase duty ∝ two-phase share (UA ∝ area, ΔT fixed), so
 *   (1 − share_sh) = (1 − share_sh,design)·(ṁ/ṁ_design)·(Δh/Δh_design).
 * - Metering: flow ∝ √(ρ_inlet·Δp) (orifice equation; ρ_inlet homogeneous when flash gas
 *   reaches it); a fixed orifice also gains a fraction b per kelvin of inlet subcooling (short-
 *   tube orifice correlations carry such a term, Aaron & Domanski 1990; size from memory). A
 *   TXV/EEV holds its design superheat while its wide-open flow (valveReserve × design, scaled the
 *   same way) can feed the evaporator; beyond that it is an orifice and the superheat rises.
 * - Mass: desuperheating vapour at the dew point + 15 K; two-phase zones with the Zivi void
 *   fraction (homogeneous as a check, `circuit.voidFraction`) and quality linear along the zone (`meanTwoPhaseDensity`; saturated liquid = bubble
 *   point, vapour = dew point at the pressure, a simplification for blends); subcooled liquid at
 *   its mean temperature; liquid line at the outlet state; superheated zone and suction line
 *   vapour; compressor allowance constant. Densities from the engine's single-phase tables
 *   (loadSinglePhaseTable first).
 *
 * Units: °C, K, kPa absolute, kg.
 *
 * @throws PropertyRangeError when the point leaves the property tables
 */
export function operatingPointAt(
  circuit: ChargeCircuit,
  conditions: InventoryConditions,
  coordinate: number,
  design: DesignFlow | null,
): OperatingPoint {
  const refrigerant = circuit.refrigerant;
  const voidFraction = circuit.voidFraction === "homogeneous" ? homogeneousVoidFraction : ziviVoidFraction;
  const subcooledShare = Math.max(coordinate, 0);
  const outletQuality = Math.max(-coordinate, 0);

  const designTwoPhaseShare = 1 - circuit.desuperheatingShare - circuit.designSubcooledShare;
  const twoPhaseShare = 1 - circuit.desuperheatingShare - subcooledShare;
  const condensingOverAmbientK = (circuit.condensingOverAmbientK * designTwoPhaseShare) / twoPhaseShare;
  const condensingBubbleC = conditions.outdoorAirC + condensingOverAmbientK;
  const condensingPressureKPa = saturationPressure(refrigerant, condensingBubbleC, "bubble");
  const subcoolerNtu =
    -Math.log(1 - circuit.designSubcoolingK / circuit.condensingOverAmbientK) / circuit.designSubcooledShare;
  const subcoolingK = condensingOverAmbientK * (1 - Math.exp(-subcoolerNtu * subcooledShare));

  const high = saturatedPhasesAtPressure(refrigerant, condensingPressureKPa);
  const liquid =
    subcoolingK > SATURATED_WITHIN_K
      ? singlePhaseState(refrigerant, condensingPressureKPa, condensingBubbleC - subcoolingK)
      : high.liquid;
  const inletEnthalpy =
    outletQuality > 0
      ? high.liquid.enthalpyKJPerKg + outletQuality * (high.vapour.enthalpyKJPerKg - high.liquid.enthalpyKJPerKg)
      : liquid.enthalpyKJPerKg;
  const inletDensity =
    outletQuality > 0
      ? 1 / (outletQuality / high.vapour.densityKgPerM3 + (1 - outletQuality) / high.liquid.densityKgPerM3)
      : liquid.densityKgPerM3;
  const liquidLineC =
    outletQuality > 0
      ? condensingBubbleC + outletQuality * (high.vapour.temperatureC - condensingBubbleC)
      : condensingBubbleC - subcoolingK;

  const evaporatingDewC = conditions.returnAirC - circuit.evaporatorTemperatureDifferenceK;
  const evaporatingPressureKPa = saturationPressure(refrigerant, evaporatingDewC, "dew");
  const low = saturatedPhasesAtPressure(refrigerant, evaporatingPressureKPa);
  const latent = low.vapour.enthalpyKJPerKg - low.liquid.enthalpyKJPerKg;
  const inletQuality = Math.min(Math.max((inletEnthalpy - low.liquid.enthalpyKJPerKg) / latent, 0), 1);
  const twoPhaseRise = low.vapour.enthalpyKJPerKg - inletEnthalpy;

  const orificeGain =
    circuit.meteringDevice === "fixed-orifice" ? 1 + circuit.orificeSubcoolingGainPerK * subcoolingK : 1;
  const flowFactor = Math.sqrt(inletDensity * (condensingPressureKPa - evaporatingPressureKPa)) * orificeGain;
  let superheatedShare = circuit.designSuperheatedShare;
  let valveWideOpen = false;
  if (design) {
    const duty = (flowFactor / design.flowFactor) * (twoPhaseRise / design.twoPhaseEnthalpyRiseKJPerKg);
    const designWet = 1 - circuit.designSuperheatedShare;
    if (circuit.meteringDevice === "fixed-orifice") superheatedShare = 1 - designWet * duty;
    else if (designWet * duty * circuit.valveReserve < designWet) {
      valveWideOpen = true;
      superheatedShare = 1 - designWet * duty * circuit.valveReserve;
    }
    superheatedShare = Math.min(Math.max(superheatedShare, 0), MAX_SUPERHEATED_SHARE);
  }
  const evaporatorDifferenceK = circuit.evaporatorTemperatureDifferenceK;
  const superheaterNtu =
    -Math.log(1 - circuit.designSuperheatK / evaporatorDifferenceK) / circuit.designSuperheatedShare;
  const superheatK = evaporatorDifferenceK * (1 - Math.exp(-superheaterNtu * superheatedShare));

  const vapourAt = (temperatureC: number) =>
    temperatureC - low.vapour.temperatureC > SATURATED_WITHIN_K
      ? singlePhaseState(refrigerant, evaporatingPressureKPa, temperatureC).densityKgPerM3
      : low.vapour.densityKgPerM3;
  const condenserKg =
    circuit.condenserVolumeM3 *
    (circuit.desuperheatingShare *
      singlePhaseState(refrigerant, condensingPressureKPa, high.vapour.temperatureC + MEAN_DESUPERHEAT_K)
        .densityKgPerM3 +
      twoPhaseShare *
        meanTwoPhaseDensity(outletQuality, 1, high.vapour.densityKgPerM3, high.liquid.densityKgPerM3, voidFraction) +
      subcooledShare *
        (subcoolingK > SATURATED_WITHIN_K
          ? singlePhaseState(refrigerant, condensingPressureKPa, condensingBubbleC - subcoolingK / 2).densityKgPerM3
          : high.liquid.densityKgPerM3));
  const lineVoid = voidFraction(outletQuality, high.vapour.densityKgPerM3, high.liquid.densityKgPerM3);
  const liquidLineDensity =
    outletQuality > 0
      ? lineVoid * high.vapour.densityKgPerM3 + (1 - lineVoid) * high.liquid.densityKgPerM3
      : liquid.densityKgPerM3;
  const liquidLineKg = tubeVolume(circuit.liquidLineInnerDiameterM, circuit.liquidLineLengthM) * liquidLineDensity;
  const evaporatorKg =
    circuit.evaporatorVolumeM3 *
    ((1 - superheatedShare) *
      meanTwoPhaseDensity(inletQuality, 1, low.vapour.densityKgPerM3, low.liquid.densityKgPerM3, voidFraction) +
      superheatedShare * vapourAt(evaporatingDewC + superheatK / 2));
  const suctionLineKg =
    tubeVolume(circuit.suctionLineInnerDiameterM, circuit.liquidLineLengthM + 1) *
    vapourAt(evaporatingDewC + superheatK);
  const compressorKg = circuit.compressorAllowanceKg;

  return {
    condensingBubbleC,
    condensingPressureKPa,
    evaporatingDewC,
    evaporatingPressureKPa,
    subcoolingK,
    condenserOutletQuality: outletQuality,
    superheatK,
    subcooledShare,
    superheatedShare,
    liquidLineC,
    valveWideOpen,
    inventory: {
      condenserKg,
      liquidLineKg,
      evaporatorKg,
      suctionLineKg,
      compressorKg,
      totalKg: condenserKg + liquidLineKg + evaporatorKg + suctionLineKg + compressorKg,
    },
  };
}

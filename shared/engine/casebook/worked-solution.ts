import { chargeStateText } from "../../content/charge-states.ts";
import type { WorkedStep } from "../../schemas/casebook.ts";
import type { DiagnosisInput, DiagnosisResult } from "../../schemas/diagnosis.ts";
import { getRefrigerant } from "../properties/get-refrigerant.ts";
import { STANDARD_ATMOSPHERE_KPA } from "../properties/property-tolerances.ts";

/** Below this glide a blend behaves like a pure fluid on a gauge (R410A ≈ 0.1 K, R507A ≈ 0), K. */
const NEGLIGIBLE_GLIDE_K = 0.3;

const FIXED_DEVICES = new Set(["fixed-orifice", "capillary"]);
const DEVICE_WORDS = {
  txv: "A TXV",
  eev: "An EEV",
  "fixed-orifice": "A fixed orifice (piston)",
  capillary: "A capillary tube",
} as const;

function saturationWhy(
  side: "suction" | "liquid",
  refrigerant: string,
  isBlend: boolean,
  glideK: number | null,
): string {
  const base =
    side === "suction"
      ? `Superheat is measured on vapour leaving the evaporator, so the suction pressure is looked up in the dew (vapour) column of the ${refrigerant} table.`
      : `Subcooling is measured on liquid leaving the condenser, so the liquid pressure is looked up in the bubble (liquid) column of the ${refrigerant} table.`;
  // Said once, on the first lookup: the tables are absolute, the gauges are not.
  const tables =
    side === "suction"
      ? " The table is in absolute pressure: add the atmospheric pressure to the gauge reading first."
      : "";
  if (!isBlend)
    return `${base}${tables} ${refrigerant} is a single substance: bubble and dew are the same temperature at one pressure.`;
  if (glideK !== null && Math.abs(glideK) < NEGLIGIBLE_GLIDE_K) {
    return `${base}${tables} ${refrigerant} is a blend with almost no glide, so both columns agree to a tenth or two; read the right one anyway.`;
  }
  return side === "suction"
    ? `${base}${tables} ${refrigerant} is a zeotropic blend: at one pressure its bubble point lies below its dew point by the glide, so the bubble column (or a mid value) would overstate superheat by up to the whole glide.`
    : `${base}${tables} ${refrigerant} is a zeotropic blend: at one pressure its dew point lies above its bubble point by the glide, so the dew column (or a mid value) would overstate subcooling by up to the whole glide.`;
}

function targetWhy(quantity: "superheat" | "subcooling", input: DiagnosisInput, result: DiagnosisResult): string {
  const fixed = FIXED_DEVICES.has(input.meteringDevice);
  const device = DEVICE_WORDS[input.meteringDevice];
  const band = quantity === "superheat" ? result.targets.superheat : result.targets.subcooling;
  if (quantity === "superheat") {
    if (!fixed) {
      return `${device} holds superheat at its setting whatever the charge, so superheat here checks the valve, not the charge${band?.basis === "nameplate" ? " (against the maker's setting)" : " (against the common valve band)"}.`;
    }
    if (!band) {
      return `${device} cannot adjust, so its charge is judged by superheat against a target from return-air wet bulb and outdoor dry bulb — and here there is no valid target, so the charge cannot be judged by superheat: weigh it in.`;
    }
    return band.basis === "nameplate"
      ? `${device} cannot adjust, so the charge shows in superheat. The maker's target on the unit wins over any formula.`
      : `${device} cannot adjust, so the charge shows in superheat, judged against a target that moves with the indoor load and the outdoor air: SH ≈ 1.5 × wet bulb − 0.5 × outdoor dry bulb − 4.4 (K, °C), the metric form of the charging charts' rule.`;
  }
  if (fixed)
    return "Subcooling on a fixed device backs up the superheat verdict: low with high superheat is a shortage, high with high superheat a restriction.";
  return band?.basis === "nameplate"
    ? `${device} holds superheat, so the charge shows in subcooling. Judge it against the maker's target subcooling on the nameplate.`
    : `${device} holds superheat, so the charge shows in subcooling. With no maker's target, use the common band for TXV systems.`;
}

/**
 * The correct working of a case, step by step, for the apprentice to compare with their own:
 * which pressure, which table column (dew or bubble, and why for blends), the superheat and
 * subcooling arithmetic, which target the charge is judged against and why, and the verdict
 * with the evidence the engine used. Numbers are SI-metric fields of each step; the words
 * carry no numbers, so any display unit can be shown beside them.
 *
 * Units: kPa gauge and absolute, °C, K (see `WorkedStepSchema`). Range: readings `diagnose()`
 * accepted and its result for them. Source: TRADE.md §1.1–§1.4 [S1][S2][S3][S10][S14][S17].
 *
 * @throws {PropertyRangeError} when the refrigerant has no table (cannot happen after `diagnose()`)
 * @example workedSolution(input, diagnose(input)).map((step) => step.kind) // ["saturation", "saturation", "difference", "difference", "target", "target", "verdict"]
 */
export function workedSolution(
  input: DiagnosisInput,
  result: DiagnosisResult,
  reasoning: string | null = null,
): WorkedStep[] {
  const refrigerant = getRefrigerant(input.refrigerant);
  const isBlend = refrigerant.kind === "blend";
  const atmosphericKPa = input.atmosphericPressureKPa ?? STANDARD_ATMOSPHERE_KPA;
  const fixed = FIXED_DEVICES.has(input.meteringDevice);
  const signal = fixed ? "superheat" : "subcooling";
  const discharge = input.liquidTempLocation === "discharge-line";

  const steps: WorkedStep[] = [
    {
      kind: "saturation",
      side: "suction",
      pressureGaugeKPa: input.suctionPressureKPa,
      atmosphericKPa,
      pressureAbsoluteKPa: input.suctionPressureKPa + atmosphericKPa,
      point: "dew",
      saturationC: result.evaporatingTempC,
      otherPoint: "bubble",
      otherSaturationC: result.evaporatingBubbleTempC,
      glideK: result.glideK,
      isBlend,
      why: saturationWhy("suction", input.refrigerant, isBlend, result.glideK),
    },
    {
      kind: "saturation",
      side: "liquid",
      pressureGaugeKPa: input.liquidPressureKPa,
      atmosphericKPa,
      pressureAbsoluteKPa: input.liquidPressureKPa + atmosphericKPa,
      point: "bubble",
      saturationC: result.condensingTempC,
      otherPoint: "dew",
      otherSaturationC: result.condensingDewTempC,
      glideK: result.condenserGlideK,
      isBlend,
      why: saturationWhy("liquid", input.refrigerant, isBlend, result.condenserGlideK),
    },
    {
      kind: "difference",
      quantity: "superheat",
      lineTempC: input.suctionLineTempC,
      saturationC: result.evaporatingTempC,
      resultK: result.superheatK,
      why:
        result.superheatK === null
          ? "Superheat = suction line temperature − evaporating (dew) temperature; here it cannot be used (see the warnings on the readings)."
          : "Superheat = suction line temperature − evaporating (dew) temperature.",
    },
    {
      kind: "difference",
      quantity: "subcooling",
      lineTempC: input.liquidLineTempC,
      saturationC: result.condensingTempC,
      resultK: result.subcoolingK,
      why: discharge
        ? "The temperature was taken on the discharge line: that pipe carries superheated vapour, so there is no subcooling to work out. Move the probe to the liquid line at the condenser outlet."
        : result.subcoolingK === null
          ? "Subcooling = condensing (bubble) temperature − liquid line temperature; here it cannot be used (see the warnings on the readings)."
          : "Subcooling = condensing (bubble) temperature − liquid line temperature.",
    },
  ];

  for (const quantity of signal === "superheat"
    ? (["superheat", "subcooling"] as const)
    : (["subcooling", "superheat"] as const)) {
    const band = quantity === "superheat" ? result.targets.superheat : result.targets.subcooling;
    steps.push({
      kind: "target",
      quantity,
      band,
      measuredK: quantity === "superheat" ? result.superheatK : result.subcoolingK,
      wetBulbC: quantity === "superheat" && fixed ? result.returnAirWetBulbC : null,
      outdoorC: quantity === "superheat" && fixed ? (input.outdoorAirDryBulbC ?? null) : null,
      why: targetWhy(quantity, input, result),
    });
  }

  const evidence = result.findings
    .filter((finding) => finding.pointsTo.some((entry) => entry.state === result.chargeState && entry.weight > 0))
    .map((finding) => finding.message);
  const warningLines = result.warnings.map((warning) => warning.message);
  steps.push({
    kind: "verdict",
    chargeState: result.chargeState,
    evidence: result.chargeState === "insufficient-data" ? warningLines : evidence,
    why: reasoning ?? `${chargeStateText[result.chargeState].title}. ${chargeStateText[result.chargeState].nextStep}`,
  });
  return steps;
}

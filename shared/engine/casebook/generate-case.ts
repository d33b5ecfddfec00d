import type { BuiltInCase, CaseDifficulty, GeneratorFault } from "../../schemas/casebook.ts";
import type { DiagnosisInput, MeteringDevice } from "../../schemas/diagnosis.ts";
import { diagnose } from "../diagnosis/diagnose.ts";
import { getRefrigerant } from "../properties/get-refrigerant.ts";
import { designCaseInput } from "./design-case-input.ts";
import { expectedAnswers } from "./expected-answers.ts";

/**
 * Refrigerants the generator makes comfort-cooling cases for: every one whose table reaches
 * the hottest condensing temperature a fault here produces (about 60 °C). R744 is left out
 * (critical point 31 °C: transcritical, another kind of case).
 */
export const GENERATOR_REFRIGERANTS = [
  "R22",
  "R32",
  "R134a",
  "R152a",
  "R290",
  "R404A",
  "R407C",
  "R410A",
  "R507A",
  "R600a",
  "R717",
  "R1234yf",
  "R1234ze(E)",
] as const;

/** Sensor scatter on every temperature, ±K: a clamp probe after an ice-bath check (±0.6 K [S10]) on a good day. */
export const SENSOR_NOISE_K = 0.3;
/** Gauge resolution, kPa: a digital manifold reads to 1 kPa (common practice). */
export const GAUGE_RESOLUTION_KPA = 1;
/** How many draws the generator makes before giving up on a combination (see the property test). */
export const MAX_GENERATOR_DRAWS = 40;

export interface GenerateCaseOptions {
  refrigerant: string;
  meteringDevice: MeteringDevice;
  fault: GeneratorFault;
  /** Uniform numbers in [0, 1); pass `seededRandom(seed)` so the case can be made again. */
  random: () => number;
}

export type GeneratedCase = Omit<BuiltInCase, "id">;

type Range = readonly [number, number];

/**
 * One fault's pattern in comfort cooling, relative to the outdoor air (condensing) and, for
 * fixed devices, to the superheat target. Patterns follow TRADE.md §2 [S21][S22][S23][S24]
 * and §3 (condensing over ambient [S26], air split [S33]).
 */
interface FaultPattern {
  evaporatingC: Range;
  condensingOverOutdoorK: Range;
  /** Valve superheat, K. */
  valveSuperheatK: Range;
  /** Fixed-device superheat relative to its target, K (clamped to at least 0.8 K). */
  fixedSuperheatFromTargetK: Range;
  /** Subcooling, K, relative to the nameplate target for valves when `subcoolingFromTarget`. */
  subcoolingK: Range;
  subcoolingFromTarget: boolean;
  splitK: Range;
  /** Compressor current ÷ RLA. */
  currentRatio: Range;
  /** Discharge line temperature over condensing, K (null: not measured). */
  dischargeOverCondensingK: Range | null;
  complaints: readonly string[];
  reasoning: string;
  difficulty: CaseDifficulty;
}

const NOT_COOLING = [
  "Not keeping the rooms cool on a warm afternoon",
  "Running all day and the space is still warm",
  "Customer says the unit is not as cold as it used to be",
];

const PATTERNS: Record<GeneratorFault, FaultPattern> = {
  normal: {
    evaporatingC: [5.5, 8],
    condensingOverOutdoorK: [10.5, 13.5],
    valveSuperheatK: [4.2, 5.8],
    fixedSuperheatFromTargetK: [-0.8, 0.8],
    subcoolingK: [-0.6, 0.6],
    subcoolingFromTarget: true,
    splitK: [10, 12],
    currentRatio: [0.7, 0.85],
    dischargeOverCondensingK: [25, 32],
    complaints: [
      "Annual service: check the charge before summer",
      "New tenant wants the unit checked",
      "Noisy fan reported; check the circuit while there",
    ],
    reasoning:
      "Every reading sits in its band: the charge signal is on target and condensing over ambient and the air split are normal.",
    difficulty: "starter",
  },
  undercharged: {
    evaporatingC: [1.5, 4],
    condensingOverOutdoorK: [4.5, 7],
    valveSuperheatK: [13, 18],
    fixedSuperheatFromTargetK: [9, 13],
    subcoolingK: [0.4, 1.4],
    subcoolingFromTarget: false,
    splitK: [5.5, 7.5],
    currentRatio: [0.5, 0.62],
    dischargeOverCondensingK: [35, 45],
    complaints: NOT_COOLING,
    reasoning:
      "High superheat with almost no subcooling and low head pressure: the evaporator is starved because refrigerant is missing.",
    difficulty: "starter",
  },
  overcharged: {
    evaporatingC: [8.5, 10.5],
    condensingOverOutdoorK: [17.5, 20],
    valveSuperheatK: [4.5, 5.5],
    fixedSuperheatFromTargetK: [-6, -5],
    subcoolingK: [11.5, 14],
    subcoolingFromTarget: false,
    splitK: [9.5, 11],
    currentRatio: [1.06, 1.12],
    dischargeOverCondensingK: [25, 30],
    complaints: [
      "Topped up last month by someone else; now tripping on hot days",
      "Compressor sounds laboured and the suction line is sweating",
    ],
    reasoning:
      "Subcooling far above target with high head pressure and high amps: liquid is stacking in the condenser because there is too much refrigerant.",
    difficulty: "starter",
  },
  "restricted-metering": {
    evaporatingC: [-1.5, 1],
    condensingOverOutdoorK: [9.5, 12],
    valveSuperheatK: [15, 20],
    fixedSuperheatFromTargetK: [11, 15],
    subcoolingK: [10, 12.5],
    subcoolingFromTarget: false,
    splitK: [5.5, 7],
    currentRatio: [0.6, 0.7],
    dischargeOverCondensingK: [40, 50],
    complaints: [...NOT_COOLING, "Frost spot on the liquid line near the filter drier"],
    reasoning:
      "High superheat like a shortage, but subcooling is high, not low: liquid is backing up behind a restriction instead of reaching the evaporator.",
    difficulty: "intermediate",
  },
  "low-evaporator-airflow": {
    evaporatingC: [0, 2],
    condensingOverOutdoorK: [9, 11],
    valveSuperheatK: [1.8, 2.4],
    fixedSuperheatFromTargetK: [-5, -4.2],
    subcoolingK: [0.3, 1.2],
    subcoolingFromTarget: true,
    splitK: [16, 18],
    currentRatio: [0.7, 0.8],
    dischargeOverCondensingK: null,
    complaints: [
      "Weak airflow from the grilles and the coil sweating heavily",
      "Cold air but very little of it; the filter has not been changed for a year",
    ],
    reasoning:
      "Subcooling is right, so the charge is right; low superheat, low suction and a wide air split point at too little air over the evaporator.",
    difficulty: "intermediate",
  },
  "condenser-airflow": {
    evaporatingC: [8.5, 10],
    condensingOverOutdoorK: [21.5, 24],
    valveSuperheatK: [5, 6],
    fixedSuperheatFromTargetK: [-0.8, 0.8],
    subcoolingK: [2, 3],
    subcoolingFromTarget: false,
    splitK: [10, 11],
    currentRatio: [1.08, 1.14],
    dischargeOverCondensingK: [42, 46],
    complaints: [
      "Tripping on high pressure in the afternoons",
      "Outdoor unit sits behind a hedge and blows hot air back into itself",
    ],
    reasoning: "Condensing far above ambient with low subcooling and high amps: the condenser cannot reject its heat.",
    difficulty: "intermediate",
  },
  "non-condensables": {
    evaporatingC: [7.5, 9],
    condensingOverOutdoorK: [20.5, 23],
    valveSuperheatK: [4.5, 5.5],
    fixedSuperheatFromTargetK: [-0.8, 0.8],
    subcoolingK: [-0.4, 0.6],
    subcoolingFromTarget: true,
    splitK: [10, 11],
    currentRatio: [1.06, 1.1],
    dischargeOverCondensingK: [40, 44],
    complaints: [
      "Repaired and recharged last week; head pressure has been high ever since",
      "New installation, line set not evacuated by the installer",
    ],
    reasoning:
      "Subcooling is on target, so the charge is right, yet condensing is far above ambient: something that does not condense is taking condenser space. Confirm with a standing-pressure check.",
    difficulty: "advanced",
  },
  "weak-compressor": {
    evaporatingC: [13.5, 15.5],
    condensingOverOutdoorK: [4.5, 6],
    valveSuperheatK: [3.2, 4],
    fixedSuperheatFromTargetK: [-4.5, -3.8],
    subcoolingK: [8.5, 9.5],
    subcoolingFromTarget: false,
    splitK: [5.5, 6.5],
    currentRatio: [0.4, 0.45],
    dischargeOverCondensingK: null,
    complaints: ["Runs all day, hums, barely any cooling", "Pressures equalise almost at once when the unit stops"],
    reasoning:
      "High suction with low head, low amps and a small split: the compressor cannot pull its pressure difference.",
    difficulty: "advanced",
  },
};

const DEVICE_WORDS: Record<MeteringDevice, string> = {
  txv: "TXV",
  eev: "EEV",
  "fixed-orifice": "fixed orifice",
  capillary: "capillary",
};
const EQUIPMENT = ["ducted split", "packaged rooftop unit", "wall split", "cassette split"] as const;
const SITES = [
  "A practice site: small office block",
  "A practice site: suburban dental surgery",
  "A practice site: community hall",
  "A practice site: corner café",
] as const;

function between(random: () => number, [low, high]: Range): number {
  return low + (high - low) * random();
}

function pick<T>(random: () => number, items: readonly T[]): T {
  return items[Math.min(items.length - 1, Math.floor(random() * items.length))]!;
}

const tenth = (value: number) => Number(value.toFixed(1));

function draw(options: GenerateCaseOptions, pattern: FaultPattern): DiagnosisInput {
  const { random, meteringDevice } = options;
  const noise = () => between(random, [-SENSOR_NOISE_K, SENSOR_NOISE_K]);
  const fixed = meteringDevice === "fixed-orifice" || meteringDevice === "capillary";
  const outdoor = between(random, [29, 35]);
  const returnDry = between(random, [24, 27]);
  const returnWet = between(random, [18, 20]);
  // The fixed-device target the pattern is written against (metric charging formula, TRADE.md §1.4).
  const target = 1.5 * returnWet - 0.5 * outdoor - 40 / 9;
  const targetSubcooling = fixed ? null : Math.round(between(random, [4.5, 6.5]) * 2) / 2;
  const superheat = fixed
    ? Math.max(0.8, target + between(random, pattern.fixedSuperheatFromTargetK))
    : between(random, pattern.valveSuperheatK);
  const subcoolingBase = pattern.subcoolingFromTarget
    ? (targetSubcooling ?? 6) + between(random, pattern.subcoolingK)
    : between(random, pattern.subcoolingK);
  const evaporating = between(random, pattern.evaporatingC);
  const condensing = outdoor + between(random, pattern.condensingOverOutdoorK);
  const rla = Math.round(between(random, [8, 24]));
  const readings: Partial<DiagnosisInput> = {
    returnAirDryBulbC: tenth(returnDry + noise()),
    returnAirWetBulbC: tenth(Math.min(returnWet + noise(), returnDry)),
    supplyAirDryBulbC: tenth(returnDry - between(random, pattern.splitK) + noise()),
    outdoorAirDryBulbC: tenth(outdoor + noise()),
    compressorRla: rla,
    compressorAmps: tenth(rla * between(random, pattern.currentRatio)),
    runMinutes: Math.round(between(random, [15, 30])),
    ...(targetSubcooling === null ? {} : { targetSubcoolingK: targetSubcooling }),
    ...(pattern.dischargeOverCondensingK
      ? { dischargeLineTempC: tenth(condensing + between(random, pattern.dischargeOverCondensingK)) }
      : {}),
  };
  // Scatter: the true state moves a little, and each probe reads it with its own noise.
  return designCaseInput({
    refrigerant: options.refrigerant,
    meteringDevice,
    evaporatingDewC: evaporating + noise(),
    condensingBubbleC: condensing + noise(),
    superheatK: superheat + noise(),
    subcoolingK: Math.max(0.2, subcoolingBase + noise()),
    pressureResolutionKPa: GAUGE_RESOLUTION_KPA,
    readings,
  });
}

/**
 * A new practice case for a refrigerant, metering device and fault: comfort-cooling readings
 * drawn from the fault's symptom pattern (TRADE.md §2), made physically consistent through
 * the property engine (pressures from saturation temperatures), with realistic scatter
 * (±0.3 K on every probe, pressures to the gauge's 1 kPa), and answered by `diagnose()`.
 * Draws that the engine would read as another state are drawn again (at most
 * `MAX_GENERATOR_DRAWS` times), so the case is always diagnosed as the fault it was made for.
 *
 * Units: SI-metric readings (kPa gauge, °C, K). Range: `GENERATOR_REFRIGERANTS`, any metering
 * device, any `GENERATOR_FAULTS` entry. Source: TRADE.md §1.4, §2, §3 [S10][S21]–[S26][S33].
 *
 * @throws {RangeError} when the refrigerant is not one the generator supports, or no draw gave the fault
 * @example generateCase({ refrigerant: "R407C", meteringDevice: "txv", fault: "undercharged", random: seededRandom(42) }).expected.chargeState // "undercharged"
 */
export function generateCase(options: GenerateCaseOptions): GeneratedCase {
  if (!(GENERATOR_REFRIGERANTS as readonly string[]).includes(options.refrigerant)) {
    throw new RangeError(
      `generateCase requires one of ${GENERATOR_REFRIGERANTS.join(", ")}; ${options.refrigerant} is not supported`,
    );
  }
  const pattern = PATTERNS[options.fault];
  const info = getRefrigerant(options.refrigerant);
  for (let attempt = 0; attempt < MAX_GENERATOR_DRAWS; attempt += 1) {
    const input = draw(options, pattern);
    const result = diagnose(input);
    if (result.chargeState !== options.fault) continue;
    const equipment = pick(options.random, EQUIPMENT);
    const blend = info.kind === "blend" && options.fault !== "normal";
    const difficulty: CaseDifficulty = blend && pattern.difficulty === "starter" ? "intermediate" : pattern.difficulty;
    return {
      title: `Practice: ${equipment} on ${options.refrigerant}, ${DEVICE_WORDS[options.meteringDevice]}`,
      difficulty,
      story: {
        site: pick(options.random, SITES),
        equipment: `${equipment[0]!.toUpperCase()}${equipment.slice(1)} on ${options.refrigerant} with a ${DEVICE_WORDS[options.meteringDevice]}, comfort cooling`,
        complaint: pick(options.random, pattern.complaints),
        conditions: "Settled readings after the unit has run a while, panels on, filters as found.",
      },
      input,
      reasoning: pattern.reasoning,
      safetyTopics: [],
      design: { evaporatingDewC: null, condensingBubbleC: null },
      expected: expectedAnswers(result),
      sources: ["S21", "S22", "S23", "S24", "S26", "S33"],
    };
  }
  throw new RangeError(
    `generateCase requires a combination it can draw: no ${options.fault} case for ${options.refrigerant} with ${options.meteringDevice} in ${MAX_GENERATOR_DRAWS} draws`,
  );
}

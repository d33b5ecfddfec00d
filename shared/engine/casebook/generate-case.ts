import { upperFirst } from "../../format/upper-first.ts";
import type { BuiltInCase, CaseDifficulty, GeneratorFault } from "../../schemas/casebook.ts";
import type { Application, MeteringDevice } from "../../schemas/diagnosis.ts";
import { diagnose } from "../diagnosis/diagnose.ts";
import { parseDiagnosisInput } from "../diagnosis/parse-diagnosis-input.ts";
import { getRefrigerant } from "../properties/get-refrigerant.ts";
import { PropertyRangeError } from "../properties/property-range-error.ts";
import { drawFaultScenario } from "./draw-fault-scenario.ts";
import { expectedAnswers } from "./expected-answers.ts";

/**
 * Refrigerants the generator makes cases for: every one whose table reaches the hottest
 * condensing temperature a fault here produces (about 60 °C). R744 is left out (critical point
 * 31 °C: transcritical, another kind of case).
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
/** Gauge scatter, ± fraction of the reading: a good digital manifold (common practice). */
export const GAUGE_NOISE_FRACTION = 0.003;
/** Gauge resolution, kPa: a digital manifold reads to 1 kPa (common practice). */
export const GAUGE_RESOLUTION_KPA = 1;
/** How many draws the generator makes before giving up on a combination (see the property test). */
export const MAX_GENERATOR_DRAWS = 40;

export interface GenerateCaseOptions {
  refrigerant: string;
  meteringDevice: MeteringDevice;
  fault: GeneratorFault;
  /** What the equipment does; comfort cooling when absent. */
  application?: Application;
  /** Uniform numbers in [0, 1); pass `seededRandom(seed)` so the case can be made again. */
  random: () => number;
}

export type GeneratedCase = Omit<BuiltInCase, "id">;

/** The story and teaching of one fault. */
interface FaultStory {
  complaints: readonly string[];
  reasoning: string;
  difficulty: CaseDifficulty;
}

const NOT_COOLING = [
  "Not keeping the space cool on a warm afternoon",
  "Running all day and still not down to temperature",
  "Customer says the unit is not as cold as it used to be",
];

const STORIES: Record<GeneratorFault, FaultStory> = {
  normal: {
    complaints: [
      "Scheduled service: check the charge",
      "New tenant wants the unit checked",
      "Noisy fan reported; check the circuit while there",
    ],
    reasoning:
      "Every reading sits in its band: the charge signal is on target and head, suction against the load and the split are normal.",
    difficulty: "starter",
  },
  undercharged: {
    complaints: NOT_COOLING,
    reasoning:
      "High superheat with almost no subcooling, suction low for the load and low head: the evaporator is starved because refrigerant is missing.",
    difficulty: "starter",
  },
  overcharged: {
    complaints: [
      "Topped up last month by someone else; now tripping on hot days",
      "Compressor sounds laboured and the suction line is sweating",
    ],
    reasoning:
      "Subcooling far above target with high head and high amps, and the liquid leaving close to the outdoor air: liquid is stacking in the condenser because there is too much refrigerant.",
    difficulty: "starter",
  },
  "restricted-metering": {
    complaints: [...NOT_COOLING, "Frost spot on the liquid line near the filter drier"],
    reasoning:
      "High superheat like a shortage, but subcooling at or above target: liquid is backing up behind a restriction instead of reaching the evaporator.",
    difficulty: "intermediate",
  },
  "low-evaporator-airflow": {
    complaints: [
      "Weak airflow from the grilles and the coil sweating heavily",
      "Cold air but very little of it; the filter has not been changed for a year",
      "Ice building on the evaporator",
    ],
    reasoning:
      "Subcooling is right, so the charge is right; the coil runs far below the air it cools and the split is wide: too little air over the evaporator.",
    difficulty: "intermediate",
  },
  "overfeeding-metering": {
    complaints: [
      "Suction line frosting back to the compressor",
      "Compressor noisy at start; the suction line is sweating all the way back",
    ],
    reasoning:
      "Superheat near zero while subcooling and head are normal: not an overcharge (which stacks liquid in the condenser) but a metering device passing too much — check the bulb before anything else.",
    difficulty: "intermediate",
  },
  "condenser-airflow": {
    complaints: [
      "Tripping on high pressure in the afternoons",
      "Outdoor unit sits behind a hedge and blows hot air back into itself",
    ],
    reasoning:
      "Condensing far above ambient with normal subcooling, high amps and the liquid leaving far above the outdoor air: the condenser cannot reject its heat.",
    difficulty: "intermediate",
  },
  "non-condensables": {
    complaints: [
      "Repaired and recharged last week; head pressure has been high ever since",
      "New installation, line set not evacuated by the installer",
    ],
    reasoning:
      "Head far above ambient and the subcooling reads high, yet the liquid leaves no closer to the outdoor air than usual: the gauge is reading the pressure of air in the circuit. Confirm with a standing-pressure check.",
    difficulty: "advanced",
  },
  "weak-compressor": {
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
const EQUIPMENT: Record<Application, readonly string[]> = {
  "comfort-cooling": ["ducted split", "packaged rooftop unit", "wall split", "cassette split"],
  "heat-pump": ["ducted heat pump", "wall-split heat pump"],
  "medium-temperature-refrigeration": ["cool room", "display cabinet", "walk-in cooler"],
  "low-temperature-refrigeration": ["freezer room", "ice-cream cabinet", "walk-in freezer"],
  "process-chilling": ["small process chiller", "glycol chiller"],
};
const APPLICATION_WORDS: Record<Application, string> = {
  "comfort-cooling": "comfort cooling",
  "heat-pump": "heat pump in cooling mode",
  "medium-temperature-refrigeration": "medium-temperature refrigeration",
  "low-temperature-refrigeration": "low-temperature refrigeration",
  "process-chilling": "process chilling",
};
const SITES = [
  "A practice site: small office block",
  "A practice site: suburban dental surgery",
  "A practice site: community hall",
  "A practice site: corner café",
] as const;

function pick<T>(random: () => number, items: readonly T[]): T {
  const item = items[Math.min(items.length - 1, Math.floor(random() * items.length))];
  if (item === undefined) throw new RangeError("generateCase requires a list to pick from with at least one item");
  return item;
}

/**
 * A new practice case for a refrigerant, metering device, fault and application: readings drawn
 * from the fault's physical picture (`drawFaultScenario`, TRADE.md §2), made consistent through
 * the property engine, with realistic scatter (±0.3 K on every probe, ±0.3 % on gauges read to
 * 1 kPa), and answered by `diagnose()`. Draws that the engine would read as another state are
 * drawn again (at most `MAX_GENERATOR_DRAWS` times), so the case is always diagnosed as the
 * fault it was made for.
 *
 * Units: SI-metric readings (kPa gauge, °C, K). Range: `GENERATOR_REFRIGERANTS`, any metering
 * device its application uses, any `GENERATOR_FAULTS` entry. Source: TRADE.md §1.4, §2, §3
 * [S10][S21]–[S26][S33].
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
  const application = options.application ?? "comfort-cooling";
  const story = STORIES[options.fault];
  const info = getRefrigerant(options.refrigerant);
  for (let attempt = 0; attempt < MAX_GENERATOR_DRAWS; attempt += 1) {
    let input;
    try {
      ({ input } = drawFaultScenario({
        refrigerant: options.refrigerant,
        meteringDevice: options.meteringDevice,
        application,
        fault: options.fault,
        random: options.random,
        temperatureNoiseK: SENSOR_NOISE_K,
        pressureNoiseFraction: GAUGE_NOISE_FRACTION,
        nameplateSubcooling: options.random() < 0.7,
      }));
    } catch (error) {
      // A draw outside the refrigerant's table (e.g. a freezer on a high-pressure fluid): draw again.
      if (error instanceof RangeError || error instanceof PropertyRangeError) continue;
      throw error;
    }
    // A random draw is new data: it passes the schema before diagnose(), which trusts its input.
    const result = diagnose(parseDiagnosisInput(input));
    if (result.chargeState !== options.fault) continue;
    const equipment = pick(options.random, EQUIPMENT[application]);
    const blend = info.kind === "blend" && options.fault !== "normal";
    const difficulty: CaseDifficulty = blend && story.difficulty === "starter" ? "intermediate" : story.difficulty;
    return {
      title: `Practice: ${equipment} on ${options.refrigerant}, ${DEVICE_WORDS[options.meteringDevice]}`,
      difficulty,
      story: {
        site: pick(options.random, SITES),
        equipment: `${upperFirst(equipment)} on ${options.refrigerant} with a ${DEVICE_WORDS[options.meteringDevice]}, ${APPLICATION_WORDS[application]}`,
        complaint: pick(options.random, story.complaints),
        conditions: "Settled readings after the unit has run a while, panels on, filters as found.",
      },
      input,
      reasoning: story.reasoning,
      safetyTopics: [],
      design: { evaporatingDewC: null, condensingBubbleC: null },
      expected: expectedAnswers(result),
      sources: ["S21", "S22", "S23", "S24", "S26", "S33"],
    };
  }
  throw new RangeError(
    `generateCase requires a combination it can draw: no ${options.fault} case for ${options.refrigerant} with ${options.meteringDevice} (${application}) in ${MAX_GENERATOR_DRAWS} draws`,
  );
}

/**
 * Validation run of the diagnosis engine (`npm run validate:diagnosis`; not part of `npm test`).
 *
 * For every refrigerant class × metering device × application × fault it draws physically
 * consistent readings from the fault scenarios (shared/engine/casebook/fault-scenarios.ts:
 * the symptom table of TRADE.md §2 turned into operating points), adds sensor scatter (±0.5 K on
 * every temperature, ±1 % on every pressure), diagnoses them, and prints a confusion matrix
 * with the recall of every state (right first) and its top-two recall (right state first or
 * second), then the weakest combinations.
 *
 * Options: --per-cell N (draws per combination, default 12), --seed S, --state STATE (only
 * that fault), --verbose (print each miss).
 */
import {
  APPLICATIONS,
  CHARGE_STATES,
  type Application,
  type ChargeState,
  type EvidenceState,
  type MeteringDevice,
} from "../shared/schemas/diagnosis.ts";
import { diagnose, parseDiagnosisInput, seededRandom } from "../shared/engine/index.ts";
import { drawFaultScenario } from "../shared/engine/casebook/draw-fault-scenario.ts";
import { loadAllRefrigerants } from "../shared/engine/index.ts";

// Every saturation table, before anything looks one up (tables load per refrigerant).
await loadAllRefrigerants();

const argument = (name: string) => {
  const index = process.argv.indexOf(`--${name}`);
  return index === -1 ? undefined : process.argv[index + 1];
};
const PER_CELL = Number(argument("per-cell") ?? 12);
const SEED = Number(argument("seed") ?? 2026);
const ONLY = argument("state") as EvidenceState | undefined;
const VERBOSE = process.argv.includes("--verbose");

/** Refrigerant classes per application: pure or azeotropic, near-azeotropic, high-glide blends. */
const REFRIGERANTS: Record<Application, readonly string[]> = {
  "comfort-cooling": ["R22", "R32", "R410A", "R454B", "R407C", "R134a", "R290"],
  "heat-pump": ["R410A", "R32", "R454B", "R407C"],
  "medium-temperature-refrigeration": ["R404A", "R134a", "R448A", "R449A", "R290", "R513A"],
  "low-temperature-refrigeration": ["R404A", "R507A", "R448A", "R449A"],
  "process-chilling": ["R134a", "R410A", "R407C", "R32", "R717", "R1234ze(E)"],
};
const DEVICES: Record<Application, readonly MeteringDevice[]> = {
  "comfort-cooling": ["txv", "eev", "fixed-orifice", "capillary"],
  "heat-pump": ["txv", "eev", "fixed-orifice"],
  "medium-temperature-refrigeration": ["txv", "eev", "capillary"],
  "low-temperature-refrigeration": ["txv", "eev", "capillary"],
  "process-chilling": ["txv", "eev"],
};
const FAULTS = CHARGE_STATES.filter((state): state is EvidenceState => state !== "insufficient-data").filter(
  (state) => !ONLY || state === ONLY,
);

type Counts = Record<EvidenceState, Record<ChargeState, number>>;
const confusion = Object.fromEntries(
  FAULTS.map((fault) => [fault, Object.fromEntries(CHARGE_STATES.map((state) => [state, 0]))]),
) as Counts;
const topTwo = Object.fromEntries(FAULTS.map((fault) => [fault, 0])) as Record<EvidenceState, number>;
const totals = Object.fromEntries(FAULTS.map((fault) => [fault, 0])) as Record<EvidenceState, number>;
const cells: { key: string; right: number; total: number }[] = [];

const random = seededRandom(SEED);
const started = performance.now();
for (const application of APPLICATIONS) {
  for (const refrigerant of REFRIGERANTS[application]) {
    for (const device of DEVICES[application]) {
      for (const fault of FAULTS) {
        let right = 0;
        for (let draw = 0; draw < PER_CELL; draw += 1) {
          const location =
            draw % 3 === 1
              ? ("outdoor-unit" as const)
              : draw % 3 === 2 && device !== "fixed-orifice"
                ? ("evaporator-outlet" as const)
                : undefined;
          const scenario = drawFaultScenario({
            refrigerant,
            meteringDevice: device,
            application,
            fault,
            random,
            temperatureNoiseK: 0.5,
            pressureNoiseFraction: 0.01,
            nameplateSubcooling: draw % 4 !== 3,
            ...(location ? { suctionTempLocation: location } : {}),
          });
          // A drawn scenario is new data: it passes the schema before diagnose(), which trusts its input.
          const result = diagnose(parseDiagnosisInput(scenario.input));
          confusion[fault][result.chargeState] += 1;
          totals[fault] += 1;
          const second =
            result.chargeState === "insufficient-data" ? result.alternatives[0]?.state : result.alternatives[0]?.state;
          if (result.chargeState === fault || second === fault) topTwo[fault] += 1;
          if (result.chargeState === fault) right += 1;
          else if (VERBOSE) {
            console.log(
              `MISS ${application} ${refrigerant} ${device} ${fault} → ${result.chargeState} SH ${result.superheatK?.toFixed(1)} SC ${result.subcoolingK?.toFixed(1)} TD ${result.evaporatorTemperatureDifferenceK?.toFixed(1)} CTOA ${result.condensingOverAmbientK?.toFixed(1)} appr ${result.condenserApproachK?.toFixed(1)} split ${result.temperatureSplitK?.toFixed(1)}/${result.targets.temperatureSplit?.targetK.toFixed(1)} (${result.alternatives.map((a) => `${a.state} ${a.score.toFixed(2)}`).join(", ")})`,
            );
            console.log(`     ${JSON.stringify(scenario.input)}`);
          }
        }
        cells.push({ key: `${application} · ${refrigerant} · ${device} · ${fault}`, right, total: PER_CELL });
      }
    }
  }
}
const seconds = (performance.now() - started) / 1000;

const short = (state: string) =>
  state
    .replace("restricted-metering", "restricted")
    .replace("low-evaporator-airflow", "low-evap-air")
    .replace("overfeeding-metering", "overfeeding")
    .replace("condenser-airflow", "cond-air")
    .replace("non-condensables", "non-cond")
    .replace("weak-compressor", "weak-comp")
    .replace("insufficient-data", "insuff");
const width = 12;
const pad = (text: string) => text.padStart(width);
console.log(
  `\nDiagnosis validation: ${cells.length} combinations × ${PER_CELL} draws = ${Object.values(totals).reduce((a, b) => a + b, 0)} diagnoses in ${seconds.toFixed(1)} s (seed ${SEED})`,
);
console.log("Sensor scatter ±0.5 K on temperatures, ±1 % on pressures; rows: true state, columns: verdict\n");
console.log(
  pad("true \\ said") + CHARGE_STATES.map((state) => pad(short(state))).join("") + pad("recall") + pad("top two"),
);
for (const fault of FAULTS) {
  const row = CHARGE_STATES.map((state) => pad(String(confusion[fault][state]))).join("");
  const recall = confusion[fault][fault] / totals[fault];
  console.log(
    pad(short(fault)) +
      row +
      pad(`${(recall * 100).toFixed(1)} %`) +
      pad(`${((topTwo[fault] / totals[fault]) * 100).toFixed(1)} %`),
  );
}
const right = FAULTS.reduce((sum, fault) => sum + confusion[fault][fault], 0);
const all = FAULTS.reduce((sum, fault) => sum + totals[fault], 0);
const two = FAULTS.reduce((sum, fault) => sum + topTwo[fault], 0);
console.log(
  `\nOverall: ${((right / all) * 100).toFixed(1)} % right first, ${((two / all) * 100).toFixed(1)} % right within the top two`,
);
console.log("\nWeakest combinations (right first / draws):");
for (const cell of cells
  .sort((first, second) => first.right / first.total - second.right / second.total)
  .slice(0, 15)) {
  console.log(`  ${String(cell.right).padStart(3)}/${cell.total}  ${cell.key}`);
}

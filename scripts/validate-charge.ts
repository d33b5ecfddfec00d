/**
 * Validation run of the charge-deviation estimate (`npm run validate:charge`; not part of
 * `npm test`).
 *
 * For each refrigerant × metering device it draws split air conditioners
 * (scripts/charge-inventory/draw-charge-circuit.ts), takes each one's correct charge as the
 * refrigerant its physical inventory model holds at the design point (AHRI "A" conditions,
 * design subcooling and superheat), then for outdoor and return air around that point and a
 * true charge deviation from −30 % to +25 % solves the operating point that holds that charge
 * (scripts/charge-inventory/solve-operating-point.ts), reads it like a technician (sensor
 * scatter ±0.5 K on temperatures, ±1 % on pressures, as the diagnosis validation), and asks
 * diagnose() for `chargeDeviation` twice: without a reference point (generic coefficients, the
 * nameplate subcooling target) and with the circuit's own reference point (the model's
 * correct-charge readings at the design point, read with the same scatter).
 *
 * Printed per refrigerant, device and basis: cases, share with an estimate, mean absolute
 * error in % of the correct charge, share within 10 % of the charge (the aim the virtual
 * refrigerant charge papers report), share whose [lowKg, highKg] contains the truth, and the
 * mean range width. Then the same by true deviation, where the limits of the method show.
 *
 * Options: --circuits N (per refrigerant × device, default 8), --seed S, --no-scatter, --dump
 * FILE (every estimate as CSV, for looking into the errors), --subcooled-share-per-k LOW,HIGH
 * (the model's subcooled zone per kelvin of design subcooling, default 0.015,0.03: it sets the
 * kilograms per kelvin, so rerunning with another range shows how far the figures rest on it),
 * --void-fraction homogeneous (instead of Zivi, the same check for the two-phase zones).
 */
import { writeFileSync } from "node:fs";
import { diagnose, listRefrigerants, parseDiagnosisInput, seededRandom } from "../shared/engine/index.ts";
import { loadSinglePhaseTable } from "../shared/property-tables/load-single-phase-table.ts";
import type { ChargeReference } from "../shared/schemas/diagnosis.ts";
import {
  DESIGN_CONDITIONS,
  type InventoryConditions,
  type InventoryMeteringDevice,
} from "./charge-inventory/charge-circuit.ts";
import { designFlowOf } from "./charge-inventory/design-flow-of.ts";
import { drawChargeCircuit, SUBCOOLED_SHARE_PER_K } from "./charge-inventory/draw-charge-circuit.ts";
import { inventoryReadings, type ReadingScatter } from "./charge-inventory/inventory-readings.ts";
import { operatingPointAt } from "./charge-inventory/operating-point-at.ts";
import { solveOperatingPoint } from "./charge-inventory/solve-operating-point.ts";
import { loadAllRefrigerants } from "../shared/engine/index.ts";

// Every saturation table, before anything looks one up (tables load per refrigerant).
await loadAllRefrigerants();

const argument = (name: string) => {
  const index = process.argv.indexOf(`--${name}`);
  return index === -1 ? undefined : process.argv[index + 1];
};
const CIRCUITS = Number(argument("circuits") ?? 8);
const SEED = Number(argument("seed") ?? 2026);
const SCATTER = !process.argv.includes("--no-scatter");
const DUMP = argument("dump");
const VOID_FRACTION = argument("void-fraction") === "homogeneous" ? "homogeneous" : "zivi";
const SHARE_PER_K = (argument("subcooled-share-per-k")?.split(",").map(Number) ?? [...SUBCOOLED_SHARE_PER_K]) as [
  number,
  number,
];
const dumped: string[] = [
  "refrigerant,device,basis,outdoorC,returnC,deviation,chargeKg,trueKg,kg,lowKg,highKg,subcoolingK,superheatK,referenceSubcoolingK,referenceSuperheatK,valveWideOpen",
];

const WANTED = ["R410A", "R32", "R454B", "R407C", "R134a", "R22"];
const known = new Set(listRefrigerants().map((entry) => (typeof entry === "string" ? entry : entry.id)));
const REFRIGERANTS = WANTED.filter((id) => known.has(id));
const DEVICES: readonly InventoryMeteringDevice[] = ["txv", "eev", "fixed-orifice"];
const DEVIATIONS = [-0.3, -0.25, -0.2, -0.15, -0.1, -0.05, 0, 0.05, 0.1, 0.15, 0.2, 0.25];
/** Outdoor air, °C, and return air dry/wet bulb pairs, °C, around the design point (inside the fixed-orifice chart's range). */
const OUTDOOR_C = [25, 30, 35, 40, 45];
const RETURN_AIR: readonly [number, number][] = [
  [23, 16.5],
  [26.7, 19.4],
  [28, 21],
];

interface Tally {
  cases: number;
  estimates: number;
  absoluteErrorShare: number;
  signedErrorShare: number;
  within10: number;
  contained: number;
  widthShare: number;
  unsolved: number;
}
const emptyTally = (): Tally => ({
  cases: 0,
  estimates: 0,
  absoluteErrorShare: 0,
  signedErrorShare: 0,
  within10: 0,
  contained: 0,
  widthShare: 0,
  unsolved: 0,
});
const tallies = new Map<string, Tally>();
const tally = (key: string) => {
  let entry = tallies.get(key);
  if (!entry) tallies.set(key, (entry = emptyTally()));
  return entry;
};
const notes = new Map<string, number>();

const random = seededRandom(SEED);
const scatter: ReadingScatter | null = SCATTER ? { temperatureK: 0.5, pressureFraction: 0.01, random } : null;
const started = performance.now();
for (const refrigerant of REFRIGERANTS) {
  await loadSinglePhaseTable(refrigerant);
  for (const device of DEVICES) {
    for (let index = 0; index < CIRCUITS; index += 1) {
      const circuit = {
        ...drawChargeCircuit(refrigerant, device, random, SHARE_PER_K),
        voidFraction: VOID_FRACTION,
      } as const;
      const design = designFlowOf(circuit, DESIGN_CONDITIONS);
      const correct = operatingPointAt(circuit, DESIGN_CONDITIONS, circuit.designSubcooledShare, design);
      const correctKg = correct.inventory.totalKg;
      // The reference point as the app stores it: the settled readings at the correct charge, measured.
      // Modelled readings are new data: they pass the schema before diagnose(), which trusts its input.
      const referenceRun = diagnose(
        parseDiagnosisInput(inventoryReadings(circuit, DESIGN_CONDITIONS, correct, correctKg, scatter)),
      );
      const chargeReference: ChargeReference = {
        subcoolingK: referenceRun.subcoolingK ?? correct.subcoolingK,
        superheatK: referenceRun.superheatK ?? correct.superheatK,
        evaporatingTempC: correct.evaporatingDewC,
        condensingTempC: correct.condensingBubbleC,
        outdoorAirDryBulbC: DESIGN_CONDITIONS.outdoorAirC,
        returnAirDryBulbC: DESIGN_CONDITIONS.returnAirC,
      };
      for (const outdoorAirC of OUTDOOR_C) {
        for (const [returnAirC, returnWetBulbC] of RETURN_AIR) {
          const conditions: InventoryConditions = { outdoorAirC, returnAirC, returnWetBulbC };
          for (const deviation of DEVIATIONS) {
            const trueKg = correctKg * deviation;
            const point = solveOperatingPoint(circuit, conditions, correctKg + trueKg, design);
            for (const basis of ["generic", "unit-reference"] as const) {
              const keys = [
                `${refrigerant}|${device}|${basis}`,
                `all|${device}|${basis}`,
                `all|all|${basis}`,
                `deviation ${deviation}|${device === "fixed-orifice" ? "fixed" : "valve"}|${basis}`,
              ];
              if (!point) {
                for (const key of keys) tally(key).unsolved += 1;
                continue;
              }
              const input = parseDiagnosisInput(inventoryReadings(circuit, conditions, point, correctKg, scatter));
              const result = diagnose(basis === "generic" ? input : { ...input, chargeReference });
              const estimate = result.chargeDeviation;
              if (DUMP && estimate)
                dumped.push(
                  [
                    refrigerant,
                    device,
                    basis,
                    outdoorAirC,
                    returnAirC,
                    deviation,
                    correctKg.toFixed(3),
                    trueKg.toFixed(3),
                    estimate.kg,
                    estimate.lowKg,
                    estimate.highKg,
                    result.subcoolingK?.toFixed(2),
                    result.superheatK?.toFixed(2),
                    basis === "generic"
                      ? (result.targets.subcooling?.targetK.toFixed(2) ?? "")
                      : chargeReference.subcoolingK.toFixed(2),
                    chargeReference.superheatK.toFixed(2),
                    point.valveWideOpen,
                  ].join(","),
                );
              for (const key of keys) {
                const entry = tally(key);
                entry.cases += 1;
                if (!estimate) continue;
                entry.estimates += 1;
                const errorShare = Math.abs(estimate.kg - trueKg) / correctKg;
                entry.absoluteErrorShare += errorShare;
                entry.signedErrorShare += (estimate.kg - trueKg) / correctKg;
                if (errorShare <= 0.1) entry.within10 += 1;
                if (trueKg >= estimate.lowKg - 0.025 && trueKg <= estimate.highKg + 0.025) entry.contained += 1;
                entry.widthShare += (estimate.highKg - estimate.lowKg) / correctKg;
              }
              if (!estimate) {
                const note = `${basis}: ${(result.chargeDeviationNote ?? "").slice(0, 90)}`;
                notes.set(note, (notes.get(note) ?? 0) + 1);
              }
            }
          }
        }
      }
    }
  }
}
const seconds = (performance.now() - started) / 1000;

const percent = (value: number) => `${(value * 100).toFixed(1)} %`;
const row = (label: string, entry: Tally) => {
  const shown = entry.estimates || 1;
  return [
    label.padEnd(34),
    String(entry.cases).padStart(6),
    percent(entry.estimates / (entry.cases || 1)).padStart(9),
    percent(entry.absoluteErrorShare / shown).padStart(9),
    percent(entry.signedErrorShare / shown).padStart(9),
    percent(entry.within10 / shown).padStart(9),
    percent(entry.contained / shown).padStart(10),
    percent(entry.widthShare / shown).padStart(9),
  ].join("");
};
const header = [
  "".padEnd(34),
  "cases".padStart(6),
  "estimate".padStart(9),
  "MAE".padStart(9),
  "bias".padStart(9),
  "≤10 %".padStart(9),
  "in range".padStart(10),
  "width".padStart(9),
].join("");
const total = tally("all|all|generic").cases + tally("all|all|generic").unsolved;
console.log(
  `\nCharge deviation validation: ${REFRIGERANTS.join(", ")} × ${DEVICES.join(", ")}, ${CIRCUITS} circuits each, ${total} charge levels × 2 bases in ${seconds.toFixed(1)} s (seed ${SEED})`,
);
console.log(
  `Model: ${VOID_FRACTION === "zivi" ? "Zivi" : "homogeneous"} void fraction; subcooled zone ${SHARE_PER_K.join("–")} of the condenser per kelvin of design subcooling`,
);
console.log(
  `Sensor scatter ${SCATTER ? "±0.5 K on temperatures, ±1 % on pressures" : "none"}; true deviation ${DEVIATIONS[0]! * 100} % to +${DEVIATIONS.at(-1)! * 100} %; outdoor ${OUTDOOR_C.join("/")} °C; return air ${RETURN_AIR.map(([dry]) => dry).join("/")} °C`,
);
console.log(
  "MAE, bias (mean signed error) and width in % of the correct charge, over the cases with an estimate; ≤10 %: share within 10 % of the charge\n",
);
for (const basis of ["unit-reference", "generic"] as const) {
  console.log(
    `${basis === "unit-reference" ? "With the circuit's own reference point" : "Generic (targets and default coefficients)"}`,
  );
  console.log(header);
  for (const refrigerant of REFRIGERANTS)
    for (const device of DEVICES)
      console.log(row(`${refrigerant} · ${device}`, tally(`${refrigerant}|${device}|${basis}`)));
  for (const device of DEVICES) console.log(row(`all · ${device}`, tally(`all|${device}|${basis}`)));
  console.log(row("all", tally(`all|all|${basis}`)));
  console.log("");
}
console.log("By true deviation (valve: TXV and EEV; fixed: fixed orifice)");
console.log(header);
for (const basis of ["unit-reference", "generic"] as const)
  for (const family of ["valve", "fixed"])
    for (const deviation of DEVIATIONS) {
      const entry = tally(`deviation ${deviation}|${family}|${basis}`);
      console.log(row(`${basis} · ${family} · ${deviation >= 0 ? "+" : ""}${Math.round(deviation * 100)} %`, entry));
    }
const unsolved = tally("all|all|generic").unsolved;
console.log(`\nCharge levels outside the model (no operating point): ${unsolved}`);
console.log("No estimate, by reason:");
for (const [note, count] of [...notes].sort((first, second) => second[1] - first[1]))
  console.log(`  ${String(count).padStart(5)}  ${note}`);
if (DUMP) {
  writeFileSync(DUMP, `${dumped.join("\n")}\n`);
  console.log(`\nEvery estimate written to ${DUMP}`);
}

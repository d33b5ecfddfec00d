/**
 * Generates the worked diagnosis cases in tests/fixtures/diagnosis-cases/cases.json.
 *
 * Each case is written here by its intent — the evaporating dew point, the condensing bubble
 * point, the superheat and subcooling the technician would see — and this script derives the
 * gauge pressures from the property engine (`saturationPressure`, `absoluteToGauge`) so every
 * case is physically consistent. Numbers are rounded (0.1 kPa, 0.1 °C) and stored, so tests
 * never depend on this script; re-run it only to add or change cases:
 *
 *   npx tsx scripts/build-diagnosis-cases.ts
 *
 * All readings are invented. Standard comfort conditions used below: return air 26.7 °C dry
 * bulb / 19.4 °C wet bulb (80/67 °F, the AHRI rating point, memory), outdoor 35 °C.
 */
import { writeFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { absoluteToGauge, saturationPressure } from "../shared/engine/index.ts";
import type { ChargeState, DiagnosisInput, WarningCode } from "../shared/schemas/diagnosis.ts";
import {
  DIAGNOSIS_CASE_FORMAT,
  DIAGNOSIS_CASE_FORMAT_VERSION,
  DiagnosisCaseFileSchema,
  type DiagnosisCase,
} from "../tests/fixtures/diagnosis-cases/diagnosis-case-schema.ts";
import { loadAllRefrigerants } from "../shared/engine/index.ts";

// Every saturation table, before anything looks one up (tables load per refrigerant).
await loadAllRefrigerants();

interface CaseSpec {
  id: string;
  title: string;
  refrigerant: string;
  meteringDevice: DiagnosisInput["meteringDevice"];
  /** Intended dew point at the suction pressure, °C (null: `suctionPressureKPa` given in `readings`). */
  evaporatingDewC: number | null;
  /** Intended bubble point at the liquid pressure, °C (null: `liquidPressureKPa` given in `readings`). */
  condensingBubbleC: number | null;
  superheatK: number;
  subcoolingK: number;
  /** Discharge pressure = liquid pressure + this, kPa (condenser pressure drop). */
  dischargeAboveLiquidKPa?: number;
  /** Other readings; may override the derived line temperatures. */
  readings?: Partial<DiagnosisInput>;
  expected: {
    chargeState: ChargeState;
    warnings?: WarningCode[];
    superheatK?: number | null;
    subcoolingK?: number | null;
    targetSuperheatK?: number | null;
  };
  why: string;
  sources: string[];
}

/** Comfort-cooling air readings at the standard condition, with a normal 11 K split. */
const COMFORT = { returnAirDryBulbC: 26.7, returnAirWetBulbC: 19.4, supplyAirDryBulbC: 15.7, outdoorAirDryBulbC: 35 } as const;
/** Fixed-orifice target at COMFORT: 1.5 × 19.4 − 0.5 × 35 − 40/9 = 7.16 K (TRADE.md §1.4). */
const COMFORT_TARGET_SH = 1.5 * 19.4 - 0.5 * 35 - 40 / 9;

const SPECS: CaseSpec[] = [
  // ---------------------------------------------------------------- normal
  { id: "normal-r410a-txv", title: "Ducted split on R410A, TXV, everything on target", refrigerant: "R410A", meteringDevice: "txv",
    evaporatingDewC: 7, condensingBubbleC: 46, superheatK: 5, subcoolingK: 6,
    readings: { ...COMFORT, dischargeLineTempC: 74, compressorAmps: 14, compressorRla: 18, targetSubcoolingK: 6, runMinutes: 20 },
    expected: { chargeState: "normal" },
    why: "Subcooling matches the nameplate 6 K, superheat sits in the valve's band, condensing is 11 K over ambient and the air split is 11 K.", sources: ["S9", "S26", "S33"] },
  { id: "normal-r32-eev", title: "Wall split on R32, EEV, in test mode", refrigerant: "R32", meteringDevice: "eev",
    evaporatingDewC: 8, condensingBubbleC: 45, superheatK: 5, subcoolingK: 5,
    readings: { returnAirDryBulbC: 26, returnAirWetBulbC: 19, supplyAirDryBulbC: 15, outdoorAirDryBulbC: 34, targetSubcoolingK: 5, runMinutes: 25 },
    expected: { chargeState: "normal" },
    why: "Subcooling is on the maker's 5 K target and superheat is in band; head pressure is 11 K over ambient.", sources: ["S9", "S26"] },
  { id: "normal-r22-fixed-orifice", title: "Older R22 package unit with a piston, on its superheat target", refrigerant: "R22", meteringDevice: "fixed-orifice",
    evaporatingDewC: 7, condensingBubbleC: 46, superheatK: 7.2, subcoolingK: 6,
    readings: { ...COMFORT, runMinutes: 20 },
    expected: { chargeState: "normal", targetSuperheatK: COMFORT_TARGET_SH },
    why: "At 19.4 °C wet bulb and 35 °C outdoor the piston target is 7.2 K and the measured superheat is 7.2 K.", sources: ["S10", "S17"] },
  { id: "normal-r407c-txv-glide", title: "Rooftop circuit on R407C: dew point for superheat, bubble point for subcooling", refrigerant: "R407C", meteringDevice: "txv",
    evaporatingDewC: 7, condensingBubbleC: 45, superheatK: 5, subcoolingK: 5,
    readings: { returnAirDryBulbC: 26, supplyAirDryBulbC: 15, outdoorAirDryBulbC: 33, targetSubcoolingK: 5, runMinutes: 30 },
    expected: { chargeState: "normal" },
    why: "With about 5 K of glide the right saturation points give 5 K superheat and 5 K subcooling, both on target; a mid-point would be off by half the glide.", sources: ["S1", "S2"] },
  { id: "normal-r404a-cool-room-txv", title: "Cool room on R404A, TXV", refrigerant: "R404A", meteringDevice: "txv",
    evaporatingDewC: -8, condensingBubbleC: 40, superheatK: 5, subcoolingK: 5,
    readings: { application: "medium-temperature-refrigeration", returnAirDryBulbC: 2, outdoorAirDryBulbC: 28, runMinutes: 30 },
    expected: { chargeState: "normal" },
    why: "Superheat 5 K and subcooling 5 K sit in the common bands; condensing 12 K over ambient is right for an air-cooled condenser.", sources: ["S15", "S14", "S26"] },
  { id: "normal-r134a-chiller-txv", title: "Small R134a chiller, TXV", refrigerant: "R134a", meteringDevice: "txv",
    evaporatingDewC: 4, condensingBubbleC: 42, superheatK: 5, subcoolingK: 5,
    readings: { application: "process-chilling", outdoorAirDryBulbC: 30, runMinutes: 40 },
    expected: { chargeState: "normal" },
    why: "Superheat and subcooling both sit in their common-practice bands and head pressure is 12 K over ambient.", sources: ["S15", "S14", "S26"] },
  { id: "normal-r290-capillary", title: "Portable unit on R290 with a capillary, on target", refrigerant: "R290", meteringDevice: "capillary",
    evaporatingDewC: 8, condensingBubbleC: 47, superheatK: 6.6, subcoolingK: 5,
    readings: { returnAirDryBulbC: 25, returnAirWetBulbC: 18, supplyAirDryBulbC: 14, outdoorAirDryBulbC: 32 },
    expected: { chargeState: "normal", targetSuperheatK: 1.5 * 18 - 0.5 * 32 - 40 / 9 },
    why: "The capillary target at 18 °C wet bulb and 32 °C outdoor is 6.6 K and the superheat matches.", sources: ["S10", "S17"] },
  { id: "normal-r507a-freezer-txv", title: "Freezer room on R507A, TXV", refrigerant: "R507A", meteringDevice: "txv",
    evaporatingDewC: -28, condensingBubbleC: 38, superheatK: 5, subcoolingK: 5,
    readings: { application: "low-temperature-refrigeration", returnAirDryBulbC: -20, outdoorAirDryBulbC: 27, runMinutes: 45 },
    expected: { chargeState: "normal" },
    why: "An azeotrope with one saturation temperature per pressure; superheat 5 K and subcooling 5 K are in band and condensing is 11 K over ambient.", sources: ["S2", "S15", "S26"] },
  { id: "normal-r717-txv", title: "Ammonia process chiller, TXV", refrigerant: "R717", meteringDevice: "txv",
    evaporatingDewC: -10, condensingBubbleC: 35, superheatK: 5, subcoolingK: 4.5,
    readings: { application: "process-chilling", outdoorAirDryBulbC: 24, runMinutes: 60 },
    expected: { chargeState: "normal" },
    why: "Superheat and subcooling are in band and condensing sits 11 K over ambient.", sources: ["S15", "S14", "S26"] },
  { id: "normal-r1234yf-txv", title: "Packaged unit on R1234yf, TXV", refrigerant: "R1234yf", meteringDevice: "txv",
    evaporatingDewC: 6, condensingBubbleC: 45, superheatK: 5, subcoolingK: 6,
    readings: { returnAirDryBulbC: 26, supplyAirDryBulbC: 15, outdoorAirDryBulbC: 34, runMinutes: 20 },
    expected: { chargeState: "normal" },
    why: "Superheat, subcooling, condensing over ambient and the air split are all in their bands.", sources: ["S15", "S14", "S26", "S33"] },
  { id: "normal-r744-cascade-txv", title: "Subcritical CO2 low stage of a cascade, TXV", refrigerant: "R744", meteringDevice: "txv",
    evaporatingDewC: -35, condensingBubbleC: -5, superheatK: 5, subcoolingK: 4, readings: { targetSubcoolingK: 4, runMinutes: 30 },
    expected: { chargeState: "normal" },
    why: "Condensing at -5 °C in the cascade heat exchanger, subcooling is on its 4 K target and superheat in band.", sources: ["S15", "S9"] },

  // ---------------------------------------------------------------- undercharged
  { id: "undercharged-r410a-txv", title: "R410A TXV split losing charge", refrigerant: "R410A", meteringDevice: "txv",
    evaporatingDewC: 3, condensingBubbleC: 40, superheatK: 14, subcoolingK: 1,
    readings: { ...COMFORT, supplyAirDryBulbC: 19.7, compressorAmps: 10, compressorRla: 18, targetSubcoolingK: 6, runMinutes: 20 },
    expected: { chargeState: "undercharged" },
    why: "Subcooling 1 K against a 6 K target carries the signal on a TXV; high superheat says the valve is wide open, and low head with a small split agree.", sources: ["S21", "S22", "S24"] },
  { id: "undercharged-r22-fixed-orifice", title: "R22 piston unit short of charge", refrigerant: "R22", meteringDevice: "fixed-orifice",
    evaporatingDewC: 2, condensingBubbleC: 41, superheatK: 20, subcoolingK: 2,
    readings: { ...COMFORT, supplyAirDryBulbC: 19.2, runMinutes: 20 },
    expected: { chargeState: "undercharged", targetSuperheatK: COMFORT_TARGET_SH },
    why: "Superheat 20 K is far above the 7.2 K piston target and subcooling is low: the starved-evaporator pattern of undercharge, not a restriction.", sources: ["S10", "S21", "S24"] },
  { id: "undercharged-r407c-fixed-orifice-humidity", title: "R407C piston unit short of charge, wet bulb from humidity", refrigerant: "R407C", meteringDevice: "fixed-orifice",
    evaporatingDewC: 3, condensingBubbleC: 42, superheatK: 18, subcoolingK: 1.5,
    readings: { returnAirDryBulbC: 26.7, returnAirRelativeHumidity: 50, supplyAirDryBulbC: 19, outdoorAirDryBulbC: 35, runMinutes: 20 },
    expected: { chargeState: "undercharged", targetSuperheatK: 1.5 * 19.287 - 0.5 * 35 - 40 / 9 },
    why: "50 % RH at 26.7 °C gives a 19.3 °C wet bulb and a 7.0 K target; 18 K superheat with 1.5 K subcooling is a shortage of charge.", sources: ["S10", "S21", "S24"] },
  { id: "undercharged-r32-capillary", title: "R32 capillary unit short of charge", refrigerant: "R32", meteringDevice: "capillary",
    evaporatingDewC: 4, condensingBubbleC: 42, superheatK: 16, subcoolingK: 1.5,
    readings: { returnAirDryBulbC: 27, returnAirWetBulbC: 19, supplyAirDryBulbC: 19, outdoorAirDryBulbC: 33 },
    expected: { chargeState: "undercharged", targetSuperheatK: 1.5 * 19 - 0.5 * 33 - 40 / 9 },
    why: "The capillary target is 7.6 K; superheat twice that with almost no subcooling is undercharge.", sources: ["S10", "S21", "S24"] },
  { id: "undercharged-r134a-txv", title: "R134a chiller with a leak", refrigerant: "R134a", meteringDevice: "txv",
    evaporatingDewC: 0, condensingBubbleC: 36, superheatK: 12, subcoolingK: 0.5,
    readings: { application: "process-chilling", outdoorAirDryBulbC: 30, runMinutes: 30 },
    expected: { chargeState: "undercharged" },
    why: "Subcooling under 2.8 K suggests undercharge on a TXV; high superheat and condensing only 6 K over ambient agree.", sources: ["S14", "S21", "S26"] },
  { id: "undercharged-r404a-txv", title: "R404A cool room short of charge", refrigerant: "R404A", meteringDevice: "txv",
    evaporatingDewC: -14, condensingBubbleC: 34, superheatK: 11, subcoolingK: 0.5,
    readings: { application: "medium-temperature-refrigeration", returnAirDryBulbC: 3, outdoorAirDryBulbC: 28, runMinutes: 30 },
    expected: { chargeState: "undercharged" },
    why: "No subcooling to speak of, high superheat and low head pressure: the TXV is starving for liquid.", sources: ["S14", "S21", "S22"] },
  { id: "undercharged-r410a-txv-short-run-hot-discharge", title: "R410A TXV short of charge, read too early, hot discharge", refrigerant: "R410A", meteringDevice: "txv",
    evaporatingDewC: 2, condensingBubbleC: 41, superheatK: 18, subcoolingK: 1,
    readings: { ...COMFORT, supplyAirDryBulbC: 20, dischargeLineTempC: 112, targetSubcoolingK: 6, runMinutes: 5 },
    expected: { chargeState: "undercharged", warnings: ["short-run-time", "discharge-temperature-high"] },
    why: "The pattern is undercharge, but after 5 minutes readings have not settled, and a 112 °C discharge line is above the 107 °C limit.", sources: ["S10", "S13", "S37", "S22"] },

  // ---------------------------------------------------------------- overcharged
  { id: "overcharged-r410a-txv", title: "R410A TXV split overcharged after a top-up", refrigerant: "R410A", meteringDevice: "txv",
    evaporatingDewC: 9, condensingBubbleC: 54, superheatK: 5, subcoolingK: 13,
    readings: { ...COMFORT, supplyAirDryBulbC: 16.7, compressorAmps: 19.5, compressorRla: 18, targetSubcoolingK: 6, runMinutes: 20 },
    expected: { chargeState: "overcharged" },
    why: "Subcooling 13 K against a 6 K target with high head and amps above RLA; the TXV holds superheat, so subcooling shows the surplus.", sources: ["S21", "S23", "S39"] },
  { id: "overcharged-r22-fixed-orifice", title: "R22 piston unit overcharged, floodback risk", refrigerant: "R22", meteringDevice: "fixed-orifice",
    evaporatingDewC: 10, condensingBubbleC: 53, superheatK: 2, subcoolingK: 12,
    readings: { ...COMFORT, supplyAirDryBulbC: 16.2, runMinutes: 20 },
    expected: { chargeState: "overcharged", warnings: ["low-superheat-floodback"], targetSuperheatK: COMFORT_TARGET_SH },
    why: "Superheat 2 K against a 7.2 K target with 12 K subcooling and high head: too much refrigerant, and liquid may reach the compressor.", sources: ["S10", "S17", "S21", "S23"] },
  { id: "overcharged-r32-eev", title: "R32 EEV split overcharged", refrigerant: "R32", meteringDevice: "eev",
    evaporatingDewC: 9, condensingBubbleC: 52, superheatK: 4, subcoolingK: 12,
    readings: { returnAirDryBulbC: 26, supplyAirDryBulbC: 15.5, outdoorAirDryBulbC: 34, targetSubcoolingK: 5, runMinutes: 25 },
    expected: { chargeState: "overcharged" },
    why: "Subcooling 12 K against a 5 K target and condensing 18 K over ambient.", sources: ["S21", "S23", "S26"] },
  { id: "overcharged-r290-capillary", title: "R290 capillary unit overcharged", refrigerant: "R290", meteringDevice: "capillary",
    evaporatingDewC: 10, condensingBubbleC: 50, superheatK: 2.5, subcoolingK: 13,
    readings: { returnAirDryBulbC: 25, returnAirWetBulbC: 18, supplyAirDryBulbC: 14.5, outdoorAirDryBulbC: 32 },
    expected: { chargeState: "overcharged", warnings: ["low-superheat-floodback"] },
    why: "Superheat well under the 6.6 K capillary target with high subcooling and head, and the liquid leaves only 5 K above the outdoor air: a condenser stacked with liquid.", sources: ["S10", "S21", "S23"] },
  { id: "overcharged-r407c-txv", title: "R407C rooftop circuit overcharged", refrigerant: "R407C", meteringDevice: "txv",
    evaporatingDewC: 8, condensingBubbleC: 48, superheatK: 5, subcoolingK: 12,
    readings: { returnAirDryBulbC: 26, supplyAirDryBulbC: 15.5, outdoorAirDryBulbC: 33, targetSubcoolingK: 5, runMinutes: 30 },
    expected: { chargeState: "overcharged" },
    why: "Subcooling from the bubble point is 12 K against a 5 K target and the liquid leaves only 3 K above the outdoor air: the condenser is stacked with liquid; head is high and superheat held by the valve.", sources: ["S21", "S23"] },

  // ---------------------------------------------------------------- restricted metering / liquid line
  { id: "restricted-r410a-txv", title: "R410A TXV split with a blocked filter drier", refrigerant: "R410A", meteringDevice: "txv",
    evaporatingDewC: -1, condensingBubbleC: 45, superheatK: 16, subcoolingK: 11,
    readings: { ...COMFORT, supplyAirDryBulbC: 20.7, dischargeLineTempC: 98, compressorAmps: 12, compressorRla: 18, targetSubcoolingK: 6, runMinutes: 20 },
    expected: { chargeState: "restricted-metering" },
    why: "High superheat with high subcooling: liquid is backing up in the condenser but not getting through to the evaporator.", sources: ["S21", "S24", "S25"] },
  { id: "restricted-r22-fixed-orifice", title: "R22 piston partly blocked", refrigerant: "R22", meteringDevice: "fixed-orifice",
    evaporatingDewC: 0, condensingBubbleC: 44, superheatK: 22, subcoolingK: 10,
    readings: { ...COMFORT, supplyAirDryBulbC: 19.7, runMinutes: 20 },
    expected: { chargeState: "restricted-metering" },
    why: "Superheat far above target like an undercharge, but subcooling is high, not low: the restriction signature.", sources: ["S21", "S24", "S25"] },
  { id: "restricted-r134a-txv", title: "R134a TXV with a failing power head", refrigerant: "R134a", meteringDevice: "txv",
    evaporatingDewC: -4, condensingBubbleC: 40, superheatK: 14, subcoolingK: 10,
    readings: { application: "process-chilling", outdoorAirDryBulbC: 30, runMinutes: 30 },
    expected: { chargeState: "restricted-metering" },
    why: "The valve is not feeding: superheat 14 K with subcooling above the band.", sources: ["S21", "S24"] },
  { id: "restricted-r404a-txv-liquid-cold", title: "R404A cool room with a kinked liquid line before the probe", refrigerant: "R404A", meteringDevice: "txv",
    evaporatingDewC: -20, condensingBubbleC: 38, superheatK: 15, subcoolingK: 10,
    readings: { application: "medium-temperature-refrigeration", returnAirDryBulbC: 2, outdoorAirDryBulbC: 30, runMinutes: 30 },
    expected: { chargeState: "restricted-metering", warnings: ["liquid-colder-than-outdoor-air"] },
    why: "High superheat with high subcooling, and the liquid line is colder than the air cooling the condenser — only a pressure drop upstream of the probe does that.", sources: ["S21", "S24", "S26", "S34"] },
  { id: "restricted-r1234yf-capillary", title: "R1234yf capillary partly blocked", refrigerant: "R1234yf", meteringDevice: "capillary",
    evaporatingDewC: 0, condensingBubbleC: 44, superheatK: 18, subcoolingK: 9,
    readings: { returnAirDryBulbC: 27, returnAirWetBulbC: 19, supplyAirDryBulbC: 20, outdoorAirDryBulbC: 33 },
    expected: { chargeState: "restricted-metering" },
    why: "Superheat 18 K against a 7.6 K target while subcooling is high: the capillary is restricting flow.", sources: ["S21", "S24"] },

  // ---------------------------------------------------------------- low evaporator airflow
  { id: "low-airflow-r410a-fixed-orifice", title: "R410A piston unit with a clogged filter", refrigerant: "R410A", meteringDevice: "fixed-orifice",
    evaporatingDewC: 1, condensingBubbleC: 44, superheatK: 2, subcoolingK: 7,
    readings: { ...COMFORT, supplyAirDryBulbC: 10.7, runMinutes: 20 },
    expected: { chargeState: "low-evaporator-airflow", warnings: ["low-superheat-floodback"] },
    why: "Low superheat with normal subcooling and a 16 K air split: the coil is not getting the air to boil off its liquid.", sources: ["S21", "S33"] },
  { id: "low-airflow-r22-txv", title: "R22 TXV unit with a slipping blower belt", refrigerant: "R22", meteringDevice: "txv",
    evaporatingDewC: 0, condensingBubbleC: 44, superheatK: 2, subcoolingK: 6,
    readings: { returnAirDryBulbC: 26.7, supplyAirDryBulbC: 9.7, outdoorAirDryBulbC: 35, runMinutes: 20 },
    expected: { chargeState: "low-evaporator-airflow", warnings: ["low-superheat-floodback"] },
    why: "Subcooling is normal, so the charge is right; a 17 K split, low suction for the load and low superheat point at the air side.", sources: ["S21", "S33"] },
  { id: "low-airflow-r32-eev", title: "R32 EEV ducted unit with a dirty evaporator coil", refrigerant: "R32", meteringDevice: "eev",
    evaporatingDewC: 2, condensingBubbleC: 45, superheatK: 2.4, subcoolingK: 6,
    readings: { returnAirDryBulbC: 26, supplyAirDryBulbC: 9, outdoorAirDryBulbC: 35, targetSubcoolingK: 6, runMinutes: 20 },
    expected: { chargeState: "low-evaporator-airflow", warnings: ["low-superheat-floodback"] },
    why: "Subcooling on target, superheat low, a 17 K air split and a 24 K coil TD: too little air.", sources: ["S21", "S33"] },

  // ---------------------------------------------------------------- condenser airflow
  { id: "condenser-airflow-r410a-txv", title: "R410A TXV unit with a blocked condenser coil", refrigerant: "R410A", meteringDevice: "txv",
    evaporatingDewC: 9, condensingBubbleC: 58, superheatK: 6, subcoolingK: 3,
    readings: { ...COMFORT, supplyAirDryBulbC: 16.2, dischargeLineTempC: 100, compressorAmps: 20, compressorRla: 18, targetSubcoolingK: 6, runMinutes: 20 },
    expected: { chargeState: "condenser-airflow" },
    why: "Condensing 23 K over ambient with low subcooling: the condenser cannot reject heat, and amps are above RLA.", sources: ["S21", "S26", "S39"] },
  { id: "condenser-airflow-r22-fixed-orifice", title: "R22 piston unit with a dead condenser fan", refrigerant: "R22", meteringDevice: "fixed-orifice",
    evaporatingDewC: 10, condensingBubbleC: 57, superheatK: 5, subcoolingK: 2.5,
    readings: { ...COMFORT, supplyAirDryBulbC: 16.7, compressorAmps: 20.7, compressorRla: 18, runMinutes: 20 },
    expected: { chargeState: "condenser-airflow" },
    why: "Superheat is within the piston tolerance but head pressure is 22 K over ambient with low subcooling and high amps.", sources: ["S21", "S26"] },
  { id: "condenser-airflow-r404a-txv", title: "R404A cool room condenser choked with leaves", refrigerant: "R404A", meteringDevice: "txv",
    evaporatingDewC: -8, condensingBubbleC: 52, superheatK: 5, subcoolingK: 2,
    readings: { application: "medium-temperature-refrigeration", returnAirDryBulbC: 2, outdoorAirDryBulbC: 30, dischargeLineTempC: 105, runMinutes: 30 },
    expected: { chargeState: "condenser-airflow" },
    why: "Condensing 22 K over ambient with subcooling below the band: poor condenser airflow.", sources: ["S21", "S26"] },

  // A high head with NORMAL subcooling and the liquid leaving far above the outdoor air is a
  // condenser that cannot reject heat — not air in the circuit, which makes the computed
  // subcooling read high (TRADE.md §2 [S21][S26][S27]).
  { id: "condenser-airflow-r134a-txv-normal-subcooling", title: "R134a chiller whose condenser coil is matted with dust", refrigerant: "R134a", meteringDevice: "txv",
    evaporatingDewC: 6, condensingBubbleC: 55, superheatK: 5, subcoolingK: 6,
    readings: { application: "process-chilling", outdoorAirDryBulbC: 33, dischargeLineTempC: 96, runMinutes: 30 },
    expected: { chargeState: "condenser-airflow" },
    why: "Condensing 22 K over ambient with normal subcooling: the liquid leaves 16 K above the outdoor air, so the condenser is not rejecting its heat. Air in the circuit would have made the subcooling read high.", sources: ["S21", "S26", "S27"] },
  { id: "condenser-airflow-r410a-txv-normal-subcooling", title: "R410A split whose condenser blows back into itself", refrigerant: "R410A", meteringDevice: "txv",
    evaporatingDewC: 8, condensingBubbleC: 57, superheatK: 5, subcoolingK: 6,
    readings: { ...COMFORT, dischargeLineTempC: 99, compressorAmps: 19.8, compressorRla: 18, targetSubcoolingK: 6, runMinutes: 20 },
    expected: { chargeState: "condenser-airflow" },
    why: "Subcooling on target with condensing 22 K over ambient, the liquid 16 K above the outdoor air and amps above RLA: the condenser cannot reject heat (dirty coil, slow fan, hot air recirculating).", sources: ["S21", "S26", "S39"] },
  { id: "condenser-airflow-r32-fixed-orifice-slow-fan", title: "R32 piston unit with a slow condenser fan", refrigerant: "R32", meteringDevice: "fixed-orifice",
    evaporatingDewC: 8, condensingBubbleC: 55, superheatK: 7, subcoolingK: 6.5,
    readings: { returnAirDryBulbC: 26.7, returnAirWetBulbC: 19.4, supplyAirDryBulbC: 15.7, outdoorAirDryBulbC: 33, dischargeLineTempC: 100, runMinutes: 20 },
    expected: { chargeState: "condenser-airflow" },
    why: "Superheat on its 8.2 K target and normal subcooling, but condensing 22 K over ambient and the liquid 15.5 K above the outdoor air: poor condenser airflow.", sources: ["S21", "S26"] },

  // ---------------------------------------------------------------- non-condensables
  // Air adds its partial pressure: the gauge (and so the computed condensing temperature and
  // subcooling) reads high while the liquid itself leaves about as far above the outdoor air as
  // usual. Confirm with a standing-pressure check [S27][S28][S31].
  { id: "non-condensables-r134a-txv", title: "R134a chiller after a poor evacuation", refrigerant: "R134a", meteringDevice: "txv",
    evaporatingDewC: 6, condensingBubbleC: 55, superheatK: 5, subcoolingK: 12,
    readings: { application: "process-chilling", outdoorAirDryBulbC: 33, dischargeLineTempC: 96, runMinutes: 30 },
    expected: { chargeState: "non-condensables" },
    why: "Head 22 K over ambient and subcooling 12 K, yet the liquid still leaves 10 K above the outdoor air: the high subcooling is the gauge reading air's pressure, not a condenser full of liquid.", sources: ["S27", "S28", "S26"] },
  { id: "non-condensables-r410a-txv", title: "R410A split charged without evacuating the line set", refrigerant: "R410A", meteringDevice: "txv",
    evaporatingDewC: 8, condensingBubbleC: 56, superheatK: 5, subcoolingK: 11,
    readings: { ...COMFORT, dischargeLineTempC: 99, compressorAmps: 19.8, compressorRla: 18, targetSubcoolingK: 6, runMinutes: 20 },
    expected: { chargeState: "non-condensables" },
    why: "Subcooling 11 K against a 6 K target with condensing 21 K over ambient, but the liquid leaves 10 K above the outdoor air (an overcharge stacks liquid and brings it close to ambient): air in the circuit.", sources: ["S27", "S28", "S39"] },
  { id: "non-condensables-r32-fixed-orifice", title: "R32 piston unit with nitrogen left in", refrigerant: "R32", meteringDevice: "fixed-orifice",
    evaporatingDewC: 8, condensingBubbleC: 55, superheatK: 8, subcoolingK: 12,
    readings: { returnAirDryBulbC: 26.7, returnAirWetBulbC: 19.4, supplyAirDryBulbC: 15.7, outdoorAirDryBulbC: 33, dischargeLineTempC: 100, runMinutes: 20 },
    expected: { chargeState: "non-condensables" },
    why: "Superheat on its 8.2 K target (an overcharge would flood the piston), head 22 K over ambient and subcooling 12 K with the liquid 10 K above the outdoor air: non-condensables.", sources: ["S27", "S28"] },

  // ---------------------------------------------------------------- weak compressor
  { id: "weak-compressor-r22-txv", title: "R22 TXV unit with leaking compressor valves", refrigerant: "R22", meteringDevice: "txv",
    evaporatingDewC: 15, condensingBubbleC: 40, superheatK: 3.5, subcoolingK: 9,
    readings: { returnAirDryBulbC: 26.7, supplyAirDryBulbC: 20.7, outdoorAirDryBulbC: 35, compressorAmps: 7, compressorRla: 18, targetSubcoolingK: 6, runMinutes: 20 },
    expected: { chargeState: "weak-compressor" },
    why: "High suction with low head (condensing only 5 K over ambient), low amps and a small split: the compressor cannot pull its pressure difference.", sources: ["S21", "S29", "S122"] },
  { id: "weak-compressor-r410a-fixed-orifice", title: "R410A piston unit with a worn scroll", refrigerant: "R410A", meteringDevice: "fixed-orifice",
    evaporatingDewC: 14, condensingBubbleC: 41, superheatK: 3, subcoolingK: 8,
    readings: { ...COMFORT, supplyAirDryBulbC: 20.7, compressorAmps: 8, compressorRla: 18, runMinutes: 20 },
    expected: { chargeState: "weak-compressor" },
    why: "Low head with high suction and a compression ratio near 2:1; superheat below target and subcooling high fit a compressor that is not pumping.", sources: ["S21", "S29", "S38", "S122"] },
  { id: "weak-compressor-r407c-txv", title: "R407C rooftop circuit with a failing compressor", refrigerant: "R407C", meteringDevice: "txv",
    evaporatingDewC: 17, condensingBubbleC: 37, superheatK: 4, subcoolingK: 3.5, dischargeAboveLiquidKPa: 30,
    readings: { returnAirDryBulbC: 26, supplyAirDryBulbC: 20, outdoorAirDryBulbC: 33, compressorAmps: 8, compressorRla: 17, targetSubcoolingK: 5, runMinutes: 30 },
    expected: { chargeState: "weak-compressor" },
    why: "The coil runs only about 11 K below the return air (suction high for the load), condensing is about 6 K over ambient (head low), amps are half of RLA and the split is small: the compressor no longer pumps. A shortage would pull the suction down instead.", sources: ["S21", "S29", "S122"] },

  // ---------------------------------------------------------------- metering device overfeeding
  // Superheat near zero with normal subcooling and normal head: the valve (or an oversized
  // orifice) floods the coil. An overcharge would raise subcooling and head; poor airflow would
  // pull the suction down and widen the split. Danger first: never "normal".
  { id: "overfeeding-r410a-txv-loose-bulb", title: "R410A TXV with its bulb hanging off the suction line", refrigerant: "R410A", meteringDevice: "txv",
    evaporatingDewC: 8, condensingBubbleC: 46, superheatK: 0.4, subcoolingK: 6,
    readings: { ...COMFORT, suctionTempLocation: "evaporator-outlet", dischargeLineTempC: 58, targetSubcoolingK: 6, runMinutes: 20 },
    expected: { chargeState: "overfeeding-metering", warnings: ["low-superheat-floodback", "low-discharge-superheat"] },
    why: "Superheat 0.4 K at the evaporator outlet with subcooling on target, head 12 K over ambient and a normal split: the valve is overfeeding. Liquid is reaching the compressor (discharge only 10 K above its dew point).", sources: ["S17", "S21"] },
  { id: "overfeeding-r407c-txv-inside-glide", title: "R407C rooftop circuit: suction line inside the glide", refrigerant: "R407C", meteringDevice: "txv",
    evaporatingDewC: 7, condensingBubbleC: 45, superheatK: -3, subcoolingK: 5,
    readings: { returnAirDryBulbC: 26, supplyAirDryBulbC: 15.5, outdoorAirDryBulbC: 33, targetSubcoolingK: 5, runMinutes: 30 },
    expected: { chargeState: "overfeeding-metering", warnings: ["suction-inside-glide"] },
    why: "The suction line sits between the bubble and dew points, so the blend is still boiling there: liquid leaves the coil while subcooling and head are normal. Not normal, whatever else reads right.", sources: ["S1", "S2", "S17"] },
  { id: "overfeeding-r22-fixed-orifice-oversized", title: "R22 package unit with the wrong (oversized) piston fitted", refrigerant: "R22", meteringDevice: "fixed-orifice",
    evaporatingDewC: 8, condensingBubbleC: 47, superheatK: 1, subcoolingK: 6,
    readings: { ...COMFORT, supplyAirDryBulbC: 16.2, runMinutes: 20 },
    expected: { chargeState: "overfeeding-metering", warnings: ["low-superheat-floodback"], targetSuperheatK: COMFORT_TARGET_SH },
    why: "Superheat 1 K against a 7.2 K piston target, but subcooling and head are normal: not an overcharge (which stacks liquid in the condenser) but a piston passing too much.", sources: ["S10", "S17", "S21"] },

  // ---------------------------------------------------------------- refrigeration judged as refrigeration
  { id: "low-airflow-r404a-cool-room-iced-coil", title: "Cool room at 3 °C with an iced evaporator", refrigerant: "R404A", meteringDevice: "txv",
    evaporatingDewC: -17, condensingBubbleC: 40, superheatK: 5, subcoolingK: 5,
    readings: { application: "medium-temperature-refrigeration", returnAirDryBulbC: 3, supplyAirDryBulbC: -3, outdoorAirDryBulbC: 27, runMinutes: 40 },
    expected: { chargeState: "low-evaporator-airflow" },
    why: "The coil runs about 20 K below a 3 °C room where 4–10 K is right: ice or a failed fan starves it of air (comfort-cooling bands would have passed it).", sources: ["S15", "S21"] },
  { id: "low-airflow-r404a-cool-room-no-application", title: "Cool room with no application recorded: judged as refrigeration from its room air", refrigerant: "R404A", meteringDevice: "txv",
    evaporatingDewC: -16, condensingBubbleC: 40, superheatK: 5, subcoolingK: 5,
    readings: { returnAirDryBulbC: 2, supplyAirDryBulbC: -3, outdoorAirDryBulbC: 27, runMinutes: 40 },
    expected: { chargeState: "low-evaporator-airflow", warnings: ["application-assumed"] },
    why: "Room air at 2 °C says this is a cool room; its coil 19 K below the room is starved of air, and the engine says which bands it assumed.", sources: ["S15", "S21"] },
  { id: "normal-r404a-freezer-hot-discharge-ok", title: "Freezer room on R404A: a 98 °C discharge line is normal here", refrigerant: "R404A", meteringDevice: "txv",
    evaporatingDewC: -27, condensingBubbleC: 40, superheatK: 3, subcoolingK: 4.5,
    readings: { application: "low-temperature-refrigeration", returnAirDryBulbC: -20, supplyAirDryBulbC: -23, outdoorAirDryBulbC: 27, dischargeLineTempC: 98, runMinutes: 60 },
    expected: { chargeState: "normal" },
    why: "A single-stage freezer runs a high compression ratio; 98 °C is under its 100 °C elevated value and the 107 °C limit, and superheat 3 K is what a freezer valve holds.", sources: ["S13", "S15"] },
  { id: "normal-r410a-heat-pump-cooling", title: "R410A heat pump checked in cooling mode", refrigerant: "R410A", meteringDevice: "txv",
    evaporatingDewC: 7, condensingBubbleC: 46, superheatK: 5, subcoolingK: 6,
    readings: { ...COMFORT, application: "heat-pump", targetSubcoolingK: 6, runMinutes: 20 },
    expected: { chargeState: "normal" },
    why: "In cooling mode a heat pump reads like an air conditioner: subcooling on target, superheat, head and split in band.", sources: ["S9", "S26", "S33"] },

  // ---------------------------------------------------------------- the evidence agrees with the headline
  { id: "undercharged-r407c-txv-subcooling-below-target", title: "R407C TXV: high superheat with subcooling just under its band", refrigerant: "R407C", meteringDevice: "txv",
    evaporatingDewC: 4, condensingBubbleC: 44, superheatK: 11.9, subcoolingK: 3.2,
    readings: { targetSubcoolingK: 5, runMinutes: 30 },
    expected: { chargeState: "undercharged" },
    why: "On a TXV, high superheat with subcooling below its target is a shortage; a restriction would back liquid up and raise the subcooling.", sources: ["S21", "S24", "S25"] },
  { id: "undercharged-r410a-txv-probe-on-discharge-line", title: "R410A TXV short of charge, the 'liquid' probe on the discharge line", refrigerant: "R410A", meteringDevice: "txv",
    evaporatingDewC: 2, condensingBubbleC: 40, superheatK: 14, subcoolingK: 0,
    readings: { ...COMFORT, supplyAirDryBulbC: 20.7, liquidTempLocation: "discharge-line", liquidLineTempC: 85, compressorAmps: 10, compressorRla: 18, runMinutes: 20 },
    expected: { chargeState: "undercharged", subcoolingK: null, warnings: ["subcooling-on-discharge-line", "judged-without-charge-signal"] },
    why: "Subcooling cannot come from a discharge line, so it is left out; what stays valid — high superheat, suction low for the load, head only 5 K over ambient, a small split — is a shortage, not a restriction.", sources: ["S13", "S21", "S22", "S24"] },
  { id: "undercharged-r22-fixed-orifice-probe-on-discharge-line", title: "R22 piston unit short of charge, the 'liquid' probe on the discharge line", refrigerant: "R22", meteringDevice: "fixed-orifice",
    evaporatingDewC: 2, condensingBubbleC: 40, superheatK: 18, subcoolingK: 0,
    readings: { ...COMFORT, supplyAirDryBulbC: 20.7, liquidTempLocation: "discharge-line", liquidLineTempC: 85, compressorAmps: 10, compressorRla: 18, runMinutes: 20 },
    expected: { chargeState: "undercharged", subcoolingK: null, warnings: ["subcooling-on-discharge-line"], targetSuperheatK: COMFORT_TARGET_SH },
    why: "Superheat 18 K against a 7.2 K target carries a piston's charge signal; with subcooling left out, low head and a small split separate a shortage from a restriction.", sources: ["S10", "S13", "S21", "S24"] },

  // ---------------------------------------------------------------- danger first
  { id: "restricted-r410a-txv-suction-below-table", title: "R410A TXV pulling its suction into vacuum", refrigerant: "R410A", meteringDevice: "txv",
    evaporatingDewC: null, condensingBubbleC: 40, superheatK: 0, subcoolingK: 8,
    readings: { suctionPressureKPa: -50, suctionLineTempC: 10, targetSubcoolingK: 6, runMinutes: 20 },
    expected: { chargeState: "restricted-metering", superheatK: null, warnings: ["outside-table", "suction-pressure-very-low"] },
    why: "A suction below anything R410A boils at in service is a danger in itself; with subcooling at or above target the liquid is there but cannot get through.", sources: ["S21", "S24"] },

  // ---------------------------------------------------------------- the site's atmosphere
  { id: "normal-r410a-txv-at-altitude", title: "R410A TXV at a site 1 000 m up (atmosphere 89.9 kPa)", refrigerant: "R410A", meteringDevice: "txv",
    evaporatingDewC: 7, condensingBubbleC: 46, superheatK: 5, subcoolingK: 6,
    readings: { ...COMFORT, atmosphericPressureKPa: 89.875, targetSubcoolingK: 6, runMinutes: 20 },
    expected: { chargeState: "normal" },
    why: "Gauges read against the local atmosphere: at 1 000 m (89.9 kPa, ISO 2533) the same saturation temperatures need a gauge reading 11 kPa higher than at sea level.", sources: ["S9", "S26"] },

  // ---------------------------------------------------------------- insufficient data / invalid readings
  { id: "insufficient-r22-fixed-orifice-discharge-line", title: "R22 piston unit: no wet bulb, and the 'liquid' probe on the discharge line", refrigerant: "R22", meteringDevice: "fixed-orifice",
    evaporatingDewC: 7, condensingBubbleC: 46, superheatK: 8, subcoolingK: 0,
    readings: { liquidTempLocation: "discharge-line", liquidLineTempC: 78, outdoorAirDryBulbC: 35 },
    expected: { chargeState: "insufficient-data", subcoolingK: null, warnings: ["subcooling-on-discharge-line", "fixed-orifice-target-unavailable"] },
    why: "A piston needs wet bulb and outdoor temperature for its superheat target, and a discharge-line temperature is superheated vapour, so there is no valid subcooling either.", sources: ["S10", "S13"] },
  { id: "insufficient-r410a-fixed-orifice-weigh-in", title: "R410A piston unit on a hot, dry day: weigh in", refrigerant: "R410A", meteringDevice: "fixed-orifice",
    evaporatingDewC: 6, condensingBubbleC: 52, superheatK: 3, subcoolingK: 6,
    readings: { returnAirDryBulbC: 27, returnAirWetBulbC: 15, supplyAirDryBulbC: 15, outdoorAirDryBulbC: 40, runMinutes: 20 },
    expected: { chargeState: "insufficient-data", warnings: ["fixed-orifice-target-unavailable"], targetSuperheatK: null },
    why: "At 15 °C wet bulb and 40 °C outdoor the formula target is below 2.8 K: there is no valid superheat test, so the charge must be weighed in.", sources: ["S10", "S17", "S18"] },
  { id: "insufficient-r410a-txv-discharge-line", title: "R410A TXV unit with the subcooling probe on the discharge line", refrigerant: "R410A", meteringDevice: "txv",
    evaporatingDewC: 7, condensingBubbleC: 46, superheatK: 5, subcoolingK: 0,
    readings: { ...COMFORT, liquidTempLocation: "discharge-line", liquidLineTempC: 80, runMinutes: 20 },
    expected: { chargeState: "insufficient-data", subcoolingK: null, warnings: ["subcooling-on-discharge-line"] },
    why: "A TXV is charged by subcooling, and a discharge-line temperature cannot give subcooling; superheat alone says little about charge on a TXV.", sources: ["S13", "S11", "S14"] },
  { id: "insufficient-r32-fixed-orifice-humid", title: "R32 piston unit, wet bulb above the charging chart", refrigerant: "R32", meteringDevice: "fixed-orifice",
    evaporatingDewC: 10, condensingBubbleC: 45, superheatK: 9, subcoolingK: 6,
    readings: { returnAirDryBulbC: 29, returnAirWetBulbC: 25.5, supplyAirDryBulbC: 20, outdoorAirDryBulbC: 32, runMinutes: 20 },
    expected: { chargeState: "insufficient-data", warnings: ["fixed-orifice-target-unavailable"], targetSuperheatK: null },
    why: "Wet bulb 25.5 °C is above the 24 °C top of the charging chart, so the target superheat is not defined; the formula is not extrapolated.", sources: ["S17", "S18"] },
  { id: "insufficient-r404a-txv-liquid-outside-table", title: "R404A: liquid pressure above the critical point entered", refrigerant: "R404A", meteringDevice: "txv",
    evaporatingDewC: -8, condensingBubbleC: null, superheatK: 5, subcoolingK: 0,
    readings: { liquidPressureKPa: 3800, liquidLineTempC: 40, runMinutes: 30 },
    expected: { chargeState: "insufficient-data", subcoolingK: null, warnings: ["outside-table"] },
    why: "3800 kPa gauge is above R404A's critical pressure, so there is no bubble point and no subcooling; without it a TXV's charge cannot be judged.", sources: ["S14"] },
  { id: "insufficient-r410a-fixed-orifice-suction-below-saturation", title: "R410A piston unit: suction probe reading colder than saturation", refrigerant: "R410A", meteringDevice: "fixed-orifice",
    evaporatingDewC: 7, condensingBubbleC: 46, superheatK: -5, subcoolingK: 6,
    readings: { ...COMFORT, runMinutes: 20 },
    expected: { chargeState: "insufficient-data", superheatK: null, warnings: ["suction-below-saturation"] },
    why: "A suction line 5 K colder than its saturation temperature is impossible, so the probe or gauge is wrong and superheat cannot be used.", sources: ["S10"] },
  { id: "insufficient-r410a-txv-probe-cannot-be-on-discharge-line", title: "R410A TXV: a 'discharge line' temperature colder than condensing", refrigerant: "R410A", meteringDevice: "txv",
    evaporatingDewC: 7, condensingBubbleC: 46, superheatK: 5, subcoolingK: 6,
    readings: { liquidTempLocation: "discharge-line", runMinutes: 20 },
    expected: { chargeState: "insufficient-data", subcoolingK: null, warnings: ["subcooling-on-discharge-line"] },
    why: "A discharge line carries superheated gas and cannot be 6 K colder than its dew point: the reading says so and offers the subcooling it would give on the liquid line, but does not guess.", sources: ["S13", "S1"] },
  { id: "insufficient-r744-transcritical-gas-cooler", title: "CO2 booster: high side above the critical point", refrigerant: "R744", meteringDevice: "eev",
    evaporatingDewC: -8, condensingBubbleC: null, superheatK: 6, subcoolingK: 0,
    readings: { liquidPressureKPa: 9000, liquidLineTempC: 36, runMinutes: 30 },
    expected: { chargeState: "insufficient-data", subcoolingK: null, warnings: ["transcritical-gas-cooler"] },
    why: "At 9 MPa the CO2 high side is a transcritical gas cooler, where nothing condenses and subcooling does not apply; an EEV's charge cannot be judged by subcooling here.", sources: ["S1"] },
];

const ATMOSPHERE_KPA = 101.325;
const round = (value: number, step: number) => Math.round(value / step) * step;
const tenth = (value: number) => Number(round(value, 0.1).toFixed(1));

function build(spec: CaseSpec): DiagnosisCase {
  const atmosphere = spec.readings?.atmosphericPressureKPa ?? ATMOSPHERE_KPA;
  const suctionPressureKPa =
    spec.evaporatingDewC === null
      ? spec.readings!.suctionPressureKPa!
      : tenth(absoluteToGauge(saturationPressure(spec.refrigerant, spec.evaporatingDewC, "dew"), atmosphere));
  const liquidPressureKPa =
    spec.condensingBubbleC === null
      ? spec.readings!.liquidPressureKPa!
      : tenth(absoluteToGauge(saturationPressure(spec.refrigerant, spec.condensingBubbleC, "bubble"), atmosphere));
  const input: DiagnosisInput = {
    refrigerant: spec.refrigerant,
    meteringDevice: spec.meteringDevice,
    suctionPressureKPa,
    suctionLineTempC: spec.evaporatingDewC === null ? spec.readings!.suctionLineTempC! : tenth(spec.evaporatingDewC + spec.superheatK),
    liquidPressureKPa,
    liquidLineTempC: spec.condensingBubbleC === null ? spec.readings!.liquidLineTempC! : tenth(spec.condensingBubbleC - spec.subcoolingK),
    ...(spec.dischargeAboveLiquidKPa === undefined ? {} : { dischargePressureKPa: tenth(liquidPressureKPa + spec.dischargeAboveLiquidKPa) }),
    ...spec.readings,
  };
  const expectedTarget = spec.expected.targetSuperheatK;
  return {
    id: spec.id,
    title: spec.title,
    input,
    design: { evaporatingDewC: spec.evaporatingDewC, condensingBubbleC: spec.condensingBubbleC },
    expected: {
      chargeState: spec.expected.chargeState,
      superheatK: spec.expected.superheatK !== undefined ? spec.expected.superheatK : spec.evaporatingDewC === null ? null : spec.superheatK,
      subcoolingK: spec.expected.subcoolingK !== undefined ? spec.expected.subcoolingK : spec.condensingBubbleC === null ? null : spec.subcoolingK,
      ...(expectedTarget === undefined ? {} : { targetSuperheatK: expectedTarget === null ? null : Number(expectedTarget.toFixed(3)) }),
      warnings: spec.expected.warnings ?? [],
    },
    // 0.1 kPa pressure rounding moves a saturation temperature by well under 0.01 K.
    toleranceK: 0.02,
    why: spec.why,
    sources: spec.sources,
  };
}

const file = DiagnosisCaseFileSchema.parse({
  format: DIAGNOSIS_CASE_FORMAT,
  version: DIAGNOSIS_CASE_FORMAT_VERSION,
  generatedBy: "scripts/build-diagnosis-cases.ts (pressures from saturationPressure at the design saturation temperatures, 101.325 kPa atmosphere)",
  cases: SPECS.map(build),
});
const target = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../tests/fixtures/diagnosis-cases/cases.json");
writeFileSync(target, `${JSON.stringify(file, null, 2)}\n`);
console.log(`wrote ${file.cases.length} cases to ${path.relative(process.cwd(), target)}`);

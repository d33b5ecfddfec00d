import fc from "fast-check";
import { describe, it } from "vitest";
import {
  DiagnosisResultSchema,
  METERING_DEVICES,
  type DiagnosisInputDraft,
  type DiagnosisResult,
  type EvidenceState,
} from "@shared/schemas/diagnosis";
import { absoluteToGauge, diagnose, saturationPressure } from "@shared/engine/index";
import { SENSOR_TOLERANCE_K } from "@shared/engine/diagnosis/diagnosis-limits";

const confidenceOf = (result: DiagnosisResult, state: EvidenceState) =>
  result.chargeState === state
    ? result.confidence
    : (result.alternatives.find((item) => item.state === state)?.confidence ?? 0);

/** Circuit readings built from saturation temperatures, so every sample is physically consistent. */
const circuit = fc
  .record({
    refrigerant: fc.constantFrom("R410A", "R32", "R22", "R407C", "R134a", "R404A", "R290"),
    meteringDevice: fc.constantFrom(...METERING_DEVICES),
    evaporatingC: fc.double({ min: -10, max: 14, noNaN: true }),
    condensingC: fc.double({ min: 32, max: 58, noNaN: true }),
    superheatK: fc.double({ min: 0, max: 25, noNaN: true }),
    subcoolingK: fc.double({ min: -0.5, max: 15, noNaN: true }),
    air: fc.option(
      fc.record({
        returnAirDryBulbC: fc.double({ min: 22, max: 30, noNaN: true }),
        wetBulbDepressionK: fc.double({ min: 3, max: 10, noNaN: true }),
        splitK: fc.double({ min: 2, max: 20, noNaN: true }),
        outdoorAirDryBulbC: fc.double({ min: 15, max: 45, noNaN: true }),
      }),
      { nil: undefined },
    ),
    dischargeLineTempC: fc.option(fc.double({ min: 60, max: 120, noNaN: true }), { nil: undefined }),
    targetSubcoolingK: fc.option(fc.double({ min: 3, max: 10, noNaN: true }), { nil: undefined }),
  })
  .map((sample) => {
    const input: DiagnosisInputDraft = {
      refrigerant: sample.refrigerant,
      meteringDevice: sample.meteringDevice,
      suctionPressureKPa: absoluteToGauge(saturationPressure(sample.refrigerant, sample.evaporatingC, "dew")),
      suctionLineTempC: sample.evaporatingC + sample.superheatK,
      liquidPressureKPa: absoluteToGauge(saturationPressure(sample.refrigerant, sample.condensingC, "bubble")),
      liquidLineTempC: sample.condensingC - sample.subcoolingK,
      ...(sample.dischargeLineTempC === undefined ? {} : { dischargeLineTempC: sample.dischargeLineTempC }),
      ...(sample.targetSubcoolingK === undefined ? {} : { targetSubcoolingK: sample.targetSubcoolingK }),
      ...(sample.air === undefined
        ? {}
        : {
            returnAirDryBulbC: sample.air.returnAirDryBulbC,
            returnAirWetBulbC: sample.air.returnAirDryBulbC - sample.air.wetBulbDepressionK,
            supplyAirDryBulbC: sample.air.returnAirDryBulbC - sample.air.splitK,
            outdoorAirDryBulbC: sample.air.outdoorAirDryBulbC,
          }),
    };
    return input;
  });

const step = fc.double({ min: 0.05, max: 8, noNaN: true });

/**
 * Liquid no colder than the air cooling the condenser, within the probes' tolerance: a liquid line
 * below it is not liquid backing up but a probe or a restriction before it, and its approach is
 * not judged (decision 045; TRADE.md §3 [S26][S34]). The subcooling properties hold on such
 * readings; a circuit with no outdoor air has nothing to be colder than.
 */
const liquidOverTheAir = (input: DiagnosisInputDraft) =>
  input.outdoorAirDryBulbC === undefined ||
  input.liquidLineTempC === undefined ||
  // The approach as the engine works it out (liquid − air), so a boundary case is judged alike.
  input.liquidLineTempC - input.outdoorAirDryBulbC >= -SENSOR_TOLERANCE_K;

describe("diagnose (properties)", () => {
  it("returns a schema-valid result for any consistent circuit", () => {
    fc.assert(fc.property(circuit, (input) => DiagnosisResultSchema.safeParse(diagnose(input)).success));
  });

  // TRADE.md §2: subcooling low = undercharge [S21][S24]; so more subcooling can never make an
  // undercharge verdict more likely, whatever the metering device.
  it("never makes undercharge more likely when subcooling rises", () => {
    fc.assert(
      fc.property(circuit, step, (input, more) => {
        const colder = { ...input, liquidLineTempC: input.liquidLineTempC - more };
        fc.pre(liquidOverTheAir(colder));
        return confidenceOf(diagnose(colder), "undercharged") <= confidenceOf(diagnose(input), "undercharged") + 1e-12;
      }),
    );
  });

  it("never makes overcharge less likely when subcooling rises (liquid backing up [S21][S23])", () => {
    fc.assert(
      fc.property(circuit, step, (input, more) => {
        const colder = { ...input, liquidLineTempC: input.liquidLineTempC - more };
        fc.pre(liquidOverTheAir(colder));
        return confidenceOf(diagnose(colder), "overcharged") >= confidenceOf(diagnose(input), "overcharged") - 1e-12;
      }),
    );
  });

  // TRADE.md §1.4 / §2: on a fixed orifice, superheat below target means overcharge, above it
  // shortage [S10][S17]; higher superheat never points more towards overcharge. Holds for TXV too.
  it("never makes overcharge more likely when superheat rises", () => {
    fc.assert(
      fc.property(circuit, step, (input, more) => {
        const warmer = { ...input, suctionLineTempC: input.suctionLineTempC + more };
        return confidenceOf(diagnose(warmer), "overcharged") <= confidenceOf(diagnose(input), "overcharged") + 1e-12;
      }),
    );
  });

  // Without its superheat target a fixed device's charge cannot be judged (weigh in [S10]): no
  // charge verdict, whatever else the readings show (a fault elsewhere may still be named).
  it("never names a charge state on a fixed orifice without a superheat target (weigh in [S10])", () => {
    fc.assert(
      fc.property(circuit, (input) => {
        const bare = {
          ...input,
          meteringDevice: "fixed-orifice" as const,
          returnAirWetBulbC: undefined,
          returnAirRelativeHumidity: undefined,
          targetSuperheatK: undefined,
        };
        return !["normal", "undercharged", "overcharged"].includes(diagnose(bare).chargeState);
      }),
    );
  });

  // A danger to the plant (liquid reaching the compressor, a suction below the table, a discharge
  // line past its limit) never ends as "normal" (TRADE.md §1.3 [S17], §3 [S13]).
  it("never calls a circuit with a danger warning normal", () => {
    fc.assert(
      fc.property(circuit, (input) => {
        const result = diagnose(input);
        const danger = result.warnings.some((warning) => warning.severity === "danger");
        return (
          !danger ||
          (result.chargeState !== "normal" &&
            result.alternatives.every((alternative) => alternative.state !== "normal"))
        );
      }),
    );
  });

  // The headline never contradicts the first lines of its evidence: the verdict's own signature
  // comes first, and the reading listed next supports the verdict.
  it("puts the verdict's signature first and leads with evidence that supports it", () => {
    fc.assert(
      fc.property(circuit, (input) => {
        const result = diagnose(input);
        if (result.chargeState === "insufficient-data") return true;
        const [first, second] = result.findings;
        if (first?.direction !== "summary") return false;
        if (!second) return true;
        return (second.pointsTo.find((evidence) => evidence.state === result.chargeState)?.weight ?? 0) > 0;
      }),
    );
  });

  it("trusts readings taken before the unit has run 10 minutes less (Title 24 reads at 15 min [S10])", () => {
    fc.assert(
      fc.property(circuit, fc.integer({ min: 0, max: 9 }), (input, minutes) => {
        const early = diagnose({ ...input, runMinutes: minutes });
        const settled = diagnose({ ...input, runMinutes: 20 });
        return (
          early.chargeState !== settled.chargeState ||
          early.confidence <= settled.confidence * 0.96 ||
          settled.confidence === 0
        );
      }),
    );
  });
});

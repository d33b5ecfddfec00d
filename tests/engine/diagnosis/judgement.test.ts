import { describe, expect, it } from "vitest";
import type { DiagnosisInputDraft, DiagnosisResult } from "@shared/schemas/diagnosis";
import {
  absoluteToGauge,
  assessTrend,
  diagnose,
  dischargeLineLimits,
  inferApplication,
  saturationPressure,
  saturationTemperature,
  SETTLED_MAX_RATE_K_PER_MIN,
  suctionLineAllowance,
  targetTemperatureSplit,
} from "@shared/engine/index";

/** Gauge pressure (kPa, sea level) whose saturation point is the given temperature. */
const gauge = (refrigerant: string, temperatureC: number, point: "bubble" | "dew") =>
  absoluteToGauge(saturationPressure(refrigerant, temperatureC, point));
/** Standard comfort conditions: 26.7 °C / 19.4 °C return (80/67 °F, AHRI rating point, memory), 35 °C outdoor. */
const COMFORT = {
  returnAirDryBulbC: 26.7,
  returnAirWetBulbC: 19.4,
  supplyAirDryBulbC: 16.4,
  outdoorAirDryBulbC: 35,
} as const;

/** An R410A TXV circuit evaporating at 7 °C and condensing at 46 °C with 5 K superheat and 6 K subcooling. */
function r410a(
  overrides: Partial<DiagnosisInputDraft> & {
    evaporatingC?: number;
    condensingC?: number;
    superheatK?: number;
    subcoolingK?: number;
  } = {},
): DiagnosisInputDraft {
  const { evaporatingC = 7, condensingC = 46, superheatK = 5, subcoolingK = 6, ...rest } = overrides;
  return {
    refrigerant: "R410A",
    meteringDevice: "txv",
    suctionPressureKPa: gauge("R410A", evaporatingC, "dew"),
    suctionLineTempC: evaporatingC + superheatK,
    liquidPressureKPa: gauge("R410A", condensingC, "bubble"),
    liquidLineTempC: condensingC - subcoolingK,
    targetSubcoolingK: 6,
    runMinutes: 20,
    ...COMFORT,
    ...rest,
  };
}

const codes = (result: DiagnosisResult) => result.warnings.map((warning) => warning.code);

describe("judgement a master technician would sign (TRADE.md §2 symptom table)", () => {
  describe("a condenser that cannot reject heat is not air in the circuit [S21][S26][S27]", () => {
    it("high head, normal subcooling, high current and a high approach: condenser airflow", () => {
      const result = diagnose(
        r410a({ condensingC: 57, compressorAmps: 20, compressorRla: 17, dischargeLineTempC: 98 }),
      );
      expect(result.chargeState).toBe("condenser-airflow");
      expect(result.condenserApproachK).toBeCloseTo(57 - 6 - 35, 1);
      expect(result.findings[0]!.message).toMatch(/approach high/);
    });

    it("a high approach that only the missing subcooling explains is not the condenser's: normal head and no subcooling is a shortage [S24][S26]", () => {
      // Approach ≈ condensing over ambient − subcooling: with the head where it belongs and the
      // liquid leaving at its bubble point, the approach reads high from a clean condenser.
      for (const superheatK of [6, 12]) {
        const result = diagnose(r410a({ condensingC: 47, subcoolingK: 0.5, superheatK, dischargeLineTempC: 85 }));
        expect(result.chargeState, `superheat ${superheatK} K`).toBe("undercharged");
        expect(result.alternatives.map((alternative) => alternative.state)).not.toContain("condenser-airflow");
      }
    });

    it("high head with the computed subcooling high but the liquid no closer to ambient than usual: non-condensables", () => {
      // Air adds its partial pressure: the bubble point of the gauge reading is ~10 K above the
      // real condensing temperature, so the computed subcooling reads 10 K too high.
      const result = diagnose(r410a({ condensingC: 56, subcoolingK: 11, compressorAmps: 19, compressorRla: 17 }));
      expect(result.chargeState).toBe("non-condensables");
      expect(result.alternatives[0]!.state).toBe("overcharged");
    });

    it("high head with high subcooling and the liquid close to ambient: a condenser stacked with liquid (overcharge) [S23]", () => {
      const result = diagnose(
        r410a({ evaporatingC: 8.5, condensingC: 52, subcoolingK: 14, compressorAmps: 19, compressorRla: 17 }),
      );
      expect(result.chargeState).toBe("overcharged");
    });
  });

  describe("danger never ends as normal [S17][S13]", () => {
    it("superheat near zero at the evaporator outlet with normal subcooling and head: the metering device overfeeds", () => {
      const result = diagnose(r410a({ superheatK: 0.3, suctionTempLocation: "evaporator-outlet" }));
      expect(result.chargeState).toBe("overfeeding-metering");
      expect(codes(result)).toContain("low-superheat-floodback");
      expect(result.alternatives.map((alternative) => alternative.state)).not.toContain("normal");
    });

    it("a suction line inside a zeotrope's glide is liquid leaving the coil, not normal [S1][S2]", () => {
      const result = diagnose({
        refrigerant: "R407C",
        meteringDevice: "txv",
        suctionPressureKPa: gauge("R407C", 7, "dew"),
        suctionLineTempC: 4,
        liquidPressureKPa: gauge("R407C", 45, "bubble"),
        liquidLineTempC: 40,
        targetSubcoolingK: 5,
      });
      expect(codes(result)).toContain("suction-inside-glide");
      expect(result.warnings.find((warning) => warning.code === "suction-inside-glide")!.severity).toBe("danger");
      expect(result.chargeState).not.toBe("normal");
    });

    it("a suction pressure below the refrigerant's table is a danger and a starved coil", () => {
      const result = diagnose(r410a({ suctionPressureKPa: -50, suctionLineTempC: 10 }));
      expect(codes(result)).toEqual(expect.arrayContaining(["outside-table", "suction-pressure-very-low"]));
      expect(["restricted-metering", "undercharged", "low-evaporator-airflow"]).toContain(result.chargeState);
    });

    it("overcharge raises subcooling and head; overfeeding does not", () => {
      const overfed = diagnose(r410a({ superheatK: 0.5, suctionTempLocation: "evaporator-outlet" }));
      const overcharged = diagnose({
        ...r410a({ evaporatingC: 8.5, condensingC: 52, subcoolingK: 14, superheatK: 0.8 }),
        meteringDevice: "fixed-orifice",
        targetSubcoolingK: undefined,
      });
      expect(overfed.chargeState).toBe("overfeeding-metering");
      expect(overcharged.chargeState).toBe("overcharged");
    });
  });

  describe("refrigeration is judged as refrigeration [S15]", () => {
    const coolRoom = (application?: "medium-temperature-refrigeration") => ({
      refrigerant: "R404A",
      meteringDevice: "txv" as const,
      suctionPressureKPa: gauge("R404A", -17, "dew"),
      suctionLineTempC: -12,
      liquidPressureKPa: gauge("R404A", 40, "bubble"),
      liquidLineTempC: 35,
      returnAirDryBulbC: 3,
      supplyAirDryBulbC: 0,
      outdoorAirDryBulbC: 27,
      runMinutes: 40,
      ...(application ? { application } : {}),
    });

    it("a cool room at 3 °C whose coil runs 20 K below the room is starved of air (iced), not normal", () => {
      const result = diagnose(coolRoom("medium-temperature-refrigeration"));
      expect(result.application).toBe("medium-temperature-refrigeration");
      expect(result.applicationBasis).toBe("equipment");
      expect(result.evaporatorTemperatureDifferenceK!).toBeGreaterThan(18);
      expect(result.chargeState).toBe("low-evaporator-airflow");
    });

    it("without a recorded application a 3 °C room is judged as a cool room, and says so", () => {
      const result = diagnose(coolRoom());
      expect(result.applicationBasis).toBe("inferred-from-return-air");
      expect(result.chargeState).toBe("low-evaporator-airflow");
      expect(codes(result)).toContain("application-assumed");
    });

    it("a freezer's 98 °C discharge line is inside its own limits; an air conditioner's is hot", () => {
      expect(dischargeLineLimits("R404A", "low-temperature-refrigeration").elevatedC).toBeGreaterThan(98);
      expect(dischargeLineLimits("R410A", "comfort-cooling").elevatedC).toBeLessThan(98);
      // Every application keeps the 225 °F (107 °C) ceiling [S13] for HFCs; R32 runs hotter than R410A (memory).
      expect(dischargeLineLimits("R404A", "low-temperature-refrigeration").limitC).toBe(107);
      expect(dischargeLineLimits("R32", "comfort-cooling").elevatedC).toBeGreaterThan(
        dischargeLineLimits("R410A", "comfort-cooling").elevatedC,
      );
    });

    it("infers the application from the return air: freezer below −8 °C, cool room below 12 °C (common practice)", () => {
      expect(inferApplication(undefined, -20).application).toBe("low-temperature-refrigeration");
      expect(inferApplication(undefined, 3).application).toBe("medium-temperature-refrigeration");
      expect(inferApplication(undefined, 24).application).toBe("comfort-cooling");
      expect(inferApplication("process-chilling", 12)).toEqual({ application: "process-chilling", basis: "equipment" });
      expect(inferApplication(undefined, undefined).basis).toBe("default");
    });
  });

  it("a compressor that no longer pumps has high suction and low head; a shortage has low suction and high superheat [S21][S29][S122]", () => {
    const weak = diagnose(
      r410a({
        evaporatingC: 14,
        condensingC: 39,
        superheatK: 4,
        subcoolingK: 4,
        outdoorAirDryBulbC: 33,
        supplyAirDryBulbC: 21.5,
        compressorAmps: 8,
        compressorRla: 18,
      }),
    );
    expect(weak.chargeState).toBe("weak-compressor");
    const short = diagnose(
      r410a({
        evaporatingC: 1,
        condensingC: 40,
        superheatK: 15,
        subcoolingK: 1,
        supplyAirDryBulbC: 20,
        compressorAmps: 11,
        compressorRla: 18,
      }),
    );
    expect(short.chargeState).toBe("undercharged");
  });

  it("does not read subcooling short of a target the condenser cannot reach as a shortage: its liquid cannot leave colder than the air (TRADE.md §3 [S26][S34])", () => {
    // Condensing 3.5 K over a 33 °C day: at most 3.5 K of subcooling, whatever the charge.
    const atAmbient = diagnose(
      r410a({
        evaporatingC: 14,
        condensingC: 36.5,
        superheatK: 4,
        subcoolingK: 3,
        outdoorAirDryBulbC: 33,
        supplyAirDryBulbC: 21.5,
        compressorAmps: 8,
        compressorRla: 18,
      }),
    );
    const subcooling = atAmbient.findings.find((finding) => finding.ruleId === "subcooling-vs-target")!;
    expect(subcooling.direction).toBe("normal");
    expect(subcooling.message).toMatch(/cannot give more .* says nothing about the charge/);
    // At most a trace for a shortage: 3.0 K sits at the lowered pivot.
    const shortage = subcooling.pointsTo.find((evidence) => evidence.state === "undercharged")?.weight ?? 0;
    expect(shortage).toBeLessThan(0.2);
    expect(atAmbient.chargeState).toBe("weak-compressor");
    // Its liquid 0.5 K over the air is the head near ambient, not a condenser full of liquid: a
    // flooded condenser subcools well above its band (TRADE.md §2: overcharge, SC ↑), and this
    // one is short of subcooling, so the approach is no evidence of an overcharge.
    const approach = atAmbient.findings.find((finding) => finding.ruleId === "condenser-approach")!;
    expect(approach.direction).not.toBe("low");
    expect(atAmbient.alternatives.map((alternative) => alternative.state)).not.toContain("overcharged");
    // A shortage on the same day keeps its liquid well above the air: still low against what the
    // condenser could give, and still undercharged.
    const short = diagnose(
      r410a({
        evaporatingC: 1,
        condensingC: 40,
        superheatK: 15,
        subcoolingK: 0.5,
        outdoorAirDryBulbC: 38,
        supplyAirDryBulbC: 20,
        compressorAmps: 11,
        compressorRla: 18,
      }),
    );
    expect(short.findings.find((finding) => finding.ruleId === "subcooling-vs-target")!.direction).toBe("low");
    expect(short.chargeState).toBe("undercharged");
  });

  it("liquid colder than the outdoor air is not read as a condenser full of liquid: the figure gives no state any weight (TRADE.md §3 [S26][S34])", () => {
    // Liquid 2 K under a 34 °C day, subcooling in its band. No condenser cools its liquid below
    // the air cooling it, so the approach is a probe or a restriction, never an overcharge.
    const inputs = [
      r410a({ condensingC: 40, subcoolingK: 6, outdoorAirDryBulbC: 36 }),
      r410a({ condensingC: 40, subcoolingK: 2, outdoorAirDryBulbC: 40 }),
    ];
    for (const input of inputs) {
      const result = diagnose(input);
      const approach = result.findings.find((finding) => finding.ruleId === "condenser-approach")!;
      expect(result.condenserApproachK).toBeLessThan(-1);
      expect(approach.direction).toBe("not-judged");
      expect(approach.pointsTo).toEqual([]);
      expect(approach.message).not.toMatch(/full of liquid/);
      expect(codes(result)).toContain("liquid-colder-than-outdoor-air");
    }
    // Within the probes' tolerance (1 K) of the air it is still judged: low, a full condenser.
    const atTheAir = diagnose(r410a({ condensingC: 40, subcoolingK: 6, outdoorAirDryBulbC: 34.5 }));
    const approach = atTheAir.findings.find((finding) => finding.ruleId === "condenser-approach")!;
    expect(approach.direction).toBe("low");
    expect(codes(atTheAir)).not.toContain("liquid-colder-than-outdoor-air");
  });

  it("on a TXV high superheat with subcooling below target is a shortage, and the first evidence line says so [S24][S25]", () => {
    const result = diagnose({
      refrigerant: "R407C",
      meteringDevice: "txv",
      suctionPressureKPa: gauge("R407C", 4, "dew"),
      suctionLineTempC: 15.9,
      liquidPressureKPa: gauge("R407C", 44, "bubble"),
      liquidLineTempC: 40.8,
      targetSubcoolingK: 5,
    });
    expect(result.superheatK!).toBeCloseTo(11.9, 1);
    expect(result.subcoolingK!).toBeCloseTo(3.2, 1);
    expect(result.chargeState).toBe("undercharged");
    expect(result.findings[0]!.direction).toBe("summary");
    expect(result.findings[0]!.message).toMatch(/undercharged: superheat high, subcooling low/);
    const restricted = diagnose({
      refrigerant: "R407C",
      meteringDevice: "txv",
      suctionPressureKPa: gauge("R407C", 4, "dew"),
      suctionLineTempC: 15.9,
      liquidPressureKPa: gauge("R407C", 44, "bubble"),
      liquidLineTempC: 37,
      targetSubcoolingK: 5,
    });
    expect(restricted.chargeState).toBe("restricted-metering");
  });

  describe("subcooling voided, judgement kept [S13]", () => {
    it("judges from what stays valid and names the reading left out", () => {
      const result = diagnose(
        r410a({
          evaporatingC: 2,
          condensingC: 40,
          superheatK: 14,
          liquidTempLocation: "discharge-line",
          liquidLineTempC: 85,
          supplyAirDryBulbC: 20.7,
          compressorAmps: 10,
          compressorRla: 18,
        }),
      );
      expect(result.subcoolingK).toBeNull();
      expect(result.chargeState).toBe("undercharged");
      expect(result.readingsLeftOut.map((left) => left.field)).toContain("liquidTempLocation");
      expect(codes(result)).toContain("judged-without-charge-signal");
      // The discharge superheat is line − dew point, never the other way round.
      const dew = saturationTemperature("R410A", saturationPressure("R410A", 40, "bubble"), "dew");
      expect(result.dischargeSuperheatK!).toBeCloseTo(85 - dew, 1);
      expect(result.readingsLeftOut[0]!.reason).toContain(`${(85 - dew).toFixed(1)} K is discharge superheat`);
    });

    it("says plainly when a temperature cannot have been taken where it is said to be", () => {
      const result = diagnose(r410a({ liquidTempLocation: "discharge-line" }));
      expect(result.chargeState).toBe("insufficient-data");
      const message = result.warnings.find((warning) => warning.code === "subcooling-on-discharge-line")!.message;
      expect(message).toMatch(/cannot have been read on the discharge line/);
      expect(message).toMatch(/subcooling is 6\.0 K/);
    });
  });

  describe("confidence and settling [S10][S20]", () => {
    it("a reading three minutes after a start is trusted less than a settled one", () => {
      const early = diagnose(r410a({ runMinutes: 3 }));
      const settled = diagnose(r410a({ runMinutes: 20 }));
      expect(early.chargeState).toBe(settled.chargeState);
      expect(early.confidence).toBeLessThan(settled.confidence * 0.8);
    });

    it("a steady 0.15 K/min drift is not settled, though it moves under 1 K in 5 minutes", () => {
      const start = Date.parse("2026-03-02T09:00:00+10:00");
      const drifting = Array.from({ length: 11 }, (_, minute) => ({
        takenAt: new Date(start + minute * 60_000).toISOString(),
        input: r410a({ superheatK: 6 - 0.15 * minute }),
      }));
      const result = assessTrend(drifting);
      expect(result.changeOverWindow.superheatK!).toBeLessThan(1);
      expect(Math.abs(result.rate.superheatKPerMin!)).toBeGreaterThan(SETTLED_MAX_RATE_K_PER_MIN);
      expect(result.settled).toBe(false);
      expect(result.reason).toMatch(/drifting/);
    });

    it("reads stored results instead of diagnosing the inputs again", () => {
      const start = Date.parse("2026-03-02T09:00:00+10:00");
      const stored = diagnose(r410a());
      const marked = { ...stored, chargeState: "overcharged" as const };
      const series = Array.from({ length: 7 }, (_, minute) => ({
        takenAt: new Date(start + minute * 60_000).toISOString(),
        input: r410a(),
        result: marked,
      }));
      expect(assessTrend(series).latest.chargeState).toBe("overcharged");
    });
  });

  describe("smaller errors", () => {
    it("condensing over ambient for a blend uses the mid-glide (mean) condensing temperature", () => {
      const result = diagnose({
        refrigerant: "R407C",
        meteringDevice: "txv",
        suctionPressureKPa: gauge("R407C", 7, "dew"),
        suctionLineTempC: 12,
        liquidPressureKPa: gauge("R407C", 45, "bubble"),
        liquidLineTempC: 40,
        outdoorAirDryBulbC: 33,
      });
      expect(result.condensingOverAmbientK!).toBeCloseTo(
        (result.condensingTempC! + result.condensingDewTempC!) / 2 - 33,
        9,
      );
      expect(result.condensingOverAmbientK!).toBeGreaterThan(45 - 33 + 1.5);
    });

    it("R744 above its critical pressure is a transcritical gas cooler, not 'near the critical point'", () => {
      const result = diagnose({
        refrigerant: "R744",
        meteringDevice: "eev",
        suctionPressureKPa: 2900,
        suctionLineTempC: 0,
        liquidPressureKPa: 9000,
        liquidLineTempC: 36,
      });
      const warning = result.warnings.find((item) => item.code === "transcritical-gas-cooler")!;
      expect(warning.message).toMatch(/transcritical gas cooler/);
      expect(warning.message).toMatch(/subcooling does not apply/);
      expect(result.subcoolingK).toBeNull();
    });

    it("reports the atmosphere it used", () => {
      expect(diagnose(r410a()).atmosphericPressureKPa).toBe(101.325);
      expect(diagnose(r410a({ atmosphericPressureKPa: 89.875 })).atmosphericPressureKPa).toBe(89.875);
    });
  });

  describe("what else the same readings give", () => {
    it("the comfort air split target comes from return dry and wet bulb: humid air lowers it [S33]", () => {
      const rating = targetTemperatureSplit(26.7, 19.4, 101.325)!;
      // 400 cfm/ton (54 L/s per kW [S33]) at the 80/67 °F rating point: about 18–20 °F in trade practice.
      expect(rating).toBeGreaterThan(9);
      expect(rating).toBeLessThan(12);
      expect(targetTemperatureSplit(26.7, 22.5, 101.325)!).toBeLessThan(rating);
      expect(targetTemperatureSplit(26.7, 15, 101.325)!).toBeGreaterThan(rating);
      expect(targetTemperatureSplit(5, 3, 101.325)).toBeNull();
      expect(diagnose(r410a()).targets.temperatureSplit!.basis).toBe("formula");
    });

    it("a TXV band read at the outdoor unit rises by the line-set allowance; a piston target read at the coil falls by it", () => {
      const atCoil = diagnose(r410a({ suctionTempLocation: "evaporator-outlet" }));
      const outside = diagnose(r410a({ suctionTempLocation: "outdoor-unit", liquidLineLengthM: 15 }));
      expect(outside.targets.superheat!.lowK - atCoil.targets.superheat!.lowK).toBeCloseTo(suctionLineAllowance(15), 9);
      expect(outside.suctionLineAllowanceK).toBeCloseTo(2, 9);
      const piston = diagnose({ ...r410a(), meteringDevice: "fixed-orifice" });
      const pistonAtCoil = diagnose({
        ...r410a({ suctionTempLocation: "evaporator-outlet" }),
        meteringDevice: "fixed-orifice",
      });
      expect(piston.targets.superheat!.targetK - pistonAtCoil.targets.superheat!.targetK).toBeCloseTo(
        suctionLineAllowance(undefined),
        9,
      );
    });
  });
});

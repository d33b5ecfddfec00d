import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  diagnose,
  GAUGE_RESOLUTION_KPA,
  generateCase,
  GENERATOR_REFRIGERANTS,
  seededRandom,
  SENSOR_NOISE_K,
} from "@shared/engine/index.ts";
import { DiagnosisInputSchema, METERING_DEVICES } from "@shared/schemas/diagnosis.ts";
import { GENERATOR_FAULTS, generatedCaseId, parseGeneratedCaseId } from "@shared/schemas/casebook.ts";

const combination = fc.record({
  refrigerant: fc.constantFrom(...GENERATOR_REFRIGERANTS),
  meteringDevice: fc.constantFrom(...METERING_DEVICES),
  fault: fc.constantFrom(...GENERATOR_FAULTS),
  seed: fc.integer({ min: 0, max: 2 ** 32 - 1 }),
});

describe("generateCase", () => {
  it("makes a case the engine diagnoses as the fault it was generated for, over many seeds", () => {
    // Symptom patterns: TRADE.md §2 [S21][S22][S23][S24]; the engine's own rules judge them.
    fc.assert(
      fc.property(combination, ({ seed, ...options }) => {
        const made = generateCase({ ...options, random: seededRandom(seed) });
        expect(DiagnosisInputSchema.safeParse(made.input).success).toBe(true);
        const result = diagnose(made.input);
        expect(result.chargeState).toBe(options.fault);
        expect(made.expected.chargeState).toBe(options.fault);
        expect(made.expected.superheatK).toBeCloseTo(result.superheatK!, 9);
      }),
      { numRuns: 400 },
    );
  });

  it("never cools the liquid below the air crossing the condenser (TRADE.md §3, condenser approach [S26][S34])", () => {
    fc.assert(
      fc.property(combination, ({ seed, ...options }) => {
        const { input } = generateCase({ ...options, random: seededRandom(seed) });
        // Each probe scatters ±SENSOR_NOISE_K, so the two readings may cross by twice that.
        expect(input.liquidLineTempC).toBeGreaterThanOrEqual(input.outdoorAirDryBulbC! - 2 * SENSOR_NOISE_K);
      }),
      { numRuns: 400 },
    );
  });

  it("is reproducible: the same seed gives the same case, another seed another", () => {
    const options = { refrigerant: "R407C", meteringDevice: "txv", fault: "undercharged" } as const;
    expect(generateCase({ ...options, random: seededRandom(11) })).toEqual(
      generateCase({ ...options, random: seededRandom(11) }),
    );
    expect(generateCase({ ...options, random: seededRandom(12) }).input).not.toEqual(
      generateCase({ ...options, random: seededRandom(11) }).input,
    );
  });

  it("scatters readings like real instruments: whole-kPa gauges, probes to 0.1 °C", () => {
    expect(SENSOR_NOISE_K).toBe(0.3);
    fc.assert(
      fc.property(combination, ({ seed, ...options }) => {
        const { input } = generateCase({ ...options, random: seededRandom(seed) });
        expect(Number.isInteger(input.suctionPressureKPa / GAUGE_RESOLUTION_KPA)).toBe(true);
        expect(Number.isInteger(input.liquidPressureKPa / GAUGE_RESOLUTION_KPA)).toBe(true);
        expect(Math.abs(input.suctionLineTempC * 10 - Math.round(input.suctionLineTempC * 10))).toBeLessThan(1e-6);
      }),
      { numRuns: 100 },
    );
    // Two seeds of the same fault never give identical line temperatures (the scatter is real).
    const temps = new Set(
      Array.from(
        { length: 20 },
        (_, seed) =>
          generateCase({ refrigerant: "R32", meteringDevice: "eev", fault: "normal", random: seededRandom(seed) }).input
            .suctionLineTempC,
      ),
    );
    expect(temps.size).toBeGreaterThan(10);
  });

  it("keeps a fixed device's case on the comfort charging chart (TRADE.md §1.4: WB 10–24 °C, outdoor 13–46 °C)", () => {
    for (let seed = 0; seed < 50; seed += 1) {
      const { input } = generateCase({
        refrigerant: "R410A",
        meteringDevice: "fixed-orifice",
        fault: "normal",
        random: seededRandom(seed),
      });
      expect(input.returnAirWetBulbC).toBeGreaterThanOrEqual(10);
      expect(input.returnAirWetBulbC).toBeLessThanOrEqual(24);
      expect(input.outdoorAirDryBulbC).toBeGreaterThanOrEqual(13);
      expect(input.outdoorAirDryBulbC).toBeLessThanOrEqual(46);
    }
  });

  it("refuses a refrigerant it has no pattern for", () => {
    expect(() =>
      generateCase({ refrigerant: "R744", meteringDevice: "txv", fault: "normal", random: seededRandom(1) }),
    ).toThrow(/generateCase requires/);
  });

  it("round-trips its id, so the server can make the same case again", () => {
    const options = {
      refrigerant: "R1234ze(E)",
      meteringDevice: "capillary",
      fault: "weak-compressor",
      seed: 4_000_000_000,
    } as const;
    expect(parseGeneratedCaseId(generatedCaseId(options))).toEqual(options);
    expect(parseGeneratedCaseId("gen~~txv~normal~R32")).toBeNull();
    expect(parseGeneratedCaseId("wattle-lane-rtu1-c1-quarterly-check")).toBeNull();
  });
});

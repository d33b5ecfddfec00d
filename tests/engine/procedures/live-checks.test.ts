import { describe, expect, it } from "vitest";
import {
  analyseDecay,
  describeDecay,
  runningCurrentNotice,
  singlePhaseWindings,
  testPressureNotice,
} from "@shared/engine/index";

describe("singlePhaseWindings", () => {
  it("passes C–R 1.20, C–S 3.10, R–S 4.30 Ω: R–S = C–R + C–S and start above run ([S46]; memory)", () => {
    // By hand: 1.20 + 3.10 = 4.30 Ω exactly; the start winding (3.10) reads above the run (1.20).
    const result = singlePhaseWindings({ commonRun: 1.2, commonStart: 3.1, runStart: 4.3 });
    expect(result.verdict).toBe("pass");
    expect(result.expectedRunStartOhms).toBeCloseTo(4.3, 10);
    expect(result.sumMismatchPercent).toBeCloseTo(0, 10);
    expect(result.startAboveRun).toBe(true);
    expect(result.source).toMatch(/\[S46\] G-W/);
  });

  it("allows the meter's lead resistance: 0.15 Ω off on a 2 Ω R–S is within the 0.2 Ω allowance (common practice)", () => {
    // 0.6 + 1.25 = 1.85 Ω against 2.00 Ω read: 0.15 Ω apart, 7.5 % of R–S but under 0.2 Ω.
    expect(singlePhaseWindings({ commonRun: 0.6, commonStart: 1.25, runStart: 2 }).verdict).toBe("pass");
  });

  it("warns between 5 and 10 % apart and fails beyond (an open or shorted winding or misread terminals)", () => {
    // 2 + 5 = 7 Ω against 7.5 Ω: 0.5 Ω, 6.7 % of R–S.
    const warn = singlePhaseWindings({ commonRun: 2, commonStart: 5, runStart: 7.5 });
    expect(warn.verdict).toBe("warn");
    expect(warn.sumMismatchPercent).toBeCloseTo(6.667, 2);
    // 2 + 5 = 7 Ω against 12 Ω: 41.7 %.
    const fail = singlePhaseWindings({ commonRun: 2, commonStart: 5, runStart: 12 });
    expect(fail.verdict).toBe("fail");
    expect(fail.reason).toMatch(/open or shorted winding/);
  });

  it("warns when the sum holds but C–S is not above C–R: the start winding normally reads higher ([S46])", () => {
    const swapped = singlePhaseWindings({ commonRun: 3.1, commonStart: 1.2, runStart: 4.3 });
    expect(swapped.verdict).toBe("warn");
    expect(swapped.startAboveRun).toBe(false);
    expect(swapped.reason).toMatch(/check which terminal is which/);
  });

  it("refuses a zero, negative or non-finite reading", () => {
    expect(() => singlePhaseWindings({ commonRun: 0, commonStart: 3, runStart: 3 })).toThrow(
      /singlePhaseWindings requires/,
    );
    expect(() => singlePhaseWindings({ commonRun: 1, commonStart: Number.NaN, runStart: 3 })).toThrow(
      /singlePhaseWindings requires/,
    );
  });
});

describe("runningCurrentNotice (while typing)", () => {
  it("says nothing within the RLA, cautions above it and warns of danger past 140 % (RLA = MCC ÷ 1.56 or ÷ 1.4 [S39]; common practice)", () => {
    expect(runningCurrentNotice({ amps: 9.5, ratedA: 10, kind: "compressor-rla" })).toBeNull();
    const above = runningCurrentNotice({ amps: 12.5, ratedA: 10, kind: "compressor-rla" });
    expect(above?.level).toBe("caution");
    expect(above?.message).toMatch(/12\.5 A is 125\.0 % of the 10\.0 A RLA/);
    expect(above?.source).toMatch(/\[S39\]/);
    expect(above?.source).toMatch(/common practice/);
    expect(runningCurrentNotice({ amps: 15, ratedA: 10, kind: "compressor-rla" })?.level).toBe("danger");
  });

  it("calls a current above 8 × the rating implausible: more than locked-rotor current, typically 5–7 × RLA (memory)", () => {
    const typo = runningCurrentNotice({ amps: 95, ratedA: 9.5, kind: "compressor-rla" });
    expect(typo?.level).toBe("caution");
    expect(typo?.message).toMatch(/not a running current/);
    expect(typo?.source).toMatch(/memory/);
  });

  it("leaves zero, negative and missing ratings to the schema and the saved verdict", () => {
    expect(runningCurrentNotice({ amps: 0, ratedA: 10, kind: "compressor-rla" })).toBeNull();
    expect(runningCurrentNotice({ amps: -3, ratedA: 10, kind: "compressor-rla" })).toBeNull();
    expect(runningCurrentNotice({ amps: 5, ratedA: 0, kind: "fan-fla" })).toBeNull();
  });
});

describe("testPressureNotice (while typing)", () => {
  it("warns of danger above the rated pressure: never exceed PS of the lowest-rated component ([S57][S63][S64])", () => {
    // R410A high sides are commonly rated 4150 kPa (PS 4.15 MPa, trade notes §5, memory).
    const notice = testPressureNotice({ testGaugeKPa: 4500, ratedKPa: 4150, nameplateKPa: 4150 });
    expect(notice?.level).toBe("danger");
    expect(notice?.message).toMatch(/^Do not exceed the rated pressure: 4500\.0 kPa is above the 4150\.0 kPa limit/);
    expect(notice?.message).toMatch(/nameplate and local codes decide/);
    expect(testPressureNotice({ testGaugeKPa: 3800, ratedKPa: 4150, nameplateKPa: 4150 })).toBeNull();
  });

  it("holds to the nameplate when a higher rating is typed over it, and says so", () => {
    // Low side 1700 kPa on the nameplate; 2900 typed; 2000 kPa applied is over the nameplate's rating.
    expect(testPressureNotice({ testGaugeKPa: 2000, ratedKPa: 2900, nameplateKPa: 1700 })?.level).toBe("danger");
    const typedHigher = testPressureNotice({ testGaugeKPa: 1000, ratedKPa: 2900, nameplateKPa: 1700 });
    expect(typedHigher?.level).toBe("caution");
    expect(typedHigher?.message).toMatch(/above the nameplate's 1700\.0 kPa/);
  });

  it("words pressures with the formatter it is given (the technician's unit)", () => {
    const psi = (kPa: number) => `${Math.round(kPa / 6.894757)} psig`;
    expect(testPressureNotice({ testGaugeKPa: 4500, ratedKPa: 4150, nameplateKPa: null }, psi)?.message).toMatch(
      /653 psig is above the 602 psig limit/,
    );
  });
});

describe("describeDecay", () => {
  const held = [
    { minutes: 0, microns: 400 },
    { minutes: 10, microns: 430 },
    { minutes: 20, microns: 450 },
  ];

  it("keeps the microns sentence analyseDecay stores", () => {
    const result = analyseDecay(held);
    expect(describeDecay(result.wording!)).toBe(result.reason);
    expect(result.reason).toBe("Held: stayed at or under 500 microns for 20.0 min (final 450 microns); tight and dry.");
  });

  it("speaks pascals when the technician reads pascals: 500 µm = 66.7 Pa, 450 µm = 60.0 Pa (1 µm = 0.133322 Pa [S60])", () => {
    const text = describeDecay(analyseDecay(held).wording!, "Pa");
    expect(text).toBe("Held: stayed at or under 66.7 Pa for 20.0 min (final 60.0 Pa); tight and dry.");
    expect(text).not.toMatch(/micron|µm/);
  });

  it("does not say 'rose above' when the pull-down never reached the target, in either unit", () => {
    const wet = analyseDecay([
      { minutes: 0, microns: 900 },
      { minutes: 10, microns: 1400 },
      { minutes: 20, microns: 1450 },
      { minutes: 30, microns: 1460 },
    ]);
    expect(wet.verdict).toBe("moisture");
    for (const unit of ["micron", "Pa"] as const) expect(describeDecay(wet.wording!, unit)).not.toMatch(/rose above/);
    // 900 µm × 0.133322 = 120.0 Pa; 1460 µm = 194.7 Pa.
    expect(describeDecay(wet.wording!, "Pa")).toMatch(
      /started at 120\.0 Pa \(the pull-down never reached 66\.7 Pa\) and levelled off at 194\.7 Pa/,
    );
  });

  it("gives a leak's rise rate in Pa/min: 150 µm/min = 20.0 Pa/min", () => {
    const leak = analyseDecay([
      { minutes: 0, microns: 400 },
      { minutes: 10, microns: 1900 },
      { minutes: 20, microns: 3400 },
      { minutes: 30, microns: 4900 },
    ]);
    expect(leak.verdict).toBe("leak");
    expect(describeDecay(leak.wording!, "Pa")).toMatch(/still rising at 20\.0 Pa\/min/);
  });
});

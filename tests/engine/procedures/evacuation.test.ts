import { describe, expect, it } from "vitest";
import { analyseDecay, evacuationReached, micronsToPa, paToMicrons } from "@shared/engine/index";

type Sample = { minutes: number; microns: number };

// Digits for toBeCloseTo, which passes when |actual − expected| < 0.5 × 10^−digits.
/** [S60] prints 1 micron = 0.133322 Pa: half a unit of its last digit. */
const S60_PA_DIGITS = 6;
/** 133.322 Pa back to microns: the printed factor's rounding (5e-7 Pa per micron) times 1000, with margin. */
const S60_MICRONS_DIGITS = 2;
/** A reading converted there and back: float rounding alone. */
const ROUND_TRIP_DIGITS = 6;

/** Readings every `stepMinutes` from 0 to `endMinutes` of a curve `microns(t)`. */
function sampled(microns: (minutes: number) => number, endMinutes = 20, stepMinutes = 2): Sample[] {
  const samples: Sample[] = [];
  for (let minutes = 0; minutes <= endMinutes; minutes += stepMinutes)
    samples.push(Object.freeze({ minutes, microns: microns(minutes) }));
  return Object.freeze(samples) as Sample[];
}

describe("micronsToPa / paToMicrons", () => {
  it("uses 1 micron = 1 mTorr = 0.133322 Pa [S60]", () => {
    expect(micronsToPa(1)).toBeCloseTo(0.133322, S60_PA_DIGITS);
    expect(paToMicrons(133.322)).toBeCloseTo(1000, S60_MICRONS_DIGITS);
  });

  it("matches the conversion table of the trade notes §4.2 (computed from [S60]) to its printed precision", () => {
    // microns → Pa abs as printed: 250 → 33.3, 500 → 66.7, 1000 → 133.3, 1500 → 200.0, 5000 → 666.6, 760 000 → 101 325.
    const table: [number, number, number][] = [
      [250, 33.3, 0.05],
      [500, 66.7, 0.05],
      [1000, 133.3, 0.05],
      [1500, 200.0, 0.05],
      [5000, 666.6, 0.05],
      [760_000, 101_325, 0.5],
    ];
    for (const [microns, pa, halfUnit] of table) {
      expect(Math.abs(micronsToPa(microns) - pa)).toBeLessThanOrEqual(halfUnit);
      expect(paToMicrons(micronsToPa(microns))).toBeCloseTo(microns, ROUND_TRIP_DIGITS);
    }
  });
});

describe("evacuationReached", () => {
  it("gives the time of the first reading at or under 500 microns, the industry target [S4]", () => {
    const pullDown = [
      { minutes: 0, microns: 760_000 },
      { minutes: 10, microns: 5000 },
      { minutes: 25, microns: 620 },
      { minutes: 32, microns: 480 },
      { minutes: 40, microns: 350 },
    ];
    expect(evacuationReached(pullDown)).toEqual({ reached: true, atMinutes: 32 });
    expect(evacuationReached(pullDown, 300)).toEqual({ reached: false, atMinutes: null });
    expect(evacuationReached([{ minutes: 0, microns: 500 }])).toEqual({ reached: true, atMinutes: 0 });
  });

  it("refuses readings out of time order", () => {
    expect(() =>
      evacuationReached([
        { minutes: 5, microns: 900 },
        { minutes: 5, microns: 400 },
      ]),
    ).toThrow(/strictly increasing minutes/);
  });
});

describe("analyseDecay", () => {
  it("held: valved off at 400 microns, 450 after 20 minutes, never above 500 (held at or under 500 µm for 20 minutes [S52])", () => {
    // Synthetic: a slow straight rise of 2.5 µm/min from 400.
    const result = analyseDecay(sampled((t) => 400 + 2.5 * t));
    expect(result.verdict).toBe("held");
    expect(result.finalMicrons).toBe(450);
    expect(result.riseRateMicronsPerMinute).toBeCloseTo(2.5, 10);
    expect(result.reason).toMatch(/^Held/);
  });

  it("moisture: from 300 microns rises then levels near 1500 (slow rise levelling near 1500 µm = moisture [S55])", () => {
    // Synthetic: 300 + 1200 (1 − e^(−t/3)), the shape of water boiling off towards its vapour pressure.
    const result = analyseDecay(sampled((t) => 300 + 1200 * (1 - Math.exp(-t / 3))));
    expect(result.verdict).toBe("moisture");
    expect(result.levelledOff).toBe(true);
    expect(result.finalMicrons).toBeGreaterThan(1450);
    expect(result.finalMicrons).toBeLessThan(1500);
    expect(result.reason).toMatch(/evacuate longer/);
  });

  it("does not say the reading rose above the hold limit when the pull-down never reached it", () => {
    // Synthetic: valved off at 900 microns (above the 500 µm target), levelling near 1500.
    const result = analyseDecay(sampled((t) => 900 + 600 * (1 - Math.exp(-t / 3))));
    expect(result.verdict).toBe("moisture");
    expect(result.reason).toMatch(/started at 900 microns \(the pull-down never reached 500 microns\)/);
    expect(result.reason).not.toMatch(/rose above/);
  });

  it("moisture: rises and holds near 5000 microns ([S54] reads that as moisture)", () => {
    const result = analyseDecay(sampled((t) => 250 + 4600 * (1 - Math.exp(-t / 2.5)), 30, 3));
    expect(result.finalMicrons).toBeLessThanOrEqual(5000);
    expect(result.verdict).toBe("moisture");
  });

  it("leak: keeps rising in a straight line, 150 µm/min from 300 (keeps rising steadily = leak [S58][S55])", () => {
    // Synthetic: a choked leak into vacuum, constant rate; ends at 3300, still under 5000.
    const result = analyseDecay(sampled((t) => 300 + 150 * t));
    expect(result.verdict).toBe("leak");
    expect(result.levelledOff).toBe(false);
    expect(result.riseRateMicronsPerMinute).toBeCloseTo(150, 10);
    expect(result.reason).toMatch(/still rising at 150\.0 µm\/min/);
  });

  it("leak: rises past 5000 microns even if it slows (keeps rising above 5000 µm = leak [S54])", () => {
    const result = analyseDecay(sampled((t) => 300 + 9000 * (1 - Math.exp(-t / 4))));
    expect(result.finalMicrons).toBeGreaterThan(5000);
    expect(result.verdict).toBe("leak");
  });

  it("with only two readings above the hold limit calls it a leak and asks for more readings", () => {
    const result = analyseDecay([
      { minutes: 0, microns: 400 },
      { minutes: 10, microns: 900 },
    ]);
    expect(result.verdict).toBe("leak");
    expect(result.reason).toMatch(/take more readings/);
  });

  it("notes a test shorter than the makers' 15 minutes [S53]", () => {
    expect(
      analyseDecay([
        { minutes: 0, microns: 400 },
        { minutes: 5, microns: 410 },
      ]).reason,
    ).toMatch(/lasted only 5\.0 min/);
  });

  it("takes the organisation's hold and leak limits and says the organisation set them", () => {
    const samples = sampled((t) => 200 + 10 * t); // 400 after 20 min
    expect(analyseDecay(samples).verdict).toBe("held");
    const strict = analyseDecay(samples, { holdMicrons: 300 });
    expect(strict.verdict).toBe("leak");
    expect(strict.source).toMatch(/organisation/);
  });

  it("names the decay sources by title", () => {
    const { source } = analyseDecay(sampled(() => 400));
    expect(source).toMatch(/\[S58\] Thermo King/);
    expect(source).toMatch(/\[S54\] Amana/);
  });

  it("refuses fewer than two readings", () => {
    expect(() => analyseDecay([{ minutes: 0, microns: 400 }])).toThrow(/analyseDecay requires at least 2 readings/);
  });
});

import { describe, expect, it } from "vitest";
import { caseSafetyNotes, designCaseInput, diagnose, workedSolution } from "@shared/engine/index.ts";
import type { WorkedStep } from "@shared/schemas/casebook.ts";

type Step<K extends WorkedStep["kind"]> = Extract<WorkedStep, { kind: K }>;

// An R407C rooftop circuit like the demo scenario's (PRODUCT.md): dew 7 °C at suction, bubble 45 °C
// at the liquid port, superheat 6 K, subcooling 5 K.
const rooftop = designCaseInput({
  refrigerant: "R407C",
  meteringDevice: "txv",
  evaporatingDewC: 7,
  condensingBubbleC: 45,
  superheatK: 6,
  subcoolingK: 5,
  readings: { targetSubcoolingK: 5, outdoorAirDryBulbC: 33, runMinutes: 25 },
});

describe("workedSolution", () => {
  const steps = workedSolution(rooftop, diagnose(rooftop));
  const [suction, liquid] = steps.filter((step): step is Step<"saturation"> => step.kind === "saturation");

  it("reads suction in the dew column and liquid in the bubble column (TRADE.md §1.1 [S1][S2][S3])", () => {
    expect(suction).toMatchObject({ side: "suction", point: "dew", otherPoint: "bubble", isBlend: true });
    expect(liquid).toMatchObject({ side: "liquid", point: "bubble", otherPoint: "dew" });
    expect(suction!.saturationC).toBeCloseTo(7, 1);
    expect(liquid!.saturationC).toBeCloseTo(45, 1);
    // Gauge + 101.325 kPa = absolute, as the tables are (PRODUCT.md "Units").
    expect(suction!.pressureAbsoluteKPa).toBeCloseTo(rooftop.suctionPressureKPa + 101.325, 9);
  });

  it("explains the glide for a blend: R407C about 5–7 K (TRADE.md §1.1, from memory)", () => {
    expect(suction!.glideK!).toBeGreaterThan(4);
    expect(suction!.glideK!).toBeLessThan(7.5);
    expect(suction!.otherSaturationC!).toBeLessThan(suction!.saturationC!);
    expect(suction!.why).toMatch(/zeotropic blend/);
    expect(liquid!.why).toMatch(/bubble \(liquid\) column/);
  });

  it("does the arithmetic by the definitions and judges a TXV by subcooling first (TRADE.md §1.3 [S9][S11][S14])", () => {
    const superheat = steps.find(
      (step): step is Step<"difference"> => step.kind === "difference" && step.quantity === "superheat",
    )!;
    expect(superheat.resultK).toBeCloseTo(superheat.lineTempC - superheat.saturationC!, 9);
    const targets = steps.filter((step): step is Step<"target"> => step.kind === "target");
    expect(targets.map((step) => step.quantity)).toEqual(["subcooling", "superheat"]);
    expect(targets[0]!.band).toMatchObject({ targetK: 5, basis: "nameplate" });
    expect(targets[0]!.why).toMatch(/maker's target subcooling/);
    expect(steps.at(-1)).toMatchObject({ kind: "verdict", chargeState: "normal" });
  });

  it("says one column is enough for a single-substance refrigerant", () => {
    const r32 = designCaseInput({
      refrigerant: "R32",
      meteringDevice: "eev",
      evaporatingDewC: 8,
      condensingBubbleC: 45,
      superheatK: 5,
      subcoolingK: 6,
    });
    const first = workedSolution(r32, diagnose(r32))[0] as Step<"saturation">;
    expect(first.isBlend).toBe(false);
    expect(first.why).toMatch(/single substance/);
  });

  it("puts a fixed device's superheat target first with the wet bulb and outdoor air it came from (TRADE.md §1.4)", () => {
    const piston = designCaseInput({
      refrigerant: "R410A",
      meteringDevice: "fixed-orifice",
      evaporatingDewC: 7,
      condensingBubbleC: 46,
      superheatK: 7.2,
      subcoolingK: 6,
      readings: { returnAirDryBulbC: 26.7, returnAirWetBulbC: 19.4, supplyAirDryBulbC: 15.7, outdoorAirDryBulbC: 35 },
    });
    const target = workedSolution(piston, diagnose(piston)).find(
      (step): step is Step<"target"> => step.kind === "target",
    )!;
    // 1.5 × 19.4 − 0.5 × 35 − 4.44 = 7.16 K (commonly taught charging formula, from memory).
    expect(target).toMatchObject({ quantity: "superheat", wetBulbC: 19.4, outdoorC: 35 });
    expect(target.band!.targetK).toBeCloseTo(7.16, 2);
  });

  it("says there is no subcooling when the probe is on the discharge line (TRADE.md §1.2 [S13])", () => {
    const wrongPipe = { ...rooftop, liquidTempLocation: "discharge-line" as const, liquidLineTempC: 80 };
    const subcooling = workedSolution(wrongPipe, diagnose(wrongPipe)).find(
      (step): step is Step<"difference"> => step.kind === "difference" && step.quantity === "subcooling",
    )!;
    expect(subcooling.resultK).toBeNull();
    expect(subcooling.why).toMatch(/discharge line/);
  });
});

describe("caseSafetyNotes", () => {
  it("brings the flammable caution for A2L and A3 refrigerants (ISO 817 classes, TRADE.md §7.2 [S80])", () => {
    expect(caseSafetyNotes("R32", "normal", []).map((note) => note.topic)).toEqual(["flammable"]);
    expect(caseSafetyNotes("R290", "normal", [])[0]!.reason).toMatch(/A3/);
  });

  it("brings the toxic caution for ammonia (B2L)", () => {
    expect(caseSafetyNotes("R717", "normal", [])[0]!.topic).toBe("toxic");
  });

  it("adds the hazard of the job the verdict leads to: isolation before condenser work (TRADE.md §9 [S115][S116])", () => {
    expect(caseSafetyNotes("R407C", "condenser-airflow", []).map((note) => note.topic)).toEqual(["electrical"]);
    expect(caseSafetyNotes("R410A", "overcharged", []).map((note) => note.topic)).toEqual(["recovery-cylinder"]);
  });

  it("adds the case's own topics once each, and falls back to the gauge-hose caution", () => {
    expect(caseSafetyNotes("R32", "undercharged", ["nitrogen", "flammable"]).map((note) => note.topic)).toEqual([
      "flammable",
      "liquid-refrigerant",
      "nitrogen",
    ]);
    expect(caseSafetyNotes("R134a", "normal", []).map((note) => note.topic)).toEqual(["pressure"]);
  });
});

import { describe, expect, it } from "vitest";
import { circuitFacts, withCircuitFacts } from "@shared/schemas/circuit-facts.ts";

const unit = { refrigerant: "R410A", compressorRlaA: null, application: "comfort-cooling" as const };
const nameplate = { meteringDevice: "txv" as const, targetSuperheatK: 6, targetSubcoolingK: null };

describe("circuit facts", () => {
  it("maps a unit, its nameplate and charge record onto the diagnosis input's fields", () => {
    expect(circuitFacts(unit, nameplate, { chargeKg: 4.2, chargeReference: null })).toEqual({
      refrigerant: "R410A",
      meteringDevice: "txv",
      targetSuperheatK: 6,
      targetSubcoolingK: null,
      compressorRla: null,
      application: "comfort-cooling",
      liquidLineLengthM: null,
      chargeKg: 4.2,
      chargeReference: null,
    });
  });

  it("puts the facts over what was measured and leaves out what the records do not have", () => {
    const facts = circuitFacts(unit, nameplate, { chargeKg: null, chargeReference: null });
    const merged = withCircuitFacts({ suctionPressureKPa: 800, targetSuperheatK: 20 }, facts, 95);
    expect(merged).toEqual({
      suctionPressureKPa: 800,
      refrigerant: "R410A",
      meteringDevice: "txv",
      targetSuperheatK: 6,
      application: "comfort-cooling",
      atmosphericPressureKPa: 95,
    });
    expect(Object.keys(merged)).not.toContain("chargeKg");
  });
});

import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;
interface Reading {
  circuit: number;
  takenAt: string;
  input: { chargeKg?: number; chargeReference?: unknown };
  result: { chargeDeviation: { kg: number; lowKg: number; highKg: number; basis: string } | null };
}

/**
 * The demo rooftop unit's circuit 1: weighed in to its 4.2 kg nameplate five months ago and
 * settled (its reference point); found short yesterday, its charge recovered and weighed. The
 * estimate from the short readings is checked against the scale.
 */
describe("demo charge history", () => {
  let testApp: TestApp;
  let senior: Agent;
  let rooftopId: string;

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp, { withChargeHistory: true });
    senior = await signedIn(testApp.app, BELLBIRD.senior);
    const units = (await senior.get("/api/equipment")).body.equipment as { id: string; refrigerant: string }[];
    rooftopId = units.find((unit) => unit.refrigerant === "R407C")!.id;
  });
  afterAll(() => testApp.close());

  it("keeps circuit 1's reference points: the drier visit's, replaced by yesterday's weigh-in", async () => {
    const { circuits } = (await senior.get(`/api/equipment/${rooftopId}/charge-references`)).body;
    expect(circuits[0].current).toMatchObject({ source: "weigh-in", setBy: { name: "Sam Toko" }, cleared: null });
    expect(circuits[0].history).toHaveLength(2);
    expect(circuits[0].history[1]).toMatchObject({
      source: "weigh-in",
      setBy: { name: "Lee Hargreaves" },
      cleared: { reason: "Replaced by the reference point settled after a weigh-in" },
    });
    expect(circuits[0].history[1].values.subcoolingK).toBeCloseTo(5, 0);
    expect(circuits[1].current).toBeNull();
  });

  it("puts the recovered-and-weighed shortfall inside the range estimated from the short readings", async () => {
    const visits = (await senior.get(`/api/visits?equipmentId=${rooftopId}&status=awaiting-review`)).body.visits as {
      id: string;
    }[];
    const visit = (await senior.get(`/api/visits/${visits[0]!.id}`)).body.visit;
    const refrigerant = (await senior.get(`/api/visits/${visit.id}/refrigerant`)).body;
    const recoveredKg = refrigerant.movements
      .filter((movement: { kind: string; circuit: number }) => movement.kind === "recovered" && movement.circuit === 1)
      .reduce((sum: number, movement: { kg: number }) => sum + movement.kg, 0);
    // Shortfall = nameplate − recovered (the refrigerant balance; the scale's figure).
    const shortfallKg = recoveredKg - 4.2;
    expect(shortfallKg).toBeCloseTo(-1.1, 6);

    const short = (visit.readings as Reading[]).filter((reading) => reading.circuit === 1).slice(0, 2);
    for (const reading of short) {
      expect(reading.input).toMatchObject({ chargeKg: 4.2 });
      expect(reading.input.chargeReference).toBeDefined();
      // Virtual refrigerant charge (Li & Braun 2009) against the unit's own reference point.
      expect(reading.result.chargeDeviation).toMatchObject({ basis: "unit-reference" });
      const { lowKg, highKg } = reading.result.chargeDeviation!;
      expect(lowKg).toBeLessThanOrEqual(shortfallKg);
      expect(highKg).toBeGreaterThanOrEqual(shortfallKg);
    }
  });
});

/**
 * Saturation tables load per refrigerant (README decision "Saturation tables loaded per
 * refrigerant"): a lookup before its table is loaded names the call that fixes it, loading is
 * cached, and loading one refrigerant loads no other. Each test imports a fresh copy of the
 * engine, since the setup file has already loaded every table into the shared one.
 */
import { beforeEach, describe, expect, it, vi } from "vitest";

type Engine = typeof import("@shared/engine/index.ts");

/** That the loaded table answers, to the kPa; its accuracy is known-values.test.ts's concern. toBeCloseTo digits. */
const LOADED_TABLE_DIGITS = 0;

async function freshEngine(): Promise<Engine> {
  vi.resetModules();
  return import("@shared/engine/index.ts");
}

function thrownBy(engine: Engine, run: () => unknown) {
  try {
    run();
  } catch (error) {
    if (error instanceof engine.PropertyRangeError) return error;
    throw error;
  }
  throw new Error("expected a PropertyRangeError");
}

describe("loadRefrigerant", () => {
  let engine: Engine;
  beforeEach(async () => {
    engine = await freshEngine();
  });

  it("refuses a lookup before its table is loaded, naming the call that loads it", () => {
    expect(engine.isRefrigerantLoaded("R32")).toBe(false);
    for (const lookup of [
      () => engine.saturationPressure("R32", 0),
      () => engine.saturationTemperature("R32", 800),
      () => engine.saturatedState("R32", 0),
      () => engine.getRefrigerant("R32"),
    ]) {
      const error = thrownBy(engine, lookup);
      expect(error.code).toBe("TABLE_NOT_LOADED");
      expect(error.refrigerantId).toBe("R32");
      expect(error.message).toBe(
        'The R32 saturation table is not loaded: await loadRefrigerant("R32") before using it',
      );
    }
  });

  it("makes the lookups synchronous once loaded, and gives the refrigerant's metadata", async () => {
    const info = await engine.loadRefrigerant("R32");
    expect(info.id).toBe("R32");
    expect(info.safety.class).toBe("A2L");
    expect(engine.isRefrigerantLoaded("R32")).toBe(true);
    // R32 at 0 °C: 813.1 kPa absolute (Tillner-Roth & Yokozeki 1997 through the committed table)
    expect(engine.saturationPressure("R32", 0)).toBeCloseTo(813.1, LOADED_TABLE_DIGITS);
  });

  it("loads each table once: repeated and concurrent loads give the same compiled table", async () => {
    const [first, second] = await Promise.all([engine.loadRefrigerant("R410A"), engine.loadRefrigerant("R410A")]);
    const third = await engine.loadRefrigerant("R410A");
    expect(second).toBe(first);
    expect(third).toBe(first);
    expect(engine.getRefrigerant("R410A")).toBe(first);
  });

  it("loads no other refrigerant with it", async () => {
    await engine.loadRefrigerant("R290");
    expect(engine.isRefrigerantLoaded("R290")).toBe(true);
    expect(engine.isRefrigerantLoaded("R600a")).toBe(false);
    expect(thrownBy(engine, () => engine.saturationPressure("R600a", 0)).code).toBe("TABLE_NOT_LOADED");
    expect(thrownBy(engine, () => engine.listRefrigerants()).code).toBe("TABLE_NOT_LOADED");
  });

  it("refuses an id without a table, loaded or not", async () => {
    await expect(engine.loadRefrigerant("R999")).rejects.toMatchObject({
      code: "UNKNOWN_REFRIGERANT",
      refrigerantId: "R999",
    });
    expect(thrownBy(engine, () => engine.saturationPressure("R999", 0)).code).toBe("UNKNOWN_REFRIGERANT");
  });

  it("loads every table for the server and the tests", async () => {
    await engine.loadAllRefrigerants();
    expect(engine.listRefrigerants()).toHaveLength(31);
  });
});

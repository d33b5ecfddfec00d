import { beforeAll, describe, expect, it } from "vitest";
import { measuredCycle, pressureToDisplay, saturatedState } from "@shared/engine/index.ts";
import { loadSinglePhaseTable } from "@shared/property-tables/load-single-phase-table.ts";
import type { DiagnosisInput } from "@shared/schemas/diagnosis.ts";
import { phDiagramData } from "@/features/run-log/utils/ph-diagram-data.ts";

// R407C (zeotropic, about 6 K of glide) and R32 (pure) readings; pressures kPa gauge.
const R407C: DiagnosisInput = Object.freeze({
  refrigerant: "R407C",
  meteringDevice: "txv",
  suctionPressureKPa: 446,
  suctionLineTempC: 12,
  liquidPressureKPa: 1734,
  liquidLineTempC: 38,
  dischargeLineTempC: 90,
});

describe("phDiagramData", () => {
  beforeAll(async () => {
    await Promise.all([loadSinglePhaseTable("R407C"), loadSinglePhaseTable("R32")]);
  });

  it("joins the four states round the circuit, 1 → 2 → 3 → 4 → 1, and keeps them inside the axes", () => {
    const cycle = measuredCycle(R407C);
    const data = phDiagramData("R407C", cycle, null, "kPa");
    expect(data.cycle!.points.map((point) => point.number)).toEqual([1, 2, 3, 4]);
    expect(data.cycle!.segments).toHaveLength(1);
    const loop = data.cycle!.segments[0]!;
    expect(loop).toHaveLength(5);
    expect(loop[0]).toEqual(loop[4]);
    for (const point of data.cycle!.points) {
      expect(point.h).toBeGreaterThan(data.enthalpyDomain[0]);
      expect(point.h).toBeLessThan(data.enthalpyDomain[1]);
      expect(point.p).toBeGreaterThan(data.pressureDomain[0]);
      expect(point.p).toBeLessThan(data.pressureDomain[1]);
    }
    expect(data.enthalpyTicks.length).toBeLessThanOrEqual(9);
  });

  it("leaves a gap where a state is unknown: no discharge temperature, no line through 2", () => {
    const { dischargeLineTempC: _none, ...withoutDischarge } = R407C;
    const data = phDiagramData("R407C", measuredCycle(withoutDischarge), null, "kPa");
    expect(data.cycle!.points.map((point) => point.number)).toEqual([1, 3, 4]);
    // 3 → 4 → 1 only
    const [one, three, four] = data.cycle!.points.map(({ h, p }) => ({ h, p }));
    expect(data.cycle!.segments).toEqual([[three, four, one]]);
  });

  it("draws a blend's evaporating isotherm sloped across the dome (its glide) and a pure fluid's flat", () => {
    const blend = phDiagramData("R407C", measuredCycle(R407C), null, "kPa").isotherms[0]!;
    expect(blend.label).toBe("evaporating (dew)");
    expect(blend.points[0]!.p / blend.points[1]!.p).toBeGreaterThan(1.1);
    const pure = phDiagramData(
      "R32",
      measuredCycle({
        ...R407C,
        refrigerant: "R32",
        suctionPressureKPa: 850,
        liquidPressureKPa: 2600,
        liquidLineTempC: 38,
      }),
      null,
      "kPa",
    ).isotherms[0]!;
    expect(pure.points[0]!.p / pure.points[1]!.p).toBeCloseTo(1, 6);
  });

  it("gives pressures absolute in the user's unit, on the saturation table's dome", () => {
    const data = phDiagramData(
      "R407C",
      measuredCycle(R407C),
      measuredCycle({ ...R407C, suctionPressureKPa: 376 }),
      "psi",
    );
    const state = saturatedState("R407C", 10);
    const near = data.vapourLine.reduce((best, point) =>
      Math.abs(point.h - state.vapourEnthalpyKJPerKg) < Math.abs(best.h - state.vapourEnthalpyKJPerKg) ? point : best,
    );
    expect(near.p).toBeGreaterThan(pressureToDisplay(state.dewPressureKPa, "psi", "absolute") * 0.8);
    expect(data.previous!.points).toHaveLength(4);
    expect(data.cycle!.points[0]!.p).toBeCloseTo(pressureToDisplay(446 + 101.325, "psi", "absolute"), 9);
  });
});

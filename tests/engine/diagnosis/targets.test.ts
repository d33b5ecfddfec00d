import { describe, expect, it } from "vitest";
import {
  diagnosisLimits,
  fixedOrificeTargetSuperheat,
  selectSubcoolingTarget,
  selectSuperheatTarget,
} from "@shared/engine/index";

/** The °F form as commonly taught in trade training (TRADE.md §1.4, memory). */
const fahrenheitTarget = (wetBulbF: number, dryBulbF: number) => (3 * wetBulbF - 80 - dryBulbF) / 2;
const toF = (celsius: number) => celsius * 1.8 + 32;

describe("fixedOrificeTargetSuperheat", () => {
  it("gives 8.1 K at 19 °C wet bulb and 32 °C outdoor (TRADE.md §1.4 check, computed)", () => {
    const target = fixedOrificeTargetSuperheat(19, 32);
    expect(target.status).toBe("ok");
    expect(target.status === "ok" && Number(target.targetK.toFixed(1))).toBe(8.1);
  });

  it("equals the °F trade formula converted to K across the chart range (TRADE.md §1.4)", () => {
    for (const wetBulb of [10, 14.5, 19.4, 24]) {
      for (const outdoor of [13, 27, 35, 46]) {
        const target = fixedOrificeTargetSuperheat(wetBulb, outdoor);
        const expectedK = fahrenheitTarget(toF(wetBulb), toF(outdoor)) / 1.8;
        if (expectedK >= diagnosisLimits.MIN_VALID_TARGET_SUPERHEAT_K) {
          expect(target.status).toBe("ok");
          expect(target.status === "ok" && target.targetK).toBeCloseTo(expectedK, 10);
        } else {
          expect(target.status).toBe("weigh-in");
        }
      }
    }
  });

  it("gives 13 °F (7.2 K) at 67 °F wet bulb and 95 °F outdoor, the AHRI-style rating point (°F formula, memory)", () => {
    const target = fixedOrificeTargetSuperheat((67 - 32) / 1.8, 35);
    expect(target.status === "ok" && target.targetK * 1.8).toBeCloseTo(13, 6);
  });

  it("says to weigh in when the target is below 2.8 K (5 °F) [S10][S17][S18]", () => {
    const target = fixedOrificeTargetSuperheat(15, 40);
    expect(target.status).toBe("weigh-in");
    expect(target.status === "weigh-in" && target.reason).toMatch(/weigh in/);
  });

  it("refuses to extrapolate outside the chart's wet bulb 10–24 °C and outdoor 13–46 °C [S17][S18][S19]", () => {
    expect(fixedOrificeTargetSuperheat(9.9, 30).status).toBe("outside-range");
    expect(fixedOrificeTargetSuperheat(24.1, 30).status).toBe("outside-range");
    expect(fixedOrificeTargetSuperheat(19, 12.7).status).toBe("outside-range");
    expect(fixedOrificeTargetSuperheat(19, 46.1).status).toBe("outside-range");
    expect(fixedOrificeTargetSuperheat(Number.NaN, 30).status).toBe("outside-range");
  });
});

describe("selectSuperheatTarget", () => {
  it("uses the common-practice 2.8–6.7 K band for a TXV without a maker's target [S15][S17]", () => {
    const { band } = selectSuperheatTarget("txv", undefined, null, undefined);
    expect(band).toMatchObject({ lowK: 2.8, highK: 6.7, basis: "common-practice" });
    expect(band?.source).toMatch(/\[S15\]/);
  });

  it("uses the nameplate target ±1.7 K on a TXV/EEV (Title 24 ±3 °F tolerance, memory)", () => {
    const { band } = selectSuperheatTarget("eev", 5, null, undefined);
    expect(band).toMatchObject({ targetK: 5, lowK: 3.3, highK: 6.7, basis: "nameplate" });
  });

  it("lets the unit's own chart value override the formula on a fixed orifice, ±2.8 K [S10][S17]", () => {
    const { band } = selectSuperheatTarget("fixed-orifice", 10, 19, 32);
    expect(band).toMatchObject({ targetK: 10, lowK: 7.2, highK: 12.8, basis: "nameplate" });
  });

  it("uses the formula ±2.8 K (installer tolerance ±5 °F [S10]) on a capillary", () => {
    const { band } = selectSuperheatTarget("capillary", undefined, 19, 32);
    expect(band?.basis).toBe("formula");
    expect(band?.lowK).toBeCloseTo(8.0556 - 2.8, 3);
    expect(band?.highK).toBeCloseTo(8.0556 + 2.8, 3);
  });

  it("gives no band, with a reason, when a fixed orifice lacks wet bulb or outdoor temperature", () => {
    const choice = selectSuperheatTarget("fixed-orifice", undefined, null, 35);
    expect(choice.band).toBeNull();
    expect(choice.note).toMatch(/wet bulb/);
  });
});

describe("selectSubcoolingTarget", () => {
  it("uses the common-practice 4.4–8.3 K band (8–15 °F) without a maker's target [S14]", () => {
    expect(selectSubcoolingTarget(undefined)).toMatchObject({ lowK: 4.4, highK: 8.3, basis: "common-practice" });
    expect(4.4 * 1.8).toBeCloseTo(8, 0);
    expect(8.3 * 1.8).toBeCloseTo(15, 0);
  });

  it("uses the maker's target ±1.7 K, never below zero", () => {
    expect(selectSubcoolingTarget(6)).toMatchObject({ targetK: 6, lowK: 4.3, highK: 7.7, basis: "nameplate" });
    expect(selectSubcoolingTarget(1).lowK).toBe(0);
  });
});

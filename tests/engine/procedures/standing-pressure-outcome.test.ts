import { describe, expect, it } from "vitest";
import { judgeStandingPressure, standingPressureOutcome } from "@shared/engine/index";

describe("standingPressureOutcome (the standing-pressure verdict, or the reading outside the table)", () => {
  it("returns the engine's verdict when both readings are inside the refrigerant's table", () => {
    const input = { refrigerant: "R410A", standingGaugeKPa: 1750, equalisedTempC: 25 };
    expect(standingPressureOutcome(input)).toEqual({ result: judgeStandingPressure(input) });
  });

  it("names the temperature when it is outside the table, whatever the pressure", () => {
    const outcome = standingPressureOutcome({ refrigerant: "R410A", standingGaugeKPa: 1750, equalisedTempC: 90 });
    expect(outcome).toMatchObject({ problem: { field: "equalisedTempC" } });
  });

  it("names the pressure when only the pressure is outside the table", () => {
    expect(standingPressureOutcome({ refrigerant: "R410A", standingGaugeKPa: 6000, equalisedTempC: 25 })).toMatchObject(
      { problem: { field: "standingGaugeKPa" } },
    );
    expect(standingPressureOutcome({ refrigerant: "R410A", standingGaugeKPa: -200, equalisedTempC: 25 })).toMatchObject(
      { problem: { field: "standingGaugeKPa" } },
    );
  });

  it("names the refrigerant when it has no table", () => {
    expect(standingPressureOutcome({ refrigerant: "R999", standingGaugeKPa: 500, equalisedTempC: 20 })).toMatchObject({
      problem: { field: "refrigerant" },
    });
  });
});

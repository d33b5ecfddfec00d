import { describe, expect, it } from "vitest";
import { draftFromInput, emptyDraft, parseDraft } from "@/features/run-log/utils/reading-draft.ts";

const ATMOSPHERE = 101.325;

describe("reading draft (display units ↔ stored SI-metric)", () => {
  it("reads what a technician typed in kPa and °C, with a comma decimal", () => {
    const draft = {
      ...emptyDraft(),
      suctionPressureKPa: "464",
      suctionLineTempC: "12,5",
      liquidPressureKPa: "1734",
      liquidLineTempC: "37",
    };
    const parsed = parseDraft(draft, { temperature: "C", pressure: "kPa" }, ATMOSPHERE);
    expect(parsed.missing).toEqual([]);
    expect(parsed.values).toMatchObject({
      suctionPressureKPa: 464,
      suctionLineTempC: 12.5,
      liquidPressureKPa: 1734,
      liquidLineTempC: 37,
    });
  });

  it("converts psig and °F to kPa gauge and °C (1 psi = 6.894757 kPa, NIST SP 811)", () => {
    const draft = {
      ...emptyDraft(),
      suctionPressureKPa: "100",
      suctionLineTempC: "50",
      liquidPressureKPa: "300",
      liquidLineTempC: "100",
    };
    const parsed = parseDraft(draft, { temperature: "F", pressure: "psi" }, ATMOSPHERE);
    expect(parsed.values.suctionPressureKPa).toBeCloseTo(689.476, 2);
    expect(parsed.values.suctionLineTempC).toBeCloseTo(10, 6);
    expect(parsed.values.liquidLineTempC).toBeCloseTo(37.778, 3);
  });

  it("flags text that is not a number and lists required fields still empty, losing nothing", () => {
    const draft = { ...emptyDraft(), suctionPressureKPa: "4x4" };
    const parsed = parseDraft(draft, { temperature: "C", pressure: "kPa" }, ATMOSPHERE);
    expect(parsed.typingErrors.suctionPressureKPa).toMatch(/number/);
    expect(parsed.missing).toEqual(["suctionLineTempC", "liquidPressureKPa", "liquidLineTempC"]);
    expect(draft.suctionPressureKPa).toBe("4x4");
  });

  it("carries a stored reading forward in the user's units", () => {
    const draft = draftFromInput(
      { suctionPressureKPa: 689.476, suctionLineTempC: 10, liquidTempLocation: "discharge-line" },
      { temperature: "F", pressure: "psi" },
      ATMOSPHERE,
    );
    expect(draft.suctionPressureKPa).toBe("100.0");
    expect(draft.suctionLineTempC).toBe("50.0");
    expect(draft.liquidTempLocation).toBe("discharge-line");
    expect(draft.liquidPressureKPa).toBe("");
  });
});

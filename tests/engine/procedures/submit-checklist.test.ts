import { describe, expect, it } from "vitest";
import { CHARGE_MATCH_TOLERANCE_KG, submitChecklist, type SubmitChecklistInput } from "@shared/engine/index";

const VOID = { at: "2026-03-01T10:00:00.000Z", by: null, reason: "typed on the wrong circuit" };

/** A two-circuit visit with nothing wrong: a reason, readings on both circuits, no tests, no charge. */
function cleanVisit(overrides: Partial<SubmitChecklistInput> = {}): SubmitChecklistInput {
  return Object.freeze({
    reason: "Not cooling; tenant reports warm air",
    circuits: [1, 2],
    readings: [
      { circuit: 1, voided: null },
      { circuit: 2, voided: null },
    ],
    adjustments: [],
    registerChargedKg: 0,
    tests: { pressureTests: [], evacuations: [], standingPressureChecks: [], electricalChecks: [] },
    ...overrides,
  });
}

describe("submitChecklist", () => {
  it("has nothing to say about a complete visit", () => {
    expect(submitChecklist(cleanVisit())).toEqual([]);
  });

  it("blocks on a missing reason (empty or only spaces), and only on that", () => {
    for (const reason of ["", "   "]) {
      const items = submitChecklist(cleanVisit({ reason }));
      expect(items).toEqual([expect.objectContaining({ kind: "missing-reason", blocking: true })]);
    }
  });

  it("names each circuit without a standing reading, in order; a voided reading counts for nothing", () => {
    const items = submitChecklist(
      cleanVisit({
        circuits: [3, 1, 2],
        readings: [
          { circuit: 2, voided: null },
          { circuit: 1, voided: VOID },
        ],
      }),
    );
    expect(items.map((item) => item.message)).toEqual(["Circuit 1 has no readings", "Circuit 3 has no readings"]);
    expect(items.every((item) => !item.blocking)).toBe(true);
  });

  it("warns of every failed test still on the record, with the engine's reason, and ignores passes, warnings and voided failures", () => {
    const items = submitChecklist(
      cleanVisit({
        tests: {
          pressureTests: [
            { voided: null, verdict: "fail", reason: "Corrected drop 35 kPa, over the 20 kPa allowed" },
            { voided: VOID, verdict: "fail", reason: "entered wrongly" },
          ],
          evacuations: [
            { voided: null, verdict: "fail", reason: "Rose past 1500 microns and kept rising: a leak" },
            { voided: null, verdict: null, reason: "Still pumping" },
          ],
          standingPressureChecks: [{ voided: null, verdict: "warn", reason: "Within 3 K" }],
          electricalChecks: [
            { voided: null, verdict: "fail", reason: "Insulation 0.4 MΩ, under the 1 MΩ minimum" },
            { voided: null, verdict: "pass", reason: "Fine" },
          ],
        },
      }),
    );
    expect(items.map((item) => [item.kind, item.message])).toEqual([
      ["failed-test", "Pressure test failed: Corrected drop 35 kPa, over the 20 kPa allowed"],
      ["failed-test", "Evacuation / decay test failed: Rose past 1500 microns and kept rising: a leak"],
      ["failed-test", "Electrical check failed: Insulation 0.4 MΩ, under the 1 MΩ minimum"],
    ]);
  });

  // EU F-gas equipment records list the quantity added at every service (Regulation 2024/573
  // Art. 7; 517/2014 as summarised in TRADE.md §8.2 [S83][S106]): a kilogram marked as charged
  // on the run log must also be in the register by cylinder.
  it("warns when kilograms charged on the run log are not all in the register", () => {
    const none = submitChecklist(cleanVisit({ adjustments: [{ kind: "charge-added", amountKg: 0.8, voided: null }] }));
    expect(none).toEqual([
      {
        kind: "charge-not-in-register",
        blocking: false,
        message: "0.8 kg charged on the run log but none in the register: log it by cylinder (Refrigerant section)",
      },
    ]);

    const part = submitChecklist(
      cleanVisit({
        adjustments: [
          { kind: "charge-added", amountKg: 0.5, voided: null },
          { kind: "charge-added", amountKg: 0.7, voided: null },
        ],
        registerChargedKg: 0.5,
      }),
    );
    expect(part.map((item) => item.message)).toEqual([
      "1.2 kg charged on the run log, 0.5 kg in the register: log the other 0.7 kg by cylinder",
    ]);
  });

  it("is satisfied when the register holds the charge (the demo's 3.1 kg reused + 1.1 kg new for a 4.2 kg weigh-in), within the scale's 10 g", () => {
    const weighIn = [{ kind: "charge-added" as const, amountKg: 4.2, voided: null }];
    expect(submitChecklist(cleanVisit({ adjustments: weighIn, registerChargedKg: 3.1 + 1.1 }))).toEqual([]);
    expect(
      submitChecklist(cleanVisit({ adjustments: weighIn, registerChargedKg: 4.2 - CHARGE_MATCH_TOLERANCE_KG / 2 })),
    ).toEqual([]);
    // Removals, other adjustments and voided charge marks are not charged refrigerant.
    expect(
      submitChecklist(
        cleanVisit({
          adjustments: [
            { kind: "charge-removed", amountKg: 1, voided: null },
            { kind: "metering", amountKg: null, voided: null },
            { kind: "charge-added", amountKg: 2, voided: VOID },
          ],
        }),
      ),
    ).toEqual([]);
  });

  it("puts the blocking reason first when several things are wrong", () => {
    const items = submitChecklist(
      cleanVisit({ reason: "", readings: [], adjustments: [{ kind: "charge-added", amountKg: 1, voided: null }] }),
    );
    expect(items.map((item) => item.kind)).toEqual([
      "missing-reason",
      "circuit-without-readings",
      "circuit-without-readings",
      "charge-not-in-register",
    ]);
    expect(items.filter((item) => item.blocking)).toHaveLength(1);
  });
});

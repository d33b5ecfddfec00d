import { readdirSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { DIAGNOSIS_RULES } from "@shared/engine/index";
import { FIXED_SUPERHEAT_PROFILE, VALVE_SUPERHEAT_PROFILE } from "@shared/engine/diagnosis/rules/superheat-vs-target";
import { FIXED_SUBCOOLING_PROFILE, VALVE_SUBCOOLING_PROFILE } from "@shared/engine/diagnosis/rules/subcooling-vs-target";
import { HIGH_SUPERHEAT_BY_SUBCOOLING, LOW_SUPERHEAT_BY_SUBCOOLING } from "@shared/engine/diagnosis/rules/superheat-subcooling-pairing";
import { HIGH_HEAD_BY_SUBCOOLING } from "@shared/engine/diagnosis/rules/high-head-pairing";
import type { EvidenceProfile } from "@shared/engine/diagnosis/types";

const rulesFolder = path.resolve(import.meta.dirname, "../../../shared/engine/diagnosis/rules");
const nonIncreasing = (weights: readonly number[] | undefined) => !weights || (weights[0]! >= weights[1]! && weights[1]! >= weights[2]!);
const nonDecreasing = (weights: readonly number[] | undefined) => !weights || (weights[0]! <= weights[1]! && weights[1]! <= weights[2]!);

describe("diagnosis rule registry", () => {
  it("lists every rule file once, each with a kebab-case id, a one-line description and a source", () => {
    const files = readdirSync(rulesFolder).filter((name) => !["registry.ts", "banded-finding.ts", "no-output.ts"].includes(name));
    expect(DIAGNOSIS_RULES.length).toBe(files.length);
    const ids = DIAGNOSIS_RULES.map((rule) => rule.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const rule of DIAGNOSIS_RULES) {
      expect(files).toContain(`${rule.id}.ts`);
      expect(rule.id).toMatch(/^[a-z]+(-[a-z]+)*$/);
      expect(rule.description).not.toMatch(/\n/);
      expect(rule.description.length).toBeGreaterThan(10);
      expect(rule.source).toMatch(/\[S\d+\]|common practice|memory|TRADE\.md|discharge gas/);
    }
  });

  it("keeps every evidence weight within ±1.5 per rule", () => {
    const profiles: EvidenceProfile[] = [FIXED_SUPERHEAT_PROFILE, VALVE_SUPERHEAT_PROFILE, FIXED_SUBCOOLING_PROFILE, VALVE_SUBCOOLING_PROFILE, HIGH_SUPERHEAT_BY_SUBCOOLING, LOW_SUPERHEAT_BY_SUBCOOLING, HIGH_HEAD_BY_SUBCOOLING];
    for (const profile of profiles) for (const weights of Object.values(profile)) for (const weight of weights!) expect(Math.abs(weight)).toBeLessThanOrEqual(1.5);
  });

  // Monotonic profiles are what make the property tests hold (TRADE.md §2: SC low = undercharge,
  // SC high = overcharge [S21][S24]; SH low = overcharge on a fixed orifice [S10][S17]).
  it("never lets more subcooling add undercharge evidence or remove overcharge evidence", () => {
    for (const profile of [FIXED_SUBCOOLING_PROFILE, VALVE_SUBCOOLING_PROFILE, HIGH_SUPERHEAT_BY_SUBCOOLING, LOW_SUPERHEAT_BY_SUBCOOLING, HIGH_HEAD_BY_SUBCOOLING]) {
      expect(nonIncreasing(profile.undercharged)).toBe(true);
      expect(nonDecreasing(profile.overcharged)).toBe(true);
    }
  });

  it("never lets more superheat add overcharge evidence", () => {
    expect(nonIncreasing(FIXED_SUPERHEAT_PROFILE.overcharged)).toBe(true);
    expect(nonIncreasing(VALVE_SUPERHEAT_PROFILE.overcharged)).toBe(true);
    // The low-superheat pairing is scaled by how far superheat is below band, so its overcharge
    // weights must never be negative.
    expect(LOW_SUPERHEAT_BY_SUBCOOLING.overcharged!.every((weight) => weight >= 0)).toBe(true);
  });

  it("weighs superheat more on fixed devices and subcooling more on TXV/EEV (TRADE.md §2 notes [S11][S14])", () => {
    expect(FIXED_SUPERHEAT_PROFILE.undercharged![2]).toBeGreaterThan(VALVE_SUPERHEAT_PROFILE.undercharged![2]);
    expect(VALVE_SUBCOOLING_PROFILE.undercharged![0]).toBeGreaterThan(FIXED_SUBCOOLING_PROFILE.undercharged![0]);
  });
});

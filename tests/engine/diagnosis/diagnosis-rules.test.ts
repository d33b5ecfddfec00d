import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { CHARGE_STATES, type EvidenceState } from "@shared/schemas/diagnosis";
import { DIAGNOSIS_RULES, EXPECTATIONS, SIGNATURE_FEATURES, SIGNATURES, signatureMatch } from "@shared/engine/index";
import { signatureCell } from "@shared/engine/diagnosis/signature-cell";

const rulesFolder = path.resolve(import.meta.dirname, "../../../shared/engine/diagnosis/rules");
const docPath = path.resolve(import.meta.dirname, "../../../docs/diagnosis-signatures.md");
const STATES = CHARGE_STATES.filter((state): state is EvidenceState => state !== "insufficient-data");
const STRENGTHS = Array.from({ length: 41 }, (_, index) => -1 + index / 20);

describe("diagnosis rule registry", () => {
  it("lists every rule file once, each with a kebab-case id, a one-line description and a source", () => {
    const files = readdirSync(rulesFolder).filter(
      (name) => !["registry.ts", "banded-finding.ts", "no-output.ts"].includes(name),
    );
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
});

describe("signature table", () => {
  it("has a row for every state that evidence can point to, each with a source", () => {
    expect(Object.keys(SIGNATURES).sort()).toEqual([...STATES].sort());
    for (const state of STATES) expect(SIGNATURES[state].source).toMatch(/\[S\d+\]|common practice|memory/);
  });

  it("keeps every weight between 0 and 1.5 and every cell a known expectation", () => {
    for (const state of STATES) {
      for (const feature of SIGNATURE_FEATURES) {
        for (const family of ["fixed", "expansion-valve"] as const) {
          const cell = signatureCell(state, feature, family);
          if (!cell) continue;
          expect(EXPECTATIONS).toContain(cell.expect);
          expect(cell.weight).toBeGreaterThan(0);
          expect(cell.weight).toBeLessThanOrEqual(1.5);
        }
      }
    }
  });

  // TRADE.md §2: subcooling low = undercharge, high = overcharge [S21][S24]; superheat low =
  // overcharge on a fixed orifice [S10][S17]. Monotonic cells are what make the property tests hold.
  it("never lets more subcooling point towards undercharge or away from overcharge", () => {
    for (const family of ["fixed", "expansion-valve"] as const) {
      const under = signatureCell("undercharged", "subcooling", family)!;
      const over = signatureCell("overcharged", "subcooling", family)!;
      for (let index = 1; index < STRENGTHS.length; index += 1) {
        const [before, after] = [STRENGTHS[index - 1]!, STRENGTHS[index]!];
        expect(signatureMatch(under.expect, after, after)).toBeLessThanOrEqual(
          signatureMatch(under.expect, before, before),
        );
        expect(signatureMatch(over.expect, after, after)).toBeGreaterThanOrEqual(
          signatureMatch(over.expect, before, before),
        );
      }
    }
  });

  it("never lets more superheat point towards overcharge", () => {
    for (const family of ["fixed", "expansion-valve"] as const) {
      const over = signatureCell("overcharged", "superheat", family)!;
      for (let index = 1; index < STRENGTHS.length; index += 1) {
        expect(signatureMatch(over.expect, STRENGTHS[index]!, 0)).toBeLessThanOrEqual(
          signatureMatch(over.expect, STRENGTHS[index - 1]!, 0),
        );
      }
    }
  });

  it("weighs superheat more on fixed devices and subcooling more on TXV/EEV (TRADE.md §2 notes [S11][S14])", () => {
    expect(signatureCell("undercharged", "superheat", "fixed")!.weight).toBeGreaterThan(
      signatureCell("undercharged", "superheat", "expansion-valve")!.weight,
    );
    expect(signatureCell("undercharged", "subcooling", "expansion-valve")!.weight).toBeGreaterThan(
      signatureCell("undercharged", "subcooling", "fixed")!.weight,
    );
  });

  it("matches between −2 and +1, continuously, with the symptom in full scoring +1", () => {
    for (const expect_ of EXPECTATIONS) {
      for (let index = 0; index < STRENGTHS.length; index += 1) {
        const value = signatureMatch(expect_, STRENGTHS[index]!, STRENGTHS[index]!);
        expect(value).toBeGreaterThanOrEqual(-2);
        expect(value).toBeLessThanOrEqual(1);
        if (index > 0)
          expect(
            Math.abs(value - signatureMatch(expect_, STRENGTHS[index - 1]!, STRENGTHS[index - 1]!)),
          ).toBeLessThanOrEqual(0.2);
      }
    }
    expect(signatureMatch("high", 1, 0)).toBe(1);
    expect(signatureMatch("low", -1, 0)).toBe(1);
  });

  // The document technicians read is the table the engine runs: every cell of the code appears
  // in docs/diagnosis-signatures.md as written there.
  it("is the table docs/diagnosis-signatures.md shows", () => {
    const doc = readFileSync(docPath, "utf8");
    const WORDS: Record<string, string> = {
      low: "low",
      "low-or-normal": "low–normal",
      normal: "normal",
      "normal-or-high": "normal–high",
      high: "high",
      "below-pivot": "below pivot",
      "above-pivot": "above pivot",
    };
    for (const state of STATES) {
      const line = doc.split("\n").find((row) => row.startsWith(`| \`${state}\``));
      expect(line, `row for ${state}`).toBeDefined();
      const cells = line!
        .split("|")
        .slice(2, 2 + SIGNATURE_FEATURES.length)
        .map((cell) => cell.trim());
      SIGNATURE_FEATURES.forEach((feature, column) => {
        const valve = signatureCell(state, feature, "expansion-valve");
        const fixed = signatureCell(state, feature, "fixed");
        const text = (cell: typeof valve) => (cell ? `${WORDS[cell.expect]} ${cell.weight}` : "—");
        const expected = text(valve) === text(fixed) ? text(valve) : `valve ${text(valve)}; fixed ${text(fixed)}`;
        expect(cells[column], `${state} · ${feature}`).toBe(expected);
      });
    }
  });
});

import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  BROKEN_CHARACTER_MESSAGE,
  CONTROL_CHARACTER_MESSAGE,
  SINGLE_LINE_MESSAGE,
  isCleanText,
  text,
} from "@shared/schemas/text.ts";

const messages = (result: { error?: { issues: { message: string }[] } }) =>
  result.error?.issues.map((issue) => issue.message) ?? [];

describe("text", () => {
  it("trims and accepts ordinary text, accents and characters beyond the BMP", () => {
    expect(text().parse("  Wattle Lane Café ❄️ 🧊  ")).toBe("Wattle Lane Café ❄️ 🧊");
    expect(text({ trim: false }).parse("  keep  ")).toBe("  keep  ");
  });

  it("refuses NUL and other control characters (PostgreSQL text cannot hold NUL)", () => {
    expect(messages(text().safeParse("a\u0000b"))).toEqual([SINGLE_LINE_MESSAGE]);
    expect(messages(text({ multiline: true }).safeParse("a\u0000b"))).toEqual([CONTROL_CHARACTER_MESSAGE]);
    expect(messages(text({ multiline: true }).safeParse("DEL\u007F"))).toEqual([CONTROL_CHARACTER_MESSAGE]);
    expect(messages(text({ multiline: true }).safeParse("C1\u0085"))).toEqual([CONTROL_CHARACTER_MESSAGE]);
  });

  it("keeps tabs and line breaks only in multi-line text", () => {
    expect(text({ multiline: true }).parse("one\r\n\ttwo")).toBe("one\r\n\ttwo");
    expect(messages(text().safeParse("one\ttwo"))).toEqual([SINGLE_LINE_MESSAGE]);
    // Surrounding white space, line breaks included, is trimmed before the check.
    expect(text().parse("Sam Toko\n")).toBe("Sam Toko");
  });

  it("refuses lone surrogates, high or low, anywhere (no UTF-8 form; jsonb refuses them)", () => {
    for (const value of ["\uD83D", "a\uD83Db", "\uDE00a", "\uDE00\uD83D", "ok\uD83D\uD83D\uDE00"]) {
      expect(messages(text({ multiline: true }).safeParse(value)), JSON.stringify(value)).toEqual([
        BROKEN_CHARACTER_MESSAGE,
      ]);
    }
    expect(text().parse("\uD83D\uDE00")).toBe("😀");
  });

  it("agrees with String.prototype.isWellFormed on every string (a property check)", () => {
    fc.assert(
      fc.property(fc.string({ unit: "binary" }), (value) => {
        const controls = [...value].some((char) => {
          const code = char.codePointAt(0)!;
          return (code < 0x20 && ![0x09, 0x0a, 0x0d].includes(code)) || (code >= 0x7f && code <= 0x9f);
        });
        // ES2024's own test of lone surrogates (Node 20 has it; the project's lib is ES2023).
        const wellFormed = (value as string & { isWellFormed(): boolean }).isWellFormed();
        expect(isCleanText(value, true)).toBe(wellFormed && !controls);
      }),
      { seed: 13, numRuns: 1_000 },
    );
  });
});

import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { compactSearchText, matchesSearch, searchTerms } from "@shared/format/search-terms.ts";

describe("searchTerms", () => {
  it("finds a refrigerant however it is written", () => {
    expect(matchesSearch("rtu-1 packaged rooftop unit wattle lane clinic r407c", "R-407C rooftop")).toBe(true);
    expect(matchesSearch("split r32", "32")).toBe(true);
    expect(matchesSearch("split r32", "r410a")).toBe(false);
  });

  // The server searches one compact text per record with one LIKE per word (server/db/keyset.ts
  // containsTerm): that is the same rule only if "as typed, or without dashes, or without the r"
  // always comes down to "without the r, in the compact text".
  it("matches a word exactly when its withoutR is in the compact text", () => {
    const letters = fc.constantFrom("a", "r", "3", "2", "-", "–", " ", "x", "4", "\t");
    const text = fc.array(letters, { maxLength: 24 }).map((chars) => chars.join(""));
    const query = fc.array(letters, { minLength: 1, maxLength: 8 }).map((chars) => chars.join(""));
    fc.assert(
      fc.property(text, query, (searchText, typed) => {
        const compact = compactSearchText(searchText);
        expect(matchesSearch(searchText, typed)).toBe(
          searchTerms(typed).every((term) => compact.includes(term.withoutR)),
        );
      }),
      { numRuns: 2000 },
    );
  });
});

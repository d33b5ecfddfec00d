import { describe, expect, it } from "vitest";
import { cite } from "@shared/engine/sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "@shared/engine/sources/diagnosis-sources.ts";
import { numberSources } from "@/features/run-log/utils/number-sources.ts";

describe("numberSources", () => {
  it("numbers each distinct source once, in the order first cited (the numeric citation style of the ICMJE Vancouver references)", () => {
    const sources = Object.freeze([
      cite(DIAGNOSIS_SOURCES, ["S10"]),
      cite(DIAGNOSIS_SOURCES, ["S33"]),
      cite(DIAGNOSIS_SOURCES, ["S10"]),
      cite(DIAGNOSIS_SOURCES, ["S9", "S10"]),
    ]);
    const { list, numbers } = numberSources(sources);
    expect(list).toEqual([
      cite(DIAGNOSIS_SOURCES, ["S10"]),
      cite(DIAGNOSIS_SOURCES, ["S33"]),
      cite(DIAGNOSIS_SOURCES, ["S9", "S10"]),
    ]);
    expect(numbers).toEqual([1, 2, 1, 3]);
  });

  it("treats a source with stray spaces as the same source", () => {
    expect(numberSources(["A", " A "]).numbers).toEqual([1, 1]);
  });

  it("gives an empty list for no sources", () => {
    expect(numberSources([])).toEqual({ list: [], numbers: [] });
  });
});

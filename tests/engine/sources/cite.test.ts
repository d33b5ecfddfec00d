import { describe, expect, it } from "vitest";
import { cite } from "@shared/engine/sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "@shared/engine/sources/diagnosis-sources.ts";
import { COMMON_PRACTICE } from "@shared/engine/sources/marks.ts";
import { PROCEDURE_SOURCES } from "@shared/engine/sources/procedure-sources.ts";

describe("cite", () => {
  it("names each tag with its title from the list it is given, then the marks", () => {
    expect(cite(DIAGNOSIS_SOURCES, ["S33"])).toBe("[S33] HVAC School, What should the Air Delta T be?");
    expect(cite(PROCEDURE_SOURCES, ["S60"], COMMON_PRACTICE)).toBe(
      "[S60] sens4.com, Units for vacuum measurement (1 Torr = 133.322 Pa = 1000 micron); common practice",
    );
  });

  it("reads a tag's title from the list passed, where the two lists word it differently", () => {
    expect(cite(DIAGNOSIS_SOURCES, ["S39"])).toBe("[S39] rhvactools.com, Compressor Rated Load Amperage (weak)");
    expect(cite(PROCEDURE_SOURCES, ["S39"])).toBe("[S39] rhvactools.com, Compressor Rated Load Amperage (RLA) (weak)");
  });
});

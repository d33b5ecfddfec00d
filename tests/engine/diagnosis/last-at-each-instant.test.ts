import { describe, expect, it } from "vitest";
import { lastAtEachInstant } from "@shared/engine/index.ts";

describe("lastAtEachInstant", () => {
  const at = (t: number, name: string) => ({ t, name });
  it("keeps the last of each run of equal times, in order", () => {
    const kept = lastAtEachInstant(
      [at(0, "a"), at(0, "b"), at(1, "c"), at(2, "d"), at(2, "e"), at(2, "f")],
      (r) => r.t,
    );
    expect(kept.map((r) => r.name)).toEqual(["b", "c", "f"]);
  });
  it("leaves a strictly increasing series and an empty one as they are", () => {
    const series = [at(0, "a"), at(1, "b")];
    expect(lastAtEachInstant(series, (r) => r.t)).toEqual(series);
    expect(lastAtEachInstant([], (r: { t: number }) => r.t)).toEqual([]);
  });
});

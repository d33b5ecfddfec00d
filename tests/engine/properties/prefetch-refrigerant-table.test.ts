import { describe, expect, it, vi } from "vitest";
import { loadRefrigerant } from "@shared/engine/index.ts";
import { SATURATION_TABLE_IMPORTS } from "@shared/engine/properties/saturation-table-imports.ts";
import { prefetchRefrigerantTable } from "@shared/property-tables/prefetch-refrigerant-table.ts";

describe("prefetchRefrigerantTable", () => {
  it("leaves an id without a table alone, without throwing", () => {
    expect(() => prefetchRefrigerantTable("R9999")).not.toThrow();
    expect(() => prefetchRefrigerantTable("constructor")).not.toThrow();
  });

  it("imports the same module loadRefrigerant registers, so the table is fetched once", async () => {
    const importTable = vi.spyOn(
      SATURATION_TABLE_IMPORTS as Record<string, () => Promise<{ default: unknown }>>,
      "R32",
    );
    prefetchRefrigerantTable("R32");
    expect(importTable).toHaveBeenCalledTimes(1);
    const prefetched = await importTable.mock.results[0]!.value;
    const again = await SATURATION_TABLE_IMPORTS.R32!();
    expect(again).toBe(prefetched);
    await expect(loadRefrigerant("R32")).resolves.toMatchObject({ id: "R32" });
    importTable.mockRestore();
  });
});

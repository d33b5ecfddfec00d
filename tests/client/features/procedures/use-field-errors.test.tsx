// @vitest-environment jsdom
/** A field's message from the last save goes when that field is changed, and only then. */
import { act, cleanup, renderHook } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { useFieldErrors } from "@/features/procedures/hooks/use-field-errors.ts";

afterEach(cleanup);

describe("useFieldErrors", () => {
  it("drops a message once its field is corrected and keeps the others", () => {
    const { result, rerender } = renderHook(({ typed }) => useFieldErrors(typed), {
      initialProps: {
        typed: { startGaugeKPa: "12,,5", holdMinutes: "", leaks: [] as unknown[] } as Record<string, unknown>,
      },
    });
    act(() =>
      result.current[1]({ startGaugeKPa: "Enter a number", holdMinutes: "Required", "leaks.0.location": "Say where" }),
    );
    expect(Object.keys(result.current[0]).sort()).toEqual(["holdMinutes", "leaks.0.location", "startGaugeKPa"]);

    rerender({ typed: { startGaugeKPa: "1250", holdMinutes: "", leaks: [] } });
    expect(result.current[0]).toEqual({ holdMinutes: "Required" });
  });

  it("keeps a message whose field it does not know until the next save", () => {
    const { result, rerender } = renderHook(({ typed }) => useFieldErrors(typed), {
      initialProps: { typed: { note: "" } as Record<string, unknown> },
    });
    act(() => result.current[1]({ atmosphericPressureKPa: "Out of range" }));
    rerender({ typed: { note: "changed" } });
    expect(result.current[0]).toEqual({ atmosphericPressureKPa: "Out of range" });
  });
});

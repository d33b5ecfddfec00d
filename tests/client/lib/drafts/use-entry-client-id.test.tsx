// @vitest-environment jsdom
/** The client id of an entry: one per entry, the same on every retry (README decision 026). */
import { cleanup, renderHook } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { useEntryClientId } from "@/lib/drafts/use-entry-client-id.ts";

afterEach(cleanup);

describe("useEntryClientId", () => {
  it("keeps one id across retries of an entry and makes a new one once it is released", () => {
    const { result, rerender } = renderHook(() => useEntryClientId());
    const first = result.current.take();
    expect(first).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    rerender();
    // A retry after a lost answer sends the same id.
    expect(result.current.take()).toBe(first);
    result.current.release();
    expect(result.current.take()).not.toBe(first);
  });
});

import { afterEach, beforeEach, vi } from "vitest";

// A test that logs an unexpected console.error fails: silent errors hide real bugs
// (the pattern of Epic Stack's tests/setup/setup-test-env.ts).
let errorSpy: ReturnType<typeof vi.spyOn> | undefined;

beforeEach(() => {
  errorSpy = vi.spyOn(console, "error").mockImplementation((...args: unknown[]) => {
    throw new Error(`console.error was called: ${args.map(String).join(" ")}`);
  });
});

afterEach(() => {
  errorSpy?.mockRestore();
});

// Screens rendered in a page (jsdom) are unmounted after each test, as Testing Library does by
// itself where test functions are global: one left mounted kept listening, and an answer arriving
// after its page was gone (a library still loading) failed the run with "window is not defined".
if (typeof document !== "undefined") {
  const { cleanup } = await import("@testing-library/react");
  afterEach(cleanup);
}

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

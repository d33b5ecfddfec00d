/**
 * Test helper: runs a lookup that must refuse its input and returns the PropertyRangeError it
 * threw (any other error, or none, fails the test).
 */
import { PropertyRangeError } from "@shared/engine/index.ts";

export function thrownPropertyError(run: () => unknown): PropertyRangeError {
  try {
    run();
  } catch (error) {
    if (error instanceof PropertyRangeError) return error;
    throw error;
  }
  throw new Error("expected a PropertyRangeError");
}

/** SQLSTATE of a unique violation (PostgreSQL Appendix A, "Class 23 — Integrity Constraint Violation"). */
const UNIQUE_VIOLATION = "23505";

interface DatabaseError {
  code?: unknown;
  constraint?: unknown;
  cause?: unknown;
}

/**
 * The constraint a unique violation broke, when the error is one (thrown by the driver, or by
 * Drizzle around it); undefined otherwise. Two requests that race past a "does it exist?" check
 * end here: the database's unique index is the final guard.
 */
export function uniqueViolation(error: unknown): { constraint: string | undefined } | undefined {
  for (
    let current = error as DatabaseError | undefined, depth = 0;
    current && depth < 5;
    current = current.cause as DatabaseError | undefined, depth++
  ) {
    if (current.code === UNIQUE_VIOLATION)
      return { constraint: typeof current.constraint === "string" ? current.constraint : undefined };
  }
  return undefined;
}

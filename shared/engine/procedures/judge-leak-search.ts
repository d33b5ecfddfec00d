import type { Verdict } from "../../schemas/procedures.ts";
import { cite } from "../sources/cite.ts";
import { PROCEDURE_SOURCES } from "../sources/procedure-sources.ts";
import { COMMON_PRACTICE } from "../sources/marks.ts";

/** What a leak search found, as far as the verdict needs it. */
export interface LeakSearchFindings {
  leaks: { location: string; repaired: boolean }[];
  /** What the recheck after repair found. */
  recheck: "not-done" | "no-leak" | "still-leaking";
}

// Decay-curve guides say: leak → find it, repair, re-pressure-test [S58][S55]; the order of work
// itself is common practice. Topping up before the leak is repaired is not allowed under the
// Australian codes of practice (weak source / memory), so an unrepaired leak fails.
const SOURCE = cite(
  PROCEDURE_SOURCES,
  ["S58", "S55"],
  `find, repair and re-test before evacuating and charging (${COMMON_PRACTICE})`,
);

/**
 * Judge a leak search: is the system fit to evacuate and charge?
 *
 * The trade's order of work is find → repair → re-test: a leak found and not repaired, or one
 * still leaking on recheck, fails; a repair not yet proven by a recheck is a warning; nothing
 * found, or every repair proven tight, passes. It does not weigh the method used: a search that
 * found nothing is only as good as its method, which the record names beside the verdict.
 *
 * Units: none. Valid for any number of leaks (0 or more).
 *
 * @param findings the leaks found (with whether each was repaired) and the recheck result
 * @returns verdict, one-sentence reason and source
 * @throws never
 * @example
 * judgeLeakSearch({ leaks: [{ location: "Flare nut, liquid service valve", repaired: true }], recheck: "no-leak" })
 * // → { verdict: "pass", reason: "1 leak found, repaired and tight on recheck.", source: "…" }
 */
export function judgeLeakSearch(findings: LeakSearchFindings): Verdict {
  const found = findings.leaks.length;
  const unrepaired = findings.leaks.filter((leak) => !leak.repaired);
  const plural = (count: number) => `${count} leak${count === 1 ? "" : "s"}`;
  if (found === 0) {
    return { verdict: "pass", reason: "No leak found at the places checked.", source: SOURCE };
  }
  if (findings.recheck === "still-leaking") {
    return { verdict: "fail", reason: "Still leaking on recheck: repair again before evacuating.", source: SOURCE };
  }
  if (unrepaired.length > 0) {
    return {
      verdict: "fail",
      reason: `${plural(unrepaired.length)} not repaired (${unrepaired.map((leak) => leak.location).join("; ")}): repair before evacuating and charging.`,
      source: SOURCE,
    };
  }
  if (findings.recheck === "not-done") {
    return {
      verdict: "warn",
      reason: `${plural(found)} repaired but not rechecked yet: recheck before evacuating.`,
      source: SOURCE,
    };
  }
  return { verdict: "pass", reason: `${plural(found)} found, repaired and tight on recheck.`, source: SOURCE };
}

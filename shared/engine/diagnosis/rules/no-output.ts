import type { RuleOutput } from "../types.ts";

/** What a rule returns when it has nothing to say; shared and frozen so no call allocates it. */
export const NO_OUTPUT: RuleOutput = Object.freeze({ findings: Object.freeze([]), warnings: Object.freeze([]) });

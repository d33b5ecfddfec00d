/**
 * Marks for rules and limits without a published source (TRADE.md "How to read the marks"),
 * written after or instead of the cited titles.
 */
export const COMMON_PRACTICE = "common practice";
export const MEMORY = "memory (unverified)";
export const COMPUTED = "computed from the definition";

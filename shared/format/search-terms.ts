/**
 * How a search box reads what was typed, one way for the client and the server: every word
 * must be found somewhere in the record's text, and a refrigerant is found however it is
 * written ("R32", "r-32", "32"), since technicians write all three.
 */

/** One typed word and the spellings it may match in text with its spaces and dashes removed. */
export interface SearchTerm {
  /** The word as typed, lower-case: matched against the plain text. */
  word: string;
  /** Without dashes: matched against the text with spaces and dashes removed. */
  bare: string;
  /** Without a leading "r" before a digit ("r32" → "32"), also against the compact text. */
  withoutR: string;
}

/** The most words a query may hold; more add nothing a technician types and only cost work. */
export const MAX_SEARCH_WORDS = 8;

export function searchTerms(query: string): SearchTerm[] {
  return query
    .toLowerCase()
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, MAX_SEARCH_WORDS)
    .map((word) => {
      const bare = word.replace(/[-–]/g, "");
      return { word, bare, withoutR: bare.replace(/^r(?=\d)/, "") };
    });
}

/** The text with the characters a refrigerant name may or may not carry taken out. */
export const compactSearchText = (searchText: string) => searchText.replace(/[\s\-–]/g, "");

/**
 * Matches "r32", "32", "R-32" alike, and every word of the query anywhere in the text. The three
 * ways a word may match nest (found as typed ⇒ found without dashes in the compact text ⇒ found
 * without the "r" too), so the rule is "every word's `withoutR` is in the compact text": the
 * server asks exactly that of a maintained compact column (server/db/keyset.ts containsTerm).
 */
export function matchesSearch(searchText: string, query: string): boolean {
  const compact = compactSearchText(searchText);
  return searchTerms(query).every(
    (term) => searchText.includes(term.word) || compact.includes(term.bare) || compact.includes(term.withoutR),
  );
}

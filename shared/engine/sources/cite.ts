/** A list of sources: the trade research notes' tag ("S10") → the document's title. */
export type SourceList<Tag extends string> = Readonly<Record<Tag, string>>;

/**
 * Cite sources: names each tag with its title from `sources`, as "[S10] title; [S17] title",
 * followed by any marks such as `COMMON_PRACTICE` (./marks.ts). One way of writing a citation for
 * every list, so a finding's and a procedure verdict's sources read alike on screen and in reports.
 *
 * @param sources the list the tags belong to (DIAGNOSIS_SOURCES, PROCEDURE_SOURCES)
 * @param tags source tags of the trade research notes, in the order to name them
 * @param marks extra notes appended after the titles
 * @returns one line naming every source
 * @throws never
 * @example cite(DIAGNOSIS_SOURCES, ["S33"]) // "[S33] HVAC School, What should the Air Delta T be?"
 */
export function cite<Tag extends string>(sources: SourceList<Tag>, tags: readonly Tag[], ...marks: string[]): string {
  return [...tags.map((tag) => `[${tag}] ${sources[tag]}`), ...marks].join("; ");
}

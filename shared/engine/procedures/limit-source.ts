/**
 * The `source` text of a verdict: the published source of the default limit, preceded by a
 * note when the organisation set its own limit instead.
 *
 * @param defaultSource citation of the default limit (from `cite(PROCEDURE_SOURCES, …)`)
 * @param overridden true when the organisation changed a limit
 * @returns source text for the technician
 * @throws never
 * @example limitSource("[S41] Trane …", true) // "limit set by the organisation (default from [S41] Trane …)"
 */
export function limitSource(defaultSource: string, overridden: boolean): string {
  return overridden ? `limit set by the organisation (default from ${defaultSource})` : defaultSource;
}

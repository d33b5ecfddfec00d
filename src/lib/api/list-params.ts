/** A list's query as a query string: empty values left out, so the cache key and the URL agree. */
export function listQueryString(params: Record<string, string | number | undefined | null>): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params))
    if (value !== undefined && value !== null && value !== "") search.set(key, String(value));
  return search.size > 0 ? `?${search}` : "";
}

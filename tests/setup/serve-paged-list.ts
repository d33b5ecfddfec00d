import { vi } from "vitest";

const json = (body: unknown, status = 200) =>
  new Response(JSON.stringify(body), { status, headers: { "Content-Type": "application/json" } });

/**
 * Stubs fetch as the server of one cursor-paged list (`path`, e.g. "/api/visits"): each request
 * to it is recorded and answered with what `answer` picks for its query, since the search, sort
 * and paging themselves are the server's (tests/server/list-paging.test.ts). `beside` answers
 * other paths the screen reads alongside; anything else is a 404. The jobs, equipment and
 * register tables page the same way, so their tests stand the server up the same way.
 * @returns the query of each request to `path`, in order
 */
export function servePagedList<Page>(
  path: string,
  answer: (params: URLSearchParams) => Page,
  beside: Record<string, unknown> = {},
): URLSearchParams[] {
  const asked: URLSearchParams[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (input: RequestInfo | URL) => {
      const url = new URL(String(input), "http://satura.test");
      if (url.pathname in beside) return json(beside[url.pathname]);
      if (url.pathname !== path) return json({ message: "No such route" }, 404);
      asked.push(url.searchParams);
      return json(answer(url.searchParams));
    }),
  );
  return asked;
}

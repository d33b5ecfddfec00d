import { QueryClient } from "@tanstack/react-query";
import { afterEach, describe, expect, it, vi } from "vitest";
import { id, person, visit, VISIT_ID } from "../../fixtures/visit.ts";
import { visitQueryOptions } from "@/lib/api/visits.ts";

/** GET /api/visits/:id as the server answers it: whole, 304, or a delta, in the order given. */
function stubServer(answers: ((url: string, headers: Headers) => Response)[]) {
  const asked: { url: string; ifNoneMatch: string | null }[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const headers = new Headers(init?.headers);
      asked.push({ url: String(input), ifNoneMatch: headers.get("if-none-match") });
      return answers.shift()!(String(input), headers);
    }),
  );
  return asked;
}
const json = (body: unknown) =>
  new Response(JSON.stringify(body), { status: 200, headers: { "Content-Type": "application/json" } });

describe("visitQueryOptions", () => {
  afterEach(() => vi.unstubAllGlobals());

  it("loads the whole visit, then refreshes with the revision it holds: 304 keeps the copy, a delta is merged into it", async () => {
    const comment = {
      id: id(2),
      readingId: null,
      reading: null,
      body: "Coil cleaned",
      author: person,
      createdAt: "2026-12-02T01:10:00.000Z",
    };
    const asked = stubServer([
      () => json({ visit }),
      () => new Response(null, { status: 304 }),
      () =>
        json({
          delta: { ...visit, since: "e.3.f", revision: "e.4.f", comments: [comment], status: "awaiting-review" },
        }),
    ]);
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    const options = visitQueryOptions(VISIT_ID);

    const first = await client.fetchQuery(options);
    expect(first.comments).toHaveLength(1);
    await client.refetchQueries({ queryKey: options.queryKey });
    expect(client.getQueryData(options.queryKey)).toBe(first);
    await client.refetchQueries({ queryKey: options.queryKey });
    const merged = client.getQueryData(options.queryKey)!;
    expect(merged.comments.map((row) => row.body)).toEqual(["Filter blocked", "Coil cleaned"]);
    expect(merged).toMatchObject({ status: "awaiting-review", revision: "e.4.f" });

    expect(asked).toEqual([
      { url: `/api/visits/${VISIT_ID}`, ifNoneMatch: null },
      { url: `/api/visits/${VISIT_ID}?since=e.3.f`, ifNoneMatch: 'W/"e.3.f"' },
      { url: `/api/visits/${VISIT_ID}?since=e.3.f`, ifNoneMatch: 'W/"e.3.f"' },
    ]);
  });

  it("replaces the copy when the server sends the whole visit (it could not build on the revision held)", async () => {
    stubServer([() => json({ visit }), () => json({ visit: { ...visit, comments: [], revision: "f.1.f" } })]);
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    const options = visitQueryOptions(VISIT_ID);
    await client.fetchQuery(options);
    await client.refetchQueries({ queryKey: options.queryKey });
    expect(client.getQueryData(options.queryKey)).toMatchObject({ comments: [], revision: "f.1.f" });
  });
});

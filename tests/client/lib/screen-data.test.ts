import { QueryClient } from "@tanstack/react-query";
import { afterEach, describe, expect, it, vi } from "vitest";
import { visit, VISIT_ID } from "../../fixtures/visit.ts";
import { loadQuery, loadVisitScreen } from "@/lib/api/screen-data.ts";
import { visitQueryOptions } from "@/lib/api/visits.ts";

const json = (body: unknown, status = 200) =>
  new Response(JSON.stringify(body), { status, headers: { "Content-Type": "application/json" } });

/** Answers the visit, and "not found" to anything else; returns the paths asked for. */
function stubServer(): string[] {
  const asked: string[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (input: RequestInfo | URL) => {
      const url = String(input);
      asked.push(url);
      return url === `/api/visits/${VISIT_ID}` ? json({ visit }) : json({ message: "Not found" }, 404);
    }),
  );
  return asked;
}

const newClient = () => new QueryClient({ defaultOptions: { queries: { retry: false } } });

describe("screen-data", () => {
  afterEach(() => {
    vi.unstubAllGlobals();
  });

  it("asks for a visit's unit by the id the visit names, never for the list of units", async () => {
    const asked = stubServer();
    await loadVisitScreen(newClient(), VISIT_ID);

    expect(asked[0]).toBe(`/api/visits/${VISIT_ID}`);
    expect(asked).toContain(`/api/equipment/${visit.equipmentId}`);
    expect(asked).toContain(`/api/equipment/${visit.equipmentId}/charge-references`);
    expect(asked.filter((url) => /^\/api\/equipment\/?(\?|$)/.test(url))).toEqual([]);
  });

  it("leaves a failed request in the cache for the screen to show instead of throwing it", async () => {
    stubServer();
    const client = newClient();
    const options = visitQueryOptions("00000000-0000-4000-8000-000000000999");

    await expect(loadQuery(client, options)).resolves.toBeUndefined();
    expect(client.getQueryState(options.queryKey)?.error?.message).toBe("Not found");
  });

  it("offline, uses the kept copy as it is and does not wait for a request it cannot make", async () => {
    const asked = stubServer();
    vi.stubGlobal("navigator", { onLine: false });
    const client = newClient();
    client.setQueryData(visitQueryOptions(VISIT_ID).queryKey, visit);

    await expect(loadQuery(client, visitQueryOptions(VISIT_ID))).resolves.toBe(visit);
    await expect(loadQuery(client, visitQueryOptions("00000000-0000-4000-8000-000000000998"))).resolves.toBeUndefined();
    expect(asked).toEqual([]);
  });
});

import { QueryClient } from "@tanstack/react-query";
import { afterEach, describe, expect, it, vi } from "vitest";
import { z } from "zod";
import { apiRequest, forgetEarlyRequests, startEarlyRequest } from "@/lib/api/api-client.ts";
import { meQueryOptions } from "@/lib/api/auth.ts";
import { startFirstRequests } from "@/lib/api/first-requests.ts";
import { VISIT_EQUIPMENT_HEADER } from "@shared/http/visit-headers.ts";

const VISIT_ID = "00000000-0000-4000-8000-000000000100";
const UNIT_ID = "00000000-0000-4000-8000-000000000101";
const USER = {
  id: "00000000-0000-4000-8000-000000000007",
  email: "tech@bellbird.example",
  name: "Sam Toko",
  role: "technician",
  organisationId: "00000000-0000-4000-8000-000000000001",
};

/** A server that answers every GET with `{ path }`, and /api/auth/me with 401; counts what was asked. */
function stubServer() {
  const asked: string[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (input: RequestInfo | URL) => {
      const url = String(input);
      asked.push(url);
      if (url === "/api/auth/me") return new Response(JSON.stringify({ message: "Sign in first" }), { status: 401 });
      return new Response(JSON.stringify({ path: url }), {
        status: 200,
        headers: { "Content-Type": "application/json" },
      });
    }),
  );
  return asked;
}
const PathSchema = z.object({ path: z.string() });

afterEach(() => {
  vi.unstubAllGlobals();
  // An early request not taken up would answer the next test's.
  forgetEarlyRequests();
});

describe("startEarlyRequest", () => {
  it("answers the first apiRequest for the same path from the request already sent", async () => {
    const asked = stubServer();
    void startEarlyRequest(`/visits/${VISIT_ID}`);
    expect(asked).toEqual([`/api/visits/${VISIT_ID}`]);
    await expect(apiRequest(`/visits/${VISIT_ID}`, { schema: PathSchema })).resolves.toEqual({
      path: `/api/visits/${VISIT_ID}`,
    });
    expect(asked).toHaveLength(1);
  });

  it("is taken up once: the next request for the path goes to the server", async () => {
    const asked = stubServer();
    void startEarlyRequest("/equipment/one");
    await apiRequest("/equipment/one");
    await apiRequest("/equipment/one");
    expect(asked).toEqual(["/api/equipment/one", "/api/equipment/one"]);
  });

  it("never answers a conditional request or a write", async () => {
    const asked = stubServer();
    void startEarlyRequest("/visits/two");
    await apiRequest("/visits/two", { ifNoneMatch: 'W/"e.1"' });
    await apiRequest("/visits/two", { method: "POST", body: {} });
    expect(asked).toEqual(["/api/visits/two", "/api/visits/two", "/api/visits/two"]);
    // The early one is still there for the plain GET.
    await apiRequest("/visits/two");
    expect(asked).toHaveLength(3);
  });

  // Regression: a visit opened signed out went to sign-in, and after signing in the screen took up
  // the early request's 401 and said "Sign in to continue".
  it("is forgotten when a session starts or ends: its answer was the last session's", async () => {
    const asked = stubServer();
    void startEarlyRequest("/visits/three");
    forgetEarlyRequests();
    await apiRequest("/visits/three");
    expect(asked).toEqual(["/api/visits/three", "/api/visits/three"]);
  });
});

describe("startFirstRequests", () => {
  it("asks who is signed in and starts the visit's record on a visit's page", async () => {
    const asked = stubServer();
    startFirstRequests(`/visits/${VISIT_ID}`);
    expect(asked).toEqual(["/api/auth/me", `/api/visits/${VISIT_ID}`]);
    await apiRequest(`/visits/${VISIT_ID}`);
    expect(asked).toHaveLength(2);
  });

  it("asks for the visit's unit as soon as the visit's headers name it, before its body has arrived", async () => {
    const asked: string[] = [];
    // The visit's body never finishes arriving: only its headers can have sent the unit's requests.
    const endless = new ReadableStream<Uint8Array>({
      start: (controller) => controller.enqueue(new Uint8Array([123])),
    });
    vi.stubGlobal(
      "fetch",
      vi.fn(async (input: RequestInfo | URL) => {
        const url = String(input);
        asked.push(url);
        if (url === `/api/visits/${VISIT_ID}`)
          return new Response(endless, { status: 200, headers: { [VISIT_EQUIPMENT_HEADER]: UNIT_ID } });
        return new Response("{}", { status: url === "/api/auth/me" ? 401 : 200 });
      }),
    );
    startFirstRequests(`/visits/${VISIT_ID}`);
    await vi.waitFor(() => expect(asked).toContain(`/api/equipment/${UNIT_ID}`));
    expect(asked).toContain(`/api/equipment/${UNIT_ID}/charge-references`);
  });

  it("asks for no unit when the visit is refused or its headers name none", async () => {
    for (const answer of [
      () => new Response("{}", { status: 404, headers: { [VISIT_EQUIPMENT_HEADER]: UNIT_ID } }),
      () => new Response("{}", { status: 200 }),
    ]) {
      const asked: string[] = [];
      vi.stubGlobal(
        "fetch",
        vi.fn(async (input: RequestInfo | URL) => {
          asked.push(String(input));
          return String(input) === `/api/visits/${VISIT_ID}` ? answer() : new Response("{}", { status: 401 });
        }),
      );
      startFirstRequests(`/visits/${VISIT_ID}`);
      await new Promise((resolve) => setTimeout(resolve, 20));
      expect(asked.some((url) => url.startsWith("/api/equipment/"))).toBe(false);
      forgetEarlyRequests();
    }
  });

  it("starts a unit's record and charge references on the unit's page, not on the new-unit form", () => {
    const asked = stubServer();
    startFirstRequests(`/equipment/${UNIT_ID}`);
    startFirstRequests("/equipment/new");
    expect(asked).toContain(`/api/equipment/${UNIT_ID}`);
    expect(asked).toContain(`/api/equipment/${UNIT_ID}/charge-references`);
    expect(asked).not.toContain("/api/equipment/new");
  });

  it("leaves the screens of a mailed link without a session check", () => {
    const asked = stubServer();
    startFirstRequests("/reset-password");
    expect(asked).toEqual([]);
  });

  it("leaves who is signed in to the session check, which takes up the early answer and parses it", async () => {
    const asked: string[] = [];
    vi.stubGlobal(
      "fetch",
      vi.fn(async (input: RequestInfo | URL) => {
        asked.push(String(input));
        return new Response(JSON.stringify({ user: USER }), { status: 200 });
      }),
    );
    startFirstRequests("/");
    expect(asked).toEqual(["/api/auth/me"]);
    const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    await expect(queryClient.fetchQuery(meQueryOptions())).resolves.toMatchObject({ email: USER.email });
    expect(asked).toHaveLength(1);
  });
});

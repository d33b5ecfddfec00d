// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { QueryClient, QueryClientProvider, useQuery } from "@tanstack/react-query";
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { diagnose, saturationPressure, STANDARD_ATMOSPHERE_KPA } from "@shared/engine/index.ts";
import type { Reading, Visit } from "@shared/schemas/visits.ts";
import { ENTRIES_PAGE, RecordedEntries } from "@/features/run-log/components/recorded-entries.tsx";
import { METRIC_UNITS } from "@/lib/units/display-units.ts";

const id = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, "0")}`;
const VISIT_ID = id(9_999);
const COUNT = 3 * ENTRIES_PAGE;
const gauge = (temperatureC: number, point: "bubble" | "dew") =>
  saturationPressure("R407C", temperatureC, point) - STANDARD_ATMOSPHERE_KPA;
const input = {
  refrigerant: "R407C",
  meteringDevice: "txv" as const,
  suctionPressureKPa: gauge(6, "dew"),
  suctionLineTempC: 12,
  liquidPressureKPa: gauge(42, "bubble"),
  liquidLineTempC: 37,
};
const result = diagnose(input);
/** Reading n of a series, one a minute. */
const reading = (n: number): Reading => ({
  id: id(n),
  visitId: VISIT_ID,
  circuit: 1,
  takenAt: new Date(Date.UTC(2026, 11, 2, 1, n)).toISOString(),
  note: null,
  input,
  result,
  recordedBy: null,
  voided: null,
});
const all = Array.from({ length: COUNT }, (_, n) => reading(n));

/** The visit as the detail sends it: the latest page, and the cursor for the rest. */
const held = {
  id: VISIT_ID,
  readings: all.slice(-ENTRIES_PAGE),
  adjustments: [],
  circuitLogs: [
    {
      circuit: 1,
      recordCount: COUNT,
      readingCount: COUNT,
      olderCursor: id(COUNT - ENTRIES_PAGE),
      firstTakenAt: all[0]!.takenAt,
      lastTakenAt: all.at(-1)!.takenAt,
      points: [],
      trend: null,
      keyReadings: [],
    },
  ],
} as unknown as Visit;

/** GET /api/visits/:id/readings: the page before `before`, as the server answers it. */
function stubPages() {
  const asked: string[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (request: RequestInfo | URL) => {
      const url = new URL(String(request), "http://satura.test");
      const before = url.searchParams.get("before")!;
      asked.push(before);
      const end = all.findIndex((entry) => entry.id === before);
      const start = Math.max(0, end - ENTRIES_PAGE);
      const page = { readings: all.slice(start, end), olderCursor: start > 0 ? all[start]!.id : null };
      return new Response(JSON.stringify(page), { status: 200, headers: { "Content-Type": "application/json" } });
    }),
  );
  return asked;
}

/** The entries of the visit in the cache, as the run log passes them. */
function Entries() {
  const { data } = useQuery<Visit>({
    queryKey: ["visits", "detail", VISIT_ID],
    queryFn: () => held,
    staleTime: Infinity,
  });
  if (!data) return null;
  const log = data.circuitLogs[0]!;
  return (
    <RecordedEntries
      visitId={VISIT_ID}
      circuit={1}
      readings={data.readings}
      olderCursor={log.olderCursor}
      recordCount={log.recordCount}
      adjustments={data.adjustments}
      units={METRIC_UNITS}
      atmosphericKPa={STANDARD_ATMOSPHERE_KPA}
      canVoid={false}
    />
  );
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("RecordedEntries", () => {
  it("shows the latest entries, then fetches each older page from the server once, until the first reading", async () => {
    const asked = stubPages();
    const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
    queryClient.setQueryData(["visits", "detail", VISIT_ID], held);
    render(
      <QueryClientProvider client={queryClient}>
        <Entries />
      </QueryClientProvider>,
    );
    const list = () => within(screen.getByRole("list", { name: /Entries on circuit 1/ })).getAllByRole("listitem");
    expect(list()).toHaveLength(ENTRIES_PAGE);
    const user = userEvent.setup();
    await user.click(
      screen.getByRole("button", { name: `Show earlier entries (${ENTRIES_PAGE} of ${2 * ENTRIES_PAGE} more)` }),
    );
    expect(await screen.findByTestId(`entry-${id(COUNT - ENTRIES_PAGE - 1)}`)).toBeInTheDocument();
    expect(list()).toHaveLength(2 * ENTRIES_PAGE);
    await user.click(screen.getByRole("button", { name: /Show earlier entries/ }));
    expect(await screen.findByTestId(`entry-${id(0)}`)).toBeInTheDocument();
    expect(list()).toHaveLength(COUNT);
    expect(screen.queryByRole("button", { name: /Show earlier entries/ })).not.toBeInTheDocument();
    expect(asked).toEqual([id(COUNT - ENTRIES_PAGE), id(ENTRIES_PAGE)]);
    // Newest first, each reading once.
    expect(list()[0]).toHaveAttribute("data-testid", `entry-${id(COUNT - 1)}`);
  });
});

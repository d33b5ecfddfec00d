// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { MemoryRouter } from "react-router-dom";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { VisitSummary } from "@shared/schemas/visits.ts";
import { JobsTable } from "@/features/jobs/components/jobs-table.tsx";
import { servePagedList } from "../../../setup/serve-paged-list.ts";

// Invented visits of the demo scenario (PRODUCT.md "Demo scenario").
const visit = (id: number, equipmentName: string, status: VisitSummary["status"], startedAt: string): VisitSummary => ({
  id: `00000000-0000-4000-8000-0000000000${String(id).padStart(2, "0")}`,
  equipmentId: "00000000-0000-4000-8000-000000000011",
  equipmentName,
  siteName: "Wattle Lane Clinic — main building",
  customerName: "Wattle Lane Clinic",
  refrigerant: "R407C",
  reason: "Not cooling",
  status,
  startedAt,
  readingCount: 3,
  technicians: [{ id: "00000000-0000-4000-8000-000000000099", name: "Sam Toko" }],
  yourLastActivityAt: null,
});
const newer = visit(1, "RTU-1 packaged rooftop unit", "open", "2026-11-30T01:00:00.000Z");
const older = visit(2, "Server cupboard wall split", "signed-off", "2026-11-20T01:00:00.000Z");

/** Records what the table asks GET /api/visits, and answers with what `answer` picks. */
const serve = (answer: (params: URLSearchParams) => { visits: VisitSummary[]; nextCursor: string | null }) =>
  servePagedList("/api/visits", answer);

function renderJobs(status: VisitSummary["status"] | null = null) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={queryClient}>
      <MemoryRouter>
        <JobsTable status={status} empty={<p>No visits yet.</p>} />
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("JobsTable", () => {
  it("asks for the newest first with the status, and shows the page it got", async () => {
    const asked = serve(() => ({ visits: [newer], nextCursor: null }));
    renderJobs("open");
    const table = await screen.findByRole("table");
    expect(within(table).getByRole("link", { name: "RTU-1 packaged rooftop unit" })).toBeInTheDocument();
    expect(asked[0]!.get("status")).toBe("open");
    expect(asked[0]!.get("sort")).toBe("startedAt");
    expect(asked[0]!.get("dir")).toBe("desc");
    // Readings and crew are counted per page, so their headers do not offer a sort.
    expect(within(table).queryByRole("button", { name: /Readings/ })).not.toBeInTheDocument();
    expect(within(table).getByRole("columnheader", { name: "Crew" })).not.toHaveAttribute("aria-sort");
  });

  it("sorts by unit on the server and starts again from the first page", async () => {
    const user = userEvent.setup();
    const asked = serve((params) =>
      params.get("cursor") ? { visits: [older], nextCursor: null } : { visits: [newer], nextCursor: "after-newer" },
    );
    renderJobs();
    await screen.findByRole("table");
    await user.click(screen.getByRole("button", { name: "Next page of visits" }));
    await waitFor(() => expect(asked.at(-1)!.get("cursor")).toBe("after-newer"));
    await user.click(within(screen.getByRole("table")).getByRole("button", { name: /Unit/ }));
    await waitFor(() => expect(asked.at(-1)!.get("sort")).toBe("equipmentName"));
    expect(asked.at(-1)!.get("cursor")).toBeNull();
    expect(screen.getByRole("button", { name: "Previous page of visits" })).toBeDisabled();
  });

  it("searches on the server, says when nothing matches, and shows the empty state only without a search", async () => {
    const user = userEvent.setup();
    const asked = serve((params) => ({ visits: params.get("q") ? [] : [newer, older], nextCursor: null }));
    renderJobs();
    await screen.findByRole("table");
    await user.click(screen.getByLabelText("Find a visit"));
    await user.paste("toko rooftop");
    expect(await screen.findByText("No visit matches “toko rooftop”.", {}, { timeout: 3000 })).toBeInTheDocument();
    expect(asked.at(-1)!.get("q")).toBe("toko rooftop");
    expect(screen.queryByText("No visits yet.")).not.toBeInTheDocument();
  });
});

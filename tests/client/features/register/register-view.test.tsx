// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { RegisterLine, RegisterList } from "@shared/schemas/register.ts";
import { RegisterView, type RegisterFilters } from "@/features/register/components/register-view.tsx";
import { servePagedList } from "../../../setup/serve-paged-list.ts";

// Invented lines of the demo scenario (PRODUCT.md "Demo scenario").
const line = (id: number, kg: number, at: string): RegisterLine => ({
  id: `00000000-0000-4000-8000-0000000001${String(id).padStart(2, "0")}`,
  visitId: null,
  equipmentId: "00000000-0000-4000-8000-000000000011",
  equipmentName: "RTU-1 packaged rooftop unit",
  circuit: 1,
  refrigerant: "R407C",
  kind: "recovered",
  kg,
  cylinder: { id: "00000000-0000-4000-8000-000000000021", label: "BM-REC-07" },
  technician: { id: "00000000-0000-4000-8000-000000000099", name: "Sam Toko" },
  at,
  note: null,
  voided: null,
  siteName: "Wattle Lane Clinic — main building",
  location: null,
});
const newest = line(1, 3.6, "2026-11-30T01:00:00.000Z");
const older = line(2, 0.25, "2026-07-11T01:00:00.000Z");
// The totals are the whole period's, the same on every page.
const totals = [{ refrigerant: "R407C", kind: "recovered" as const, kg: 3.85 }];

/** Records what the view asks GET /api/register, and answers with what `answer` picks; no members to choose from. */
const serve = (answer: (params: URLSearchParams) => RegisterList) =>
  servePagedList("/api/register", answer, { "/api/members": { members: [] } });

function renderRegister(filters: RegisterFilters = { from: "", to: "", technicianId: "" }) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={queryClient}>
      <RegisterView filters={filters} onChange={() => undefined} mayChooseTechnician={false} />
    </QueryClientProvider>,
  );
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("RegisterView", () => {
  it("shows the latest page first with the period's totals, and pages on the server", async () => {
    const user = userEvent.setup();
    const asked = serve((params) =>
      params.get("cursor")
        ? { movements: [older], totals, allTechnicians: true, nextCursor: null }
        : { movements: [newest], totals, allTechnicians: true, nextCursor: "after-newest" },
    );
    renderRegister();
    const entries = await screen.findByRole("list", { name: "Register entries" });
    expect(within(entries).getByText("3.60 kg")).toBeInTheDocument();
    expect(asked[0]!.get("dir")).toBe("desc");
    expect(asked[0]!.get("cursor")).toBeNull();
    expect(screen.getByText("R407C · recovered from the system")).toBeInTheDocument();

    await user.click(screen.getByRole("button", { name: "Next page of entries" }));
    await waitFor(() =>
      expect(within(screen.getByRole("list", { name: "Register entries" })).getByText("0.25 kg")).toBeInTheDocument(),
    );
    expect(asked.at(-1)!.get("cursor")).toBe("after-newest");
    // The totals stay those of the whole period, not of the page shown.
    expect(screen.getByText("3.85 kg")).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Next page of entries" })).toBeDisabled();

    await user.click(screen.getByRole("button", { name: "Previous page of entries" }));
    await waitFor(() =>
      expect(within(screen.getByRole("list", { name: "Register entries" })).getByText("3.60 kg")).toBeInTheDocument(),
    );
  });

  it("starts again from the first page when the order changes, and exports the whole period", async () => {
    const user = userEvent.setup();
    const asked = serve((params) =>
      params.get("cursor")
        ? { movements: [older], totals, allTechnicians: true, nextCursor: null }
        : { movements: [newest], totals, allTechnicians: true, nextCursor: "after-newest" },
    );
    renderRegister({ from: "2026-07-01", to: "", technicianId: "" });
    await screen.findByRole("list", { name: "Register entries" });
    await user.click(screen.getByRole("button", { name: "Next page of entries" }));
    await waitFor(() => expect(asked.at(-1)!.get("cursor")).toBe("after-newest"));
    await user.selectOptions(screen.getByLabelText("Order"), "asc");
    await waitFor(() => expect(asked.at(-1)!.get("dir")).toBe("asc"));
    expect(asked.at(-1)!.get("cursor")).toBeNull();
    expect(asked.at(-1)!.get("from")).toBeTruthy();
    // The export names the period, never a page or an order.
    const href = screen.getByRole("link", { name: "Export CSV" }).getAttribute("href")!;
    expect(href).toMatch(/^\/api\/register\/export\.csv\?from=/);
    expect(href).not.toMatch(/cursor|dir/);
  });
});

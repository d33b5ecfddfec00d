// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { MemoryRouter } from "react-router-dom";
import { afterEach, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { ChargeReferencePoints, NO_REFERENCE_TEXT } from "@/features/equipment/components/charge-reference-points.tsx";
import { METRIC_UNITS } from "@/lib/units/display-units.ts";

const UNIT = "00000000-0000-4000-8000-000000000010";
const VISIT = "00000000-0000-4000-8000-000000000020";
const REFERENCE = {
  id: "00000000-0000-4000-8000-000000000030",
  circuit: 1,
  values: {
    subcoolingK: 5,
    superheatK: 6.1,
    evaporatingTempC: 6,
    condensingTempC: 42,
    outdoorAirDryBulbC: 31,
    returnAirDryBulbC: null,
  },
  source: "weigh-in",
  setAt: "2026-07-05T03:15:00.000Z",
  setBy: { id: "00000000-0000-4000-8000-000000000040", name: "Lee Hargreaves" },
  visitId: VISIT,
  visitStartedAt: "2026-07-05T00:30:00.000Z",
  readingId: "00000000-0000-4000-8000-000000000050",
  readingCount: 3,
  note: null,
  cleared: null,
};

interface Sent {
  method: string;
  url: string;
  body: unknown;
}

/** A fetch stand-in for the unit's charge references: `current` stands on circuit 1 until a DELETE clears it. */
function stubApi(current: typeof REFERENCE | null) {
  const sent: Sent[] = [];
  let standing = current;
  vi.stubGlobal(
    "fetch",
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = String(input);
      const method = init?.method ?? "GET";
      sent.push({ method, url, body: init?.body ? JSON.parse(String(init.body)) : undefined });
      const json = (status: number, payload: unknown) =>
        new Response(JSON.stringify(payload), { status, headers: { "Content-Type": "application/json" } });
      const answer = () =>
        json(200, {
          circuits: [
            {
              circuit: 1,
              correctChargeKg: 4.2,
              lineAdjustmentKg: 0,
              current: standing,
              history: standing ? [standing] : [],
            },
          ],
        });
      if (url === `/api/equipment/${UNIT}/charge-references`) return answer();
      if (url === `/api/equipment/${UNIT}/charge-references/1` && method === "DELETE") {
        standing = null;
        return answer();
      }
      return json(404, { message: `No stub for ${method} ${url}` });
    }),
  );
  return sent;
}

function renderPanel(canManage: boolean) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  render(
    <MemoryRouter>
      <QueryClientProvider client={queryClient}>
        <ChargeReferencePoints equipmentId={UNIT} visits={[]} units={METRIC_UNITS} canManage={canManage} />
      </QueryClientProvider>
    </MemoryRouter>,
  );
}

beforeAll(() => {
  // jsdom has no modal dialogs: open and close are enough to test what is inside.
  HTMLDialogElement.prototype.showModal = function showModal(this: HTMLDialogElement) {
    this.open = true;
  };
  HTMLDialogElement.prototype.close = function close(this: HTMLDialogElement) {
    this.open = false;
  };
});
beforeEach(() => vi.unstubAllGlobals());
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("ChargeReferencePoints", () => {
  it("tells a technician there is no reference point yet, read-only", async () => {
    stubApi(null);
    renderPanel(false);
    expect(await screen.findByText(NO_REFERENCE_TEXT)).toBeInTheDocument();
    expect(screen.queryByRole("button", { name: /Set from a reading/ })).not.toBeInTheDocument();
  });

  it("shows the reference point in K and °C with when, by whom and from which visit", async () => {
    stubApi(REFERENCE);
    renderPanel(false);
    const card = await screen.findByRole("article", { name: "Circuit 1 reference point" });
    expect(within(card).getByText("5.0 K")).toBeInTheDocument();
    expect(within(card).getByText("42.0 °C")).toBeInTheDocument();
    expect(within(card).getByText("not measured")).toBeInTheDocument();
    expect(within(card).getByText(/Settled after a weigh-in · set .* by Lee Hargreaves/)).toBeInTheDocument();
    expect(within(card).getByRole("link", { name: /the visit of/ })).toHaveAttribute("href", `/visits/${VISIT}`);
    expect(within(card).queryByRole("button", { name: /Clear/ })).not.toBeInTheDocument();
  });

  it("lets a senior clear it only with a reason, which is sent with the request", async () => {
    const sent = stubApi(REFERENCE);
    const user = userEvent.setup();
    renderPanel(true);
    await user.click(await screen.findByRole("button", { name: "Clear…" }));
    const dialog = screen.getByRole("dialog", { name: /Clear circuit 1/ });
    await user.click(within(dialog).getByRole("button", { name: /Clear the reference point/ }));
    expect(within(dialog).getByRole("alert", { hidden: true })).toHaveTextContent(
      "Say why the reference point is cleared",
    );
    expect(sent.filter((request) => request.method === "DELETE")).toEqual([]);
    await user.type(within(dialog).getByLabelText("Reason (required)"), "Condenser coil replaced");
    await user.click(within(dialog).getByRole("button", { name: /Clear the reference point/ }));
    expect(await screen.findByText(NO_REFERENCE_TEXT)).toBeInTheDocument();
    expect(sent.find((request) => request.method === "DELETE")?.body).toEqual({ reason: "Condenser coil replaced" });
  });
});

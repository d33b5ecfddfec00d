// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { MemoryRouter } from "react-router-dom";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { Equipment } from "@shared/schemas/equipment.ts";
import { EquipmentTable } from "@/features/equipment/components/equipment-table.tsx";
import { servePagedList } from "../../../setup/serve-paged-list.ts";

const site = {
  siteId: "00000000-0000-4000-8000-000000000001",
  siteName: "Wattle Lane Clinic — main building",
  customerId: "00000000-0000-4000-8000-000000000002",
  customerName: "Wattle Lane Clinic",
};
const blank = {
  application: "comfort-cooling" as const,
  location: null,
  maker: null,
  model: null,
  serial: null,
  compressorRlaA: null,
  compressorLraA: null,
  fanFlaA: null,
  supplyVoltageV: null,
  phases: null,
  ratedHighSideKPa: null,
  ratedLowSideKPa: null,
  createdAt: "2026-11-01T00:00:00.000Z",
};
const circuit = (number: number, factoryChargeKg: number, meteringDevice: "txv" | "eev") => ({
  number,
  factoryChargeKg,
  meteringDevice,
  targetSuperheatK: null,
  targetSubcoolingK: null,
  liquidLineLengthM: null,
});

// Invented units of the demo scenario (PRODUCT.md "Demo scenario").
const units: Equipment[] = [
  {
    ...site,
    ...blank,
    id: "00000000-0000-4000-8000-000000000011",
    name: "RTU-1 packaged rooftop unit",
    kind: "packaged rooftop",
    refrigerant: "R407C",
    serial: "SA21-44817",
    circuits: [circuit(1, 4.2, "txv"), circuit(2, 4.2, "txv")],
  },
  {
    ...site,
    ...blank,
    id: "00000000-0000-4000-8000-000000000012",
    name: "Server cupboard wall split",
    kind: "wall split",
    refrigerant: "R32",
    circuits: [circuit(1, 0.85, "eev")],
  },
  {
    ...site,
    ...blank,
    id: "00000000-0000-4000-8000-000000000013",
    name: "Vaccine and stores cool room",
    kind: "cool room",
    refrigerant: "R404A",
    circuits: [circuit(1, 2.6, "txv")],
  },
];

/** Records what the table asks GET /api/equipment, and answers with the units `answer` picks for its query. */
const serve = (answer: (params: URLSearchParams) => { equipment: Equipment[]; nextCursor: string | null }) =>
  servePagedList("/api/equipment", answer);

function renderTable() {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={queryClient}>
      <MemoryRouter>
        <EquipmentTable empty={<p>No equipment yet.</p>} />
      </MemoryRouter>
    </QueryClientProvider>,
  );
  // jsdom applies no media queries, so both layouts render; the table is the one checked here.
  const unitNames = () =>
    within(screen.getByRole("table"))
      .getAllByRole("row")
      .slice(1)
      .map((row) => within(row).getAllByRole("link")[0]!.textContent);
  return { unitNames };
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("EquipmentTable", () => {
  it("shows the page the server sent, in its order, with the circuits and the total factory charge", async () => {
    serve(() => ({ equipment: units, nextCursor: null }));
    const { unitNames } = renderTable();
    await waitFor(() =>
      expect(unitNames()).toEqual([
        "RTU-1 packaged rooftop unit",
        "Server cupboard wall split",
        "Vaccine and stores cool room",
      ]),
    );
    // 2 circuits × 4.2 kg = 8.40 kg in all.
    const rooftop = within(screen.getByRole("table")).getByRole("row", { name: /RTU-1/ });
    expect(within(rooftop).getByText("8.40 kg")).toBeInTheDocument();
    expect(within(rooftop).getByText("2 × TXV")).toBeInTheDocument();
    expect(screen.getByText("3 units")).toBeInTheDocument();
  });

  it("shows each refrigerant's ISO 817 safety class beside it", async () => {
    serve(() => ({ equipment: units, nextCursor: null }));
    renderTable();
    const table = await screen.findByRole("table");
    // ISO 817 / ASHRAE 34 safety classes: R32 is A2L, R407C and R404A are A1.
    expect(within(within(table).getByRole("row", { name: /Server cupboard/ })).getByText("A2L")).toBeInTheDocument();
    expect(within(within(table).getByRole("row", { name: /RTU-1/ })).getByText("A1")).toBeInTheDocument();
  });

  it("asks the server once typing stops, and shows what it found", async () => {
    const user = userEvent.setup();
    const asked = serve((params) => ({ equipment: params.get("q") ? [units[1]!] : units, nextCursor: null }));
    const { unitNames } = renderTable();
    await waitFor(() => expect(unitNames()).toHaveLength(3));
    // Typed as fast as a phone's suggestion bar puts in a word.
    await user.click(screen.getByLabelText("Find a unit"));
    await user.paste("R-32");
    await waitFor(() => expect(unitNames()).toEqual(["Server cupboard wall split"]), { timeout: 3000 });
    // One request for the word once typing stops.
    expect(asked.map((params) => params.get("q"))).toEqual([null, "R-32"]);
    expect(screen.getByText("1 unit found")).toBeInTheDocument();
  });

  it("filters by kind on the server and says so when nothing matches", async () => {
    const user = userEvent.setup();
    const asked = serve((params) => ({ equipment: params.get("kind") ? [] : units, nextCursor: null }));
    renderTable();
    await screen.findByRole("table");
    await user.selectOptions(screen.getByLabelText("Kind"), "freezer room");
    expect(await screen.findByText(/No unit matches among freezer room units/)).toBeInTheDocument();
    expect(asked.at(-1)!.get("kind")).toBe("freezer room");
  });

  it("sorts by factory charge on the server when its header is pressed, and reverses on a second press", async () => {
    const user = userEvent.setup();
    const asked = serve(() => ({ equipment: units, nextCursor: null }));
    renderTable();
    const table = await screen.findByRole("table");
    const header = within(table).getByRole("button", { name: /Factory charge/ });
    await user.click(header);
    await waitFor(() => expect(asked.at(-1)!.get("sort")).toBe("factoryCharge"));
    const first = asked.at(-1)!.get("dir");
    await user.click(within(table).getByRole("button", { name: /Factory charge/ }));
    await waitFor(() => expect(asked.at(-1)!.get("dir")).not.toBe(first));
    expect([first, asked.at(-1)!.get("dir")].sort()).toEqual(["asc", "desc"]);
  });

  it("pages with the cursor the server gave, and goes back to the first page", async () => {
    const user = userEvent.setup();
    const asked = serve((params) =>
      params.get("cursor") === "after-rtu"
        ? { equipment: units.slice(1), nextCursor: null }
        : { equipment: units.slice(0, 1), nextCursor: "after-rtu" },
    );
    const { unitNames } = renderTable();
    await waitFor(() => expect(unitNames()).toEqual(["RTU-1 packaged rooftop unit"]));
    expect(screen.getByRole("button", { name: "Previous page of units" })).toBeDisabled();
    await user.click(screen.getByRole("button", { name: "Next page of units" }));
    await waitFor(() => expect(unitNames()).toEqual(["Server cupboard wall split", "Vaccine and stores cool room"]));
    expect(asked.at(-1)!.get("cursor")).toBe("after-rtu");
    expect(screen.getByRole("button", { name: "Next page of units" })).toBeDisabled();
    await user.click(screen.getByRole("button", { name: "Previous page of units" }));
    await waitFor(() => expect(unitNames()).toEqual(["RTU-1 packaged rooftop unit"]));
  });

  it("shows the empty state when the company has no unit at all", async () => {
    serve(() => ({ equipment: [], nextCursor: null }));
    renderTable();
    expect(await screen.findByText("No equipment yet.")).toBeInTheDocument();
  });
});

// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { cleanup, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { MemoryRouter } from "react-router-dom";
import { afterEach, describe, expect, it } from "vitest";
import type { Equipment } from "@shared/schemas/equipment.ts";
import { EquipmentTable } from "@/features/equipment/components/equipment-table.tsx";

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

function renderTable() {
  render(
    <MemoryRouter>
      <EquipmentTable equipment={units} />
    </MemoryRouter>,
  );
  // jsdom applies no media queries, so both layouts render; the table is the one checked here.
  const table = screen.getByRole("table");
  const unitNames = () =>
    within(table)
      .getAllByRole("row")
      .slice(1)
      .map((row) => within(row).getAllByRole("link")[0]!.textContent);
  return { table, unitNames };
}

afterEach(cleanup);

describe("EquipmentTable", () => {
  it("lists every unit by name, A to Z, with the circuits and the total factory charge", () => {
    const { table, unitNames } = renderTable();
    expect(unitNames()).toEqual([
      "RTU-1 packaged rooftop unit",
      "Server cupboard wall split",
      "Vaccine and stores cool room",
    ]);
    // 2 circuits × 4.2 kg = 8.40 kg in all.
    const rooftop = within(table).getByRole("row", { name: /RTU-1/ });
    expect(within(rooftop).getByText("8.40 kg")).toBeInTheDocument();
    expect(within(rooftop).getByText("2 × TXV")).toBeInTheDocument();
  });

  it("shows each refrigerant's ISO 817 safety class beside it", () => {
    const { table } = renderTable();
    // ISO 817 / ASHRAE 34 safety classes: R32 is A2L, R407C and R404A are A1.
    expect(within(within(table).getByRole("row", { name: /Server cupboard/ })).getByText("A2L")).toBeInTheDocument();
    expect(within(within(table).getByRole("row", { name: /RTU-1/ })).getByText("A1")).toBeInTheDocument();
  });

  it("narrows the list to units matching the search, whichever way the refrigerant is typed", async () => {
    const user = userEvent.setup();
    const { unitNames } = renderTable();
    const search = screen.getByLabelText("Find a unit");
    // Technicians write R32, R-32 or just 32 for the same refrigerant (common practice).
    for (const typed of ["R32", "r-32", "32"]) {
      await user.clear(search);
      await user.type(search, typed);
      await waitFor(() => expect(unitNames()).toEqual(["Server cupboard wall split"]));
    }
    expect(screen.getByText("1 of 3 units")).toBeInTheDocument();
    await user.clear(search);
    await user.type(search, "SA21-44817");
    await waitFor(() => expect(unitNames()).toEqual(["RTU-1 packaged rooftop unit"]));
  });

  it("filters by kind and says so when nothing matches", async () => {
    const user = userEvent.setup();
    const { unitNames } = renderTable();
    await user.selectOptions(screen.getByLabelText("Kind"), "cool room");
    expect(unitNames()).toEqual(["Vaccine and stores cool room"]);
    await user.type(screen.getByLabelText("Find a unit"), "R32");
    expect(await screen.findByText(/No unit matches “R32” among cool room units/)).toBeInTheDocument();
  });

  it("sorts by factory charge when its header is pressed, and reverses on a second press", async () => {
    const user = userEvent.setup();
    const { table, unitNames } = renderTable();
    const header = within(table).getByRole("button", { name: /Factory charge/ });
    await user.click(header);
    const ascending = unitNames();
    await user.click(header);
    const descending = unitNames();
    // 0.85 kg < 2.60 kg < 8.40 kg.
    const lightestFirst = ["Server cupboard wall split", "Vaccine and stores cool room", "RTU-1 packaged rooftop unit"];
    expect([ascending, descending]).toContainEqual(lightestFirst);
    expect([ascending, descending]).toContainEqual([...lightestFirst].reverse());
    expect(ascending).not.toEqual(descending);
  });
});

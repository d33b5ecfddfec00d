// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { EquipmentForm } from "@/features/equipment/components/equipment-form.tsx";

const SITE = {
  id: "00000000-0000-4000-8000-000000000001",
  customerId: "00000000-0000-4000-8000-000000000002",
  customerName: "Wattle Lane Clinic",
  name: "Wattle Lane Clinic — main building",
  address: null,
  altitudeM: null,
};

interface Sent {
  method: string;
  url: string;
  body: unknown;
}

/** A fetch stand-in for /api: the sites list, and a POST /api/equipment answered by `onCreate`. */
function stubApi(onCreate: (body: Record<string, unknown>) => { status: number; body: unknown }) {
  const sent: Sent[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = String(input);
      const method = init?.method ?? "GET";
      const body = init?.body ? JSON.parse(String(init.body)) : undefined;
      sent.push({ method, url, body });
      const json = (status: number, payload: unknown) =>
        new Response(JSON.stringify(payload), { status, headers: { "Content-Type": "application/json" } });
      if (url === "/api/sites") return json(200, { sites: [SITE] });
      if (url === "/api/customers") return json(200, { customers: [] });
      if (url === "/api/equipment" && method === "POST") {
        const answer = onCreate(body);
        return json(answer.status, answer.body);
      }
      return json(404, { message: `No stub for ${method} ${url}` });
    }),
  );
  return sent;
}

/** What the server answers for a stored unit: the body as sent plus the fields it adds. */
const stored = (body: Record<string, unknown>, id: string) => ({
  equipment: {
    ...body,
    id,
    siteName: SITE.name,
    customerId: SITE.customerId,
    customerName: SITE.customerName,
    createdAt: "2026-12-01T08:00:00.000Z",
  },
});

function renderForm() {
  const onCreated = vi.fn();
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  render(
    <QueryClientProvider client={queryClient}>
      <EquipmentForm onCreated={onCreated} />
    </QueryClientProvider>,
  );
  return { onCreated };
}

async function fillValidUnit(user: ReturnType<typeof userEvent.setup>) {
  await user.selectOptions(await screen.findByLabelText("Site"), SITE.id);
  await user.type(screen.getByLabelText("Unit name"), "RTU-2 packaged rooftop unit");
  await user.selectOptions(screen.getByLabelText("Kind"), "packaged rooftop");
  await user.selectOptions(screen.getByLabelText("Refrigerant"), "R407C");
  await user.type(screen.getByLabelText("Factory charge"), "4,2");
}

beforeEach(() => {
  vi.unstubAllGlobals();
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("EquipmentForm", () => {
  it("puts a message under each required field and sends nothing while any is wrong", async () => {
    const sent = stubApi(() => ({ status: 500, body: {} }));
    const user = userEvent.setup();
    renderForm();
    await screen.findByLabelText("Site");
    await user.click(screen.getByRole("button", { name: "Save unit" }));

    expect(await screen.findByText(/^⚠ Choose the site$/)).toBeInTheDocument();
    expect(screen.getByText(/Give the unit a name/)).toBeInTheDocument();
    expect(screen.getByText(/Choose the kind of equipment/)).toBeInTheDocument();
    expect(screen.getByText(/Choose a refrigerant from the list/)).toBeInTheDocument();
    expect(screen.getByText(/Factory charge must be a number in kg/)).toBeInTheDocument();
    expect(screen.getByLabelText("Unit name")).toHaveAttribute("aria-invalid", "true");
    expect(sent.filter((request) => request.method === "POST")).toHaveLength(0);
  });

  it("rejects text in a number field and offers only single or three phase", async () => {
    stubApi(() => ({ status: 500, body: {} }));
    const user = userEvent.setup();
    renderForm();
    await fillValidUnit(user);
    await user.type(screen.getByLabelText("Compressor RLA"), "eleven");
    await user.click(screen.getByRole("button", { name: "Save unit" }));
    expect(await screen.findByText(/Compressor RLA must be a number in A/)).toBeInTheDocument();
    // Low-voltage supplies are single phase or three phase (AS/NZS 3000 wiring rules).
    const phases = within(screen.getByLabelText("Phases"))
      .getAllByRole("option")
      .map((option) => option.textContent);
    expect(phases).toEqual(["Not stated", "Single phase", "Three phase"]);
  });

  it("shows the flammable caution for an A2L or A3 refrigerant and not for an A1", async () => {
    stubApi(() => ({ status: 500, body: {} }));
    const user = userEvent.setup();
    renderForm();
    const refrigerant = await screen.findByLabelText("Refrigerant");
    // ISO 817 / ASHRAE 34: R32 is A2L and R290 (propane) A3, both flammable; R407C is A1.
    await user.selectOptions(refrigerant, "R32");
    expect(screen.getByRole("region", { name: /^Caution/ })).toBeInTheDocument();
    expect(screen.getAllByText(/A2L/).length).toBeGreaterThan(0);
    await user.selectOptions(refrigerant, "R290");
    expect(screen.getByRole("region", { name: /^Caution/ })).toBeInTheDocument();
    await user.selectOptions(refrigerant, "R407C");
    expect(screen.queryByRole("region", { name: /^Caution/ })).not.toBeInTheDocument();
  });

  it("sends the nameplate as numbers with circuits numbered in order, and hands back the new unit", async () => {
    let received: Record<string, unknown> | undefined;
    stubApi((body) => {
      received = body;
      return { status: 201, body: stored(body, "00000000-0000-4000-8000-000000000099") };
    });
    const user = userEvent.setup();
    const { onCreated } = renderForm();
    await fillValidUnit(user);
    await user.click(screen.getByRole("button", { name: /Add circuit 2/ }));
    const second = screen.getByRole("group", { name: "Circuit 2" });
    await user.type(within(second).getByLabelText("Factory charge"), "3.9");
    await user.selectOptions(within(second).getByLabelText("Metering device"), "eev");
    await user.type(screen.getByLabelText("Compressor RLA"), "11.8");
    await user.type(screen.getByLabelText("Supply voltage"), "400");
    await user.selectOptions(screen.getByLabelText("Phases"), "3");
    await user.click(screen.getByRole("button", { name: "Save unit" }));

    await vi.waitFor(() => expect(onCreated).toHaveBeenCalledTimes(1));
    expect(received).toMatchObject({
      siteId: SITE.id,
      name: "RTU-2 packaged rooftop unit",
      kind: "packaged rooftop",
      refrigerant: "R407C",
      compressorRlaA: 11.8,
      supplyVoltageV: 400,
      phases: 3,
      fanFlaA: null,
      circuits: [
        // "4,2" typed with a decimal comma reads as 4.2 kg.
        { number: 1, factoryChargeKg: 4.2, meteringDevice: "txv", targetSuperheatK: null, targetSubcoolingK: null },
        { number: 2, factoryChargeKg: 3.9, meteringDevice: "eev", targetSuperheatK: null, targetSubcoolingK: null },
      ],
    });
  });

  it("places the server's field messages under their fields and keeps everything typed", async () => {
    stubApi(() => ({
      status: 400,
      body: {
        message: "Some fields need attention",
        fields: { siteId: "Choose one of your sites", "circuits.0.factoryChargeKg": "Check the charge" },
      },
    }));
    const user = userEvent.setup();
    const { onCreated } = renderForm();
    await fillValidUnit(user);
    await user.click(screen.getByRole("button", { name: "Save unit" }));

    expect(await screen.findByText(/Choose one of your sites/)).toBeInTheDocument();
    expect(screen.getByText(/Check the charge/)).toBeInTheDocument();
    expect(screen.getByLabelText("Unit name")).toHaveValue("RTU-2 packaged rooftop unit");
    expect(screen.getByLabelText("Factory charge")).toHaveValue("4,2");
    expect(screen.getByLabelText("Refrigerant")).toHaveValue("R407C");
    expect(onCreated).not.toHaveBeenCalled();
  });

  it("removes a circuit and renumbers the rest so they stay 1, 2, 3…", async () => {
    let received: Record<string, unknown> | undefined;
    stubApi((body) => {
      received = body;
      return { status: 201, body: stored(body, "00000000-0000-4000-8000-000000000098") };
    });
    const user = userEvent.setup();
    renderForm();
    await fillValidUnit(user);
    await user.click(screen.getByRole("button", { name: /Add circuit 2/ }));
    await user.type(within(screen.getByRole("group", { name: "Circuit 2" })).getByLabelText("Factory charge"), "2");
    await user.click(screen.getByRole("button", { name: /Add circuit 3/ }));
    await user.type(within(screen.getByRole("group", { name: "Circuit 3" })).getByLabelText("Factory charge"), "3");
    await user.click(screen.getByRole("button", { name: "Remove circuit 1" }));
    await user.click(screen.getByRole("button", { name: "Save unit" }));
    await vi.waitFor(() => expect(received).toBeDefined());
    expect(
      (received?.circuits as { number: number; factoryChargeKg: number }[]).map((entry) => [
        entry.number,
        entry.factoryChargeKg,
      ]),
    ).toEqual([
      [1, 2],
      [2, 3],
    ]);
  });
});

// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { NewSitePanel } from "@/features/equipment/components/new-site-panel.tsx";

const CUSTOMER = {
  id: "00000000-0000-4000-8000-000000000002",
  name: "Wattle Lane Clinic",
  contactName: null,
  contactEmail: null,
  contactPhone: null,
};
const SITE = {
  id: "00000000-0000-4000-8000-000000000001",
  customerId: CUSTOMER.id,
  customerName: CUSTOMER.name,
  name: "Main building",
  address: null,
  altitudeM: 120,
};

type Answer = { status: number; body: unknown };

/** A fetch stand-in for /api: the customers already known, and the two POSTs answered as given. */
function stubApi({
  customers,
  customer = () => ({ status: 201, body: { customer: CUSTOMER } }),
  site = () => ({ status: 201, body: { site: SITE } }),
}: {
  customers: (typeof CUSTOMER)[];
  customer?: () => Answer;
  site?: () => Answer;
}) {
  const posted: { url: string; body: unknown }[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = String(input);
      const method = init?.method ?? "GET";
      const json = ({ status, body }: Answer) =>
        new Response(JSON.stringify(body), { status, headers: { "Content-Type": "application/json" } });
      if (method === "POST") posted.push({ url, body: JSON.parse(String(init?.body)) });
      if (url === "/api/customers" && method === "GET") return json({ status: 200, body: { customers } });
      if (url === "/api/customers") return json(customer());
      if (url === "/api/sites" && method === "POST") return json(site());
      return json({ status: 404, body: { message: `No stub for ${method} ${url}` } });
    }),
  );
  return posted;
}

function renderPanel(onCancel?: () => void) {
  const onCreated = vi.fn();
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  render(
    <QueryClientProvider client={queryClient}>
      <NewSitePanel onCreated={onCreated} onCancel={onCancel} />
    </QueryClientProvider>,
  );
  return { onCreated };
}

beforeEach(() => {
  vi.unstubAllGlobals();
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("NewSitePanel", () => {
  it("adds the first customer, then the site under it, each saved with Enter", async () => {
    const posted = stubApi({ customers: [] });
    const user = userEvent.setup();
    const { onCreated } = renderPanel();

    expect(await screen.findByRole("group", { name: "New customer" })).toBeInTheDocument();
    // The first customer has nowhere else to go: no Cancel on its panel or on the site's.
    expect(screen.queryByRole("button", { name: "Cancel" })).not.toBeInTheDocument();
    await user.type(screen.getByLabelText("Customer name"), "Wattle Lane Clinic{Enter}");
    expect(await screen.findByRole("button", { name: "Save site" })).toBeEnabled();
    expect(posted).toEqual([{ url: "/api/customers", body: expect.objectContaining({ name: "Wattle Lane Clinic" }) }]);

    await user.type(screen.getByLabelText("Altitude (optional)"), "120");
    await user.type(screen.getByLabelText("Site name"), "Main building{Enter}");
    await vi.waitFor(() => expect(onCreated).toHaveBeenCalledWith(SITE));
    expect(posted[1]).toEqual({
      url: "/api/sites",
      body: expect.objectContaining({ customerId: CUSTOMER.id, name: "Main building", altitudeM: 120 }),
    });
  });

  it("puts the server's messages under their fields and the rest above the panel", async () => {
    stubApi({
      customers: [CUSTOMER],
      site: () => ({
        status: 400,
        body: { message: "Check the site", fields: { name: "A site by that name exists" } },
      }),
    });
    const user = userEvent.setup();
    const onCancel = vi.fn();
    const { onCreated } = renderPanel(onCancel);

    await user.selectOptions(await screen.findByLabelText("Customer"), CUSTOMER.id);
    await user.type(screen.getByLabelText("Site name"), "Main building");
    await user.click(screen.getByRole("button", { name: "Save site" }));
    expect(await screen.findByText(/A site by that name exists/)).toBeInTheDocument();
    expect(screen.queryByRole("alert")).not.toBeInTheDocument();
    expect(onCreated).not.toHaveBeenCalled();

    await user.click(screen.getByRole("button", { name: "Cancel" }));
    expect(onCancel).toHaveBeenCalledOnce();
  });

  it("says above the customer's panel what the server refused without naming a field", async () => {
    stubApi({ customers: [CUSTOMER], customer: () => ({ status: 500, body: { message: "The server failed" } }) });
    const user = userEvent.setup();
    renderPanel();

    await user.click(await screen.findByRole("button", { name: "New customer" }));
    await user.type(screen.getByLabelText("Customer name"), "Cool Co");
    await user.click(screen.getByRole("button", { name: "Save customer" }));
    expect(await screen.findByRole("alert")).toHaveTextContent("The server failed");
    expect(screen.getByRole("group", { name: "New customer" })).toContainElement(screen.getByRole("alert"));
  });
});

// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { formatTime } from "@shared/format/date-time.ts";
import { CircuitChoice, ProcedureLayout } from "@/features/procedures/components/procedure-layout.tsx";
import { ROLE_READ_ONLY_NOTE } from "@/features/procedures/utils/read-only-note.ts";

const VISIT_ID = "00000000-0000-4000-8000-000000000001";
const STANDING = { id: "00000000-0000-4000-8000-000000000011", takenAt: "2026-12-01T08:05:00.000Z", voided: null };
const VOIDED = {
  id: "00000000-0000-4000-8000-000000000012",
  takenAt: "2026-12-01T08:40:00.000Z",
  voided: {
    at: "2026-12-01T09:00:00.000Z",
    by: { id: "00000000-0000-4000-8000-000000000021", name: "Sam Toko" },
    reason: "Typed 3500 for 350",
  },
};

/** A save as `useProcedureSave` hands it over, idle unless told otherwise. */
const saveOf = (state: Partial<{ formError: string; stored: boolean; pending: boolean }> = {}) => ({
  submit: vi.fn(async () => undefined),
  dismiss: vi.fn(),
  formError: state.formError ?? null,
  stored: state.stored ?? false,
  pending: state.pending ?? false,
});

function renderLayout({
  canWrite = true,
  readOnlyNote,
  loadError,
  save = saveOf(),
  storedNote,
}: {
  canWrite?: boolean;
  readOnlyNote?: string;
  loadError?: string;
  save?: ReturnType<typeof saveOf>;
  storedNote?: string;
} = {}) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  render(
    <QueryClientProvider client={queryClient}>
      <ProcedureLayout
        visitId={VISIT_ID}
        kind="pressure-test"
        canWrite={canWrite}
        readOnlyNote={readOnlyNote}
        saved={{
          title: "Tests on this visit",
          records: [STANDING, VOIDED],
          name: "the pressure test",
          view: (test) => <p>Test {test.id.slice(-2)}</p>,
        }}
        loadError={loadError}
        form={{
          label: "New pressure test",
          title: "New nitrogen pressure test",
          save,
          saveLabel: "Save pressure test",
          storedNote,
          children: <p>The fields</p>,
        }}
      />
    </QueryClientProvider>,
  );
  return save;
}

beforeEach(() => {
  // Signed out: no entries kept on the device to list.
  vi.stubGlobal(
    "fetch",
    vi.fn(async () => new Response(JSON.stringify({ message: "Sign in" }), { status: 401 })),
  );
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("ProcedureLayout", () => {
  it("lists the saved records under their heading, each standing one with Void named by its time", () => {
    renderLayout();
    const list = screen.getByRole("region", { name: "Tests on this visit" });
    expect(within(list).getByText("Test 11")).toBeInTheDocument();
    expect(within(list).getByText("Test 12")).toBeInTheDocument();
    const voids = within(list).getAllByRole("button", { name: /^Void / });
    expect(voids.map((button) => button.getAttribute("aria-label"))).toEqual([
      `Void the pressure test of ${formatTime(STANDING.takenAt)}`,
    ]);
  });

  it("ends the form with the save's message and the button, which says when it is saving", () => {
    renderLayout({ save: saveOf({ formError: "Check the fields marked below", pending: true }) });
    const form = screen.getByRole("form", { name: "New pressure test" });
    expect(within(form).getByRole("heading", { name: "New nitrogen pressure test" })).toBeInTheDocument();
    expect(within(form).getByRole("alert")).toHaveTextContent("Check the fields marked below");
    expect(within(form).getByRole("button", { name: "Saving…" })).toBeDisabled();
    expect(screen.queryByRole("status")).not.toBeInTheDocument();
  });

  it("saves with the section's save when the button is pressed", async () => {
    const save = renderLayout();
    await userEvent.setup().click(screen.getByRole("button", { name: "Save pressure test" }));
    expect(save.submit).toHaveBeenCalledOnce();
  });

  it("says the stored note beside the button once the server has the record", () => {
    renderLayout({ save: saveOf({ stored: true }), storedNote: "✓ Saved and judged — see the check above" });
    expect(screen.getByRole("status")).toHaveTextContent("✓ Saved and judged — see the check above");
  });

  it("shows why nothing can be recorded instead of the form, and offers no void", () => {
    renderLayout({ canWrite: false, loadError: "The pressure tests could not be loaded: offline" });
    expect(screen.queryByRole("form")).not.toBeInTheDocument();
    expect(screen.getByText(ROLE_READ_ONLY_NOTE)).toBeInTheDocument();
    expect(screen.queryByRole("button", { name: /^Void / })).not.toBeInTheDocument();
    expect(screen.getByRole("alert")).toHaveTextContent("The pressure tests could not be loaded: offline");
  });

  it("offers each circuit by number and hands the choice on as text", async () => {
    const onChange = vi.fn();
    render(<CircuitChoice circuits={[1, 2]} value="1" onChange={onChange} />);
    const choice = screen.getByRole("radiogroup", { name: "Circuit" });
    expect(within(choice).getByRole("radio", { name: "Circuit 1" })).toHaveAttribute("aria-checked", "true");
    await userEvent.setup().click(within(choice).getByRole("radio", { name: "Circuit 2" }));
    expect(onChange).toHaveBeenCalledWith("2");
  });
});

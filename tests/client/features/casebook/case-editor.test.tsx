// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen } from "@testing-library/react";
import userEvent, { type UserEvent } from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { CaseDraft } from "@shared/schemas/casebook.ts";
import { CaseEditor } from "@/features/casebook/components/case-editor.tsx";
import { ApiError } from "@/lib/api/api-client.ts";
import { METRIC_UNITS } from "@/lib/units/display-units.ts";

function renderEditor(onSave: (draft: CaseDraft) => Promise<unknown> = vi.fn(async () => undefined)) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  render(
    <QueryClientProvider client={queryClient}>
      <CaseEditor units={METRIC_UNITS} atmosphericKPa={101.325} pending={false} onSave={onSave} />
    </QueryClientProvider>,
  );
  return { onSave };
}

/** A whole case in metric units: an R410A TXV circuit with its four refrigerant readings. */
async function fillCase(user: UserEvent) {
  await user.type(screen.getByLabelText("Title"), "Bellbird bakery, cool room: slow to pull down");
  await user.type(screen.getByLabelText("Site"), "A bakery's cool room");
  await user.type(screen.getByLabelText("Equipment"), "Split system, R410A, TXV");
  await user.type(screen.getByLabelText("Complaint"), "The room takes hours to cool");
  await user.type(screen.getByLabelText("Conditions"), "Mild afternoon, doors shut");
  await user.type(screen.getByLabelText("Suction pressure (low side)"), "800");
  await user.type(screen.getByLabelText("Suction line temperature"), "12");
  await user.type(screen.getByLabelText("Liquid pressure (high side)"), "2400");
  await user.type(screen.getByLabelText("Liquid line temperature"), "35");
  await user.type(screen.getByLabelText("Reasoning behind the verdict"), "High superheat and low subcooling on a TXV");
}

afterEach(() => {
  cleanup();
});

describe("CaseEditor", () => {
  it("refuses a reading it cannot read or that is missing in its own words, with the schema's messages for the rest", async () => {
    const user = userEvent.setup();
    const { onSave } = renderEditor();
    await user.type(screen.getByLabelText("Title"), "Cool");
    await user.type(screen.getByLabelText("Suction pressure (low side)"), "eight");
    await user.click(screen.getByRole("button", { name: "Save as draft" }));

    expect(await screen.findByRole("alert")).toHaveTextContent("Some fields need attention");
    expect(screen.getByText(/Suction pressure \(low side\) must be a number/)).toBeInTheDocument();
    expect(screen.getByText(/Liquid pressure \(high side\) is needed/)).toBeInTheDocument();
    expect(screen.getByText(/Give the case a title of at least 5 characters/)).toBeInTheDocument();
    expect(screen.getByText(/The site is needed/)).toBeInTheDocument();
    expect(screen.getByText(/Write the reasoning/)).toBeInTheDocument();
    expect(screen.getByLabelText("Title")).toHaveAttribute("aria-invalid", "true");
    expect(onSave).not.toHaveBeenCalled();
  });

  it("saves the shared schema's body: readings in SI-metric, hazards in the order they were ticked", async () => {
    const user = userEvent.setup();
    const { onSave } = renderEditor();
    await fillCase(user);
    await user.click(screen.getByLabelText("Pressure testing with nitrogen"));
    await user.click(screen.getByLabelText("Isolate, lock out, prove dead"));
    await user.selectOptions(screen.getByLabelText("Difficulty"), "intermediate");
    await user.click(screen.getByRole("button", { name: "Save as draft" }));

    expect(onSave).toHaveBeenCalledTimes(1);
    expect(onSave).toHaveBeenCalledWith({
      title: "Bellbird bakery, cool room: slow to pull down",
      difficulty: "intermediate",
      story: {
        site: "A bakery's cool room",
        equipment: "Split system, R410A, TXV",
        complaint: "The room takes hours to cool",
        conditions: "Mild afternoon, doors shut",
      },
      input: expect.objectContaining({
        refrigerant: "R410A",
        meteringDevice: "txv",
        suctionPressureKPa: 800,
        suctionLineTempC: 12,
        liquidPressureKPa: 2400,
        liquidLineTempC: 35,
      }) as unknown,
      reasoning: "High superheat and low subcooling on a TXV",
      safetyTopics: ["nitrogen", "electrical"],
    });
  });

  it("puts the server's field messages under their fields and its message above the button", async () => {
    const user = userEvent.setup();
    renderEditor(async () => {
      throw new ApiError(400, "Some fields need attention", { "story.site": "Leave the customer's name out" });
    });
    await fillCase(user);
    await user.click(screen.getByRole("button", { name: "Save as draft" }));

    expect(await screen.findByText(/Leave the customer's name out/)).toBeInTheDocument();
    expect(screen.getByRole("alert")).toHaveTextContent("Some fields need attention");
    expect(screen.getByLabelText("Site")).toHaveValue("A bakery's cool room");
  });
});

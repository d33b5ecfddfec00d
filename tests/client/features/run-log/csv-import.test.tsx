// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { CsvImport } from "@/features/run-log/components/csv-import.tsx";

const VISIT_ID = "00000000-0000-4000-8000-000000000001";
const LOG = [
  "\ufeffTime,Suction pressure kPa,Suction temp C,Liquid pressure kPa,Liquid temp C,Probe 7",
  "10:00,480,12,1650,37,a",
  "10:01,481,12.1,1651,37,b",
  "",
  "10:02,482,12.2,1652,37,c",
  "10:03,483,12.3,1653,37,d",
].join("\n");

/** POST /api/visits/:id/readings/import, answering with `answer`; each request's form is kept. */
function stubImport(answer: { status: number; body: object }) {
  const sent: FormData[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (_url: RequestInfo | URL, init?: RequestInit) => {
      sent.push(init?.body as FormData);
      return new Response(JSON.stringify(answer.body), {
        status: answer.status,
        headers: { "Content-Type": "application/json" },
      });
    }),
  );
  return sent;
}

function renderImport() {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  render(
    <QueryClientProvider client={queryClient}>
      <CsvImport visitId={VISIT_ID} circuit={1} />
    </QueryClientProvider>,
  );
}

const summary = { headers: [], mapping: {}, rowCount: 4, problems: [] };

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("CsvImport", () => {
  it("maps the columns from the file read in the browser, and sends the file once, at import", async () => {
    const sent = stubImport({ status: 201, body: { ...summary, validCount: 4, stored: 4 } });
    renderImport();
    const user = userEvent.setup();
    await user.upload(screen.getByLabelText("CSV file"), new File([LOG], "log.csv", { type: "text/csv" }));

    const column = (header: string) => screen.getByRole("combobox", { name: new RegExp(`^${header}`) });
    expect(await screen.findByRole("group", { name: "Columns" })).toBeInTheDocument();
    expect(column("Time")).toHaveValue("takenAt");
    expect(column("Suction pressure kPa")).toHaveValue("suctionPressureKPa");
    expect(column("Liquid temp C")).toHaveValue("liquidLineTempC");
    expect(column("Probe 7")).toHaveValue("ignore");
    // The first rows are shown under each header, blank lines skipped.
    expect(screen.getByText("a · b · c")).toBeInTheDocument();

    await user.selectOptions(column("Probe 7"), "outdoorAirDryBulbC");
    await user.selectOptions(column("Time"), "ignore");
    expect(screen.getByText(/Map one column to the reading time/)).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Import all rows" })).toBeDisabled();
    await user.selectOptions(column("Time"), "takenAt");
    expect(fetch).not.toHaveBeenCalled();

    await user.click(screen.getByRole("button", { name: "Import all rows" }));
    expect(await screen.findByText(/4 reading\(s\) imported into circuit 1/)).toBeInTheDocument();
    expect(sent).toHaveLength(1);
    expect(sent[0]!.get("mode")).toBe("all");
    expect(JSON.parse(String(sent[0]!.get("mapping")))).toEqual({
      Time: "takenAt",
      "Suction pressure kPa": "suctionPressureKPa",
      "Suction temp C": "suctionLineTempC",
      "Liquid pressure kPa": "liquidPressureKPa",
      "Liquid temp C": "liquidLineTempC",
      "Probe 7": "outdoorAirDryBulbC",
    });
    expect((sent[0]!.get("file") as File).name).toBe("log.csv");
  });

  it("lists the server's problems by line and imports the valid rows only when asked", async () => {
    const problems = [{ line: 3, field: "liquidLineTempC", message: "Liquid temp C: “abc” is not a number" }];
    const sent = stubImport({ status: 422, body: { ...summary, validCount: 3, problems, stored: 0 } });
    renderImport();
    const user = userEvent.setup();
    await user.upload(screen.getByLabelText("CSV file"), new File([LOG], "log.csv", { type: "text/csv" }));
    await user.click(await screen.findByRole("button", { name: "Import all rows" }));

    expect(await screen.findByText(/1 row\(s\) have problems: nothing was stored/)).toBeInTheDocument();
    expect(screen.getByRole("list", { name: "Problems by line" })).toHaveTextContent(
      "Line 3: Liquid temp C: “abc” is not a number",
    );
    expect(sent[0]!.get("mode")).toBe("all");
    const again = stubImport({ status: 201, body: { ...summary, validCount: 3, stored: 3 } });
    await user.click(screen.getByRole("button", { name: "Import the 3 valid rows and skip 1" }));
    expect(await screen.findByText(/3 reading\(s\) imported into circuit 1/)).toBeInTheDocument();
    expect(again[0]!.get("mode")).toBe("valid-only");
  });

  it("says so when the chosen file is empty, sending nothing", async () => {
    stubImport({ status: 500, body: {} });
    renderImport();
    const user = userEvent.setup();
    await user.upload(screen.getByLabelText("CSV file"), new File(["\n\n"], "empty.csv", { type: "text/csv" }));
    expect(await screen.findByText(/The file is empty/)).toBeInTheDocument();
    expect(fetch).not.toHaveBeenCalled();
  });
});

// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { Profile } from "@shared/schemas/profile.ts";
import { ProfileForm } from "@/features/profile/components/profile-form.tsx";

const PROFILE: Profile = {
  user: {
    id: "00000000-0000-4000-8000-000000000001",
    email: "tech@bellbird.example",
    name: "Sam Toko",
    role: "technician",
    organisationId: "00000000-0000-4000-8000-000000000002",
  },
  organisationName: "Bellbird Mechanical",
  preferences: { temperatureUnit: "C", pressureUnit: "kPa", atmosphericPressureKPa: 101.325 },
  licenceNumber: null,
  version: 3,
};

interface Sent {
  method: string;
  ifMatch: string | null;
  body: unknown;
}

/** /api/profile on a server where another device has already saved version 4. */
function stubApi() {
  const sent: Sent[] = [];
  const saved = { ...PROFILE, user: { ...PROFILE.user, name: "Samuel Toko" }, version: 4 };
  vi.stubGlobal(
    "fetch",
    vi.fn(async (_input: RequestInfo | URL, init?: RequestInit) => {
      const method = init?.method ?? "GET";
      const headers = new Headers(init?.headers);
      sent.push({
        method,
        ifMatch: headers.get("If-Match"),
        body: init?.body ? JSON.parse(String(init.body)) : undefined,
      });
      const json = (status: number, payload: unknown) =>
        new Response(JSON.stringify(payload), { status, headers: { "Content-Type": "application/json" } });
      if (method === "PUT") {
        return headers.get("If-Match") === '"4"'
          ? json(200, { ...saved, user: { ...saved.user, name: "Sam T." }, version: 5 })
          : json(409, {
              message:
                "A newer version of your profile was saved after you opened it here, so your change was not saved. Reload to see the latest version, then make your change again.",
            });
      }
      return json(200, saved);
    }),
  );
  return sent;
}

function renderForm() {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  queryClient.setQueryData(["profile"], PROFILE);
  function Screen() {
    return <ProfileForm profile={(queryClient.getQueryData(["profile"]) as Profile) ?? PROFILE} />;
  }
  return render(
    <QueryClientProvider client={queryClient}>
      <Screen />
    </QueryClientProvider>,
  );
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("ProfileForm", () => {
  it("sends the version it was filled from, and on a stale save keeps what was typed in view and offers the latest", async () => {
    const sent = stubApi();
    const user = userEvent.setup();
    renderForm();
    await user.clear(screen.getByLabelText("Your name"));
    await user.type(screen.getByLabelText("Your name"), "Sam T.");
    await user.click(screen.getByRole("button", { name: "Save settings" }));

    const notice = await screen.findByRole("alert");
    expect(notice).toHaveTextContent("A newer version of your profile was saved");
    expect(within(notice).getByText("Sam T.")).toBeInTheDocument();
    expect(sent.find((request) => request.method === "PUT")).toMatchObject({
      ifMatch: '"3"',
      body: { name: "Sam T.", licenceNumber: null },
    });

    await user.click(within(notice).getByRole("button", { name: "Reload the latest version" }));
    expect(await screen.findByDisplayValue("Samuel Toko")).toBeInTheDocument();
    expect(screen.getByRole("alert")).toHaveTextContent("This is your profile as saved now");
    expect(within(screen.getByRole("alert")).getByText("Sam T.")).toBeInTheDocument();
  });
});

import { describe, expect, it } from "vitest";
import { paths } from "@/config/paths.ts";
import { ACCOUNT_SCREENS, screenAt, SIGNED_IN_SCREENS } from "@/routes/screens.ts";

const VISIT_ID = "00000000-0000-4000-8000-000000000100";
const pathOf = (pathname: string) => screenAt(pathname)?.screen.path;

// The screen started at start-up must be the one the router shows, or the phone downloads a
// screen it never runs while the right one waits (src/start-first-screen.ts).
describe("screenAt", () => {
  it("finds a public account screen outside the signed-in frame", () => {
    expect(screenAt("/sign-in")).toMatchObject({ signedIn: false, screen: { path: paths.signIn.path } });
    expect(screenAt("/reset-password")?.signedIn).toBe(false);
  });

  it("finds a signed-in screen inside the frame, the visit's run log and its report apart", () => {
    expect(screenAt(`/visits/${VISIT_ID}`)).toMatchObject({
      signedIn: true,
      screen: { path: paths.visits.detail.path },
    });
    expect(pathOf(`/visits/${VISIT_ID}/report`)).toBe(paths.visits.report.path);
    expect(pathOf("/")).toBe(paths.home.path);
  });

  it("ranks a fixed path over a parameter, as the router does", () => {
    expect(pathOf("/equipment/new")).toBe(paths.equipment.new.path);
    expect(pathOf("/equipment/unit-7")).toBe(paths.equipment.detail.path);
    expect(pathOf("/casebook/new")).toBe(paths.casebook.new.path);
  });

  it("sends any other path to the not-found screen in the frame", () => {
    expect(screenAt("/no/such/screen")).toMatchObject({ signedIn: true, screen: { path: "*" } });
  });

  it("names every screen once", () => {
    const named = [...ACCOUNT_SCREENS, ...SIGNED_IN_SCREENS].map((screen) => screen.path);
    expect(new Set(named).size).toBe(named.length);
  });
});

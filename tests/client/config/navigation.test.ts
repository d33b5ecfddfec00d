import { describe, expect, it } from "vitest";
import { isNavItemActive, navigation, navigationFor } from "@/config/navigation.ts";

const item = (label: string) => navigation.find((candidate) => candidate.label === label)!;
const at = (url: string) => {
  const parsed = new URL(url, "http://satura.invalid");
  return { pathname: parsed.pathname, search: parsed.search };
};
const active = (url: string, items = navigation) =>
  items.filter((candidate) => isNavItemActive(candidate, at(url), items)).map((candidate) => candidate.label);

describe("isNavItemActive", () => {
  it("marks exactly one section for the jobs list and for the review queue", () => {
    expect(active("/jobs")).toEqual(["Jobs"]);
    expect(active("/jobs?status=awaiting-review")).toEqual(["Review"]);
    expect(active("/jobs?status=open")).toEqual(["Jobs"]);
  });

  it("keeps Equipment active on a unit's page and on the new-unit form", () => {
    expect(active("/equipment")).toEqual(["Equipment"]);
    expect(active("/equipment/new")).toEqual(["Equipment"]);
    expect(active("/equipment-other")).toEqual([]);
    expect(isNavItemActive(item("Equipment"), at("/equipment/1234"), navigation)).toBe(true);
  });

  it("lets Jobs take the review queue when the viewer has no Review entry", () => {
    // Only seniors and owners sign off (PERMISSIONS.signOff), so a technician sees no Review item.
    const forTechnician = navigationFor("technician", { outbox: false });
    expect(forTechnician.map((entry) => entry.label)).not.toContain("Review");
    expect(active("/jobs?status=awaiting-review", forTechnician)).toEqual(["Jobs"]);
    expect(navigationFor("senior", { outbox: false }).map((entry) => entry.label)).toContain("Review");
  });
});

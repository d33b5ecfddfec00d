// @vitest-environment jsdom
/**
 * The refrigerant list's search follows the app's one search rule (shared/format/search-terms.ts):
 * a designation is found however a technician writes it ("R32", "r-32", "32"), and a bracketed
 * isomer with or without its brackets.
 */
import "@testing-library/jest-dom/vitest";
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { MemoryRouter } from "react-router-dom";
import { afterEach, describe, expect, it } from "vitest";
import { RefrigerantList } from "@/features/pt-tables/components/refrigerant-list.tsx";

afterEach(cleanup);

const shownIds = () =>
  screen
    .queryAllByRole("link")
    .map((link) => link.querySelector(".num")?.textContent)
    .filter(Boolean);

function search(query: string) {
  fireEvent.change(screen.getByLabelText("Find a refrigerant"), { target: { value: query } });
}

describe("RefrigerantList search", () => {
  it("finds a designation written with or without its R and dash, and isomers with or without brackets", () => {
    render(
      <MemoryRouter>
        <RefrigerantList />
      </MemoryRouter>,
    );
    const everything = shownIds().length;
    expect(everything).toBeGreaterThan(20);
    for (const typed of ["R-410A", "r410a", "410A"]) {
      search(typed);
      expect(shownIds()).toEqual(["R410A"]);
    }
    search("1234zeE");
    expect(shownIds()).toContain("R1234ze(E)");
    search("propane");
    expect(shownIds()).toEqual(["R290"]);
    search("   ");
    expect(shownIds()).toHaveLength(everything);
    search("xyz");
    expect(shownIds()).toEqual([]);
  });
});

// @vitest-environment jsdom
import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { Toaster, toastError } from "@/components/ui/toaster/toaster.tsx";

describe("Toaster", () => {
  it("renders nothing until a toast is asked for, then shows it and the next ones", async () => {
    const { container } = render(<Toaster />);
    expect(container.innerHTML).toBe("");
    toastError("Could not refresh: the server answered 500");
    expect(await screen.findByText("Could not refresh: the server answered 500")).toBeTruthy();
    toastError("No connection to the Satura server");
    expect(await screen.findByText("No connection to the Satura server")).toBeTruthy();
  });
});

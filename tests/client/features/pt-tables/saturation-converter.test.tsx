// @vitest-environment jsdom
/**
 * The quick converter keeps the quantity typed when the display unit is switched: 430 kPa gauge
 * becomes 62.4 psig (1 psi = 6.894757 kPa, NIST SP 811), never "430 psig". The saturation
 * temperature shown stays the same.
 */
import "@testing-library/jest-dom/vitest";
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it } from "vitest";
import { SaturationConverter } from "@/features/pt-tables/components/saturation-converter.tsx";

afterEach(cleanup);

describe("SaturationConverter", () => {
  it("converts the typed pressure when the pressure unit changes, and the answer stays put", async () => {
    const props = { refrigerantId: "R410A", isBlend: true, atmosphericKPa: 101.325 };
    const view = render(<SaturationConverter {...props} units={{ temperature: "C", pressure: "kPa" }} />);
    await userEvent.type(screen.getByLabelText("Gauge pressure"), "430");
    const dewBefore = screen.getByText("Dew point").closest("div")!.textContent;
    view.rerender(<SaturationConverter {...props} units={{ temperature: "C", pressure: "psi" }} />);
    const field = screen.getByLabelText("Gauge pressure") as HTMLInputElement;
    expect(Number(field.value)).toBeCloseTo(430 / 6.894757, 1);
    expect(screen.getByText("Dew point").closest("div")!.textContent).toBe(dewBefore);
  });
});

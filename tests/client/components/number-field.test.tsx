// @vitest-environment jsdom
/**
 * Number fields that go below zero carry their own ± button: the iPhone's decimal keypad
 * (inputMode="decimal") has no minus key (Apple developer documentation, UIKeyboardType
 * .decimalPad: "a keyboard with numbers and a decimal point"), and cool rooms, evaporators and
 * circuits in vacuum read below zero (°C; kPa gauge below atmospheric).
 */
import "@testing-library/jest-dom/vitest";
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { afterEach, describe, expect, it } from "vitest";
import { NumberField, typedNumber } from "@/components/ui/field/number-field.tsx";
import { flipSign, parseDecimal, unitCanBeNegative } from "@/components/ui/field/number-input.tsx";

afterEach(cleanup);

const SIGN = "Change sign (plus or minus)";

function Controlled({ unit, initial = "" }: { unit: string; initial?: string }) {
  const [text, setText] = useState(initial);
  return <NumberField label="Suction line temperature" unit={unit} value={text} onValueChange={setText} />;
}

describe("NumberField", () => {
  it("keeps the decimal keypad and a text input, so a typed comma or minus is never dropped", () => {
    render(<Controlled unit="°C" />);
    const input = screen.getByLabelText("Suction line temperature");
    expect(input).toHaveAttribute("type", "text");
    expect(input).toHaveAttribute("inputmode", "decimal");
  });

  it("flips the sign of what is typed, and back", async () => {
    const user = userEvent.setup();
    render(<Controlled unit="°C" />);
    const input = screen.getByLabelText("Suction line temperature");
    await user.type(input, "18,5");
    await user.click(screen.getByRole("button", { name: SIGN }));
    expect(input).toHaveValue("-18,5");
    expect(parseDecimal("-18,5")).toBe(-18.5);
    await user.click(screen.getByRole("button", { name: SIGN }));
    expect(input).toHaveValue("18,5");
  });

  it("starts a value with the minus when pressed first, and the digits follow it", async () => {
    const user = userEvent.setup();
    render(<Controlled unit="kPa g" />);
    const input = screen.getByLabelText("Suction line temperature");
    await user.click(screen.getByRole("button", { name: SIGN }));
    expect(input).toHaveValue("-");
    await user.type(input, "45");
    expect(input).toHaveValue("-45");
  });

  it("leaves the focus in the field, so the phone's keypad stays up", async () => {
    const user = userEvent.setup();
    render(<Controlled unit="°C" />);
    const input = screen.getByLabelText("Suction line temperature");
    await user.type(input, "4");
    await user.click(screen.getByRole("button", { name: SIGN }));
    expect(input).toHaveFocus();
    expect(input).toHaveValue("-4");
  });

  it("gives a react-hook-form field the negative number", async () => {
    const user = userEvent.setup();
    let submitted: unknown;
    function Form() {
      const form = useForm<{ t: unknown }>();
      return (
        <form onSubmit={form.handleSubmit((values) => void (submitted = values.t))}>
          <NumberField
            label="Box temperature"
            unit="°C"
            registration={form.register("t", { setValueAs: typedNumber })}
          />
          <button type="submit">Save</button>
        </form>
      );
    }
    render(<Form />);
    await user.type(screen.getByLabelText("Box temperature"), "18,0");
    await user.click(screen.getByRole("button", { name: SIGN }));
    await user.click(screen.getByRole("button", { name: "Save" }));
    expect(submitted).toBe(-18);
  });

  it("offers the button on temperatures and gauge pressures, not on masses, microns or absolute pressures", () => {
    for (const unit of ["°C", "°F", "kPa g", "psig", "bar g", "MPa g"]) expect(unitCanBeNegative(unit)).toBe(true);
    for (const unit of ["kg", "µm", "kPa abs", "psia", "min", "V", "A", "K", ""])
      expect(unitCanBeNegative(unit)).toBe(false);
    render(<NumberField label="Mass" unit="kg" />);
    expect(screen.queryByRole("button", { name: SIGN })).not.toBeInTheDocument();
  });

  it("keeps the button out of the Tab order (a keyboard has its own minus key) and at least 48 px", () => {
    render(<Controlled unit="°C" />);
    const button = screen.getByRole("button", { name: SIGN });
    expect(button).toHaveAttribute("tabindex", "-1");
    // min-h-14 / min-w-14 are 3.5 rem, 56 px at the 16 px base: over the 48 px target size.
    expect(button.className).toMatch(/\bmin-h-14\b/);
    expect(button.className).toMatch(/\bmin-w-14\b/);
  });
});

describe("flipSign", () => {
  it("adds, removes and replaces signs, the typographic minus included", () => {
    expect(flipSign("12")).toBe("-12");
    expect(flipSign("-12")).toBe("12");
    expect(flipSign("−12")).toBe("12");
    expect(flipSign("+12")).toBe("-12");
    expect(flipSign("")).toBe("-");
    expect(flipSign("-")).toBe("");
    expect(parseDecimal("−3,5")).toBe(-3.5);
  });
});

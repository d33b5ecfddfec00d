import { forwardRef, useRef, type InputHTMLAttributes } from "react";
import { cn } from "@/lib/cn.ts";

interface NumberInputProps extends Omit<InputHTMLAttributes<HTMLInputElement>, "type"> {
  /** Unit shown inside the field, right-aligned, e.g. "kPa g". */
  unit?: string;
  invalid?: boolean;
  /**
   * Shows a ± button beside the field for values that can be below zero. Left out, it follows
   * the unit: temperatures (°C, °F) and gauge pressures (kPa g, psig, bar g, MPa g: a circuit in
   * vacuum reads below zero gauge) get one.
   */
  signed?: boolean;
}

/** Units whose values go below zero in the field: cool rooms, evaporators and circuits in vacuum. */
export function unitCanBeNegative(unit: string | undefined): boolean {
  if (!unit) return false;
  return unit.startsWith("°") || unit.endsWith(" g") || unit === "psig";
}

/** "12" → "-12", "-12" → "12", "+12" → "-12", "" → "-" (the digits come next). Accepts the typographic minus too. */
export function flipSign(text: string): string {
  const trimmed = text.trim();
  if (/^[-−]/.test(trimmed)) return trimmed.slice(1);
  return `-${trimmed.replace(/^\+/, "")}`;
}

/**
 * Sets an input's text the way typing does, so React's onChange (and react-hook-form's
 * register) sees it: React tracks the value a script sets directly and would ignore the event.
 */
function typeInto(input: HTMLInputElement, text: string) {
  Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, "value")?.set?.call(input, text);
  input.dispatchEvent(new Event("input", { bubbles: true }));
}

/**
 * A large numeric field with its unit beside the digits. It is a text input with a decimal
 * keypad (inputMode) rather than type=number, which drops a typed "-" or "," on some phones.
 * The iPhone's decimal keypad has no minus key at all, so fields that take negatives carry a
 * ± button of their own (56 px, a gloved finger's size) that flips the sign of what is typed.
 */
export const NumberInput = forwardRef<HTMLInputElement, NumberInputProps>(function NumberInput(
  { unit, invalid, signed, className, ...props },
  ref,
) {
  const inputRef = useRef<HTMLInputElement | null>(null);
  const withSign = signed ?? unitCanBeNegative(unit);
  const frame = (
    <div
      data-unit-frame=""
      className={cn(
        "flex min-h-14 items-center rounded-card border-2 bg-surface focus-within:border-ink",
        invalid ? "border-fault" : "border-rule",
        withSign ? "min-w-0 flex-1" : className,
      )}
    >
      <input
        ref={(element) => {
          inputRef.current = element;
          if (typeof ref === "function") ref(element);
          else if (ref) ref.current = element;
        }}
        type="text"
        inputMode="decimal"
        autoComplete="off"
        spellCheck={false}
        aria-invalid={invalid || undefined}
        className="num w-full min-w-0 bg-transparent px-3 py-2 text-2xl outline-none"
        {...props}
      />
      {unit && <span className="num shrink-0 pr-3 text-base text-muted">{unit}</span>}
    </div>
  );
  if (!withSign) return frame;
  return (
    <div className={cn("flex items-stretch gap-2", className)}>
      <button
        type="button"
        // Named for what it does; the field itself shows the sign.
        aria-label="Change sign (plus or minus)"
        aria-controls={props.id}
        // A keyboard has its own minus key: the button is for touch keypads without one, and
        // staying out of the Tab order keeps a long form at one stop per field.
        tabIndex={-1}
        // Keeps the focus (and the phone's keypad) in the field while the sign is flipped.
        onMouseDown={(event) => event.preventDefault()}
        onClick={() => {
          const input = inputRef.current;
          if (!input || input.disabled || input.readOnly) return;
          typeInto(input, flipSign(input.value));
        }}
        disabled={props.disabled}
        className="num inline-flex min-h-14 min-w-14 shrink-0 items-center justify-center rounded-card border-2 border-rule bg-surface text-2xl font-semibold text-ink hover:border-ink disabled:opacity-50"
      >
        ±
      </button>
      {frame}
    </div>
  );
});

/** Reads what a technician typed: accepts "4,5" as 4.5, a leading "+" and a typographic minus; "" → undefined. */
export function parseDecimal(text: string): number | undefined | "invalid" {
  const trimmed = text.trim().replace(",", ".").replace(/^\+/, "").replace(/^−/, "-");
  if (trimmed === "") return undefined;
  if (!/^-?(\d+\.?\d*|\.\d+)$/.test(trimmed)) return "invalid";
  return Number(trimmed);
}

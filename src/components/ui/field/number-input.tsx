import { forwardRef, type InputHTMLAttributes } from "react";
import { cn } from "@/lib/cn.ts";

interface NumberInputProps extends Omit<InputHTMLAttributes<HTMLInputElement>, "type"> {
  /** Unit shown inside the field, right-aligned, e.g. "kPa g". */
  unit?: string;
  invalid?: boolean;
}

/**
 * A large numeric field with its unit beside the digits. It is a text input with a decimal
 * keypad (inputMode) rather than type=number, which drops a typed "-" or "," on some phones.
 */
export const NumberInput = forwardRef<HTMLInputElement, NumberInputProps>(function NumberInput(
  { unit, invalid, className, ...props },
  ref,
) {
  return (
    <div
      className={cn(
        "flex min-h-14 items-center rounded-card border-2 bg-surface focus-within:border-ink",
        invalid ? "border-fault" : "border-rule",
        className,
      )}
    >
      <input
        ref={ref}
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
});

/** Reads what a technician typed: accepts "4,5" as 4.5 and a leading "+"; "" → undefined. */
export function parseDecimal(text: string): number | undefined | "invalid" {
  const trimmed = text.trim().replace(",", ".").replace(/^\+/, "");
  if (trimmed === "") return undefined;
  if (!/^-?(\d+\.?\d*|\.\d+)$/.test(trimmed)) return "invalid";
  return Number(trimmed);
}

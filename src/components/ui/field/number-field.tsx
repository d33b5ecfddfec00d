import { forwardRef, useId, type ComponentProps, type ReactNode } from "react";
import type { UseFormRegisterReturn } from "react-hook-form";
import { NumberInput, parseDecimal } from "./number-input.tsx";

/**
 * Turns what was typed into the number a shared schema checks: "" → undefined (no value),
 * "4,5" → 4.5; anything unreadable stays as text so the schema's own "must be a number in …"
 * message appears under the field. Use as react-hook-form's `setValueAs`.
 */
export function typedNumber(value: unknown): unknown {
  if (typeof value === "number" || value === null || value === undefined) return value ?? undefined;
  const parsed = parseDecimal(String(value));
  return parsed === "invalid" ? String(value) : parsed;
}

type NumberFieldProps = Omit<ComponentProps<typeof NumberInput>, "invalid"> & {
  label: string;
  unit: string;
  error?: string;
  hint?: ReactNode;
  /** react-hook-form's register(...) result; or pass value/onChange for a controlled field. */
  registration?: UseFormRegisterReturn;
  /** Classes for the wrapper (label, input and messages). */
  wrapperClassName?: string;
  /** For controlled fields: called with the text as typed. */
  onValueChange?: (text: string) => void;
};

/** A large labelled number input with its unit beside the digits and its hint or message under it. */
export const NumberField = forwardRef<HTMLInputElement, NumberFieldProps>(function NumberField(
  { label, unit, error, hint, registration, wrapperClassName, onValueChange, id, ...inputProps },
  ref,
) {
  const generated = useId();
  const fieldId = id ?? generated;
  const describedBy =
    [hint ? `${fieldId}-hint` : "", error ? `${fieldId}-error` : ""].filter(Boolean).join(" ") || undefined;
  return (
    <div className={wrapperClassName ?? "space-y-1"}>
      <label htmlFor={fieldId} className="block font-medium">
        {label}
      </label>
      <NumberInput
        ref={ref}
        id={fieldId}
        unit={unit}
        invalid={Boolean(error)}
        aria-describedby={describedBy}
        {...(onValueChange ? { onChange: (event) => onValueChange(event.target.value) } : {})}
        {...inputProps}
        {...registration}
      />
      {hint && (
        <p id={`${fieldId}-hint`} className="text-sm text-muted">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${fieldId}-error`} className="text-sm font-medium text-fault">
          ⚠ {error}
        </p>
      )}
    </div>
  );
});

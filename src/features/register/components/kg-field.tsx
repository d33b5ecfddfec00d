import { useId, type ReactNode } from "react";
import type { UseFormRegisterReturn } from "react-hook-form";
import { NumberInput, parseDecimal } from "@/components/ui/field/number-input.tsx";

/**
 * Turns what was typed into the number the shared schema checks: "" → undefined, "4,5" → 4.5;
 * anything unreadable stays text so the schema's own "must be a number" message shows.
 */
export function typedNumber(value: unknown): unknown {
  if (typeof value === "number" || value === null || value === undefined) return value ?? undefined;
  const parsed = parseDecimal(String(value));
  return parsed === "invalid" ? String(value) : parsed;
}

interface KgFieldProps {
  label: string;
  registration: UseFormRegisterReturn;
  unit?: string;
  error?: string;
  hint?: ReactNode;
  placeholder?: string;
}

/** A large mass input with "kg" beside the digits, its hint and its message under it. */
export function KgField({ label, registration, unit = "kg", error, hint, placeholder }: KgFieldProps) {
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : "", error ? `${id}-error` : ""].filter(Boolean).join(" ") || undefined;
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block font-medium">
        {label}
      </label>
      <NumberInput id={id} unit={unit} invalid={Boolean(error)} aria-describedby={describedBy} placeholder={placeholder} {...registration} />
      {hint && (
        <p id={`${id}-hint`} className="text-sm text-muted">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="text-sm font-medium text-fault">
          ⚠ {error}
        </p>
      )}
    </div>
  );
}

import { useId } from "react";
import { NumberInput } from "@/components/ui/field/number-input.tsx";

interface NumberFieldProps {
  label: string;
  unit: string;
  value: string;
  onChange: (value: string) => void;
  error?: string;
  hint?: string;
  className?: string;
}

/** A large numeric entry with its label above, its unit beside the digits and its message below. */
export function NumberField({ label, unit, value, onChange, error, hint, className }: NumberFieldProps) {
  const id = useId();
  const described = [hint ? `${id}-hint` : "", error ? `${id}-error` : ""].filter(Boolean).join(" ") || undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="block font-medium">
        {label}
      </label>
      <NumberInput id={id} unit={unit} value={value} onChange={(event) => onChange(event.target.value)} invalid={Boolean(error)} aria-describedby={described} />
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

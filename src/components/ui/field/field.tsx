import { Eye, EyeOff } from "lucide-react";
import { useId, useState, type ComponentProps, type ReactNode } from "react";
import { cn } from "@/lib/cn.ts";

const controlClass =
  "block min-h-touch w-full rounded-card border-2 border-rule bg-surface px-3 py-2 text-base text-ink placeholder:text-muted focus-visible:border-ink aria-[invalid=true]:border-fault";

interface FieldShellProps {
  id: string;
  label: string;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
}

/** Label above, control, then the hint and the error message under it, tied together for screen readers. */
function FieldShell({ id, label, hint, error, children }: FieldShellProps) {
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block font-medium">
        {label}
      </label>
      {children}
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

function describedBy(id: string, hint: unknown, error: unknown): string | undefined {
  const ids = [hint ? `${id}-hint` : "", error ? `${id}-error` : ""].filter(Boolean);
  return ids.length > 0 ? ids.join(" ") : undefined;
}

export type TextFieldProps = ComponentProps<"input"> & { label: string; hint?: ReactNode; error?: string };

/** A labelled input at least 44 px tall; pass react-hook-form's register(...) props straight in. */
export function TextField({ label, hint, error, id, className, ...props }: TextFieldProps) {
  const generated = useId();
  const fieldId = id ?? generated;
  return (
    <FieldShell id={fieldId} label={label} hint={hint} error={error}>
      <input
        id={fieldId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, hint, error)}
        className={cn(controlClass, className)}
        {...props}
      />
    </FieldShell>
  );
}

/** A password input with a show/hide switch, for typing long passphrases on a phone. */
export function PasswordField({ label, hint, error, id, className, ...props }: TextFieldProps) {
  const generated = useId();
  const fieldId = id ?? generated;
  const [visible, setVisible] = useState(false);
  return (
    <FieldShell id={fieldId} label={label} hint={hint} error={error}>
      <div className="flex gap-2">
        <input
          id={fieldId}
          type={visible ? "text" : "password"}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(fieldId, hint, error)}
          className={cn(controlClass, "flex-1", className)}
          {...props}
        />
        <button
          type="button"
          onClick={() => setVisible((value) => !value)}
          aria-pressed={visible}
          aria-label={visible ? `Hide ${label.toLowerCase()}` : `Show ${label.toLowerCase()}`}
          className="inline-flex min-h-touch min-w-touch items-center justify-center rounded-card border-2 border-rule bg-surface hover:border-ink"
        >
          {visible ? <EyeOff aria-hidden className="size-5" /> : <Eye aria-hidden className="size-5" />}
        </button>
      </div>
    </FieldShell>
  );
}

export type SelectFieldProps = ComponentProps<"select"> & { label: string; hint?: ReactNode; error?: string };

export function SelectField({ label, hint, error, id, className, children, ...props }: SelectFieldProps) {
  const generated = useId();
  const fieldId = id ?? generated;
  return (
    <FieldShell id={fieldId} label={label} hint={hint} error={error}>
      <select
        id={fieldId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, hint, error)}
        className={cn(controlClass, className)}
        {...props}
      >
        {children}
      </select>
    </FieldShell>
  );
}

/** A form-level message (not tied to one field), announced when it appears. */
export function FormAlert({ tone = "fault", children }: { tone?: "fault" | "good"; children: ReactNode }) {
  return (
    <div
      role={tone === "fault" ? "alert" : "status"}
      className={cn(
        "rounded-card border-2 bg-surface p-3 font-medium",
        tone === "fault" ? "border-fault text-fault" : "border-good text-good",
      )}
    >
      {tone === "fault" ? "⚠ " : "✓ "}
      {children}
    </div>
  );
}

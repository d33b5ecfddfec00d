import { cn } from "@/lib/cn.ts";

interface SegmentedProps<T extends string> {
  label: string;
  value: T;
  options: { value: T; label: string }[];
  onChange: (value: T) => void;
  className?: string;
}

/** A row of large radio buttons for a short, exclusive choice (units, bubble/dew). */
export function Segmented<T extends string>({ label, value, options, onChange, className }: SegmentedProps<T>) {
  return (
    <div
      role="radiogroup"
      aria-label={label}
      className={cn("inline-flex rounded-card border-2 border-rule bg-surface p-0.5", className)}
    >
      {options.map((option) => {
        const checked = option.value === value;
        return (
          <button
            key={option.value}
            type="button"
            role="radio"
            aria-checked={checked}
            onClick={() => onChange(option.value)}
            className={cn(
              "min-h-touch min-w-touch rounded-[0.5rem] px-3 font-medium",
              checked ? "bg-ink text-paper" : "text-ink hover:bg-sunken",
            )}
          >
            {option.label}
          </button>
        );
      })}
    </div>
  );
}

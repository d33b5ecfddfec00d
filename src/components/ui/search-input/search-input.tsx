import { Search } from "lucide-react";
import { cn } from "@/lib/cn.ts";

interface SearchInputProps {
  /** The id its <label> points at (each screen words its own label). */
  id: string;
  value: string;
  onChange: (value: string) => void;
  placeholder: string;
  /** A larger type where the search is the screen's main job (the P–T table list). */
  large?: boolean;
  className?: string;
}

/** The one search field: a 56 px box with its icon, typed text kept as typed, no autocomplete. */
export function SearchInput({ id, value, onChange, placeholder, large = false, className }: SearchInputProps) {
  return (
    <div
      className={cn(
        "mt-1 flex min-h-14 items-center gap-2 rounded-card border-2 border-rule bg-surface px-3 focus-within:border-ink",
        className,
      )}
    >
      <Search aria-hidden className="size-5 text-muted" />
      <input
        id={id}
        type="search"
        value={value}
        onChange={(event) => onChange(event.target.value)}
        placeholder={placeholder}
        className={cn("w-full bg-transparent py-2 outline-none", large ? "text-xl" : "text-lg")}
        autoComplete="off"
        enterKeyHint="search"
      />
    </div>
  );
}

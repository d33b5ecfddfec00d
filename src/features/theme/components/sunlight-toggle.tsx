import { Sun } from "lucide-react";
import { cn } from "@/lib/cn.ts";
import { useTheme } from "../hooks/use-theme.ts";

/** A switch for Sunlight mode; its state reads as a word, not only as a colour. */
export function SunlightToggle({ className }: { className?: string }) {
  const [theme, setTheme] = useTheme();
  const on = theme === "sunlight";
  return (
    <button
      type="button"
      role="switch"
      aria-checked={on}
      onClick={() => setTheme(on ? "paper" : "sunlight")}
      className={cn(
        "inline-flex min-h-touch items-center gap-2 rounded-card border-2 px-3 font-medium",
        on ? "border-ink bg-ink text-paper" : "border-rule bg-surface text-ink hover:border-ink",
        className,
      )}
    >
      <Sun aria-hidden className="size-5" strokeWidth={on ? 2.6 : 2} />
      <span>Sunlight</span>
      <span className="num text-sm">{on ? "ON" : "OFF"}</span>
    </button>
  );
}

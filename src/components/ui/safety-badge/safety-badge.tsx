import { Flame, ShieldCheck, Skull } from "lucide-react";
import { describeSafetyClass, safetyClasses, type SafetyClass } from "@shared/content/safety-classes.ts";
import { cn } from "@/lib/cn.ts";

/** The safety class as a word and a shape: a shield for A1, a flame for flammables, a skull for toxic. */
export function SafetyBadge({ safetyClass, className }: { safetyClass: SafetyClass; className?: string }) {
  const info = safetyClasses[safetyClass];
  const Icon = safetyClass.startsWith("B") ? Skull : info.caution === "flammable" ? Flame : ShieldCheck;
  const hazardous = info.caution !== null;
  return (
    <span
      title={describeSafetyClass(safetyClass)}
      className={cn(
        "inline-flex items-center gap-1 rounded-md border-2 px-2 py-0.5 text-sm font-semibold",
        hazardous ? "border-caution text-caution" : "border-rule text-muted",
        className,
      )}
    >
      <Icon aria-hidden className="size-4" />
      <span className="num">{safetyClass}</span>
      <span className="sr-only">{describeSafetyClass(safetyClass)}</span>
    </span>
  );
}

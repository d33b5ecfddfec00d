import {
  ArrowDownToLine,
  ArrowUpToLine,
  Bubbles,
  CircleCheck,
  CircleHelp,
  Cog,
  Fan,
  Funnel,
  Droplets,
  Wind,
  type LucideIcon,
} from "lucide-react";
import { chargeStateText } from "@shared/content/charge-states.ts";
import type { ChargeState } from "@shared/schemas/diagnosis.ts";
import { cn } from "@/lib/cn.ts";

/** Each state has its own shape, so it reads without colour (and in a black-and-white print). */
export const CHARGE_STATE_ICONS: Record<ChargeState, LucideIcon> = {
  normal: CircleCheck,
  undercharged: ArrowDownToLine,
  overcharged: ArrowUpToLine,
  "restricted-metering": Funnel,
  "low-evaporator-airflow": Fan,
  "overfeeding-metering": Droplets,
  "condenser-airflow": Wind,
  "non-condensables": Bubbles,
  "weak-compressor": Cog,
  "insufficient-data": CircleHelp,
};

export function chargeStateTone(state: ChargeState): string {
  return state === "normal"
    ? "text-good border-good"
    : state === "insufficient-data"
      ? "text-muted border-rule"
      : "text-fault border-fault";
}

export function ChargeStateBadge({
  state,
  short = false,
  className,
}: {
  state: ChargeState;
  short?: boolean;
  className?: string;
}) {
  const Icon = CHARGE_STATE_ICONS[state];
  const text = chargeStateText[state];
  return (
    <span
      className={cn(
        "inline-flex items-center gap-1.5 rounded-md border-2 px-2 py-0.5 font-semibold",
        chargeStateTone(state),
        className,
      )}
    >
      <Icon aria-hidden className="size-4 shrink-0" />
      <span>{short ? text.short : text.title}</span>
    </span>
  );
}

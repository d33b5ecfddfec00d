import { CYLINDER_KIND_LABELS, type Cylinder } from "@shared/schemas/register.ts";
import { formatKg } from "../utils/format-register.ts";
import { CylinderFillBar } from "./cylinder-fill.tsx";
import { ReclaimForm } from "./reclaim-form.tsx";

/** The organisation's cylinders as cards: contents against the 80 % limit, stamped figures. */
export function CylinderList({ cylinders, canWrite }: { cylinders: readonly Cylinder[]; canWrite: boolean }) {
  if (cylinders.length === 0) return <p className="text-muted">No cylinders yet. Add the first one below.</p>;
  return (
    <ul aria-label="Cylinders" className="grid gap-3 md:grid-cols-2">
      {cylinders.map((cylinder) => (
        <li
          key={cylinder.id}
          className="space-y-2 rounded-card border-2 border-rule bg-surface p-4"
          aria-label={cylinder.label}
        >
          <div className="flex flex-wrap items-baseline justify-between gap-2">
            <h3 className="text-lg font-semibold">{cylinder.label}</h3>
            <p className="text-sm font-medium">
              {CYLINDER_KIND_LABELS[cylinder.kind]} · <span className="num">{cylinder.refrigerant}</span>
            </p>
          </div>
          <CylinderFillBar cylinder={cylinder} />
          <p className="num text-sm text-muted">
            WC {formatKg(cylinder.waterCapacityKg)} · tare {formatKg(cylinder.tareKg)}
            {cylinder.serial && <> · serial {cylinder.serial}</>}
          </p>
          {canWrite && cylinder.kind === "recovery" && cylinder.contentsKg > 0 && (
            <details className="rounded-card border-2 border-rule p-3">
              <summary className="min-h-touch cursor-pointer py-2 font-medium">Send for reclaim</summary>
              <ReclaimForm cylinder={cylinder} />
            </details>
          )}
        </li>
      ))}
    </ul>
  );
}

import { applicationText } from "@shared/content/applications.ts";
import type { Case } from "@shared/schemas/casebook.ts";
import type { ChargeReference } from "@shared/schemas/diagnosis.ts";
import type { DisplayUnits } from "@/lib/units/display-units.ts";
import { CASE_READINGS, METERING_LABELS } from "../utils/case-readings.ts";
import { unitLabel, formatQuantity } from "@/lib/units/quantities.ts";

const GROUP_TITLES = {
  refrigerant: "Refrigerant circuit",
  air: "Air",
  electrical: "Running",
  nameplate: "From the nameplate",
} as const;

/** The reference point's readings, in the order the story tells them. */
const REFERENCE_ROWS: { field: keyof ChargeReference; label: string; quantity: "temperature" | "difference" }[] = [
  { field: "subcoolingK", label: "Subcooling", quantity: "difference" },
  { field: "superheatK", label: "Superheat", quantity: "difference" },
  { field: "evaporatingTempC", label: "Evaporating (dew)", quantity: "temperature" },
  { field: "condensingTempC", label: "Condensing (bubble)", quantity: "temperature" },
  { field: "outdoorAirDryBulbC", label: "Outdoor air", quantity: "temperature" },
  { field: "returnAirDryBulbC", label: "Return air", quantity: "temperature" },
];

/** The story and the readings the technician took, in the user's display units. */
export function CaseStory({
  item,
  units,
  atmosphericKPa,
}: {
  item: Case;
  units: DisplayUnits;
  atmosphericKPa: number;
}) {
  const { story, input } = item;
  const onDischarge = input.liquidTempLocation === "discharge-line";
  const groups = (["refrigerant", "air", "electrical", "nameplate"] as const)
    .map((group) => ({
      group,
      rows: CASE_READINGS.filter((reading) => reading.group === group && typeof input[reading.field] === "number"),
    }))
    .filter((entry) => entry.rows.length > 0);
  return (
    <section aria-labelledby="story-heading" className="space-y-4 rounded-card border-2 border-rule bg-surface p-4">
      <h2 id="story-heading" className="text-xl font-semibold">
        The job
      </h2>
      <dl className="grid gap-x-4 gap-y-2 sm:grid-cols-[10rem_1fr]">
        <dt className="font-medium text-muted">Site</dt>
        <dd>{story.site}</dd>
        <dt className="font-medium text-muted">Equipment</dt>
        <dd>{story.equipment}</dd>
        <dt className="font-medium text-muted">Complaint</dt>
        <dd>{story.complaint}</dd>
        <dt className="font-medium text-muted">Conditions</dt>
        <dd>{story.conditions}</dd>
      </dl>
      <p className="text-sm">
        <span className="num font-semibold">{input.refrigerant}</span> · {METERING_LABELS[input.meteringDevice]} ·{" "}
        {input.application ? `${applicationText[input.application].label} · ` : ""}
        gauges read against <span className="num">{input.atmosphericPressureKPa ?? atmosphericKPa} kPa</span> atmosphere
      </p>
      <div className="grid gap-4 md:grid-cols-2">
        {groups.map(({ group, rows }) => (
          <div key={group}>
            <h3 className="mb-1 font-semibold">{GROUP_TITLES[group]}</h3>
            <table className="w-full text-left">
              <tbody>
                {rows.map((reading) => {
                  const label =
                    reading.field === "liquidLineTempC" && onDischarge
                      ? "“Liquid” temperature — clamp on the discharge line"
                      : reading.label;
                  return (
                    <tr key={reading.field} className="border-t border-rule">
                      <th scope="row" className="py-2 pr-2 font-normal">
                        {label}
                      </th>
                      <td
                        className="num py-2 text-right text-lg whitespace-nowrap"
                        data-testid={`reading-${reading.field}`}
                      >
                        {formatQuantity(
                          input[reading.field] as number,
                          reading.quantity,
                          units,
                          input.atmosphericPressureKPa ?? atmosphericKPa,
                        )}{" "}
                        <span className="text-sm text-muted">{unitLabel(reading.quantity, units)}</span>
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        ))}
        {input.chargeReference && (
          <div data-testid="charge-reference">
            <h3 className="font-semibold">This circuit's reference point</h3>
            <p className="mb-1 text-sm text-muted">Settled readings at its correct charge, after a weigh-in</p>
            <table className="w-full text-left">
              <tbody>
                {REFERENCE_ROWS.map(({ field, label, quantity }) => {
                  const value = input.chargeReference![field];
                  if (value === null) return null;
                  return (
                    <tr key={field} className="border-t border-rule">
                      <th scope="row" className="py-2 pr-2 font-normal">
                        {label}
                      </th>
                      <td className="num py-2 text-right text-lg whitespace-nowrap">
                        {formatQuantity(value, quantity, units, input.atmosphericPressureKPa ?? atmosphericKPa)}{" "}
                        <span className="text-sm text-muted">{unitLabel(quantity, units)}</span>
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        )}
      </div>
    </section>
  );
}

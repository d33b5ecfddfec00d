import { chargeStateText } from "@shared/content/charge-states.ts";
import { quantityOf, readingField, type NumericMeasuredField, type Quantity } from "@shared/schemas/reading-fields.ts";
import type { Reading } from "@shared/schemas/visits.ts";
import type { DisplayUnits } from "@/lib/units/display-units.ts";
import { formatQuantity, unitLabel } from "@/lib/units/quantities.ts";
import { formatTime } from "@shared/format/date-time.ts";

interface Column {
  head: string;
  quantity: Quantity;
  /** The SI figure, null when there is none, or "n/v" when it is not valid where it was taken. */
  value: (reading: Reading) => number | null | undefined | "n/v";
}

/** A measured field's column: its short name and kind of number from the catalogue of reading fields. */
const measured = (field: NumericMeasuredField): Column => {
  const { columnLabel, label } = readingField(field);
  return { head: columnLabel ?? label, quantity: quantityOf(field), value: (reading) => reading.input[field] };
};

/** The columns after the time, around the circuit: each pressure beside its saturation and margin. */
const COLUMNS: Column[] = [
  measured("suctionPressureKPa"),
  { head: "Evap.", quantity: "temperature", value: (reading) => reading.result.evaporatingTempC },
  { head: "SH", quantity: "difference", value: (reading) => reading.result.superheatK },
  measured("liquidPressureKPa"),
  { head: "Cond.", quantity: "temperature", value: (reading) => reading.result.condensingTempC },
  {
    head: "SC",
    quantity: "difference",
    // Subcooling read on the discharge line is not valid: said so rather than left blank.
    value: (reading) => (reading.input.liquidTempLocation === "discharge-line" ? "n/v" : reading.result.subcoolingK),
  },
  measured("dischargeLineTempC"),
];

/** Every reading of one circuit as a table, in the order taken. */
export function ReadingsTable({
  readings,
  units,
  atmosphericKPa,
}: {
  readings: Reading[];
  units: DisplayUnits;
  atmosphericKPa: number;
}) {
  if (readings.length === 0) return <p className="text-muted">No readings on this circuit.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="num w-full border-collapse text-right text-sm">
        <thead className="font-sans">
          <tr className="border-b-2 border-ink align-bottom">
            <th scope="col" className="px-2 py-1 text-left">
              Time
            </th>
            {COLUMNS.map(({ head, quantity }) => (
              <th key={head} scope="col" className="px-2 py-1">
                {head} {unitLabel(quantity, units)}
              </th>
            ))}
            <th scope="col" className="px-2 py-1 text-left">
              Finding
            </th>
          </tr>
        </thead>
        <tbody>
          {readings.map((reading) => {
            const atmosphere = reading.input.atmosphericPressureKPa ?? atmosphericKPa;
            return (
              <tr key={reading.id} className="border-b border-rule">
                <td className="px-2 py-1 text-left">{formatTime(reading.takenAt)}</td>
                {COLUMNS.map(({ head, quantity, value }) => {
                  const figure = value(reading);
                  return (
                    <td key={head} className="px-2 py-1">
                      {figure == null
                        ? "—"
                        : figure === "n/v"
                          ? figure
                          : formatQuantity(figure, quantity, units, atmosphere)}
                    </td>
                  );
                })}
                <td className="px-2 py-1 text-left font-sans">{chargeStateText[reading.result.chargeState].short}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

import { Segmented } from "@/components/ui/field/segmented.tsx";
import type { DisplayUnits, PressureDisplayUnit, TemperatureDisplayUnit } from "@/lib/units/display-units.ts";

export function UnitsBar({ units, onChange }: { units: DisplayUnits; onChange: (units: DisplayUnits) => void }) {
  return (
    <div className="flex flex-wrap gap-2">
      <Segmented<TemperatureDisplayUnit>
        label="Temperature unit"
        value={units.temperature}
        options={[
          { value: "C", label: "°C" },
          { value: "F", label: "°F" },
        ]}
        onChange={(temperature) => onChange({ ...units, temperature })}
      />
      <Segmented<PressureDisplayUnit>
        label="Pressure unit"
        value={units.pressure}
        options={[
          { value: "kPa", label: "kPa" },
          { value: "bar", label: "bar" },
          { value: "psi", label: "psi" },
          { value: "MPa", label: "MPa" },
        ]}
        onChange={(pressure) => onChange({ ...units, pressure })}
      />
    </div>
  );
}

import type { CycleState } from "@shared/engine/index.ts";
import {
  ABSOLUTE_LABEL,
  TEMPERATURE_LABEL,
  formatNumber,
  PRESSURE_DECIMALS,
  temperatureToDisplay,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";
import { pressureToDisplay } from "@shared/engine/index.ts";

const NAMES = {
  suction: "1 Suction (compressor inlet)",
  discharge: "2 Discharge (compressor outlet)",
  liquid: "3 Liquid (expansion-device inlet)",
  evaporatorInlet: "4 Evaporator inlet",
  isentropicDischarge: "2s Ideal discharge (same entropy as 1)",
} as const;

/** The cycle's states as a table: the diagram's content in words and numbers, for everyone and for screen readers. */
export function CycleStatesTable({
  states,
  units,
  caption,
  hideEnthalpies = false,
}: {
  states: Record<keyof typeof NAMES, CycleState | null>;
  units: DisplayUnits;
  caption: string;
  /** A casebook question: enthalpy and entropy are to be read off the diagram. */
  hideEnthalpies?: boolean;
}) {
  const t = TEMPERATURE_LABEL[units.temperature];
  const p = ABSOLUTE_LABEL[units.pressure];
  return (
    // Scrolls sideways on a phone: focusable so the keyboard can scroll it too (WCAG 2.1.1).
    <div
      className="overflow-x-auto"
      tabIndex={0}
      role="region"
      aria-label="Cycle states (scrolls sideways on a narrow screen)"
    >
      <table className="num w-full border-collapse text-right text-sm">
        <caption className="pb-1 text-left font-sans text-sm text-muted">{caption}</caption>
        <thead className="font-sans">
          <tr className="border-b-2 border-ink align-bottom">
            <th scope="col" className="px-2 py-1 text-left">
              State
            </th>
            <th scope="col" className="px-2 py-1">
              Pressure {p}
            </th>
            <th scope="col" className="px-2 py-1">
              Temperature {t}
            </th>
            {!hideEnthalpies && (
              <th scope="col" className="px-2 py-1">
                Enthalpy kJ/kg
              </th>
            )}
            {!hideEnthalpies && (
              <th scope="col" className="px-2 py-1">
                Entropy kJ/(kg·K)
              </th>
            )}
            <th scope="col" className="px-2 py-1 text-left">
              Phase
            </th>
          </tr>
        </thead>
        <tbody>
          {(Object.keys(NAMES) as (keyof typeof NAMES)[])
            // the ideal discharge is working, not a reading: not part of a question
            .filter((key) => !(hideEnthalpies && key === "isentropicDischarge"))
            .map((key) => {
              const state = states[key];
              return (
                <tr key={key} className="border-b border-rule">
                  <th scope="row" className="px-2 py-1 text-left font-sans font-medium">
                    {NAMES[key]}
                  </th>
                  {state ? (
                    <>
                      <td className="px-2 py-1">
                        {formatNumber(
                          pressureToDisplay(state.pressureKPa, units.pressure, "absolute"),
                          PRESSURE_DECIMALS[units.pressure],
                        )}
                      </td>
                      <td className="px-2 py-1">
                        {formatNumber(temperatureToDisplay(state.temperatureC, units.temperature), 1)}
                      </td>
                      {!hideEnthalpies && <td className="px-2 py-1">{formatNumber(state.enthalpyKJPerKg, 1)}</td>}
                      {!hideEnthalpies && (
                        <td className="px-2 py-1">
                          {state.entropyKJPerKgK === null ? "—" : formatNumber(state.entropyKJPerKgK, 4)}
                        </td>
                      )}
                      <td className="px-2 py-1 text-left font-sans">
                        {state.phase === "two-phase"
                          ? `two-phase, ${formatNumber((state.quality ?? 0) * 100, 0)} % vapour`
                          : state.phase}
                      </td>
                    </>
                  ) : (
                    <td colSpan={hideEnthalpies ? 3 : 5} className="px-2 py-1 text-left font-sans text-muted">
                      not known from these readings
                    </td>
                  )}
                </tr>
              );
            })}
        </tbody>
      </table>
    </div>
  );
}

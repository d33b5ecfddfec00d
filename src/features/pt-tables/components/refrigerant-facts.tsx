import type { RefrigerantInfo } from "@shared/engine/index.ts";
import { describeSafetyClass } from "@shared/content/safety-classes.ts";
import {
  formatNumber,
  TEMPERATURE_LABEL,
  temperatureToDisplay,
  type TemperatureDisplayUnit,
} from "@/lib/units/display-units.ts";

/** The refrigerant's data sheet: class, GWP with its source, critical point, boiling point, glide. */
export function RefrigerantFacts({
  info,
  temperatureUnit,
}: {
  info: RefrigerantInfo;
  temperatureUnit: TemperatureDisplayUnit;
}) {
  const t = (celsius: number) =>
    `${formatNumber(temperatureToDisplay(celsius, temperatureUnit), 1)} ${TEMPERATURE_LABEL[temperatureUnit]}`;
  const facts: [string, string][] = [
    [
      "Safety class",
      `${describeSafetyClass(info.safety.class)} (${info.safety.standard}${info.safety.fromMemory ? ", class from memory — verify" : ""})`,
    ],
    ["Composition", info.composition ?? (info.kind === "pure" ? "single component" : "—")],
    [
      "GWP100",
      [info.gwp100.AR4 && `${info.gwp100.AR4.display} (AR4)`, info.gwp100.AR5 && `${info.gwp100.AR5.display} (AR5)`]
        .filter(Boolean)
        .join(" · ") || "—",
    ],
    [
      "Normal boiling point",
      info.normalBoilingPoint
        ? info.kind === "blend"
          ? `bubble ${t(info.normalBoilingPoint.bubbleC)}, dew ${t(info.normalBoilingPoint.dewC)}`
          : t(info.normalBoilingPoint.dewC)
        : "none (solid below the triple point at 1 atm)",
    ],
    [
      "Critical point",
      `${t(info.criticalPoint.temperatureC)}, ${formatNumber(info.criticalPoint.pressureKPa, 0)} kPa abs`,
    ],
  ];
  if (info.glideAt0C)
    facts.push([
      "Glide",
      `${formatNumber(info.glideAt0C.glideK, 1)} K at ${formatNumber(info.glideAt0C.pressureKPa, 0)} kPa abs (dew 0 °C)`,
    ]);
  return (
    <div>
      <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-[max-content_1fr]">
        {facts.map(([term, value]) => (
          <div key={term} className="contents">
            <dt className="font-medium">{term}</dt>
            <dd className="text-muted">{value}</dd>
          </div>
        ))}
      </dl>
      <p className="mt-3 text-xs text-muted">
        Equation of state: {info.source.equationOfState}. GWP: {info.gwp100.source}.
      </p>
    </div>
  );
}

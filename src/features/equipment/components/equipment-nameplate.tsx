import type { ReactNode } from "react";
import { applicationText } from "@shared/content/applications.ts";
import { findRefrigerant } from "@shared/property-tables/refrigerant-catalogue.ts";
import type { Equipment } from "@shared/schemas/equipment.ts";
import { SafetyBadge } from "@/components/ui/safety-badge/safety-badge.tsx";
import {
  DIFFERENCE_LABEL,
  GAUGE_LABEL,
  PRESSURE_DECIMALS,
  differenceToDisplay,
  formatNumber,
  gaugeToDisplay,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";
import { METERING_DEVICE_LABELS, totalFactoryChargeKg } from "../utils/nameplate-text.ts";

function Item({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="min-w-0">
      <dt className="text-sm text-muted">{label}</dt>
      <dd className="font-medium">{children ?? <span className="text-muted">Not stated</span>}</dd>
    </div>
  );
}

const amps = (value: number | null) => (value == null ? null : <span className="num">{formatNumber(value, 1)} A</span>);

/** The unit's nameplate as recorded: what the diagnosis and the register rely on. */
export function EquipmentNameplate({
  equipment,
  units,
  atmosphericKPa,
}: {
  equipment: Equipment;
  units: DisplayUnits;
  atmosphericKPa: number;
}) {
  const info = findRefrigerant(equipment.refrigerant);
  const pressure = (kPaGauge: number | null) =>
    kPaGauge == null ? null : (
      <span className="num">
        {formatNumber(gaugeToDisplay(kPaGauge, units.pressure, atmosphericKPa), PRESSURE_DECIMALS[units.pressure])}{" "}
        {GAUGE_LABEL[units.pressure]}
      </span>
    );

  const difference = (kelvin: number | null) =>
    kelvin == null
      ? "—"
      : `${formatNumber(differenceToDisplay(kelvin, units.temperature), 1)} ${DIFFERENCE_LABEL[units.temperature]}`;

  return (
    <div className="space-y-4">
      <dl className="grid grid-cols-2 gap-x-4 gap-y-3 sm:grid-cols-3">
        <Item label="Refrigerant">
          <span className="flex flex-wrap items-center gap-2">
            <span className="num">{equipment.refrigerant}</span>
            {info && <SafetyBadge safetyClass={info.safety.class} />}
          </span>
        </Item>
        <Item label="Application">{applicationText[equipment.application].label}</Item>
        <Item label="Factory charge, all circuits">
          <span className="num">{formatNumber(totalFactoryChargeKg(equipment.circuits), 2)} kg</span>
        </Item>
        <Item label="Maker · model">
          {equipment.maker || equipment.model ? [equipment.maker, equipment.model].filter(Boolean).join(" · ") : null}
        </Item>
        <Item label="Serial">{equipment.serial ? <span className="num">{equipment.serial}</span> : null}</Item>
        <Item label="Compressor RLA · LRA">
          {equipment.compressorRlaA != null || equipment.compressorLraA != null ? (
            <>
              {amps(equipment.compressorRlaA) ?? "—"} · {amps(equipment.compressorLraA) ?? "—"}
            </>
          ) : null}
        </Item>
        <Item label="Fan FLA">{amps(equipment.fanFlaA)}</Item>
        <Item label="Supply">
          {equipment.supplyVoltageV != null || equipment.phases != null ? (
            <span className="num">
              {equipment.supplyVoltageV != null ? `${equipment.supplyVoltageV} V` : "— V"}
              {equipment.phases != null ? ` · ${equipment.phases === 3 ? "three phase" : "single phase"}` : ""}
            </span>
          ) : null}
        </Item>
        <Item label="Rated high side">{pressure(equipment.ratedHighSideKPa)}</Item>
        <Item label="Rated low side">{pressure(equipment.ratedLowSideKPa)}</Item>
      </dl>

      <div className="overflow-x-auto">
        <table className="w-full min-w-[28rem] text-left">
          <caption className="pb-1 text-left font-semibold">Circuits</caption>
          <thead className="border-b-2 border-rule text-sm">
            <tr>
              <th scope="col" className="py-1 pr-3">
                Circuit
              </th>
              <th scope="col" className="py-1 pr-3">
                Factory charge
              </th>
              <th scope="col" className="py-1 pr-3">
                Metering device
              </th>
              <th scope="col" className="py-1 pr-3">
                Target superheat
              </th>
              <th scope="col" className="py-1 pr-3">
                Target subcooling
              </th>
              <th scope="col" className="py-1">
                Liquid line
              </th>
            </tr>
          </thead>
          <tbody>
            {equipment.circuits.map((circuit) => (
              <tr key={circuit.number} className="border-b border-rule last:border-b-0">
                <th scope="row" className="num py-2 pr-3 font-semibold">
                  {circuit.number}
                </th>
                <td className="num py-2 pr-3">{formatNumber(circuit.factoryChargeKg, 2)} kg</td>
                <td className="py-2 pr-3">{METERING_DEVICE_LABELS[circuit.meteringDevice]}</td>
                <td className="num py-2 pr-3">{difference(circuit.targetSuperheatK)}</td>
                <td className="num py-2 pr-3">{difference(circuit.targetSubcoolingK)}</td>
                <td className="num py-2">
                  {circuit.liquidLineLengthM == null ? "—" : `${formatNumber(circuit.liquidLineLengthM, 1)} m`}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
        <p className="mt-1 text-sm text-muted">
          Targets are the maker's where stated; otherwise the run log works them out from the readings.
        </p>
      </div>
    </div>
  );
}

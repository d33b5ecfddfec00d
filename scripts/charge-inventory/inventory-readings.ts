import type { DiagnosisInput } from "../../shared/schemas/diagnosis.ts";
import { STANDARD_ATMOSPHERE_KPA } from "../../shared/engine/index.ts";
import type { ChargeCircuit, InventoryConditions, OperatingPoint } from "./charge-circuit.ts";

/** Sensor scatter applied to the readings (uniform, ± the figure). */
export interface ReadingScatter {
  temperatureK: number;
  pressureFraction: number;
  random: () => number;
}

/**
 * The gauge and probe readings a technician would take on the model's operating point, as a
 * diagnose() input: suction and liquid gauge pressures at the standard atmosphere, suction line
 * at the evaporator outlet (dew point + superheat; no suction-line heat gain in the model), liquid
 * line at the condenser outlet, outdoor and return air, the nameplate subcooling target when the
 * label has one (the circuit's own ± its nameplate offset), the
 * correct charge and the line length, settled (20 minutes' run).
 *
 * Units: kPa gauge, °C, K, kg, m.
 */
export function inventoryReadings(
  circuit: ChargeCircuit,
  conditions: InventoryConditions,
  point: OperatingPoint,
  correctChargeKg: number,
  scatter: ReadingScatter | null,
): DiagnosisInput {
  const spread = (width: number) => (scatter ? (2 * scatter.random() - 1) * width : 0);
  const pressure = (absoluteKPa: number) =>
    Math.round(absoluteKPa * (1 + spread(scatter?.pressureFraction ?? 0)) - STANDARD_ATMOSPHERE_KPA);
  const temperature = (celsius: number) => Math.round((celsius + spread(scatter?.temperatureK ?? 0)) * 10) / 10;
  return {
    refrigerant: circuit.refrigerant,
    meteringDevice: circuit.meteringDevice,
    suctionPressureKPa: pressure(point.evaporatingPressureKPa),
    suctionLineTempC: temperature(point.evaporatingDewC + point.superheatK),
    liquidPressureKPa: pressure(point.condensingPressureKPa),
    liquidLineTempC: temperature(point.liquidLineC),
    outdoorAirDryBulbC: conditions.outdoorAirC,
    returnAirDryBulbC: conditions.returnAirC,
    returnAirWetBulbC: conditions.returnWetBulbC,
    ...(circuit.nameplateSubcoolingOffsetK === null
      ? {}
      : {
          targetSubcoolingK: Math.max(
            1,
            Math.round((circuit.designSubcoolingK + circuit.nameplateSubcoolingOffsetK) * 10) / 10,
          ),
        }),
    application: "comfort-cooling",
    runMinutes: 20,
    chargeKg: Math.round(correctChargeKg * 100) / 100,
    liquidLineLengthM: Math.round(circuit.liquidLineLengthM * 10) / 10,
  };
}

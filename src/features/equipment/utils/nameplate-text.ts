import type { CircuitNameplate } from "@shared/schemas/equipment.ts";
import type { MeteringDevice } from "@shared/schemas/diagnosis.ts";

/** Metering devices as the trade writes them. */
export const METERING_DEVICE_LABELS: Record<MeteringDevice, string> = {
  txv: "TXV",
  eev: "EEV",
  "fixed-orifice": "Fixed orifice",
  capillary: "Capillary",
};

/** Sum of the factory charges of all circuits, kg. */
export function totalFactoryChargeKg(circuits: readonly Pick<CircuitNameplate, "factoryChargeKg">[]): number {
  return circuits.reduce((sum, circuit) => sum + circuit.factoryChargeKg, 0);
}

/** "2 × TXV" when every circuit has the same device, else "C1 TXV · C2 EEV". */
export function meteringSummary(circuits: readonly Pick<CircuitNameplate, "number" | "meteringDevice">[]): string {
  const [first] = circuits;
  if (first === undefined) return "—";
  const devices = new Set(circuits.map((circuit) => circuit.meteringDevice));
  if (devices.size === 1) return `${circuits.length} × ${METERING_DEVICE_LABELS[first.meteringDevice]}`;
  return circuits.map((circuit) => `C${circuit.number} ${METERING_DEVICE_LABELS[circuit.meteringDevice]}`).join(" · ");
}

/** "packaged rooftop" → "Packaged rooftop": kinds are stored lower-case, shown as a label. */
export function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

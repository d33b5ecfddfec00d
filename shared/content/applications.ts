/**
 * How each application reads on screen: a label and what it covers, in Satura's words. The
 * bands behind each are in shared/engine/diagnosis/diagnosis-limits.ts and
 * docs/diagnosis-signatures.md.
 */
import type { Application } from "../schemas/diagnosis.ts";

export const applicationText: Record<Application, { label: string; hint: string }> = {
  "comfort-cooling": {
    label: "Comfort cooling",
    hint: "Air conditioning of occupied rooms; return air about 18–30 °C",
  },
  "heat-pump": { label: "Heat pump", hint: "Reverse-cycle: judged in cooling mode, where the charge is checked" },
  "medium-temperature-refrigeration": {
    label: "Medium-temperature refrigeration",
    hint: "Cool rooms and cabinets, about −2 to +10 °C",
  },
  "low-temperature-refrigeration": {
    label: "Low-temperature refrigeration",
    hint: "Freezer rooms and cabinets, about −18 to −25 °C",
  },
  "process-chilling": {
    label: "Process chilling",
    hint: "Water or glycol chillers: return and supply are the fluid in and out",
  },
};

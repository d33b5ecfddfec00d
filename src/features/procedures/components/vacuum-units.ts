import { micronsToPa } from "@shared/engine/index.ts";
import { formatNumber } from "@/lib/units/display-units.ts";

export type VacuumUnit = "micron" | "Pa";
export const VACUUM_LABEL: Record<VacuumUnit, string> = { micron: "µm", Pa: "Pa" };

/** A vacuum reading in the chosen unit; microns are stored, pascals converted by the engine. */
export const vacuumToDisplay = (microns: number, unit: VacuumUnit) =>
  unit === "micron" ? microns : micronsToPa(microns);
export const formatVacuum = (microns: number, unit: VacuumUnit) =>
  `${formatNumber(vacuumToDisplay(microns, unit), unit === "micron" ? 0 : 1)} ${VACUUM_LABEL[unit]}`;

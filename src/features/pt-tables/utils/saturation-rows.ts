import { saturationPressure } from "@shared/engine/index.ts";

export interface SaturationRow {
  temperatureC: number;
  bubbleKPaAbs: number;
  dewKPaAbs: number;
}

/** Largest table a user can ask for; beyond it the step is too fine for the range. */
export const MAX_ROWS = 2000;

/**
 * The rows of a printed saturation table between two temperatures, on a step.
 * The bounds must already lie inside the refrigerant's table.
 */
export function saturationRows(id: string, fromC: number, toC: number, stepK: number): SaturationRow[] {
  const rows: SaturationRow[] = [];
  const count = Math.floor((toC - fromC) / stepK + 1e-9) + 1;
  for (let index = 0; index < Math.min(count, MAX_ROWS); index++) {
    // Multiply rather than accumulate, so a 0.1 K step does not drift after hundreds of rows.
    const temperatureC = Number((fromC + index * stepK).toFixed(6));
    rows.push({
      temperatureC,
      bubbleKPaAbs: saturationPressure(id, temperatureC, "bubble"),
      dewKPaAbs: saturationPressure(id, temperatureC, "dew"),
    });
  }
  return rows;
}

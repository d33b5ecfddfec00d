/**
 * Named assumptions of the measured cycle (measuredCycle), each with its source, shared by code
 * and tests. Organisation overrides are not offered: these are physics conventions, not limits.
 */

/**
 * When no discharge pressure is measured, the compressor's discharge pressure is taken as the
 * liquid pressure plus the pressure of this many kelvin of dew temperature at the condenser:
 * the drop through the discharge line and condenser coil. Discharge lines are commonly sized for
 * a drop worth about 1 K of saturation temperature (ASHRAE Handbook—Refrigeration, ch. 1
 * "Halocarbon refrigeration systems", line sizing; from memory); the coil adds a little more,
 * so the figure is a lower bound of the true drop.
 */
export const DISCHARGE_PRESSURE_ALLOWANCE_K = 1;

/**
 * Evaporator airflow estimated from a nominal cooling capacity when none was measured:
 * 400 cfm per ton of refrigeration (0.1888 m³/s per 3.517 kW = 0.0537 m³/s per kW), the usual
 * comfort-cooling design figure (ACCA Manual S/trade training material; common practice, from
 * memory). An estimate only: real airflow is often 10–20 % off it.
 */
export const NOMINAL_AIRFLOW_M3_PER_S_PER_KW = 0.18878 / 3.5169;

/**
 * Air-side and refrigerant-side capacity agree when they differ by less than this fraction of
 * the refrigerant-side figure. Each carries roughly ±10 % from airflow, probe and power-factor
 * uncertainty (common practice, from memory), so ±20 % is the honest band.
 */
export const AIR_REFRIGERANT_AGREEMENT_FRACTION = 0.2;

/**
 * A line temperature within this many kelvin of saturation is taken as saturated rather than
 * refused (thermometer and clamp accuracy of field probes, about ±0.3 K; common practice).
 */
export const SATURATED_WITHIN_K = 0.3;

/** The two compressor supplies Satura knows: single-phase and three-phase. */
export const SUPPLY_PHASES = [1, 3] as const;

/**
 * zod schema of a generated single-phase table (data/refrigerants/single-phase/<id>.json):
 * enthalpy, entropy and density of subcooled (compressed) liquid and superheated vapour,
 * written by `npm run tables` (scripts/single-phase) from the same equations of state as the
 * saturation tables, and checked with this schema when a table is registered.
 *
 * Each phase is a grid: rows uniform in y = ln(p / (1 − p/p_s)) (p in kPa absolute, p_s a
 * pressure scale at or above the critical pressure: ln p far from it, rows closer together as
 * the saturation curve steepens towards the critical point), columns in a reduced
 * temperature r = (T − T_sat(p)) / (T_bound − T_sat(p)) that runs from 0 on the saturation
 * curve (dew for the vapour, bubble for the liquid) to 1 at the phase's far temperature bound
 * (the highest vapour temperature, the lowest liquid temperature). Every node stores h, ln ρ and
 * their temperature derivatives at constant pressure, and s; (∂s/∂T)_p = c_p/T is exact, so it
 * is rebuilt from (∂h/∂T)_p instead of stored. Arrays are row-major (row × columns).
 */
import { z } from "zod";

const finite = z.number().refine(Number.isFinite, "must be a finite number");

export const SINGLE_PHASE_TABLE_FORMAT = "satura-single-phase";

const PhaseGridSchema = z
  .object({
    /** p_s in y = ln(p / (1 − p/p_s)), kPa absolute */
    pressureScaleKPa: finite.refine((value) => value > 0, "must be positive"),
    /** y of the first row */
    coordinateStart: finite,
    /** row spacing in y */
    coordinateStep: finite.refine((value) => value > 0, "must be positive"),
    rows: z.number().int().min(4),
    /** saturation temperature of every row (dew for the vapour, bubble for the liquid), °C */
    saturationC: z.array(finite),
    /** far temperature bound: highest vapour or lowest liquid temperature, °C */
    boundC: finite,
    /** reduced-temperature nodes, 0 … 1, strictly increasing */
    nodes: z.array(finite).min(2),
    /** kJ/kg (IIR reference) */
    enthalpy: z.array(finite),
    /** (∂h/∂T)_p = c_p, kJ/(kg·K) */
    enthalpySlope: z.array(finite),
    /** kJ/(kg·K) (IIR reference) */
    entropy: z.array(finite),
    /** ln(ρ / (kg/m³)) */
    logDensity: z.array(finite),
    /** (∂ ln ρ/∂T)_p, 1/K */
    logDensitySlope: z.array(finite),
  })
  .superRefine((grid, ctx) => {
    const size = grid.rows * grid.nodes.length;
    if (grid.saturationC.length !== grid.rows)
      ctx.addIssue({ code: "custom", message: "saturationC needs one entry per row" });
    for (const key of ["enthalpy", "enthalpySlope", "entropy", "logDensity", "logDensitySlope"] as const) {
      if (grid[key].length !== size)
        ctx.addIssue({ code: "custom", path: [key], message: `needs rows × nodes = ${size} values` });
    }
    if (grid.nodes[0] !== 0 || grid.nodes[grid.nodes.length - 1] !== 1) {
      ctx.addIssue({ code: "custom", path: ["nodes"], message: "must run from 0 to 1" });
    }
    grid.nodes.forEach((node, index) => {
      const before = grid.nodes[index - 1];
      if (before !== undefined && !(node > before))
        ctx.addIssue({ code: "custom", path: ["nodes"], message: "must increase strictly" });
    });
  });
export type SinglePhaseGrid = z.infer<typeof PhaseGridSchema>;

/** Largest deviation from the direct equation-of-state solve found by the generator, and where. */
const MeasuredErrorSchema = z.object({
  value: finite,
  phase: z.enum(["liquid", "vapour"]),
  pressureKPa: finite,
  temperatureC: finite,
});

export const SinglePhaseTableSchema = z.object({
  format: z.literal(SINGLE_PHASE_TABLE_FORMAT),
  version: z.literal(1),
  id: z.string().min(2),
  generated: z.string().regex(/^\d{4}-\d{2}-\d{2}$/),
  referenceState: z.string(),
  source: z.object({
    model: z.enum(["pure-fluid", "pseudo-pure", "multi-fluid"]),
    equationOfState: z.string(),
    bibtexKeys: z.array(z.string()).min(1),
    data: z.string(),
    method: z.string(),
  }),
  interpolation: z.string(),
  units: z.record(z.string(), z.string()),
  /** Interpolation error against the direct solve at off-grid points (generator check). */
  accuracy: z.object({
    checkedPoints: z.number().int().positive(),
    enthalpyKJPerKg: MeasuredErrorSchema,
    entropyKJPerKgK: MeasuredErrorSchema,
    densityRelative: MeasuredErrorSchema,
    temperatureFromEnthalpyK: MeasuredErrorSchema,
    temperatureFromEntropyK: MeasuredErrorSchema,
  }),
  vapour: PhaseGridSchema,
  liquid: PhaseGridSchema,
});
export type SinglePhaseTable = z.infer<typeof SinglePhaseTableSchema>;

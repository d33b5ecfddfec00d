/**
 * The company's limits: one object, the engine's limit groups (ProcedureLimits) as the
 * organisation overrides them, stored in organisations.settings.procedureLimits. The Company
 * limits API (GET/PATCH /api/organisation/settings) shows and changes two of its figures by
 * their own names, and the procedure routes read every figure from here.
 */
import { EVACUATION_LIMITS, PRESSURE_HOLD_LIMITS } from "@shared/engine/index.ts";
import type {
  ProcedureSettings,
  ProcedureSettingsResponse,
  ProcedureSettingsUpdate,
} from "@shared/schemas/procedure-records.ts";
import type { ProcedureLimits } from "@shared/schemas/procedures.ts";

/** The evacuation target a new evacuation starts from, microns. */
export const evacuationTargetMicrons = ({ procedureLimits }: ProcedureSettings): number =>
  procedureLimits?.evacuation?.targetMicrons ?? EVACUATION_LIMITS.targetMicrons;

/** The allowed drop a new pressure test is judged by, kPa. */
export const allowedDropKPa = ({ procedureLimits }: ProcedureSettings): number =>
  procedureLimits?.pressureHold?.allowedDropKPa ?? PRESSURE_HOLD_LIMITS.allowedDropKPa;

/** The API's view: the company's own figures (null where it keeps the default) and the defaults. */
export function companyLimitsResponse(
  { procedureLimits }: ProcedureSettings,
  version: number,
): ProcedureSettingsResponse {
  return {
    settings: {
      evacuationTargetMicrons: procedureLimits?.evacuation?.targetMicrons ?? null,
      pressureTestAllowedDropKPa: procedureLimits?.pressureHold?.allowedDropKPa ?? null,
    },
    defaults: {
      evacuationTargetMicrons: EVACUATION_LIMITS.targetMicrons,
      pressureTestAllowedDropKPa: PRESSURE_HOLD_LIMITS.allowedDropKPa,
    },
    version,
  };
}

/** Sets one figure of a group (a number) or takes it out (null: back to the default); undefined keeps it. */
function setFigure<G extends keyof ProcedureLimits>(
  limits: ProcedureLimits,
  group: G,
  figure: keyof NonNullable<ProcedureLimits[G]>,
  value: number | null | undefined,
): ProcedureLimits {
  if (value === undefined) return limits;
  const { [figure]: _previous, ...rest } = { ...limits[group] } as Record<string, number>;
  const next = value === null ? rest : { ...rest, [figure]: value };
  const { [group]: _group, ...others } = limits;
  return Object.keys(next).length > 0 ? { ...others, [group]: next } : others;
}

/** The limits after an owner's change through the API (each named figure set or cleared). */
export function applyCompanyLimitsUpdate(limits: ProcedureLimits, update: ProcedureSettingsUpdate): ProcedureLimits {
  const withTarget = setFigure(limits, "evacuation", "targetMicrons", update.evacuationTargetMicrons);
  return setFigure(withTarget, "pressureHold", "allowedDropKPa", update.pressureTestAllowedDropKPa);
}

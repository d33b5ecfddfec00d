/**
 * Merges an organisation's partial limit override over the engine defaults, ignoring
 * undefined entries, and says whether any figure differs from the default (so the verdict's
 * source can say the organisation set it).
 *
 * @param defaults the group's defaults from procedure-limits.ts
 * @param override figures the organisation set (any subset)
 * @returns the limits to apply and whether any was changed
 * @throws RangeError "resolveLimits requires finite, non-negative limits" for a bad override
 * @example resolveLimits({ a: 2 }, { a: 3 }) // { limits: { a: 3 }, overridden: true }
 */
export function resolveLimits<T extends Record<string, number>>(
  defaults: T,
  override?: Partial<T>,
): { limits: T; overridden: boolean } {
  if (override === undefined) return { limits: defaults, overridden: false };
  const limits = { ...defaults };
  let overridden = false;
  for (const key of Object.keys(defaults) as (keyof T)[]) {
    const value = override[key];
    if (value === undefined) continue;
    if (!Number.isFinite(value) || (value as number) < 0)
      throw new RangeError("resolveLimits requires finite, non-negative limits");
    if (value !== defaults[key]) overridden = true;
    limits[key] = value as T[keyof T];
  }
  return { limits, overridden };
}

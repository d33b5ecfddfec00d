/**
 * Superancillary saturation curve: piecewise Chebyshev expansions of p_sat(T),
 * ρ'(T) and ρ''(T) built offline in extended precision (reference README §4.3;
 * Bell et al., CoolProp). Used as the independent check of the phase-equilibrium
 * solver and as its starting guess.
 */
import type { ChebyshevInterval, Superancillary } from "./reference-types.ts";

export interface SuperancillaryCurve {
  readonly minimumTemperature: number;
  readonly criticalTemperature: number;
  readonly criticalDensity: number;
  pressure(T: number): number;
  liquidDensity(T: number): number;
  vapourDensity(T: number): number;
}

/** Clenshaw summation of Σ c_j T_j(x) (README §4.3 step 3). */
export function chebyshevSum(coef: readonly number[], x: number): number {
  let b1 = 0;
  let b2 = 0;
  for (let j = coef.length - 1; j >= 1; j--) {
    const b0 = 2 * x * b1 - b2 + coef[j]!;
    b2 = b1;
    b1 = b0;
  }
  return coef[0]! + x * b1 - b2;
}

function evaluateExpansion(intervals: readonly ChebyshevInterval[], T: number): number {
  let low = 0;
  let high = intervals.length - 1;
  if (T < intervals[0]!.xmin || T > intervals[high]!.xmax) {
    throw new Error(`superancillary evaluated at ${T} K outside ${intervals[0]!.xmin}…${intervals[high]!.xmax} K`);
  }
  while (low < high) {
    const mid = (low + high) >> 1;
    if (T > intervals[mid]!.xmax) low = mid + 1;
    else high = mid;
  }
  const interval = intervals[low]!;
  const x = (2 * T - (interval.xmin + interval.xmax)) / (interval.xmax - interval.xmin);
  return chebyshevSum(interval.coef, x);
}

/**
 * @param data `EOS[0].SUPERANCILLARY` of a pure-fluid reference file
 * @returns p_sat (Pa), ρ' and ρ'' (mol/m³) as functions of T (K) from the triple point to the EOS critical point
 * @throws Error (from the returned functions) outside that range
 * @example createSuperancillary(r32.EOS[0].SUPERANCILLARY).pressure(273.15) // ≈ 813101 Pa
 */
export function createSuperancillary(data: Superancillary): SuperancillaryCurve {
  return {
    minimumTemperature: data.jexpansions_p[0]!.xmin,
    criticalTemperature: data.meta["Tcrittrue / K"]!,
    criticalDensity: data.meta["rhocrittrue / mol/m^3"]!,
    pressure: (T) => evaluateExpansion(data.jexpansions_p, T),
    liquidDensity: (T) => evaluateExpansion(data.jexpansions_rhoL, T),
    vapourDensity: (T) => evaluateExpansion(data.jexpansions_rhoV, T),
  };
}

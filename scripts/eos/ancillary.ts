/**
 * Power-series ancillary equations (reference README §5.1): vapour pressure and
 * saturated densities for starting guesses, and — for the pseudo-pure blends —
 * the published bubble (pL) and dew (pV) pressure equations of Lemmon (2003).
 */
import type { PowerSeriesAncillary } from "./reference-types.ts";

export interface AncillaryCurve {
  readonly minimumTemperature: number;
  readonly maximumTemperature: number;
  readonly reducingTemperature: number;
  /** y(T) in the ancillary's unit (Pa or mol/m³) */
  value(T: number): number;
  /** dy/dT */
  derivative(T: number): number;
}

/**
 * @param data one ancillary (`pS`, `pL`, `pV`, `rhoL` or `rhoV`)
 * @returns y(T) = y_r(1+S) for `rhoLnoexp`, else y_r exp(φ S), S = Σ n θ^t, θ = 1 − T/T_r, φ = T_r/T if `using_tau_r`
 * @throws Error (from value/derivative) at or above T_r, where θ ≤ 0 and the form is undefined
 * @example createAncillary(r410a.ANCILLARIES.pL).value(273.15) // ≈ 800705 Pa
 */
export function createAncillary(data: PowerSeriesAncillary): AncillaryCurve {
  const { n, t, T_r: Tr, reducing_value: yr } = data;
  const noExp = data.type === "rhoLnoexp";
  const series = (T: number) => {
    const theta = 1 - T / Tr;
    if (!(theta > 0)) throw new Error(`ancillary evaluated at ${T} K, at or above its T_r = ${Tr} K`);
    let S = 0;
    let dSdTheta = 0;
    for (let k = 0; k < n.length; k++) {
      const term = n[k]! * Math.pow(theta, t[k]!);
      S += term;
      dSdTheta += (term * t[k]!) / theta;
    }
    return { S, dSdT: -dSdTheta / Tr };
  };
  return {
    minimumTemperature: data.Tmin,
    maximumTemperature: data.Tmax,
    reducingTemperature: Tr,
    value(T) {
      const { S } = series(T);
      if (noExp) return yr * (1 + S);
      const phi = data.using_tau_r ? Tr / T : 1;
      return yr * Math.exp(phi * S);
    },
    derivative(T) {
      const { S, dSdT } = series(T);
      if (noExp) return yr * dSdT;
      if (data.using_tau_r) {
        const y = yr * Math.exp((Tr / T) * S);
        return y * ((-Tr / (T * T)) * S + (Tr / T) * dSdT);
      }
      return yr * Math.exp(S) * dSdT;
    },
  };
}

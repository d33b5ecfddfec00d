/**
 * Ideal-gas Helmholtz energy α^0(τ, δ) of one pure fluid and its τ derivatives
 * (reference README §3.3; term forms of the CoolProp fluid files, Bell et al. 2014).
 * δ enters only through ln δ, so α^0_δ = 1/δ is left to the caller.
 */
import type { IdealBlock } from "./reference-types.ts";

export interface IdealDerivatives {
  alpha0: number;
  dTau: number;
  dTau2: number;
}

export interface IdealHelmholtz {
  evaluate(tau: number, delta: number): IdealDerivatives;
}

/**
 * @param blocks `EOS[0].alpha0` of a reference fluid file
 * @returns evaluator of α^0, ∂α^0/∂τ and ∂²α^0/∂τ² at (τ, δ)
 * @throws Error for an unsupported block type
 * @example compileIdealHelmholtz(fluid.EOS[0].alpha0).evaluate(1.1, 0.9).dTau
 */
export function compileIdealHelmholtz(blocks: IdealBlock[]): IdealHelmholtz {
  const parts: Array<(tau: number, out: IdealDerivatives) => void> = [];
  let leadA1 = 0;
  let leadA2 = 0;
  let hasLead = false;
  const cp0Constant = (c: number, tau0: number) => (tau: number, out: IdealDerivatives) => {
    out.alpha0 += c - (c * tau) / tau0 + c * Math.log(tau / tau0);
    out.dTau += c / tau - c / tau0;
    out.dTau2 += -c / (tau * tau);
  };
  for (const block of blocks) {
    switch (block.type) {
      case "IdealGasHelmholtzLead":
        hasLead = true;
        leadA1 += block.a1;
        leadA2 += block.a2;
        break;
      case "IdealGasHelmholtzEnthalpyEntropyOffset":
        leadA1 += block.a1;
        leadA2 += block.a2;
        break;
      case "IdealGasHelmholtzLogTau": {
        const a = block.a;
        parts.push((tau, out) => {
          out.alpha0 += a * Math.log(tau);
          out.dTau += a / tau;
          out.dTau2 += -a / (tau * tau);
        });
        break;
      }
      case "IdealGasHelmholtzPower": {
        const { n, t } = block;
        parts.push((tau, out) => {
          for (let k = 0; k < n.length; k++) {
            const nk = n[k]!,
              tk = t[k]!;
            out.alpha0 += nk * Math.pow(tau, tk);
            out.dTau += nk * tk * Math.pow(tau, tk - 1);
            out.dTau2 += nk * tk * (tk - 1) * Math.pow(tau, tk - 2);
          }
        });
        break;
      }
      case "IdealGasHelmholtzPlanckEinstein": {
        const { n, t } = block;
        parts.push((tau, out) => {
          for (let k = 0; k < n.length; k++) {
            const nk = n[k]!,
              tk = t[k]!;
            const e = Math.exp(tk * tau);
            out.alpha0 += nk * Math.log(1 - Math.exp(-tk * tau));
            out.dTau += (nk * tk) / (e - 1);
            out.dTau2 += (-nk * tk * tk * e) / ((e - 1) * (e - 1));
          }
        });
        break;
      }
      case "IdealGasHelmholtzCP0Constant":
        parts.push(cp0Constant(block.cp_over_R, block.Tc / block.T0));
        break;
      case "IdealGasHelmholtzCP0PolyT": {
        // Tc and T0 come from the term itself (R123 stores 456.82 K here, README §3.3).
        const { c, t, Tc, T0 } = block;
        const tau0 = Tc / T0;
        c.forEach((ck, k) => {
          const tk = t[k]!;
          if (tk === 0) {
            parts.push(cp0Constant(ck, tau0));
          } else if (tk === -1) {
            parts.push((tau, out) => {
              out.alpha0 += ((ck * tau) / Tc) * Math.log(tau0 / tau) + (ck / Tc) * (tau - tau0);
              out.dTau += (ck / Tc) * Math.log(tau0 / tau);
              out.dTau2 += -ck / (Tc * tau);
            });
          } else {
            parts.push((tau, out) => {
              out.alpha0 +=
                (-ck * Math.pow(Tc, tk) * Math.pow(tau, -tk)) / (tk * (tk + 1)) -
                (ck * Math.pow(T0, tk + 1) * tau) / (Tc * (tk + 1)) +
                (ck * Math.pow(T0, tk)) / tk;
              out.dTau +=
                (ck * Math.pow(Tc, tk) * Math.pow(tau, -tk - 1)) / (tk + 1) -
                (ck * Math.pow(T0, tk + 1)) / (Tc * (tk + 1));
              out.dTau2 += -ck * Math.pow(Tc, tk) * Math.pow(tau, -tk - 2);
            });
          }
        });
        break;
      }
      default: {
        const unknown: never = block;
        throw new Error(`ideal-gas Helmholtz term type ${(unknown as { type: string }).type} is not supported`);
      }
    }
  }
  if (!hasLead) throw new Error("ideal-gas Helmholtz blocks need an IdealGasHelmholtzLead term");
  return {
    evaluate(tau, delta) {
      const out: IdealDerivatives = { alpha0: Math.log(delta) + leadA1 + leadA2 * tau, dTau: leadA2, dTau2: 0 };
      for (const part of parts) part(tau, out);
      return out;
    },
  };
}

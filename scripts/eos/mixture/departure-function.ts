/**
 * Departure function α^r_ij(τ, δ) of a binary pair (reference README §7.3):
 *
 * - "Exponential" (Lemmon & Jacobsen 2004, Bell et al. 2022/2023):
 *   Σ n δ^d τ^t exp(−δ^l), the exponential left out when l = 0 — exactly the pure-fluid
 *   ResidualHelmholtzPower form, so it is compiled by compileResidualHelmholtz;
 * - "GERG-2008" (Kunz & Wagner 2012): the first Npower terms n δ^d τ^t, the rest
 *   n δ^d τ^t exp[−η(δ−ε)² − β(δ−γ)]. Completing the square turns each of those into a
 *   pure-fluid Gaussian term in δ (no τ part): −η(δ−ε)² − β(δ−γ) = −η(δ−ε')² + c with
 *   ε' = ε − β/(2η) and c = η(ε'² − ε²) + βγ, folded into n.
 */
import { compileResidualHelmholtz, type ResidualHelmholtz } from "../residual-helmholtz.ts";
import type { ResidualBlock } from "../reference-types.ts";
import type { DepartureFunctionRecord } from "./mixture-data.ts";

/**
 * @param record one entry of departure_functions.json
 * @returns α^r_ij with all first and second derivatives in τ and δ
 * @throws Error for an unknown type, or a GERG-2008 term with β ≠ 0 but η = 0 (not in the pack)
 * @example compileDepartureFunction(records.find((r) => r.Name === "R32-R1234yf")!).evaluate(1.1, 1.5).alphar
 */
export function compileDepartureFunction(record: DepartureFunctionRecord): ResidualHelmholtz {
  const blocks: ResidualBlock[] = [];
  if (record.type === "Exponential") {
    blocks.push({ type: "ResidualHelmholtzPower", n: record.n, d: record.d, t: record.t, l: record.l });
  } else if (record.type === "GERG-2008") {
    const power = record.Npower;
    blocks.push({
      type: "ResidualHelmholtzPower",
      n: record.n.slice(0, power),
      d: record.d.slice(0, power),
      t: record.t.slice(0, power),
      l: record.n.slice(0, power).map(() => 0),
    });
    if (record.n.length > power) {
      const gaussian = {
        n: [] as number[],
        d: [] as number[],
        t: [] as number[],
        epsilon: [] as number[],
        eta: [] as number[],
      };
      for (let k = power; k < record.n.length; k++) {
        const eta = record.eta[k]!;
        const beta = record.beta[k]!;
        if (eta === 0 && beta !== 0) {
          throw new Error(`compileDepartureFunction requires η > 0 where β ≠ 0 (${record.Name}, term ${k})`);
        }
        const shifted = eta === 0 ? 0 : record.epsilon[k]! - beta / (2 * eta);
        const constant = eta === 0 ? 0 : eta * (shifted * shifted - record.epsilon[k]! ** 2) + beta * record.gamma[k]!;
        gaussian.n.push(record.n[k]! * Math.exp(constant));
        gaussian.d.push(record.d[k]!);
        gaussian.t.push(record.t[k]!);
        gaussian.epsilon.push(shifted);
        gaussian.eta.push(eta);
      }
      blocks.push({
        type: "ResidualHelmholtzGaussian",
        ...gaussian,
        beta: gaussian.n.map(() => 0),
        gamma: gaussian.n.map(() => 0),
      });
    }
  } else {
    throw new Error(`compileDepartureFunction: type ${(record as { type: string }).type} is not supported`);
  }
  return compileResidualHelmholtz(blocks);
}

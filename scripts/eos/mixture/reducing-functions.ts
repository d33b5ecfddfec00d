/**
 * Reducing functions of the multi-fluid (GERG-type) mixture model: the mixture's
 * reducing temperature T_r(x) and density ρ_r(x), with their first derivatives in
 * each mole fraction treated as independent (reference README §7.2 and §7.4;
 * Kunz & Wagner, J. Chem. Eng. Data 57 (2012), Kunz-JCED-2012, eqs. 7.9–7.18).
 *
 *   T_r   = Σ x_i² T_c,i + Σ_{i<j} 2 x_i x_j β_T γ_T (x_i + x_j)/(β_T² x_i + x_j) √(T_c,i T_c,j)
 *   1/ρ_r = Σ x_i²/ρ_c,i + Σ_{i<j} 2 x_i x_j β_v γ_v (x_i + x_j)/(β_v² x_i + x_j) (ρ_c,i^-1/3 + ρ_c,j^-1/3)³/8
 *
 * T_c,i and ρ_c,i are each component's reducing values (EOS[0].STATES.reducing).
 */

/** Interaction parameters of the ordered pair (i, j), i < j in component order. */
export interface PairReducingParameters {
  i: number;
  j: number;
  betaT: number;
  gammaT: number;
  betaV: number;
  gammaV: number;
}

export interface ReducingValues {
  /** K */
  temperature: number;
  /** mol/m³ */
  density: number;
  /** ∂T_r/∂x_k, K */
  dTemperature: Float64Array;
  /** ∂(1/ρ_r)/∂x_k, m³/mol */
  dVolume: Float64Array;
}

export interface ReducingFunctions {
  readonly componentCount: number;
  /** @param x mole fractions (need not sum to 1 for the derivatives) */
  evaluate(x: ArrayLike<number>, out?: ReducingValues): ReducingValues;
}

/**
 * f(x_i, x_j) = x_i x_j (x_i + x_j)/(β² x_i + x_j) and its partial derivatives
 * (0 when both fractions vanish, its limit).
 */
function pairShape(xi: number, xj: number, beta2: number): [number, number, number] {
  const denominator = beta2 * xi + xj;
  if (denominator === 0) return [0, 0, 0];
  const numerator = xi * xj * (xi + xj);
  const value = numerator / denominator;
  const dxi = (xj * (2 * xi + xj)) / denominator - (numerator * beta2) / (denominator * denominator);
  const dxj = (xi * (xi + 2 * xj)) / denominator - numerator / (denominator * denominator);
  return [value, dxi, dxj];
}

/**
 * @param reducingTemperatures T_c,i of each component, K
 * @param reducingDensities ρ_c,i of each component, mol/m³
 * @param pairs interaction parameters of every pair (pairs left out act as β = γ = 1)
 * @returns evaluator of T_r(x), ρ_r(x) and their mole-fraction derivatives
 * @throws Error when a pair index is out of range or not ordered i < j
 * @example createReducingFunctions([351.255, 339.173], [8150.08, 4779], []).evaluate([1, 0]).temperature // 351.255
 */
export function createReducingFunctions(
  reducingTemperatures: readonly number[],
  reducingDensities: readonly number[],
  pairs: readonly PairReducingParameters[],
): ReducingFunctions {
  const count = reducingTemperatures.length;
  const volumes = reducingDensities.map((rho) => 1 / rho);
  // Fill in every pair; missing ones behave as β = γ = 1.
  const table: PairReducingParameters[] = [];
  for (let i = 0; i < count; i++) {
    for (let j = i + 1; j < count; j++) {
      const given = pairs.find((pair) => pair.i === i && pair.j === j);
      table.push(given ?? { i, j, betaT: 1, gammaT: 1, betaV: 1, gammaV: 1 });
    }
  }
  for (const pair of pairs) {
    if (!(pair.i >= 0 && pair.j < count && pair.i < pair.j)) {
      throw new Error(`createReducingFunctions requires pairs ordered i < j within ${count} components`);
    }
  }
  const temperatureFactor = table.map(
    (pair) => 2 * pair.betaT * pair.gammaT * Math.sqrt(reducingTemperatures[pair.i]! * reducingTemperatures[pair.j]!),
  );
  const volumeFactor = table.map(
    (pair) =>
      (2 * pair.betaV * pair.gammaV * Math.pow(Math.cbrt(volumes[pair.i]!) + Math.cbrt(volumes[pair.j]!), 3)) / 8,
  );
  return {
    componentCount: count,
    evaluate(x, out) {
      const result = out ?? {
        temperature: 0,
        density: 0,
        dTemperature: new Float64Array(count),
        dVolume: new Float64Array(count),
      };
      let temperature = 0;
      let volume = 0;
      for (let k = 0; k < count; k++) {
        const xk = x[k]!;
        temperature += xk * xk * reducingTemperatures[k]!;
        volume += xk * xk * volumes[k]!;
        result.dTemperature[k] = 2 * xk * reducingTemperatures[k]!;
        result.dVolume[k] = 2 * xk * volumes[k]!;
      }
      for (let p = 0; p < table.length; p++) {
        const pair = table[p]!;
        const xi = x[pair.i]!;
        const xj = x[pair.j]!;
        const [fT, fTi, fTj] = pairShape(xi, xj, pair.betaT * pair.betaT);
        const [fV, fVi, fVj] = pairShape(xi, xj, pair.betaV * pair.betaV);
        temperature += temperatureFactor[p]! * fT;
        volume += volumeFactor[p]! * fV;
        // pair.i and pair.j are component indices, below `count`, the length of both arrays.
        result.dTemperature[pair.i]! += temperatureFactor[p]! * fTi;
        result.dTemperature[pair.j]! += temperatureFactor[p]! * fTj;
        result.dVolume[pair.i]! += volumeFactor[p]! * fVi;
        result.dVolume[pair.j]! += volumeFactor[p]! * fVj;
      }
      result.temperature = temperature;
      result.density = 1 / volume;
      return result;
    },
  };
}

/**
 * Solves A·x = b for a small dense system by Gaussian elimination with partial
 * pivoting (the Newton steps of the blend phase-equilibrium solver, n ≤ 8).
 *
 * @param matrix row-major square matrix (copied, not changed)
 * @param rhs right-hand side
 * @returns the solution vector
 * @throws Error when the matrix is singular to working precision
 * @example solveLinearSystem([[2, 0], [0, 4]], [2, 2]) // [1, 0.5]
 */
export function solveLinearSystem(matrix: readonly (readonly number[])[], rhs: readonly number[]): number[] {
  const n = rhs.length;
  const a = matrix.map((row) => [...row]);
  const b = [...rhs];
  for (let column = 0; column < n; column++) {
    let pivot = column;
    for (let row = column + 1; row < n; row++) {
      if (Math.abs(a[row]![column]!) > Math.abs(a[pivot]![column]!)) pivot = row;
    }
    if (!(Math.abs(a[pivot]![column]!) > 0)) throw new Error("solveLinearSystem requires a non-singular matrix");
    [a[column], a[pivot]] = [a[pivot]!, a[column]!];
    [b[column], b[pivot]] = [b[pivot]!, b[column]!];
    const top = a[column]!;
    for (let row = column + 1; row < n; row++) {
      const current = a[row]!;
      const factor = current[column]! / top[column]!;
      if (factor === 0) continue;
      for (let k = column; k < n; k++) current[k] = current[k]! - factor * top[k]!;
      b[row] = b[row]! - factor * b[column]!;
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let row = n - 1; row >= 0; row--) {
    let sum = b[row]!;
    for (let k = row + 1; k < n; k++) sum -= a[row]![k]! * x[k]!;
    x[row] = sum / a[row]![row]!;
  }
  return x;
}

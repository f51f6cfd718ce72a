/**
 * Small symmetric positive-definite systems by Cholesky factorisation
 * (Golub & Van Loan, Matrix Computations, 4th ed., §4.2). Matrices are arrays
 * of rows; sizes here are 2–6, so plain loops are fastest.
 *
 * Example: choleskySolve([[4, 2], [2, 3]], [2, 1]) → [0.5, 0]
 */

/** Lower-triangular L with L·Lᵀ = a, or null if a is not positive definite. Example: cholesky([[4]]) → [[2]] */
export function cholesky(a: readonly (readonly number[])[]): number[][] | null {
  const n = a.length;
  const l: number[][] = Array.from({ length: n }, () => new Array(n).fill(0));
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let sum = a[i][j];
      for (let k = 0; k < j; k++) sum -= l[i][k] * l[j][k];
      if (i === j) {
        if (!(sum > 0)) return null;
        l[i][i] = Math.sqrt(sum);
      } else {
        l[i][j] = sum / l[j][j];
      }
    }
  }
  return l;
}

/** Solve a·x = b for symmetric positive-definite a; null if a is not. Example: see the module comment. */
export function choleskySolve(a: readonly (readonly number[])[], b: readonly number[]): number[] | null {
  const l = cholesky(a);
  return l ? solveWithFactor(l, b) : null;
}

/** The inverse of a symmetric positive-definite matrix; null if it is not. Example: inverseSpd([[4]]) → [[0.25]] */
export function inverseSpd(a: readonly (readonly number[])[]): number[][] | null {
  const l = cholesky(a);
  if (!l) return null;
  const n = a.length;
  const columns = Array.from({ length: n }, (_, j) =>
    solveWithFactor(
      l,
      Array.from({ length: n }, (_, i) => (i === j ? 1 : 0)),
    ),
  );
  // Symmetrise: the two triangles agree to rounding.
  return Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => 0.5 * (columns[j][i] + columns[i][j])));
}

/** xᵀ·a·x for a square matrix a. Example: quadraticForm([[2, 0], [0, 3]], [1, 1]) → 5 */
export function quadraticForm(a: readonly (readonly number[])[], x: readonly number[]): number {
  let sum = 0;
  for (let i = 0; i < x.length; i++) {
    let row = 0;
    for (let j = 0; j < x.length; j++) row += a[i][j] * x[j];
    sum += x[i] * row;
  }
  return sum;
}

/** a·x for a matrix a (rows) and vector x. Example: matrixVector([[1, 2]], [3, 4]) → [11] */
export function matrixVector(a: readonly (readonly number[])[], x: readonly number[]): number[] {
  return a.map((row) => row.reduce((sum, value, j) => sum + value * x[j], 0));
}

function solveWithFactor(l: number[][], b: readonly number[]): number[] {
  const n = b.length;
  const y = new Array(n).fill(0);
  for (let i = 0; i < n; i++) {
    let sum = b[i];
    for (let k = 0; k < i; k++) sum -= l[i][k] * y[k];
    y[i] = sum / l[i][i];
  }
  const x = new Array(n).fill(0);
  for (let i = n - 1; i >= 0; i--) {
    let sum = y[i];
    for (let k = i + 1; k < n; k++) sum -= l[k][i] * x[k];
    x[i] = sum / l[i][i];
  }
  return x;
}

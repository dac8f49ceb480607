import { usageError } from '../base/errors.js';

/** Names of the baseline orders, 0 to 3. */
export const BASELINE_NAMES = ['mean', 'linear', 'quadratic', 'cubic'] as const;

/**
 * Subtract the least-squares polynomial of order 0 (the mean) to 3 (baseline correction, common
 * practice in strong-motion processing). Time is mapped to [−1, 1] to keep the normal equations well
 * conditioned, solved with partial pivoting (Golub and Van Loan, Matrix Computations, 4th ed., §3.4).
 */
export function removePolynomialBaseline(values: Float64Array, order: number): Float64Array {
  if (!Number.isInteger(order) || order < 0 || order > 3)
    throw usageError(`baseline order must be 0 (mean), 1, 2 or 3, got ${order}`);
  const coefficients = fitPolynomial(values, order);
  const n = values.length;
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) out[i] = values[i] - evaluate(coefficients, scaledTime(i, n));
  return out;
}

/** Least-squares coefficients c0…cp of Σ c_k x^k over x = scaledTime(i, n). */
export function fitPolynomial(values: Float64Array, order: number): number[] {
  const n = values.length;
  const size = Math.min(order, n - 1) + 1;
  const matrix: number[][] = Array.from({ length: size }, () => new Array<number>(size + 1).fill(0));
  const powers = new Array<number>(2 * size).fill(0);
  for (let i = 0; i < n; i++) {
    const x = scaledTime(i, n);
    let p = 1;
    for (let k = 0; k < 2 * size - 1; k++) {
      powers[k] += p;
      if (k < size) matrix[k][size] += p * values[i];
      p *= x;
    }
  }
  for (let r = 0; r < size; r++) for (let c = 0; c < size; c++) matrix[r][c] = powers[r + c];
  return solve(matrix, size);
}

function scaledTime(i: number, n: number): number {
  return n === 1 ? 0 : (2 * i) / (n - 1) - 1;
}

function evaluate(coefficients: number[], x: number): number {
  let value = 0;
  for (let k = coefficients.length - 1; k >= 0; k--) value = value * x + coefficients[k];
  return value;
}

/** Solve the augmented system in place (partial pivoting). */
function solve(matrix: number[][], size: number): number[] {
  for (let col = 0; col < size; col++) {
    let pivot = col;
    for (let r = col + 1; r < size; r++)
      if (Math.abs(matrix[r][col]) > Math.abs(matrix[pivot][col])) pivot = r;
    [matrix[col], matrix[pivot]] = [matrix[pivot], matrix[col]];
    for (let r = col + 1; r < size; r++) {
      const factor = matrix[r][col] / matrix[col][col];
      for (let c = col; c <= size; c++) matrix[r][c] -= factor * matrix[col][c];
    }
  }
  const x = new Array<number>(size).fill(0);
  for (let r = size - 1; r >= 0; r--) {
    let sum = matrix[r][size];
    for (let c = r + 1; c < size; c++) sum -= matrix[r][c] * x[c];
    x[r] = sum / matrix[r][r];
  }
  return x;
}

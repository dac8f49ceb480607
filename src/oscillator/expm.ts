/**
 * Exponential of a small dense n×n matrix (row-major), by scaling and squaring with a truncated
 * Taylor series: method 3 of Moler and Van Loan, "Nineteen dubious ways to compute the exponential
 * of a matrix, twenty-five years later", SIAM Review 45 (2003). Scaled to a 1-norm ≤ 1/2, 18 terms
 * leave an error below 1e-20 of the norm. Used to build step coefficients, never in the inner loop.
 */
export function expm(matrix: Float64Array, n: number): Float64Array {
  let norm = 0;
  for (let j = 0; j < n; j++) {
    let column = 0;
    for (let i = 0; i < n; i++) column += Math.abs(matrix[i * n + j]);
    norm = Math.max(norm, column);
  }
  const squarings = norm > 0.5 ? Math.ceil(Math.log2(norm / 0.5)) : 0;
  const scale = 2 ** -squarings;
  const size = n * n;
  const scaled = new Float64Array(size);
  for (let i = 0; i < size; i++) scaled[i] = matrix[i] * scale;

  // No array made per term: each product is written into the spare one, then swapped.
  let result: Float64Array = identity(n);
  let term: Float64Array = identity(n);
  let spare: Float64Array = new Float64Array(size);
  for (let k = 1; k <= 18; k++) {
    multiplyInto(spare, term, scaled, n);
    for (let i = 0; i < size; i++) spare[i] = spare[i] / k;
    [term, spare] = [spare, term];
    for (let i = 0; i < size; i++) result[i] += term[i];
  }
  for (let s = 0; s < squarings; s++) {
    multiplyInto(spare, result, result, n);
    [result, spare] = [spare, result];
  }
  return result;
}

function identity(n: number): Float64Array {
  const out = new Float64Array(n * n);
  for (let i = 0; i < n; i++) out[i * n + i] = 1;
  return out;
}

/** out = a·b (n×n, row-major); `out` is neither `a` nor `b`. */
function multiplyInto(out: Float64Array, a: Float64Array, b: Float64Array, n: number): void {
  out.fill(0);
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) {
      const aik = a[i * n + k];
      if (aik === 0) continue;
      for (let j = 0; j < n; j++) out[i * n + j] += aik * b[k * n + j];
    }
  }
}

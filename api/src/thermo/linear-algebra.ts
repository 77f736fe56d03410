import { ThermoInputError } from './errors';

/** Small dense linear algebra for the fits (row-major `number[][]`, a few dozen unknowns). */

/**
 * Solves A·x = b by Gaussian elimination with partial pivoting.
 * @throws ThermoInputError when A is singular to working precision
 */
export function solveLinearSystem(a: readonly (readonly number[])[], b: readonly number[]): number[] {
  const n = a.length;
  if (b.length !== n || a.some((row) => row.length !== n)) {
    throw new ThermoInputError('matrix', `expected a square ${n}×${n} system`);
  }
  const m = a.map((row, i) => [...row, b[i]]);
  const scale = Math.max(...a.flat().map(Math.abs), 0);
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(m[r][col]) > Math.abs(m[pivot][col])) pivot = r;
    if (!(Math.abs(m[pivot][col]) > 1e-14 * scale)) throw new ThermoInputError('matrix', 'singular system');
    [m[col], m[pivot]] = [m[pivot], m[col]];
    for (let r = col + 1; r < n; r++) {
      const factor = m[r][col] / m[col][col];
      if (factor === 0) continue;
      for (let k = col; k <= n; k++) m[r][k] -= factor * m[col][k];
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let sum = m[r][n];
    for (let k = r + 1; k < n; k++) sum -= m[r][k] * x[k];
    x[r] = sum / m[r][r];
  }
  return x;
}

/**
 * Linear least squares min ‖A·x − b‖₂ by Householder QR on column-scaled A (no normal
 * equations, so the condition number is not squared).
 * @returns x and the residual vector A·x − b
 * @throws ThermoInputError when there are fewer rows than columns or A is rank-deficient
 */
export function leastSquares(a: readonly (readonly number[])[], b: readonly number[]): { x: number[]; residuals: number[] } {
  const rows = a.length;
  const cols = rows === 0 ? 0 : a[0].length;
  if (rows < cols || b.length !== rows) {
    throw new ThermoInputError('matrix', `least squares needs at least as many rows (${rows}) as unknowns (${cols})`);
  }
  const colScale = Array.from({ length: cols }, (_, j) => Math.hypot(...a.map((row) => row[j])) || 1);
  const q = a.map((row) => row.map((v, j) => v / colScale[j]));
  const y = [...b];
  const diag: number[] = [];
  for (let k = 0; k < cols; k++) {
    let norm = 0;
    for (let i = k; i < rows; i++) norm = Math.hypot(norm, q[i][k]);
    if (!(norm > 1e-13)) throw new ThermoInputError('matrix', 'rank-deficient design matrix (too few distinct points?)');
    const alpha = q[k][k] > 0 ? -norm : norm;
    const v = new Array<number>(rows).fill(0);
    for (let i = k; i < rows; i++) v[i] = q[i][k];
    v[k] -= alpha;
    const vv = v.reduce((s, vi) => s + vi * vi, 0);
    const apply = (get: (i: number) => number, set: (i: number, value: number) => void) => {
      let dot = 0;
      for (let i = k; i < rows; i++) dot += v[i] * get(i);
      const f = (2 * dot) / vv;
      for (let i = k; i < rows; i++) set(i, get(i) - f * v[i]);
    };
    for (let j = k; j < cols; j++) apply((i) => q[i][j], (i, value) => { q[i][j] = value; });
    apply((i) => y[i], (i, value) => { y[i] = value; });
    diag.push(q[k][k]);
  }
  const z = new Array<number>(cols).fill(0);
  for (let r = cols - 1; r >= 0; r--) {
    let sum = y[r];
    for (let k = r + 1; k < cols; k++) sum -= q[r][k] * z[k];
    z[r] = sum / diag[r];
  }
  const x = z.map((v, j) => v / colScale[j]);
  const residuals = a.map((row, i) => row.reduce((s, v, j) => s + v * x[j], 0) - b[i]);
  return { x, residuals };
}

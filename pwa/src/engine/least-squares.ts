/*
 * Dense Householder QR for the small least-squares problems of fitting (a few parameters,
 * some tens of points). Rows are arrays; nothing here forms normal equations.
 */

export interface Factorization {
  /** n×n upper-triangular R of A = QR. */
  readonly r: number[][];
  /** The first n components of Qᵀb. */
  readonly qtb: number[];
}

/** R and Qᵀb of an m×n matrix A (m ≥ n) and a right-hand side b. */
export function qrFactor(a: readonly (readonly number[])[], b: readonly number[]): Factorization {
  const m = a.length;
  const n = a[0]?.length ?? 0;
  // Column-major copy with b as column n, reflected along with the others.
  const w = new Float64Array(m * (n + 1));
  for (let i = 0; i < m; i++) {
    const row = a[i]!;
    for (let j = 0; j < n; j++) w[j * m + i] = row[j]!;
    w[n * m + i] = b[i]!;
  }
  for (let k = 0; k < n; k++) {
    const v = k * m;
    let sumOfSquares = 0;
    for (let i = k; i < m; i++) sumOfSquares += w[v + i]! * w[v + i]!;
    if (sumOfSquares === 0) continue;
    const norm = Math.sqrt(sumOfSquares);
    const head = w[v + k]!;
    // Reflect onto −sign(head)·‖x‖·e_k so the first component does not cancel.
    const alpha = head > 0 ? -norm : norm;
    w[v + k] = head - alpha;
    const vv = 2 * norm * (norm + Math.abs(head));
    for (let j = k + 1; j <= n; j++) {
      const c = j * m;
      let dot = 0;
      for (let i = k; i < m; i++) dot += w[v + i]! * w[c + i]!;
      const scale = (2 * dot) / vv;
      for (let i = k; i < m; i++) w[c + i] = w[c + i]! - scale * w[v + i]!;
    }
    w[v + k] = alpha;
  }
  const r: number[][] = [];
  for (let i = 0; i < n; i++) {
    const row = new Array<number>(n).fill(0);
    for (let j = i; j < n; j++) row[j] = w[j * m + i]!;
    r.push(row);
  }
  return { r, qtb: Array.from(w.subarray(n * m, n * m + n)) };
}

/** x with Rx = y, R upper triangular and nonsingular. */
export function solveUpper(r: readonly (readonly number[])[], y: readonly number[]): number[] {
  const x = [...y];
  for (let i = x.length - 1; i >= 0; i--) {
    let sum = x[i]!;
    for (let j = i + 1; j < x.length; j++) sum -= r[i]![j]! * x[j]!;
    x[i] = sum / r[i]![i]!;
  }
  return x;
}

/** z with Rᵀz = y, R upper triangular and nonsingular. */
export function solveUpperTransposed(
  r: readonly (readonly number[])[],
  y: readonly number[],
): number[] {
  const z = [...y];
  for (let i = 0; i < z.length; i++) {
    let sum = z[i]!;
    for (let j = 0; j < i; j++) sum -= r[j]![i]! * z[j]!;
    z[i] = sum / r[i]![i]!;
  }
  return z;
}

/** Least-squares solution of Ax ≈ b (A of full column rank). */
export function linearLeastSquares(
  a: readonly (readonly number[])[],
  b: readonly number[],
): number[] {
  const { r, qtb } = qrFactor(a, b);
  return solveUpper(r, qtb);
}

export function euclideanNorm(x: readonly number[]): number {
  let sum = 0;
  for (const v of x) sum += v * v;
  return Math.sqrt(sum);
}

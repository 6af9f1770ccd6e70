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
  const columns = Array.from({ length: n }, (_, j) => a.map((row) => row[j]!));
  const rhs = [...b];
  for (let k = 0; k < n; k++) {
    const v = columns[k]!;
    let sumOfSquares = 0;
    for (let i = k; i < m; i++) sumOfSquares += v[i]! * v[i]!;
    if (sumOfSquares === 0) continue;
    const norm = Math.sqrt(sumOfSquares);
    const head = v[k]!;
    // Reflect onto −sign(head)·‖x‖·e_k so the first component does not cancel.
    const alpha = head > 0 ? -norm : norm;
    v[k] = head - alpha;
    const vv = 2 * norm * (norm + Math.abs(head));
    const reflect = (x: number[]) => {
      let dot = 0;
      for (let i = k; i < m; i++) dot += v[i]! * x[i]!;
      const scale = (2 * dot) / vv;
      for (let i = k; i < m; i++) x[i] = x[i]! - scale * v[i]!;
    };
    for (let j = k + 1; j < n; j++) reflect(columns[j]!);
    reflect(rhs);
    v[k] = alpha;
  }
  return {
    r: Array.from({ length: n }, (_, i) =>
      Array.from({ length: n }, (_, j) => (j >= i ? columns[j]![i]! : 0)),
    ),
    qtb: rhs.slice(0, n),
  };
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

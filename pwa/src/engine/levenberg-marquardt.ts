import { EngineInputError } from './errors.js';
import {
  euclideanNorm,
  qrFactor,
  solveUpper,
  solveUpperTransposed,
  type Factorization,
} from './least-squares.js';

/*
 * Levenberg–Marquardt as a trust-region method with Moré's scaling (Moré 1978, LNM
 * 630; MINPACK lmder/lmpar [S]): scale dⱼ = max(dⱼ, ‖Jⱼ‖), step accepted when
 * actual/predicted reduction ≥ 1e-4, stops on ftol / xtol / gtol and says which.
 */

export interface Evaluation {
  readonly residuals: number[];
  /** One row per residual. */
  readonly jacobian: number[][];
}

export interface LeastSquaresProblem {
  /**
   * Residuals and Jacobian at x, or null where x lies outside the problem's domain (the step
   * is refused). Both at once: with multicomplex steps the Jacobian pass yields the residuals
   * too, so a trial point costs one pass and, when accepted, needs no second one.
   */
  evaluate(x: readonly number[]): Evaluation | null;
}

export interface LevenbergMarquardtOptions {
  /** Stop when the relative reduction of the sum of squares, actual and predicted, is below this. */
  readonly ftol?: number;
  /** Stop when the trust region is below this fraction of the scaled parameter norm. */
  readonly xtol?: number;
  /** Stop when the residual is this close to orthogonal to every Jacobian column (cosine). */
  readonly gtol?: number;
  readonly maxEvaluations?: number;
}

export type StopReason = 'ftol' | 'xtol' | 'ftol+xtol' | 'gtol' | 'max-evaluations' | 'rounding';

export interface LevenbergMarquardtResult {
  readonly x: number[];
  readonly residuals: number[];
  /** Sum of squared residuals. */
  readonly cost: number;
  /** Jacobian evaluations (outer iterations). */
  readonly iterations: number;
  /** Evaluations, the start included. */
  readonly evaluations: number;
  readonly stopReason: StopReason;
}

const EPS = Number.EPSILON;
const DWARF = Number.MIN_VALUE * 2 ** 52;
/** MINPACK's initial trust-region factor. */
const FACTOR = 100;

function scaledNorm(diag: readonly number[], x: readonly number[]): number {
  let sum = 0;
  for (let j = 0; j < x.length; j++) sum += (diag[j]! * x[j]!) ** 2;
  return Math.sqrt(sum);
}

/** p minimising ‖Rp + qtb‖² + par·‖Dp‖², with the R factor of that damped system. */
function dampedStep(
  { r, qtb }: Factorization,
  diag: readonly number[],
  par: number,
): { step: number[]; r: number[][] } {
  const n = diag.length;
  const root = Math.sqrt(par);
  const stacked = [...r];
  const rhs = new Array<number>(2 * n).fill(0);
  for (let j = 0; j < n; j++) {
    const row = new Array<number>(n).fill(0);
    row[j] = root * diag[j]!;
    stacked.push(row);
    rhs[j] = -qtb[j]!;
  }
  const damped = qrFactor(stacked, rhs);
  return { step: solveUpper(damped.r, damped.qtb), r: damped.r };
}

/** Newton correction of par towards ‖Dp‖ = Δ (Moré 1978, eq. 5.5). */
function parCorrection(
  r: readonly (readonly number[])[],
  diag: readonly number[],
  step: readonly number[],
  dxnorm: number,
  fp: number,
  delta: number,
): number {
  const w = diag.map((d, j) => (d * d * step[j]!) / dxnorm);
  const y = solveUpperTransposed(r, w);
  const yy = y.reduce((sum, v) => sum + v * v, 0);
  return fp / delta / yy;
}

/**
 * The Levenberg–Marquardt parameter par and step p with ‖Dp‖ within 10 % of Δ, or the
 * Gauss–Newton step when that already lies inside the trust region (MINPACK lmpar).
 */
function lmpar(
  qr: Factorization,
  diag: readonly number[],
  delta: number,
  parStart: number,
): { step: number[]; par: number } {
  const { r, qtb } = qr;
  const n = diag.length;
  const fullRank = r.every((row, j) => Math.abs(row[j]!) > 100 * EPS * diag[j]!);
  let parLower = 0;
  let fp = Number.POSITIVE_INFINITY;
  let dxnorm = 0;
  if (fullRank) {
    const gaussNewton = solveUpper(
      r,
      qtb.map((v) => -v),
    );
    dxnorm = scaledNorm(diag, gaussNewton);
    fp = dxnorm - delta;
    if (fp <= 0.1 * delta) return { step: gaussNewton, par: 0 };
    parLower = parCorrection(r, diag, gaussNewton, dxnorm, fp, delta);
  }
  // ‖D⁻¹Jᵀr‖/Δ bounds par from above.
  const scaledGradient = Array.from({ length: n }, (_, j) => {
    let sum = 0;
    for (let i = 0; i <= j; i++) sum += r[i]![j]! * qtb[i]!;
    return sum / diag[j]!;
  });
  const gnorm = euclideanNorm(scaledGradient);
  let parUpper = gnorm / delta;
  if (parUpper === 0) parUpper = DWARF / Math.min(delta, 0.1);
  let par = Math.min(Math.max(parStart, parLower), parUpper);
  if (par === 0 && fullRank) par = gnorm / dxnorm;
  for (let iteration = 1; ; iteration++) {
    if (par === 0) par = Math.max(DWARF, 0.001 * parUpper);
    const damped = dampedStep(qr, diag, par);
    dxnorm = scaledNorm(diag, damped.step);
    const previous = fp;
    fp = dxnorm - delta;
    if (
      Math.abs(fp) <= 0.1 * delta ||
      (parLower === 0 && fp <= previous && previous < 0) ||
      iteration === 10
    ) {
      return { step: damped.step, par };
    }
    const correction = parCorrection(damped.r, diag, damped.step, dxnorm, fp, delta);
    if (fp > 0) parLower = Math.max(parLower, par);
    if (fp < 0) parUpper = Math.min(parUpper, par);
    par = Math.max(parLower, par + correction);
  }
}

function columnNorms(jacobian: readonly (readonly number[])[], n: number): number[] {
  const sums = new Array<number>(n).fill(0);
  for (const row of jacobian) for (let j = 0; j < n; j++) sums[j] = sums[j]! + row[j]! * row[j]!;
  return sums.map(Math.sqrt);
}

/** ‖Rp‖ for upper-triangular R. */
function triangularProductNorm(r: readonly (readonly number[])[], p: readonly number[]): number {
  let sum = 0;
  for (let i = 0; i < p.length; i++) {
    let dot = 0;
    for (let j = i; j < p.length; j++) dot += r[i]![j]! * p[j]!;
    sum += dot * dot;
  }
  return Math.sqrt(sum);
}

export function levenbergMarquardt(
  problem: LeastSquaresProblem,
  start: readonly number[],
  options: LevenbergMarquardtOptions = {},
): LevenbergMarquardtResult {
  const n = start.length;
  const { ftol = 1e-10, xtol = 1e-10, gtol = 1e-10, maxEvaluations = 200 * (n + 1) } = options;
  let x = [...start];
  const first = problem.evaluate(x);
  if (!first) throw new EngineInputError('start', 'lies outside the range the model is defined on');
  let { residuals, jacobian } = first;
  let fnorm = euclideanNorm(residuals);
  let evaluations = 1;
  let iterations = 0;
  let diag: number[] = [];
  let delta = 0;
  let xnorm = 0;
  let par = 0;
  const done = (stopReason: StopReason): LevenbergMarquardtResult => ({
    x,
    residuals,
    cost: fnorm * fnorm,
    iterations,
    evaluations,
    stopReason,
  });

  for (;;) {
    iterations++;
    const qr = qrFactor(jacobian, residuals);
    const norms = columnNorms(jacobian, n);
    if (iterations === 1) {
      diag = norms.map((c) => (c === 0 ? 1 : c));
      xnorm = scaledNorm(diag, x);
      delta = xnorm === 0 ? FACTOR : FACTOR * xnorm;
    }
    // Largest cosine between the residual and a column of J.
    let gnorm = 0;
    if (fnorm !== 0) {
      norms.forEach((norm, j) => {
        if (norm === 0) return;
        let sum = 0;
        for (let i = 0; i <= j; i++) sum += qr.r[i]![j]! * qr.qtb[i]!;
        gnorm = Math.max(gnorm, Math.abs(sum / (fnorm * norm)));
      });
    }
    if (gnorm <= gtol) return done('gtol');
    diag = diag.map((d, j) => Math.max(d, norms[j]!));

    for (;;) {
      const lm = lmpar(qr, diag, delta, par);
      par = lm.par;
      const trial = x.map((v, j) => v + lm.step[j]!);
      const pnorm = scaledNorm(diag, lm.step);
      if (iterations === 1) delta = Math.min(delta, pnorm);
      const evaluation = problem.evaluate(trial);
      evaluations++;
      const fnorm1 = evaluation ? euclideanNorm(evaluation.residuals) : Number.POSITIVE_INFINITY;

      const actred = 0.1 * fnorm1 < fnorm ? 1 - (fnorm1 / fnorm) ** 2 : -1;
      const temp1 = triangularProductNorm(qr.r, lm.step) / fnorm;
      const temp2 = (Math.sqrt(par) * pnorm) / fnorm;
      const prered = temp1 * temp1 + (temp2 * temp2) / 0.5;
      const dirder = -(temp1 * temp1 + temp2 * temp2);
      const ratio = prered === 0 ? 0 : actred / prered;

      if (ratio <= 0.25) {
        let shrink = actred >= 0 ? 0.5 : (0.5 * dirder) / (dirder + 0.5 * actred);
        if (0.1 * fnorm1 >= fnorm || shrink < 0.1) shrink = 0.1;
        delta = shrink * Math.min(delta, pnorm / 0.1);
        par /= shrink;
      } else if (par === 0 || ratio >= 0.75) {
        delta = pnorm / 0.5;
        par *= 0.5;
      }
      const accepted = ratio >= 1e-4 && evaluation !== null;
      if (accepted) {
        x = trial;
        ({ residuals, jacobian } = evaluation);
        fnorm = fnorm1;
        xnorm = scaledNorm(diag, x);
      }

      const fConverged = Math.abs(actred) <= ftol && prered <= ftol && 0.5 * ratio <= 1;
      const xConverged = delta <= xtol * xnorm;
      if (fConverged && xConverged) return done('ftol+xtol');
      if (fConverged) return done('ftol');
      if (xConverged) return done('xtol');
      if (evaluations >= maxEvaluations) return done('max-evaluations');
      if (
        (Math.abs(actred) <= EPS && prered <= EPS && 0.5 * ratio <= 1) ||
        delta <= EPS * xnorm ||
        gnorm <= EPS
      ) {
        return done('rounding');
      }
      if (accepted) break;
    }
  }
}

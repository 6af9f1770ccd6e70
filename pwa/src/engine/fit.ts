import { EngineInputError } from './errors.js';
import {
  levenbergMarquardt,
  type LeastSquaresProblem,
  type LevenbergMarquardtResult,
  type StopReason,
} from './levenberg-marquardt.js';
import { linearLeastSquares } from './least-squares.js';
import {
  checkModel,
  mapConstants,
  MODES,
  type MaterialModel,
  type Mode,
  type ModelOf,
} from './material-model.js';
import { MultiComplex } from './multicomplex.js';
import { Real } from './real.js';
import { STEP } from './scalar.js';
import { stabilityOf, type Stability } from './stability.js';
import { initialShearModulus, modeStretches, uncheckedStress } from './stress.js';

/*
 * Fitting a model's constants to test data by Levenberg–Marquardt (REFERENCES §4). The
 * Jacobian is exact: the stress is evaluated with every constant complex-stepped on its own
 * unit, and the stress's own stretch step adds one more, so each row is one multicomplex
 * evaluation of W (mixed second derivatives ∂²W/∂λ∂θⱼ, no differences).
 */

export interface FitPoint {
  readonly mode: Mode;
  readonly stretch: number;
  /** Nominal stress, MPa. */
  readonly stress: number;
}

/** Absolute: Σ(P − P_test)². Relative: Σ((P − P_test)/P_test)², over points with P_test ≠ 0. */
export type FitObjective = 'absolute' | 'relative';

export interface FitOptions {
  /** The model to fit, its constants the start. */
  readonly model: MaterialModel;
  readonly data: readonly FitPoint[];
  readonly objective: FitObjective;
  /** Weight of each mode's squared residuals; modes left out weigh 1 (the plain sum). */
  readonly weights?: Readonly<Partial<Record<Mode, number>>>;
  /** Ogden only: 'several' (default) also starts from spread exponents; 'given' uses the start alone. */
  readonly starts?: 'given' | 'several';
}

export interface FitResult {
  readonly model: MaterialModel;
  /** RMS of P − P_test per mode with data, MPa. */
  readonly rmsByMode: Readonly<Partial<Record<Mode, number>>>;
  /** Coefficient of determination per mode with data (where the stresses vary). */
  readonly r2ByMode: Readonly<Partial<Record<Mode, number>>>;
  readonly iterations: number;
  readonly stopReason: StopReason;
  readonly stability: Stability;
  /** Initial shear modulus μ₀ and Young's modulus E₀ = 3μ₀, MPa. */
  readonly mu0: number;
  readonly e0: number;
  /** The minimised objective (weighted sum of squared residuals). */
  readonly cost: number;
}

function parametersOf(model: MaterialModel): number[] {
  const values: number[] = [];
  mapConstants(model, (value) => values.push(value));
  return values;
}

function withParameters<C>(model: MaterialModel, values: readonly C[]): ModelOf<C> {
  let k = 0;
  return mapConstants(model, () => values[k++]!);
}

/** I₁ at a test point: the bound Gent and Arruda–Boyce constants must clear. */
function firstInvariant({ mode, stretch }: FitPoint): number {
  return modeStretches(mode, new Real(stretch)).reduce((sum, l) => sum + l.re * l.re, 0);
}

/** Why the constants cannot describe all data (Gent Jm > I₁ − 3, Arruda–Boyce N > I₁/3), or null. */
function boundViolation(
  model: MaterialModel,
  maxI1: number,
): { field: string; reason: string } | null {
  if (model.kind === 'gent' && !(model.jm > maxI1 - 3)) {
    return { field: 'jm', reason: `must exceed I1 − 3 = ${maxI1 - 3} at the largest test strain` };
  }
  if (model.kind === 'arruda-boyce' && !(model.n > maxI1 / 3)) {
    return { field: 'n', reason: `must exceed I1/3 = ${maxI1 / 3} at the largest test strain` };
  }
  return null;
}

function checkData(data: readonly FitPoint[], weights: FitOptions['weights']): void {
  if (data.length === 0) throw new EngineInputError('data', 'need at least one test point');
  data.forEach(({ mode, stretch, stress }, i) => {
    if (!MODES.includes(mode))
      throw new EngineInputError(`data[${i}].mode`, `is not a test mode: ${mode}`);
    if (!(Number.isFinite(stretch) && stretch > 0)) {
      throw new EngineInputError(
        `data[${i}].stretch`,
        `must be a finite stretch above 0, got ${stretch}`,
      );
    }
    if (!Number.isFinite(stress)) {
      throw new EngineInputError(`data[${i}].stress`, `must be a finite stress, got ${stress}`);
    }
  });
  for (const [mode, weight] of Object.entries(weights ?? {})) {
    if (!(Number.isFinite(weight) && weight >= 0)) {
      throw new EngineInputError(`weights.${mode}`, `must be a finite weight ≥ 0, got ${weight}`);
    }
  }
}

/** The least-squares problem in the model's constants, residuals scaled by weight and objective. */
function fitProblem(
  shape: MaterialModel,
  points: readonly FitPoint[],
  scales: readonly number[],
  maxI1: number,
): LeastSquaresProblem {
  return {
    evaluate(values) {
      const model = withParameters<number>(shape, values);
      if (boundViolation(model, maxI1)) return null;
      // All constants stepped at once, each on its own unit: one pass per point gives the
      // stress (real part) and its Jacobian row.
      const stepped = withParameters<MultiComplex | number>(shape, MultiComplex.seed(values));
      const residuals: number[] = [];
      const jacobian: number[][] = [];
      for (const [i, p] of points.entries()) {
        const stress = uncheckedStress(stepped, p.mode, new MultiComplex(p.stretch, null));
        const scale = scales[i]!;
        if (!stress.isFinite()) return null;
        residuals.push(scale * (stress.re - p.stress));
        jacobian.push(values.map((_, j) => (scale * stress.part(j)) / STEP));
      }
      return { residuals, jacobian };
    },
  };
}

/** Residual evaluations each Ogden start gets before the best one is carried on. */
const SCREENING_EVALUATIONS = 25;

/** A run continued from where `first` stopped, counted as one. */
function continueFrom(
  first: LevenbergMarquardtResult,
  second: LevenbergMarquardtResult,
): LevenbergMarquardtResult {
  return {
    ...second,
    iterations: first.iterations + second.iterations,
    evaluations: first.evaluations + second.evaluations,
  };
}

/** Exponent sets tried besides the given start for an N-term Ogden fit. */
function ogdenExponentStarts(given: readonly number[]): number[][] {
  const n = given.length;
  const spread = (lo: number, hi: number) =>
    Array.from({ length: n }, (_, p) => {
      const alpha = n === 1 ? 0.5 * (lo + hi) : lo + ((hi - lo) * p) / (n - 1);
      return alpha === 0 ? 0.5 : alpha;
    });
  return [[...given], spread(-2, 5), spread(-1, 8), spread(1, 4)];
}

/** For fixed Ogden exponents P is linear in the μₚ: the least-squares μₚ start the search. */
function ogdenStart(
  alphas: readonly number[],
  points: readonly FitPoint[],
  scales: readonly number[],
): MaterialModel {
  const columns = alphas.map((alpha): MaterialModel => ({
    kind: 'ogden',
    terms: [{ mu: 1, alpha }],
  }));
  const design = points.map((p, i) =>
    columns.map((unit) => scales[i]! * uncheckedStress(unit, p.mode, new Real(p.stretch)).re),
  );
  const mus = linearLeastSquares(
    design,
    points.map((p, i) => scales[i]! * p.stress),
  );
  return { kind: 'ogden', terms: alphas.map((alpha, p) => ({ mu: mus[p]!, alpha })) };
}

function byMode(
  data: readonly FitPoint[],
  f: (points: FitPoint[], predicted: number[]) => number | null,
  model: MaterialModel,
): Partial<Record<Mode, number>> {
  const out: Partial<Record<Mode, number>> = {};
  for (const mode of MODES) {
    const points = data.filter((p) => p.mode === mode);
    if (points.length === 0) continue;
    const predicted = points.map((p) => uncheckedStress(model, mode, new Real(p.stretch)).re);
    const value = f(points, predicted);
    if (value !== null) out[mode] = value;
  }
  return out;
}

function rms(points: FitPoint[], predicted: number[]): number {
  return Math.sqrt(
    points.reduce((s, p, i) => s + (predicted[i]! - p.stress) ** 2, 0) / points.length,
  );
}

function r2(points: FitPoint[], predicted: number[]): number | null {
  const mean = points.reduce((s, p) => s + p.stress, 0) / points.length;
  const total = points.reduce((s, p) => s + (p.stress - mean) ** 2, 0);
  const residual = points.reduce((s, p, i) => s + (predicted[i]! - p.stress) ** 2, 0);
  return total > 0 ? 1 - residual / total : null;
}

/** Fits the constants of `options.model` to the data (REFERENCES §4). */
export function fitModel(options: FitOptions): FitResult {
  const { model: start, data, objective, weights = {}, starts = 'several' } = options;
  checkModel(start);
  checkData(data, weights);
  if (objective !== 'absolute' && objective !== 'relative') {
    throw new EngineInputError('objective', `must be 'absolute' or 'relative', got ${objective}`);
  }
  const points = objective === 'relative' ? data.filter((p) => p.stress !== 0) : [...data];
  const unknowns = parametersOf(start).length;
  if (points.length < unknowns) {
    throw new EngineInputError(
      'data',
      `need at least ${unknowns} points with stress for ${unknowns} constants`,
    );
  }
  const scales = points.map(
    (p) => Math.sqrt(weights[p.mode] ?? 1) / (objective === 'relative' ? Math.abs(p.stress) : 1),
  );
  const maxI1 = Math.max(...data.map(firstInvariant));
  const violation = boundViolation(start, maxI1);
  if (violation) throw new EngineInputError(violation.field, violation.reason);

  const problem = fitProblem(start, points, scales, maxI1);
  const candidates =
    start.kind === 'ogden' && starts === 'several'
      ? [
          start,
          ...ogdenExponentStarts(start.terms.map((t) => t.alpha)).map((a) =>
            ogdenStart(a, points, scales),
          ),
        ]
      : [start];
  // Each start gets a short run; the most promising one is carried on to convergence.
  const screened = candidates.flatMap((candidate) => {
    const x0 = parametersOf(candidate);
    if (!problem.evaluate(x0)) return [];
    return [
      levenbergMarquardt(
        problem,
        x0,
        candidates.length > 1 ? { maxEvaluations: SCREENING_EVALUATIONS } : {},
      ),
    ];
  });
  const leader = screened.reduce((a, b) => (b.cost < a.cost ? b : a));
  const best =
    leader.stopReason === 'max-evaluations' && candidates.length > 1
      ? continueFrom(leader, levenbergMarquardt(problem, leader.x))
      : leader;
  const model = withParameters<number>(start, best.x);
  const mu0 = initialShearModulus(model);
  return {
    model,
    rmsByMode: byMode(data, rms, model),
    r2ByMode: byMode(data, r2, model),
    iterations: best.iterations,
    stopReason: best.stopReason,
    stability: stabilityOf(model),
    mu0,
    e0: 3 * mu0,
    cost: best.cost,
  };
}

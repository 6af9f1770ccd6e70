import { gradientAndHessian, type SecondOrder } from './derivatives.js';
import { EngineInputError } from './errors.js';
import { MODES, type MaterialModel, type Mode } from './material-model.js';
import { Real } from './real.js';
import type { Scalar } from './scalar.js';
import { strainEnergy } from './strain-energy.js';
import { modeStretches } from './stress.js';

/*
 * Drucker stability (Drucker, J. Appl. Mech. 26, 1959 [M]; REFERENCES §4 [D for this form]):
 * with Ŵ(ε₁, ε₂) = W(e^ε₁, e^ε₂, e^(−ε₁−ε₂)) the material is stable where the 2×2 Hessian of
 * Ŵ is positive definite. Checked along each test path, in tension (λ from 1 to 10) and
 * compression (1 down to 0.1), together with the stronger monotonicity dP/dλ > 0.
 */

/** Gradient and Hessian of Ŵ(ε₁, ε₂) at the state of `mode` at `stretch`, by bicomplex step. */
function druckerDerivatives(model: MaterialModel, mode: Mode, stretch: number): SecondOrder {
  const [l1, l2] = modeStretches(mode, new Real(stretch));
  const energy = <T extends Scalar<T>>([e1, e2]: T[]): T =>
    strainEnergy(model, [e1!.exp(), e2!.exp(), e1!.add(e2!).neg().exp()]);
  return gradientAndHessian(energy, [Math.log(l1.re), Math.log(l2.re)]);
}

/** Hessian of Ŵ(ε₁, ε₂) at the state of `mode` at `stretch`. */
export function druckerHessian(model: MaterialModel, mode: Mode, stretch: number): number[][] {
  return druckerDerivatives(model, mode, stretch).hessian;
}

/** Each test moves along ε = ln λ·(1, c) (REFERENCES §2 stretches). */
const PATH_DIRECTION: Readonly<Record<Mode, number>> = {
  uniaxial: -0.5,
  equibiaxial: 1,
  planar: 0,
};

export interface PathStability {
  /** First stretch, going out from λ = 1, where Drucker's condition fails; null if none. */
  readonly firstUnstableStretch: number | null;
  /** First stretch, going out from λ = 1, where dP/dλ ≤ 0; null if none. */
  readonly firstNonMonotonicStretch: number | null;
  /** Where the model stops being defined (Gent, Arruda–Boyce locking), if inside the range. */
  readonly limitStretch: number | null;
}

export type Stability = Readonly<
  Record<Mode, { readonly tension: PathStability; readonly compression: PathStability }>
>;

/** Points over the decade of stretch on each side; a sign change is then refined by bisection. */
const SCAN_POINTS = 40;
const BISECTIONS = 40;

/**
 * Smallest eigenvalue of Ŵ's Hessian, and a quantity with the sign of dP/dλ, or null where the
 * model is undefined. Along ε = ln λ·v, d²W̃/dλ² = (vᵀHv − ∇Ŵ·v)/λ², and P is a positive
 * multiple of dW̃/dλ, so the same evaluations give both checks.
 */
function indicators(model: MaterialModel, mode: Mode, stretch: number): [number, number] | null {
  try {
    const { gradient, hessian } = druckerDerivatives(model, mode, stretch);
    const [[a, b], [, d]] = hessian as [[number, number], [number, number]];
    const [g1, g2] = gradient as [number, number];
    const c = PATH_DIRECTION[mode];
    const eigen = 0.5 * (a + d) - Math.hypot(0.5 * (a - d), b);
    const slope = a + 2 * b * c + d * c * c - (g1 + g2 * c);
    return Number.isFinite(eigen) && Number.isFinite(slope) ? [eigen, slope] : null;
  } catch (error) {
    if (error instanceof EngineInputError) return null;
    throw error;
  }
}

/** The first ln λ in (inside, outside] where `fails` holds, given it holds at outside only. */
function boundary(inside: number, outside: number, fails: (logStretch: number) => boolean): number {
  let [good, bad] = [inside, outside];
  for (let k = 0; k < BISECTIONS; k++) {
    const mid = 0.5 * (good + bad);
    if (fails(mid)) bad = mid;
    else good = mid;
  }
  return Math.exp(bad);
}

function scanPath(model: MaterialModel, mode: Mode, direction: 1 | -1): PathStability {
  const at = (logStretch: number) => indicators(model, mode, Math.exp(logStretch));
  const step = (direction * Math.LN10) / SCAN_POINTS;
  let unstable: number | null = null;
  let nonMonotonic: number | null = null;
  let previous = 0;
  for (let k = 0; k <= SCAN_POINTS; k++) {
    const logStretch = k * step;
    const values = at(logStretch);
    if (values === null) {
      const limit = boundary(previous, logStretch, (s) => at(s) === null);
      return {
        firstUnstableStretch: unstable,
        firstNonMonotonicStretch: nonMonotonic,
        limitStretch: limit,
      };
    }
    const [eigen, slope] = values;
    if (unstable === null && eigen <= 0) {
      unstable = k === 0 ? 1 : boundary(previous, logStretch, (s) => (at(s)?.[0] ?? 0) <= 0);
    }
    if (nonMonotonic === null && slope <= 0) {
      nonMonotonic = k === 0 ? 1 : boundary(previous, logStretch, (s) => (at(s)?.[1] ?? 0) <= 0);
    }
    previous = logStretch;
  }
  return {
    firstUnstableStretch: unstable,
    firstNonMonotonicStretch: nonMonotonic,
    limitStretch: null,
  };
}

/** Drucker stability and monotonicity of P along every test path, λ ∈ [0.1, 10]. */
export function stabilityOf(model: MaterialModel): Stability {
  const entries = MODES.map((mode) => [
    mode,
    { tension: scanPath(model, mode, 1), compression: scanPath(model, mode, -1) },
  ]);
  return Object.fromEntries(entries) as Record<
    Mode,
    { tension: PathStability; compression: PathStability }
  >;
}

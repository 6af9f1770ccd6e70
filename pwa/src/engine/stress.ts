import { derivative } from './derivatives.js';
import { EngineInputError } from './errors.js';
import {
  checkModel,
  mapConstants,
  MODES,
  type MaterialModel,
  type Mode,
  type ModelOf,
} from './material-model.js';
import { Real } from './real.js';
import type { Liftable, Scalar } from './scalar.js';
import { strainEnergy, type Stretches } from './strain-energy.js';

/** Principal stretches of the standard tests at stretch λ (REFERENCES §2). */
export function modeStretches<T extends Scalar<T>>(mode: Mode, l: T): Stretches<T> {
  const one = l.constant(1);
  switch (mode) {
    case 'uniaxial': {
      const lateral = one.div(l.sqrt());
      return [l, lateral, lateral];
    }
    case 'equibiaxial':
      return [l, l, one.div(l.mul(l))];
    case 'planar':
      return [l, one, one.div(l)];
  }
}

/** P = dW̃/dλ in uniaxial and planar tension, ½ dW̃/dλ in equibiaxial (REFERENCES §2). */
const STRESS_FACTOR: Readonly<Record<Mode, number>> = { uniaxial: 1, equibiaxial: 0.5, planar: 1 };

/**
 * Nominal stress without input checks, for loops (fitting) that check their inputs once.
 * The stretch derivative of W is taken in a perturbation unit the stretch and the constants
 * do not use, so their own parts carry through: pass Complex constants or stretch to get
 * ∂P/∂(that quantity) in the imaginary part.
 */
export function uncheckedStress<T extends Liftable<T>>(
  model: ModelOf<T | number>,
  mode: Mode,
  stretch: T,
): T {
  return stretch
    .derivativeOf((l, lift) => strainEnergy(liftedModel(model, lift), modeStretches(mode, l)))
    .mul(STRESS_FACTOR[mode]);
}

/** True when every constant is a plain number: such a model needs no lifting at all. */
function hasOnlyNumbers(value: unknown): boolean {
  if (typeof value !== 'object' || value === null) return true;
  if ('constant' in value) return false;
  return Object.values(value).every(hasOnlyNumbers);
}

/**
 * Models with scalar constants (fit Jacobians, sensitivities) are built for one evaluation pass
 * and then read at many stretches, so their lifted copy is kept per model object; models are
 * values and are never changed in place.
 */
const liftedModels = new WeakMap<object, { lift: unknown; model: unknown }>();

/** The model with its scalar constants brought into the lifted type; numbers stay numbers. */
function liftedModel<T, U>(
  model: ModelOf<T | number>,
  lift: (value: T | number) => U,
): ModelOf<U | number> {
  if (hasOnlyNumbers(model)) return model as ModelOf<number>;
  const cached = liftedModels.get(model);
  // Each scalar type lifts through one fixed function, so the same lift means the same U.
  if (cached?.lift === lift) return cached.model as ModelOf<U | number>;
  const lifted = mapConstants(model, (value) => (typeof value === 'number' ? value : lift(value)));
  liftedModels.set(model, { lift, model: lifted });
  return lifted;
}

/**
 * Nominal stress P (MPa, force per undeformed area) of `model` in `mode` at `stretch`, over
 * Real or Complex: call it with Complex stretch or constants (e.g. from a generic load
 * function under `derivative`) and the imaginary part carries the sensitivity.
 */
export function nominalStressOf<T extends Liftable<T>>(
  model: ModelOf<T | number>,
  mode: Mode,
  stretch: T,
): T {
  checkModel(model);
  if (!MODES.includes(mode)) throw new EngineInputError('mode', `is not a test mode: ${mode}`);
  if (!stretch.isFinite()) throw stretchError(stretch.re);
  requireStretch(stretch.re);
  const stress = uncheckedStress(model, mode, stretch);
  if (!stress.isFinite()) {
    throw new EngineInputError(
      'stretch',
      `is outside the range of the ${model.kind} model in ${mode} (λ = ${stretch.re})`,
    );
  }
  return stress;
}

function stretchError(value: number): EngineInputError {
  return new EngineInputError('stretch', `must be a finite stretch above 0, got ${value}`);
}

function requireStretch(value: number): void {
  if (!(Number.isFinite(value) && value > 0)) throw stretchError(value);
}

/** Nominal stress P (MPa) at `stretch`. */
export function nominalStress(model: MaterialModel, mode: Mode, stretch: number): number {
  return nominalStressOf(model, mode, new Real(stretch)).re;
}

/** Tangent dP/dλ (MPa) at `stretch`: the second stretch derivative of W. */
export function tangentStiffness(model: MaterialModel, mode: Mode, stretch: number): number {
  requireStretch(stretch);
  return derivative((l) => nominalStressOf(model, mode, l), stretch);
}

/** Initial shear modulus μ₀ (MPa): E₀/3, with E₀ the uniaxial tangent at λ = 1. */
export function initialShearModulus(model: MaterialModel): number {
  return tangentStiffness(model, 'uniaxial', 1) / 3;
}

/** Initial Young's modulus E₀ = 3μ₀ (MPa), incompressible. */
export function initialYoungsModulus(model: MaterialModel): number {
  return 3 * initialShearModulus(model);
}

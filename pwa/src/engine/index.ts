// Public API of the engine. Several modules add to this file: edit it additively.

export {
  EngineInputError,
  requireFinite,
  requireInRange,
  requireNonNegative,
  requirePositive,
} from './errors.js';

// Derivative core (REFERENCES §1)
export { STEP, type Liftable, type LiftedFunction, type Scalar } from './scalar.js';
export { Real } from './real.js';
export { Complex } from './complex.js';
export { Bicomplex } from './bicomplex.js';
export { derivative, gradient, hessian, secondDerivative } from './derivatives.js';

// Material models written as strain energies (REFERENCES §2)
export {
  MODES,
  type MaterialModel,
  type Mode,
  type ModelKind,
  type ModelOf,
  type OgdenTerm,
} from './material-model.js';
export { checkFormula, type FormulaCheck } from './formula.js';
export { strainEnergy, type Stretches } from './strain-energy.js';
export {
  initialShearModulus,
  initialYoungsModulus,
  modeStretches,
  nominalStress,
  nominalStressOf,
  tangentStiffness,
} from './stress.js';

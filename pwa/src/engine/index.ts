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
export {
  derivative,
  gradient,
  gradientAndHessian,
  hessian,
  secondDerivative,
  type SecondOrder,
} from './derivatives.js';

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

// Fitting and material stability (REFERENCES §4)
export {
  fitModel,
  type FitObjective,
  type FitOptions,
  type FitPoint,
  type FitResult,
} from './fit.js';
export { type StopReason } from './levenberg-marquardt.js';
export { druckerHessian, stabilityOf, type PathStability, type Stability } from './stability.js';

// Compression set and aging (REFERENCES §7)
export { compressionSetPercent, type CompressionSetReading } from './compression-set.js';
export {
  GAS_CONSTANT,
  accelerationFactor,
  arrheniusFit,
  arrheniusLife,
  expectedCompressionSet,
  highestTemperatureForLife,
  type AgingPoint,
  type ArrheniusFit,
  type LifePrediction,
} from './arrhenius.js';

// Quality: tolerances, sampling, control charts (REFERENCES §8–§10)
export { moldedTolerance, type DimensionKind, type ToleranceClass } from './molded-tolerance.js';
export {
  PREFERRED_AQLS,
  acceptOneStepTighter,
  acceptanceProbability,
  codeLetterFor,
  lotDecision,
  masterTableCell,
  samplingPlan,
  type CodeLetter,
  type InspectionLevel,
  type InspectionSeverity,
  type LotDecision,
  type LotDecisionResult,
  type MasterTableCell,
  type SamplingPlan,
  type SamplingPlanInput,
} from './sampling.js';
export {
  initialSwitchingState,
  nextSwitchingState,
  resumeAfterCorrectiveAction,
  type LotOutcome,
  type SwitchingState,
} from './switching-rules.js';
export { XBAR_R_CONSTANTS, xbarRLimits, type XbarRLimits } from './control-charts.js';
export {
  capabilityIndices,
  type CapabilityIndices,
  type SpecificationLimits,
} from './capability.js';
export { binomialCdf, studentTCdf, studentTTwoSided } from './statistics.js';

// Part mechanics: shape factor, hardness, compression modulus, expected load (REFERENCES §5–§6)
export {
  dimensionNames,
  loadedArea,
  loadedAreaOf,
  shapeFactor,
  shapeFactorOf,
  type DimensionName,
  type Geometry,
  type GeometryOf,
  type Shape,
} from './geometry.js';
export {
  GENT_SHORE_A,
  LINDLEY_NATURAL_RUBBER,
  RELIABLE_SHORE_A,
  materialFactorOf,
  medianHardness,
  youngsModulusFromShoreA,
  youngsModulusFromShoreAOf,
  type HardnessDefaults,
  type HardnessDefaultsRow,
} from './hardness.js';
export {
  DEFAULT_BULK_CORRECTION,
  annulusHoleFactorOf,
  apparentCompressionModulus,
  apparentCompressionModulusOf,
  withBulkCompressibilityOf,
  type BulkCorrection,
  type CompressionModulusInput,
  type Faces,
} from './compression-modulus.js';
export {
  expectedLoad,
  loadOf,
  prepareLoadCase,
  type ExpectedLoad,
  type FaceCondition,
  type LoadCase,
  type LoadEstimate,
  type LoadVariables,
  type PreparedLoadCase,
  type ValidityCode,
  type ValidityFlag,
} from './expected-load.js';
export {
  WINDOW_TOLERANCE,
  acceptanceWindows,
  loadLimits,
  type AcceptanceWindows,
  type LoadTolerance,
  type WindowEdge,
} from './acceptance-windows.js';

// Part specs, measurements and verdicts: plain JSON shared by tablet, desk and server
export {
  specLoadCase,
  specLoadTolerance,
  type DefectLocation,
  type DefectRecord,
  type DefectSeverity,
  type DimensionClass,
  type PartMeasurement,
  type PartSpec,
} from './part-spec.js';
export {
  lotVerdict,
  partVerdict,
  prepareSpec,
  type Characteristic,
  type CharacteristicVerdict,
  type LotVerdict,
  type PartVerdict,
  type PreparedSpec,
  type VerdictOptions,
  type VerdictStatus,
} from './verdict.js';

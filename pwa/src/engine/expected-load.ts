import { Complex } from './complex.js';
import {
  DEFAULT_BULK_CORRECTION,
  apparentCompressionModulusOf,
  checkCompressionOptions,
  type BulkCorrection,
  type Faces,
} from './compression-modulus.js';
import { derivative, gradient } from './derivatives.js';
import { EngineInputError, requireFinite, requireNonNegative } from './errors.js';
import {
  checkGeometry,
  dimensionNames,
  loadedAreaOf,
  mapDimensions,
  shapeFactorOf,
  type DimensionName,
  type Geometry,
  type GeometryOf,
} from './geometry.js';
import {
  GENT_SHORE_A,
  LINDLEY_NATURAL_RUBBER,
  checkShoreA,
  insideDefaults,
  materialFactorOf,
  youngsModulusFromShoreA,
  youngsModulusFromShoreAOf,
  type HardnessDefaults,
} from './hardness.js';
import { checkModel, type MaterialModel } from './material-model.js';
import { Real } from './real.js';
import type { Liftable } from './scalar.js';
import { initialYoungsModulus, uncheckedStress } from './stress.js';

/**
 * How the part meets the test plates. 'unbonded' faces are held by friction, somewhere between
 * lubricated and bonded: the estimate is the pair of bounds, with no invented factor between
 * them (REFERENCES §5).
 */
export type FaceCondition = Faces | 'unbonded';

/** A compression load test of one part at one deflection. */
export interface LoadCase {
  geometry: Geometry;
  faces: FaceCondition;
  /** The compound's fitted model: it gives P(λ). */
  model: MaterialModel;
  /** Shore A hardness the fitted compound has (the spec's nominal). */
  nominalHardness: number;
  /** This part's hardness, Shore A; the nominal when not measured. */
  hardness?: number;
  /** Test deflection, mm; positive squeezes, negative pulls (bonded parts only). */
  deflection: number;
  /** Bulk modulus K, MPa; the hardness defaults' value when not given. */
  bulkModulus?: number;
  bulkCorrection?: BulkCorrection;
  /** Lindley's k; by default read from the hardness defaults at the part's hardness. */
  materialFactor?: number;
  hardnessDefaults?: HardnessDefaults;
}

export type ValidityCode =
  | 'shape-factor-range'
  | 'strain-over-15-percent'
  | 'tension-in-bonded-part'
  | 'hardness-outside-gent-range'
  | 'material-factor-held';

export interface ValidityFlag {
  code: ValidityCode;
  message: string;
}

/** The load for one face condition, N (per mm of length for a strip without a length). */
export interface LoadEstimate {
  load: number;
  /** dF/dδ, N/mm. */
  stiffness: number;
  /** ∂F/∂(dimension) in N/mm and ∂F/∂hardness in N per Shore A point. */
  sensitivities: Partial<Record<DimensionName | 'hardness', number>>;
  /** Φ = E_c/E₀, the shape-factor amplification (1 with lubricated faces). */
  shapeAmplification: number;
  /** E_c of the part at its hardness, MPa. */
  compressionModulus: number;
}

export interface ExpectedLoad {
  /** The lower and upper estimate: the same for bonded or lubricated faces. */
  low: LoadEstimate;
  high: LoadEstimate;
  shapeFactor: number;
  loadedArea: number;
  /** Compressive strain δ/t. */
  strain: number;
  flags: ValidityFlag[];
}

/** A load case checked once, with what every evaluation of it shares. */
export interface PreparedLoadCase {
  readonly source: LoadCase;
  readonly hardness: number;
  readonly bulkModulus: number;
  readonly bulkCorrection: BulkCorrection;
  readonly defaults: HardnessDefaults;
  /** E₀ of the fitted model, MPa, and Gent's E₀ at the nominal hardness. */
  readonly modelModulus: number;
  readonly gentNominal: number;
}

/** The quantities a load can be differentiated with respect to. */
export interface LoadVariables<T> {
  geometry: GeometryOf<T>;
  hardness: T;
  deflection: T;
}

export function prepareLoadCase(input: LoadCase): PreparedLoadCase {
  checkGeometry(input.geometry);
  checkModel(input.model);
  if (!['bonded', 'lubricated', 'unbonded'].includes(input.faces)) {
    throw new EngineInputError(
      'faces',
      `must be bonded, lubricated or unbonded, got ${input.faces}`,
    );
  }
  const defaults = input.hardnessDefaults ?? LINDLEY_NATURAL_RUBBER;
  const bulkModulus = input.bulkModulus ?? defaults.bulkModulus;
  const bulkCorrection = input.bulkCorrection ?? DEFAULT_BULK_CORRECTION;
  checkCompressionOptions({ faces: 'bonded', bulkModulus, bulkCorrection });
  if (input.materialFactor !== undefined)
    requireNonNegative('materialFactor', input.materialFactor);
  const nominalHardness = checkShoreA('nominalHardness', input.nominalHardness);
  const hardness = checkShoreA('hardness', input.hardness ?? nominalHardness);
  const { deflection } = input;
  if (requireFinite('deflection', deflection) === 0) {
    throw new EngineInputError('deflection', 'must not be 0: there is no load to check');
  }
  if (deflection >= input.geometry.thickness) {
    throw new EngineInputError(
      'deflection',
      `must be below the thickness ${input.geometry.thickness} mm`,
    );
  }
  if (deflection < 0 && input.faces !== 'bonded') {
    throw new EngineInputError('deflection', 'only a bonded part can be pulled in tension');
  }
  const modelModulus = initialYoungsModulus(input.model);
  if (!(modelModulus > 0)) {
    throw new EngineInputError(
      'model',
      `has no positive initial modulus (E₀ = ${modelModulus} MPa)`,
    );
  }
  return {
    source: input,
    hardness,
    bulkModulus,
    bulkCorrection,
    defaults,
    modelModulus,
    gentNominal: youngsModulusFromShoreA(nominalHardness),
  };
}

interface LoadTerms<T> {
  /** E₀ of this part, MPa: the model's, scaled by the hardness ratio. */
  youngsModulus: T;
  /** E_c of this part, MPa. */
  compressionModulus: T;
  load: T;
}

/**
 * F(δ) = A·Φ·|P(λ)|·r, λ = 1 − δ/t (REFERENCES §5, an estimate beyond ~15 % strain). P comes from
 * the compound's fitted model; r = E_Gent(H)/E_Gent(H_nominal) carries the part's measured
 * hardness (Gent 1958), so a harder part is stiffer by the ratio Gent's relation gives while the
 * shape of the curve stays the fitted one. E₀·r also sets Φ, whose bulk correction and k depend
 * on the modulus itself. Written once over the scalar interface: Real gives the load, Complex
 * its derivatives.
 */
function loadTermsOf<T extends Liftable<T>>(
  prepared: PreparedLoadCase,
  faces: Faces,
  { geometry, hardness, deflection }: LoadVariables<T>,
): LoadTerms<T> {
  const { source } = prepared;
  const stretch = deflection.div(geometry.thickness).neg().add(1);
  const ratio = youngsModulusFromShoreAOf(hardness).div(prepared.gentNominal);
  const youngsModulus = ratio.mul(prepared.modelModulus);
  const compressionModulus = apparentCompressionModulusOf({
    geometry,
    faces,
    youngsModulus,
    materialFactor: source.materialFactor ?? materialFactorOf(hardness, prepared.defaults),
    bulkModulus: prepared.bulkModulus,
    bulkCorrection: prepared.bulkCorrection,
  });
  const stress = uncheckedStress(source.model, 'uniaxial', stretch);
  if (!stress.isFinite()) {
    throw new EngineInputError(
      'deflection',
      `takes the ${source.model.kind} model outside its range (λ = ${stretch.re})`,
    );
  }
  const amplification = compressionModulus.div(youngsModulus);
  return {
    youngsModulus,
    compressionModulus,
    load: loadedAreaOf(geometry).mul(amplification).mul(stress.abs()).mul(ratio),
  };
}

/** The expected load F over any scalar type (see loadTermsOf). */
export function loadOf<T extends Liftable<T>>(
  prepared: PreparedLoadCase,
  faces: Faces,
  variables: LoadVariables<T>,
): T {
  return loadTermsOf(prepared, faces, variables).load;
}

/** The case's own values as plain variables. */
export function caseVariables(prepared: PreparedLoadCase): LoadVariables<number> {
  return {
    geometry: prepared.source.geometry,
    hardness: prepared.hardness,
    deflection: prepared.source.deflection,
  };
}

/** Lift plain variables into a scalar type via its constant maker. */
export function liftVariables<T>(
  variables: LoadVariables<number>,
  make: (value: number) => T,
): LoadVariables<T> {
  return {
    geometry: mapDimensions(variables.geometry, make),
    hardness: make(variables.hardness),
    deflection: make(variables.deflection),
  };
}

/** The face conditions giving the low and the high estimate. */
export function boundingFaces(faces: FaceCondition): [Faces, Faces] {
  return faces === 'unbonded' ? ['lubricated', 'bonded'] : [faces, faces];
}

function estimate(prepared: PreparedLoadCase, faces: Faces): LoadEstimate {
  const variables = caseVariables(prepared);
  const terms = loadTermsOf(
    prepared,
    faces,
    liftVariables(variables, (v) => new Real(v)),
  );
  const complex = liftVariables(variables, (v) => new Complex(v, 0));
  const stiffness = derivative(
    (deflection) => loadOf(prepared, faces, { ...complex, deflection }),
    variables.deflection,
  );
  // Gradient over the geometry's dimensions and the hardness, in that order.
  const names = dimensionNames(variables.geometry);
  const record = variables.geometry as unknown as Record<DimensionName, number>;
  const grad = gradient(
    (xs) =>
      loadOf(prepared, faces, {
        ...complex,
        geometry: mapDimensions(
          variables.geometry,
          (_, name) => xs[names.indexOf(name)] as Complex,
        ),
        hardness: xs[names.length] as Complex,
      }),
    [...names.map((n) => record[n]), variables.hardness],
  );
  return {
    load: terms.load.re,
    stiffness,
    sensitivities: Object.fromEntries([...names, 'hardness'].map((n, i) => [n, grad[i] ?? 0])),
    shapeAmplification: terms.compressionModulus.re / terms.youngsModulus.re,
    compressionModulus: terms.compressionModulus.re,
  };
}

function validityFlags(
  prepared: PreparedLoadCase,
  shapeFactor: number,
  strain: number,
): ValidityFlag[] {
  const { source, hardness, defaults } = prepared;
  const flags: ValidityFlag[] = [];
  const percent = (v: number) => `${(v * 100).toFixed(1)} %`;
  if (shapeFactor < 0.5 || shapeFactor > 20) {
    flags.push({
      code: 'shape-factor-range',
      message: `shape factor ${shapeFactor.toFixed(2)} is outside 0.5–20, where the compression formulas hold`,
    });
  }
  if (Math.abs(strain) > 0.15) {
    flags.push({
      code: 'strain-over-15-percent',
      message: `strain ${percent(Math.abs(strain))} is over 15 %: the load is an estimate there`,
    });
  }
  if (strain < 0) {
    flags.push({
      code: 'tension-in-bonded-part',
      message:
        'the bonded part is in tension: bonded rubber risks internal rupture near 5E/6 (Gent & Lindley 1959)',
    });
  }
  if (hardness < GENT_SHORE_A.min || hardness > GENT_SHORE_A.max) {
    flags.push({
      code: 'hardness-outside-gent-range',
      message: `hardness ${hardness} Shore A is outside 20–80, where Gent's hardness–modulus relation holds`,
    });
  }
  if (source.materialFactor === undefined && !insideDefaults(hardness, defaults)) {
    flags.push({
      code: 'material-factor-held',
      message: `hardness ${hardness} Shore A is outside the material-factor table; its end value is used`,
    });
  }
  return flags;
}

/** Expected load at the test deflection with stiffness, sensitivities and validity flags. */
export function expectedLoad(input: LoadCase): ExpectedLoad {
  const prepared = prepareLoadCase(input);
  const [lowFaces, highFaces] = boundingFaces(input.faces);
  const low = estimate(prepared, lowFaces);
  const high = highFaces === lowFaces ? low : estimate(prepared, highFaces);
  const shapeFactor = shapeFactorOf(mapDimensions(input.geometry, (v) => new Real(v))).re;
  const strain = input.deflection / input.geometry.thickness;
  return {
    low,
    high,
    shapeFactor,
    loadedArea: loadedAreaOf(mapDimensions(input.geometry, (v) => new Real(v))).re,
    strain,
    flags: validityFlags(prepared, shapeFactor, strain),
  };
}

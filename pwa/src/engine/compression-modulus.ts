import { EngineInputError, requireNonNegative, requirePositive } from './errors.js';
import {
  checkGeometry,
  mapDimensions,
  shapeFactorOf,
  type Geometry,
  type GeometryOf,
} from './geometry.js';
import { Real } from './real.js';
import type { Scalar } from './scalar.js';

/** How the rubber meets the plates: bonded to them, or free to slide (lubricated). */
export type Faces = 'bonded' | 'lubricated';

/**
 * Bulk-compressibility correction of a bonded block (REFERENCES §5): 'gent-lindley' is
 * 1/E_c′ = 1/E_c + 1/K (Gent & Lindley 1959); 'lubrication' is 1/E_c′ = 1/E_c + 4/(3K), the
 * lubrication-theory form, which is closer to the exact disc solution (G 1, K 2000, S 10:
 * exact 429.99, 4/(3K) 428.57, 1/K 461.54 MPa) and is therefore the default.
 */
export type BulkCorrection = 'none' | 'gent-lindley' | 'lubrication';
export const DEFAULT_BULK_CORRECTION: BulkCorrection = 'lubrication';
const BULK_FACTOR: Readonly<Record<BulkCorrection, number>> = {
  none: 0,
  'gent-lindley': 1,
  lubrication: 4 / 3,
};

export interface CompressionModulusInputOf<T> {
  geometry: GeometryOf<T>;
  faces: Faces;
  /** E₀ of the rubber, MPa. */
  youngsModulus: T;
  /** Lindley's material factor k. */
  materialFactor: T | number;
  /** K, MPa. */
  bulkModulus: number;
  bulkCorrection: BulkCorrection;
}

export type CompressionModulusInput = CompressionModulusInputOf<number>;

/**
 * Hole factor of an annulus, F = (r² + 1)/(r − 1)² + (1 + r)/((1 − r) ln r) with r = Dₒ/Dᵢ
 * (bearing literature after Constantinou et al., REFERENCES §5): the share of a full disc's
 * bulging stiffness an annulus of the same S keeps, 1 without a hole.
 */
export function annulusHoleFactorOf<T extends Scalar<T>>(ratio: T): T {
  const rm1 = ratio.sub(1);
  return ratio
    .mul(ratio)
    .add(1)
    .div(rm1.mul(rm1))
    .add(ratio.add(1).div(rm1.neg().mul(ratio.log())));
}

/**
 * E_c of an incompressible bonded block: E₀(1 + 2kS²) for discs, squares and moderate
 * rectangles (Gent & Lindley 1959, k from Lindley 1978); (4/3)E₀(1 + kS²) for a long strip; for
 * an annulus the shape term carries the hole factor, E₀(1 + 2kS²F), which tends to the bearing
 * form 6GS²F at large S [D].
 */
function incompressibleModulusOf<T extends Scalar<T>>(
  geometry: GeometryOf<T>,
  e0: T,
  k: T | number,
): T {
  const s = shapeFactorOf(geometry);
  const s2k = s.mul(s).mul(k);
  switch (geometry.shape) {
    case 'strip':
      return s2k
        .add(1)
        .mul(e0)
        .mul(4 / 3);
    case 'annulus': {
      const hole = annulusHoleFactorOf(geometry.outerDiameter.div(geometry.innerDiameter));
      return s2k.mul(hole).mul(2).add(1).mul(e0);
    }
    default:
      return s2k.mul(2).add(1).mul(e0);
  }
}

/** E_c′ from an incompressible E_c with the chosen bulk correction. */
export function withBulkCompressibilityOf<T extends Scalar<T>>(
  incompressible: T,
  bulkModulus: number,
  correction: BulkCorrection,
): T {
  const factor = BULK_FACTOR[correction];
  return factor === 0
    ? incompressible
    : incompressible.constant(1).div(
        incompressible
          .constant(1)
          .div(incompressible)
          .add(factor / bulkModulus),
      );
}

/** Apparent compression modulus (MPa) of the block; lubricated faces leave E₀ (no bulging constraint). */
export function apparentCompressionModulusOf<T extends Scalar<T>>(
  input: CompressionModulusInputOf<T>,
): T {
  if (input.faces === 'lubricated') return input.youngsModulus;
  return withBulkCompressibilityOf(
    incompressibleModulusOf(input.geometry, input.youngsModulus, input.materialFactor),
    input.bulkModulus,
    input.bulkCorrection,
  );
}

/** Throws EngineInputError unless the non-geometric inputs are physical. */
export function checkCompressionOptions(input: {
  faces: Faces;
  bulkModulus: number;
  bulkCorrection: BulkCorrection;
}): void {
  if (input.faces !== 'bonded' && input.faces !== 'lubricated') {
    throw new EngineInputError('faces', `must be 'bonded' or 'lubricated', got ${input.faces}`);
  }
  requirePositive('bulkModulus', input.bulkModulus);
  if (!Object.hasOwn(BULK_FACTOR, input.bulkCorrection)) {
    throw new EngineInputError(
      'bulkCorrection',
      `must be 'none', 'gent-lindley' or 'lubrication', got ${input.bulkCorrection}`,
    );
  }
}

/** Apparent compression modulus (MPa) for plain numbers, inputs checked. */
export function apparentCompressionModulus(input: CompressionModulusInput): number {
  checkGeometry(input.geometry);
  checkCompressionOptions(input);
  requirePositive('youngsModulus', input.youngsModulus);
  requireNonNegative('materialFactor', input.materialFactor);
  const geometry: Geometry = input.geometry;
  return apparentCompressionModulusOf({
    ...input,
    geometry: mapDimensions(geometry, (v) => new Real(v)),
    youngsModulus: new Real(input.youngsModulus),
  }).re;
}

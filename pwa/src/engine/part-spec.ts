import type { LoadTolerance } from './acceptance-windows.js';
import type { BulkCorrection } from './compression-modulus.js';
import { EngineInputError, requireFinite } from './errors.js';
import type { LoadCase } from './expected-load.js';
import type { DimensionName, Geometry } from './geometry.js';
import type { MaterialModel } from './material-model.js';
import type { DimensionKind, ToleranceClass } from './molded-tolerance.js';

/*
 * The shapes the tablet, the desk and the server exchange: plain JSON-serialisable objects.
 * A PartSpec is a released spec body (api/src/ROUTES.md SpecBody) with the compound's fitted
 * model and bulk modulus copied in, so the engine needs nothing else.
 */

export interface DimensionClass {
  class: ToleranceClass;
  kind: DimensionKind;
}

export interface PartSpec {
  /** Nominal dimensions, mm. */
  geometry: Geometry;
  bonded: boolean;
  /**
   * How unbonded faces meet the test plates: 'friction' (default) gives the lubricated and
   * bonded estimates as bounds; 'lubricated' when the test lubricates them.
   */
  unbondedFaces?: 'friction' | 'lubricated';
  /** The compound's fitted model, and the hardness it was fitted at is `hardness.nominal`. */
  model: MaterialModel;
  bulkModulusMPa?: number | null;
  /** mm, positive in compression. */
  testDeflection: number;
  /** ± percent of the expected load. */
  loadTolerancePercent: number;
  /** A dimension not listed in `dimensions` takes `class` as a fixed dimension. */
  tolerance: { class: ToleranceClass; dimensions?: Partial<Record<DimensionName, DimensionClass>> };
  /** Shore A, ± points. */
  hardness: { nominal: number; tolerance: number };
  compressionSetLimitPercent?: number;
  /** Engineering choices, with the engine's documented defaults. */
  mechanics?: { bulkCorrection?: BulkCorrection; materialFactor?: number };
}

export type DefectLocation = 'sealing' | 'flexing' | 'protecting' | 'cosmetic';
export type DefectSeverity = 'critical' | 'major' | 'minor';

/** A visual defect, classed by the function of the surface it is on (after MIL-STD-407). */
export interface DefectRecord {
  /** Trade term: flash, off-register, backrind, non-fill, void, blister, bond failure, … */
  type: string;
  location: DefectLocation;
  severity: DefectSeverity;
  sizeMm?: number | null;
}

/** What was measured on one sampled part; anything not measured is left out. */
export interface PartMeasurement {
  thickness?: number;
  dimensions?: Partial<Record<Exclude<DimensionName, 'thickness'>, number>>;
  /** Shore A readings; the median counts (3 or 5 readings). */
  hardness?: number[];
  /** N at the test deflection. */
  load?: number;
  compressionSetPercent?: number;
  defects?: DefectRecord[];
}

/** The load tolerance as percent below and above. */
export function specLoadTolerance(spec: PartSpec): LoadTolerance {
  const percent = spec.loadTolerancePercent;
  if (!(requireFinite('loadTolerancePercent', percent) >= 0 && percent < 100)) {
    throw new EngineInputError(
      'loadTolerancePercent',
      `must lie in 0 up to below 100 %, got ${percent}`,
    );
  }
  return { minusPercent: percent, plusPercent: percent };
}

/** The spec's load test as a load case, at the spec's nominal hardness unless one is given. */
export function specLoadCase(spec: PartSpec, hardness?: number, geometry?: Geometry): LoadCase {
  const { unbondedFaces = 'friction' } = spec;
  if (unbondedFaces !== 'friction' && unbondedFaces !== 'lubricated') {
    throw new EngineInputError('unbondedFaces', `must be 'friction' or 'lubricated'`);
  }
  return {
    geometry: geometry ?? spec.geometry,
    faces: spec.bonded ? 'bonded' : unbondedFaces === 'friction' ? 'unbonded' : 'lubricated',
    model: spec.model,
    nominalHardness: spec.hardness.nominal,
    hardness,
    deflection: spec.testDeflection,
    bulkModulus: spec.bulkModulusMPa ?? undefined,
    bulkCorrection: spec.mechanics?.bulkCorrection,
    materialFactor: spec.mechanics?.materialFactor,
  };
}

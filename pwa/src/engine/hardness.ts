import { EngineInputError, requireFinite } from './errors.js';
import { Real } from './real.js';
import type { Scalar } from './scalar.js';

/** Shore A readings are reliable only in this span (REFERENCES §6 [S]). */
export const RELIABLE_SHORE_A = { min: 20, max: 90 } as const;
/** Gent's relation is meant for about this span (REFERENCES §6). */
export const GENT_SHORE_A = { min: 20, max: 80 } as const;

/** Throws unless 0 ≤ shoreA < 100 (at 100 the Gent relation has no finite modulus). */
export function checkShoreA(field: string, shoreA: number): number {
  if (!(requireFinite(field, shoreA) >= 0 && shoreA < 100)) {
    throw new EngineInputError(
      field,
      `must be a Shore A hardness from 0 up to below 100, got ${shoreA}`,
    );
  }
  return shoreA;
}

/**
 * Young's modulus (MPa) from Shore A hardness, Gent 1958 (Trans. IRI 34:46–57):
 * E = 0.0981(56 + 7.62336 S) / (0.137505(254 − 2.54 S)). An estimate, ±30 % between compounds.
 */
export function youngsModulusFromShoreAOf<T extends Scalar<T>>(shoreA: T): T {
  return shoreA.mul(7.62336).add(56).mul(0.0981).div(shoreA.mul(-2.54).add(254).mul(0.137505));
}

/** Young's modulus (MPa) from a Shore A hardness (Gent 1958). */
export function youngsModulusFromShoreA(shoreA: number): number {
  return youngsModulusFromShoreAOf(new Real(checkShoreA('shoreA', shoreA))).re;
}

export interface HardnessDefaultsRow {
  shoreA: number;
  youngsModulus: number;
  shearModulus: number;
  /** Lindley's material factor k in E_c = E₀(1 + 2kS²). */
  materialFactor: number;
}

/** Hardness-indexed defaults for a family of compounds: data an engineer may replace. */
export interface HardnessDefaults {
  source: string;
  /** False until someone has checked the numbers against the original. */
  verified: boolean;
  rows: readonly HardnessDefaultsRow[];
  /** Bulk modulus used when the compound gives none, MPa. */
  bulkModulus: number;
}

/**
 * Lindley, Engineering Design with Natural Rubber (MRPRA 1978), natural rubber, IRHD ≈ Shore A —
 * REFERENCES §5 [M], recalled from memory and unverified. Bulk modulus: middle of the quoted
 * 1000–1300 MPa.
 */
export const LINDLEY_NATURAL_RUBBER: HardnessDefaults = {
  source: 'Lindley 1978, natural rubber (recalled from memory, unverified)',
  verified: false,
  rows: [
    { shoreA: 30, youngsModulus: 0.92, shearModulus: 0.3, materialFactor: 0.93 },
    { shoreA: 40, youngsModulus: 1.5, shearModulus: 0.45, materialFactor: 0.85 },
    { shoreA: 50, youngsModulus: 2.2, shearModulus: 0.64, materialFactor: 0.73 },
    { shoreA: 60, youngsModulus: 4.45, shearModulus: 1.06, materialFactor: 0.57 },
    { shoreA: 70, youngsModulus: 7.35, shearModulus: 1.73, materialFactor: 0.53 },
  ],
  bulkModulus: 1150,
};

function tableEnds(defaults: HardnessDefaults): [HardnessDefaultsRow, HardnessDefaultsRow] {
  const first = defaults.rows[0];
  const last = defaults.rows.at(-1);
  if (!first || !last) throw new EngineInputError('rows', 'the hardness table is empty');
  return [first, last];
}

/**
 * Material factor k at a hardness, linear between the table's rows (in ascending hardness) and
 * held at the end rows outside them (the caller flags that), evaluated in T so hardness
 * sensitivities carry through.
 */
export function materialFactorOf<T extends Scalar<T>>(shoreA: T, defaults: HardnessDefaults): T {
  const [first, last] = tableEnds(defaults);
  if (shoreA.le(first.shoreA)) return shoreA.constant(first.materialFactor);
  if (shoreA.ge(last.shoreA)) return shoreA.constant(last.materialFactor);
  const upper = defaults.rows.findIndex((row) => shoreA.lt(row.shoreA));
  const hi = defaults.rows[upper] ?? last;
  const lo = defaults.rows[upper - 1] ?? first;
  const slope = (hi.materialFactor - lo.materialFactor) / (hi.shoreA - lo.shoreA);
  return shoreA.sub(lo.shoreA).mul(slope).add(lo.materialFactor);
}

/** Whether a hardness lies inside the table's rows (outside, k is held at the end value). */
export function insideDefaults(shoreA: number, defaults: HardnessDefaults): boolean {
  const [first, last] = tableEnds(defaults);
  return shoreA >= first.shoreA && shoreA <= last.shoreA;
}

/** Median of hardness readings (the practice of 3 or 5 readings, REFERENCES §6). */
export function medianHardness(readings: readonly number[]): number {
  if (readings.length === 0) throw new EngineInputError('hardness', 'need at least one reading');
  readings.forEach((r, i) => checkShoreA(`hardness[${i}]`, r));
  const sorted = [...readings].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? (sorted[mid] ?? 0) : ((sorted[mid - 1] ?? 0) + (sorted[mid] ?? 0)) / 2;
}

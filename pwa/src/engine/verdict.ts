import { loadLimits, type LoadTolerance } from './acceptance-windows.js';
import { EngineInputError, requireInRange, requireNonNegative, requirePositive } from './errors.js';
import {
  boundingFaces,
  expectedLoad,
  liftVariables,
  loadOf,
  prepareLoadCase,
  type ExpectedLoad,
  type PreparedLoadCase,
  type ValidityFlag,
} from './expected-load.js';
import {
  checkGeometry,
  dimensionNames,
  mapDimensions,
  type DimensionName,
  type Geometry,
} from './geometry.js';
import { RELIABLE_SHORE_A, medianHardness } from './hardness.js';
import { moldedTolerance } from './molded-tolerance.js';
import {
  specLoadCase,
  specLoadTolerance,
  type DefectRecord,
  type PartMeasurement,
  type PartSpec,
} from './part-spec.js';
import { Real } from './real.js';
import { lotDecision, type LotDecision, type SamplingPlan } from './sampling.js';

export type VerdictStatus = 'within' | 'near' | 'out';
export type Characteristic = 'load' | 'hardness' | DimensionName | 'compression-set' | 'defects';

export interface CharacteristicVerdict {
  characteristic: Characteristic;
  status: VerdictStatus;
  measured: number | null;
  nominal: number | null;
  lower: number | null;
  upper: number | null;
  unit: 'N' | 'mm' | 'Shore A' | '%' | null;
  /** In words and numbers, for the inspector. */
  reason: string;
}

/**
 * Part rule: a part is nonconforming when any characteristic is out or it carries a critical or
 * major defect; a minor defect alone marks it near but conforming.
 */
export interface PartVerdict {
  status: VerdictStatus;
  conforming: boolean;
  characteristics: CharacteristicVerdict[];
  criticalDefects: number;
  /** Where the load estimate is outside its validity (from the nominal part). */
  flags: ValidityFlag[];
}

export interface VerdictOptions {
  /** Near the limit = inside this share of the band's width next to a limit. Default 0.1. */
  nearFraction?: number;
}

/** A spec with what every part's verdict shares worked out once. */
export interface PreparedSpec {
  spec: PartSpec;
  nearFraction: number;
  tolerance: LoadTolerance;
  expected: ExpectedLoad;
  lowerLoad: number;
  upperLoad: number;
  /** The nominal load case, checked: each part's own expectation varies only its variables. */
  loadCase: PreparedLoadCase;
}

export function prepareSpec(spec: PartSpec, options: VerdictOptions = {}): PreparedSpec {
  const nearFraction = requireInRange('nearFraction', options.nearFraction ?? 0.1, 0, 0.5);
  const tolerance = specLoadTolerance(spec);
  requirePositive('hardness.tolerance', spec.hardness.tolerance);
  const loadCase = specLoadCase(spec);
  const expected = expectedLoad(loadCase);
  if (spec.compressionSetLimitPercent !== undefined) {
    requireInRange('compressionSetLimitPercent', spec.compressionSetLimitPercent, 0, 100);
  }
  return {
    spec,
    nearFraction,
    tolerance,
    expected,
    ...loadLimits(expected, tolerance),
    loadCase: prepareLoadCase(loadCase),
  };
}

function classify(
  value: number,
  lower: number | null,
  upper: number | null,
  nearFraction: number,
): VerdictStatus {
  if ((lower !== null && value < lower) || (upper !== null && value > upper)) return 'out';
  const width = (upper ?? value) - (lower ?? 0);
  const nearLower = lower !== null && value < lower + nearFraction * width;
  const nearUpper = upper !== null && value > upper - nearFraction * width;
  return nearLower || nearUpper ? 'near' : 'within';
}

// Numbers as the inspector reads them: grouped thousands, decimals by unit.
function formatNumber(value: number, decimals: number): string {
  const text = Math.abs(value).toFixed(decimals);
  const point = decimals > 0 ? text.length - decimals - 1 : text.length;
  // Groups of three from the right, by slicing: every verdict formats a dozen numbers.
  let grouped = text.slice(0, ((point - 1) % 3) + 1);
  for (let i = grouped.length; i < point; i += 3) grouped += ` ${text.slice(i, i + 3)}`;
  return `${value < 0 ? '−' : ''}${grouped}${text.slice(point)}`;
}

const DECIMALS: Record<NonNullable<CharacteristicVerdict['unit']>, (v: number) => number> = {
  N: (v) => (Math.abs(v) >= 100 ? 0 : 1),
  mm: () => 2,
  'Shore A': (v) => (Number.isInteger(v) ? 0 : 1),
  '%': () => 1,
};

function quantity(value: number, unit: NonNullable<CharacteristicVerdict['unit']>): string {
  const number = formatNumber(value, DECIMALS[unit](value));
  return unit === 'Shore A' ? number : `${number} ${unit}`;
}

function loadRange(low: number, high: number): string {
  return low === high ? quantity(low, 'N') : `${formatNumber(low, 0)}–${quantity(high, 'N')}`;
}

function percent(value: number): string {
  return formatNumber(value, Math.abs(value) >= 10 || Number.isInteger(value) ? 0 : 1);
}

function limitClause(
  status: VerdictStatus,
  value: number,
  lower: number | null,
  upper: number | null,
  show: (v: number) => string,
): string {
  if (status === 'within') return '';
  const upperSide =
    lower === null || (upper !== null && Math.abs(value - upper) < Math.abs(value - lower));
  const limit = upperSide ? upper : lower;
  if (limit === null) return '';
  const side = upperSide ? 'upper' : 'lower';
  if (status === 'near') return `, near the ${side} limit ${show(limit)}`;
  return `, ${upperSide ? 'over' : 'under'} the ${side} limit ${show(limit)}`;
}

function direction(difference: number): string {
  return difference >= 0 ? 'above' : 'below';
}

function loadVerdict(
  prepared: PreparedSpec,
  measurement: PartMeasurement,
  load: number,
): CharacteristicVerdict {
  requireNonNegative('load', load);
  const { expected, lowerLoad, upperLoad, nearFraction, spec } = prepared;
  const status = classify(load, lowerLoad, upperLoad, nearFraction);
  const show = (v: number) => quantity(v, 'N');
  const tolerance = `± ${percent(spec.loadTolerancePercent)} %`;
  const low = expected.low.load;
  const high = expected.high.load;
  let reason: string;
  if (low === high) {
    reason = `load ${show(load)} is ${percent(Math.abs((load / low - 1) * 100))} % ${direction(load - low)} the expected ${show(low)} ${tolerance}`;
  } else if (load < low || load > high) {
    const bound = load < low ? low : high;
    const faces = load < low ? 'lubricated' : 'bonded';
    reason = `load ${show(load)} is ${percent(Math.abs((load / bound - 1) * 100))} % ${direction(load - bound)} the ${faces}-face estimate ${show(bound)} ${tolerance}`;
  } else {
    reason = `load ${show(load)} lies between the lubricated- and bonded-face estimates ${loadRange(low, high)} ${tolerance}`;
  }
  return {
    characteristic: 'load',
    status,
    measured: load,
    nominal: low === high ? low : null,
    lower: lowerLoad,
    upper: upperLoad,
    unit: 'N',
    reason:
      reason +
      limitClause(status, load, lowerLoad, upperLoad, show) +
      partClause(prepared, measurement),
  };
}

/** The part's measured geometry, nominal where not measured. */
function measuredGeometry(spec: PartSpec, measurement: PartMeasurement): Geometry {
  const measured: Partial<Record<DimensionName, number>> = {
    ...measurement.dimensions,
    thickness: measurement.thickness,
  };
  return mapDimensions(spec.geometry, (nominal, name) => measured[name] ?? nominal);
}

// When size or hardness was measured, what the model expects for this very part: it tells a
// compound or cure problem from a dimensional one.
function partClause(prepared: PreparedSpec, measurement: PartMeasurement): string {
  const { spec, loadCase } = prepared;
  const hardnessMeasured = measurement.hardness !== undefined && measurement.hardness.length > 0;
  const sizeMeasured = measurement.thickness !== undefined || measurement.dimensions !== undefined;
  if (!hardnessMeasured && !sizeMeasured) return '';
  const geometry = measuredGeometry(spec, measurement);
  checkGeometry(geometry);
  if (!(geometry.thickness > spec.testDeflection)) {
    throw new EngineInputError(
      'thickness',
      `must exceed the test deflection ${spec.testDeflection} mm`,
    );
  }
  const variables = liftVariables(
    {
      geometry,
      hardness: hardnessMeasured ? medianHardness(measurement.hardness ?? []) : loadCase.hardness,
      deflection: spec.testDeflection,
    },
    (v) => new Real(v),
  );
  const [lowFaces, highFaces] = boundingFaces(loadCase.source.faces);
  const low = loadOf(loadCase, lowFaces, variables).re;
  const high = highFaces === lowFaces ? low : loadOf(loadCase, highFaces, variables).re;
  return `; its measured size and hardness predict ${loadRange(low, high)}`;
}

function dimensionVerdicts(
  prepared: PreparedSpec,
  measurement: PartMeasurement,
): CharacteristicVerdict[] {
  const { spec, nearFraction } = prepared;
  const names = dimensionNames(spec.geometry);
  const measured: Partial<Record<DimensionName, number>> = { ...measurement.dimensions };
  if (measurement.thickness !== undefined) measured.thickness = measurement.thickness;
  const nominals = spec.geometry as unknown as Record<DimensionName, number>;
  // A key present but undefined (a decoded DTO has every field) was not measured.
  const taken = (Object.keys(measured) as DimensionName[]).filter((n) => measured[n] !== undefined);
  return taken.map((name) => {
    if (!names.includes(name)) {
      throw new EngineInputError(name, `is not a dimension of a ${spec.geometry.shape}`);
    }
    const value = requirePositive(name, measured[name] ?? Number.NaN);
    const nominal = nominals[name];
    const dimensionClass = spec.tolerance.dimensions?.[name] ?? {
      class: spec.tolerance.class,
      kind: 'fixed',
    };
    const tolerance = moldedTolerance(nominal, dimensionClass.class, dimensionClass.kind);
    const lower = nominal - tolerance;
    const upper = nominal + tolerance;
    const status = classify(value, lower, upper, nearFraction);
    const show = (v: number) => quantity(v, 'mm');
    return {
      characteristic: name,
      status,
      measured: value,
      nominal,
      lower,
      upper,
      unit: 'mm',
      reason:
        `${name} ${show(value)} is ${show(Math.abs(value - nominal))} ${direction(value - nominal)} the nominal ${show(nominal)} ± ${show(tolerance)} (ISO 3302-1 ${dimensionClass.class} ${dimensionClass.kind})` +
        limitClause(status, value, lower, upper, show),
    };
  });
}

function hardnessVerdict(
  prepared: PreparedSpec,
  readings: readonly number[],
): CharacteristicVerdict {
  const { spec, nearFraction } = prepared;
  const value = medianHardness(readings);
  const { nominal, tolerance } = spec.hardness;
  const lower = nominal - tolerance;
  const upper = nominal + tolerance;
  const status = classify(value, lower, upper, nearFraction);
  const show = (v: number) => quantity(v, 'Shore A');
  const points = Math.abs(value - nominal);
  const unreliable = readings.some((r) => r < RELIABLE_SHORE_A.min || r > RELIABLE_SHORE_A.max)
    ? '; readings under 20 or over 90 Shore A are unreliable'
    : '';
  return {
    characteristic: 'hardness',
    status,
    measured: value,
    nominal,
    lower,
    upper,
    unit: 'Shore A',
    reason:
      `hardness ${show(value)} Shore A (median of ${readings.length}) is ${show(points)} point${points === 1 ? '' : 's'} ${direction(value - nominal)} the nominal ${show(nominal)} ± ${show(tolerance)}` +
      limitClause(status, value, lower, upper, show) +
      unreliable,
  };
}

function compressionSetVerdict(prepared: PreparedSpec, value: number): CharacteristicVerdict {
  const limit = prepared.spec.compressionSetLimitPercent;
  requireInRange('compressionSetPercent', value, 0, 100);
  if (limit === undefined) {
    throw new EngineInputError('compressionSetPercent', 'the spec sets no compression-set limit');
  }
  const status = classify(value, null, limit, prepared.nearFraction);
  const show = (v: number) => quantity(v, '%');
  const words = { within: 'is under', near: 'is near', out: 'is over' }[status];
  return {
    characteristic: 'compression-set',
    status,
    measured: value,
    nominal: null,
    lower: null,
    upper: limit,
    unit: '%',
    reason: `compression set ${show(value)} ${words} the limit ${show(limit)}`,
  };
}

const SEVERITIES = ['critical', 'major', 'minor'] as const;
const LOCATIONS = ['sealing', 'flexing', 'protecting', 'cosmetic'];

function defectVerdict(defects: readonly DefectRecord[]): CharacteristicVerdict {
  defects.forEach((d, i) => {
    if (!SEVERITIES.includes(d.severity)) {
      throw new EngineInputError(`defects[${i}].severity`, `must be critical, major or minor`);
    }
    if (!LOCATIONS.includes(d.location)) {
      throw new EngineInputError(
        `defects[${i}].location`,
        `must be sealing, flexing, protecting or cosmetic`,
      );
    }
  });
  const counts = SEVERITIES.map(
    (s) => [s, defects.filter((d) => d.severity === s)] as const,
  ).filter(([, list]) => list.length > 0);
  const status: VerdictStatus = counts.some(([s]) => s !== 'minor')
    ? 'out'
    : counts.length
      ? 'near'
      : 'within';
  const reason = counts.length
    ? counts
        .map(
          ([s, list]) =>
            `${list.length} ${s} (${list.map((d) => `${d.type} on a ${d.location} surface`).join(', ')})`,
        )
        .join('; ')
    : 'no visual defects';
  return {
    characteristic: 'defects',
    status,
    measured: defects.length,
    nominal: null,
    lower: null,
    upper: null,
    unit: null,
    reason:
      status === 'out'
        ? `${reason}: critical and major defects make the part nonconforming`
        : reason,
  };
}

const RANK: Record<VerdictStatus, number> = { within: 0, near: 1, out: 2 };

/** Verdict per measured characteristic of one sampled part, and for the part. */
export function partVerdict(prepared: PreparedSpec, measurement: PartMeasurement): PartVerdict {
  const characteristics = dimensionVerdicts(prepared, measurement);
  if (measurement.hardness !== undefined)
    characteristics.push(hardnessVerdict(prepared, measurement.hardness));
  if (measurement.load !== undefined)
    characteristics.push(loadVerdict(prepared, measurement, measurement.load));
  if (measurement.compressionSetPercent !== undefined) {
    characteristics.push(compressionSetVerdict(prepared, measurement.compressionSetPercent));
  }
  const defects = measurement.defects ?? [];
  characteristics.push(defectVerdict(defects));
  const status = characteristics.reduce<VerdictStatus>(
    (worst, c) => (RANK[c.status] > RANK[worst] ? c.status : worst),
    'within',
  );
  return {
    status,
    conforming: status !== 'out',
    characteristics,
    criticalDefects: defects.filter((d) => d.severity === 'critical').length,
    flags: prepared.expected.flags,
  };
}

export interface LotVerdict {
  decision: LotDecision;
  /** Accepted inside a reduced plan's gap: go back to normal inspection. */
  returnToNormal: boolean;
  inspected: number;
  nonconforming: number;
  criticalDefects: number;
  reason: string;
}

/**
 * Lot rule: nonconforming parts against the plan's accept and reject numbers (ISO 2859-1); a
 * critical defect on any sampled part rejects the lot whatever the count (common practice:
 * critical nonconformities take Ac 0).
 */
export function lotVerdict(
  plan: Pick<SamplingPlan, 'sampleSize' | 'accept' | 'reject'>,
  parts: readonly Pick<PartVerdict, 'conforming' | 'criticalDefects'>[],
): LotVerdict {
  const inspected = parts.length;
  const nonconforming = parts.filter((p) => !p.conforming).length;
  const criticalDefects = parts.reduce((n, p) => n + p.criticalDefects, 0);
  const { decision, returnToNormal } = lotDecision(plan, { inspected, nonconforming });
  const counted = `${nonconforming} of ${inspected} inspected part${inspected === 1 ? '' : 's'} nonconforming (sample ${plan.sampleSize}, accept up to ${plan.accept}, reject at ${plan.reject})`;
  if (criticalDefects > 0) {
    return {
      decision: 'reject',
      returnToNormal: false,
      inspected,
      nonconforming,
      criticalDefects,
      reason: `${criticalDefects} critical defect${criticalDefects === 1 ? '' : 's'}: the lot is rejected whatever the count; ${counted}`,
    };
  }
  const outcome = {
    accept: returnToNormal ? 'lot accepted, but reduced inspection ends' : 'lot accepted',
    reject: 'lot rejected',
    open: `${plan.sampleSize - inspected} more to inspect`,
  }[decision];
  return {
    decision,
    returnToNormal,
    inspected,
    nonconforming,
    criticalDefects,
    reason: `${counted}: ${outcome}`,
  };
}

import { xbarRLimits } from './control-charts.js';
import { EngineInputError, requireFinite } from './errors.js';
import { sampleStandardDeviation } from './statistics.js';

export interface SpecificationLimits {
  lsl?: number;
  usl?: number;
}

export interface CapabilityIndices {
  mean: number;
  sigmaWithin: number;
  sigmaOverall: number;
  /** Need both limits; null for a one-sided specification. */
  cp: number | null;
  pp: number | null;
  cpk: number;
  ppk: number;
}

function potential(limits: SpecificationLimits, sigma: number): number | null {
  return limits.lsl === undefined || limits.usl === undefined
    ? null
    : (limits.usl - limits.lsl) / (6 * sigma);
}

// The nearer limit counts; a missing limit does not (a one-sided spec).
function centred(limits: SpecificationLimits, mean: number, sigma: number): number {
  const sides = [
    limits.usl === undefined ? Infinity : limits.usl - mean,
    limits.lsl === undefined ? Infinity : mean - limits.lsl,
  ];
  return Math.min(...sides) / (3 * sigma);
}

/**
 * Cp, Cpk (σ within subgroups, R̄/d2) and Pp, Ppk (overall sample σ) for subgrouped data
 * (REFERENCES §10 [M]). Cpk ≥ 1.33 is common practice for ongoing production.
 */
export function capabilityIndices(
  subgroups: readonly (readonly number[])[],
  limits: SpecificationLimits,
): CapabilityIndices {
  const { lsl, usl } = limits;
  if (lsl !== undefined) requireFinite('lsl', lsl);
  if (usl !== undefined) requireFinite('usl', usl);
  if (lsl === undefined && usl === undefined) {
    throw new EngineInputError('limits', 'need a lower or an upper specification limit');
  }
  if (lsl !== undefined && usl !== undefined && !(usl > lsl)) {
    throw new EngineInputError('usl', `must be above the lower limit ${lsl}`);
  }
  const chart = xbarRLimits(subgroups);
  const sigmaOverall = sampleStandardDeviation(subgroups.flat());
  if (!(chart.sigmaWithin > 0) || !(sigmaOverall > 0)) {
    throw new EngineInputError('subgroups', 'show no variation, so capability is undefined');
  }
  return {
    mean: chart.grandMean,
    sigmaWithin: chart.sigmaWithin,
    sigmaOverall,
    cp: potential(limits, chart.sigmaWithin),
    pp: potential(limits, sigmaOverall),
    cpk: centred(limits, chart.grandMean, chart.sigmaWithin),
    ppk: centred(limits, chart.grandMean, sigmaOverall),
  };
}

import { EngineInputError, requireFinite } from './errors.js';

interface ShewhartConstants {
  a2: number;
  d2: number;
  d3: number;
  d4: number;
}

// Shewhart X̄–R factors by subgroup size (REFERENCES §10 [S]: "Factors for Constructing Control
// Charts", ASTM MNL 7). Tabulated values on purpose: recomputing them from rounded d2/d3 drifts.
export const XBAR_R_CONSTANTS: Readonly<Record<number, ShewhartConstants>> = {
  2: { a2: 1.88, d2: 1.128, d3: 0, d4: 3.267 },
  3: { a2: 1.023, d2: 1.693, d3: 0, d4: 2.574 },
  4: { a2: 0.729, d2: 2.059, d3: 0, d4: 2.282 },
  5: { a2: 0.577, d2: 2.326, d3: 0, d4: 2.114 },
  6: { a2: 0.483, d2: 2.534, d3: 0, d4: 2.004 },
  7: { a2: 0.419, d2: 2.704, d3: 0.076, d4: 1.924 },
  8: { a2: 0.373, d2: 2.847, d3: 0.136, d4: 1.864 },
  9: { a2: 0.337, d2: 2.97, d3: 0.184, d4: 1.816 },
  10: { a2: 0.308, d2: 3.078, d3: 0.223, d4: 1.777 },
};

export interface XbarRLimits {
  grandMean: number;
  meanRange: number;
  xbarUcl: number;
  xbarLcl: number;
  rUcl: number;
  rLcl: number;
  /** σ estimated from within subgroups, R̄/d2. */
  sigmaWithin: number;
  subgroupSize: number;
  /** Each subgroup's mean and range, in order, for plotting against the limits. */
  means: number[];
  ranges: number[];
}

/** X̄ and R chart limits from equal-size subgroups of 2…10 measurements. */
export function xbarRLimits(subgroups: readonly (readonly number[])[]): XbarRLimits {
  if (!(subgroups.length >= 2)) {
    throw new EngineInputError('subgroups', 'need at least two subgroups');
  }
  const size = subgroups[0]?.length ?? 0;
  const constants = XBAR_R_CONSTANTS[size];
  if (!constants)
    throw new EngineInputError('subgroups', `subgroup size must be 2…10, got ${size}`);
  subgroups.forEach((group, i) => {
    if (group.length !== size) {
      throw new EngineInputError(`subgroups[${i}]`, `has ${group.length} values; all need ${size}`);
    }
    group.forEach((v, j) => requireFinite(`subgroups[${i}][${j}]`, v));
  });
  const means = subgroups.map((g) => g.reduce((s, v) => s + v, 0) / size);
  const ranges = subgroups.map((g) => Math.max(...g) - Math.min(...g));
  const grandMean = means.reduce((s, v) => s + v, 0) / means.length;
  const meanRange = ranges.reduce((s, v) => s + v, 0) / ranges.length;
  return {
    grandMean,
    meanRange,
    xbarUcl: grandMean + constants.a2 * meanRange,
    xbarLcl: grandMean - constants.a2 * meanRange,
    rUcl: constants.d4 * meanRange,
    rLcl: constants.d3 * meanRange,
    sigmaWithin: meanRange / constants.d2,
    subgroupSize: size,
    means,
    ranges,
  };
}

import { EngineInputError, requireFinite, requirePositive } from './errors.js';
import { studentTTwoSided } from './statistics.js';

/** Molar gas constant, J/(mol·K) (CODATA 2018, exact since the 2019 SI). */
export const GAS_CONSTANT = 8.314462618;
const KELVIN_OFFSET = 273.15;

/** One aged condition: at this temperature the property reached its end-of-life threshold after `hours`. */
export interface AgingPoint {
  temperatureC: number;
  hours: number;
}

/** ln t = a + b/T with T in kelvin (ISO 11346), plus what the bands and predictions need. */
export interface ArrheniusFit {
  activationEnergyKJ: number;
  a: number;
  b: number;
  r2: number;
  /** Two-sided confidence band of Ea from the standard error of the slope. */
  activationEnergyBandKJ: { low: number; high: number };
  confidence: number;
  points: number;
  /** Mean of 1/T (1/K), sum of squares of 1/T about it, residual standard deviation of ln t. */
  meanInverseKelvin: number;
  sxx: number;
  residualSd: number;
  /** Student's t for the confidence and n − 2 degrees of freedom. */
  tQuantile: number;
  testedRangeC: { min: number; max: number };
}

export interface LifePrediction {
  hours: number;
  /** Confidence band of the mean life at this temperature (regression band on ln t). */
  lowHours: number;
  highHours: number;
  /** Kelvin outside the tested range (0 inside); long extrapolations deserve a warning. */
  extrapolationK: number;
}

function inverseKelvin(field: string, temperatureC: number): number {
  if (requireFinite(field, temperatureC) <= -KELVIN_OFFSET) {
    throw new EngineInputError(
      field,
      `must be above absolute zero (−273.15 °C), got ${temperatureC}`,
    );
  }
  return 1 / (temperatureC + KELVIN_OFFSET);
}

/** Least-squares fit of ln t = a + b/T to aging data at three or more temperatures (ISO 11346). */
export function arrheniusFit(
  points: readonly AgingPoint[],
  { confidence = 0.95 }: { confidence?: number } = {},
): ArrheniusFit {
  if (!(points.length >= 3)) {
    throw new EngineInputError('points', 'need aging results at three or more temperatures');
  }
  const x = points.map((p, i) => inverseKelvin(`points[${i}].temperatureC`, p.temperatureC));
  const y = points.map((p, i) => Math.log(requirePositive(`points[${i}].hours`, p.hours)));
  if (new Set(points.map((p) => p.temperatureC)).size < 3) {
    throw new EngineInputError('points', 'need three or more different temperatures');
  }
  const n = points.length;
  const xMean = x.reduce((s, v) => s + v, 0) / n;
  const yMean = y.reduce((s, v) => s + v, 0) / n;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = (x[i] ?? 0) - xMean;
    const dy = (y[i] ?? 0) - yMean;
    sxx += dx * dx;
    sxy += dx * dy;
    syy += dy * dy;
  }
  const b = sxy / sxx;
  const a = yMean - b * xMean;
  if (!(b > 0)) {
    throw new EngineInputError(
      'points',
      'life does not fall as temperature rises: no Arrhenius fit',
    );
  }
  // Residuals summed directly: syy − b·sxy would cancel to noise on near-perfect data.
  const residualSumOfSquares = x.reduce((s, xi, i) => s + ((y[i] ?? 0) - a - b * xi) ** 2, 0);
  const residualSd = Math.sqrt(residualSumOfSquares / (n - 2));
  const tQuantile = studentTTwoSided(confidence, n - 2);
  const halfWidthB = (tQuantile * residualSd) / Math.sqrt(sxx);
  const toKJ = GAS_CONSTANT / 1000;
  const temperatures = points.map((p) => p.temperatureC);
  return {
    activationEnergyKJ: b * toKJ,
    a,
    b,
    r2: syy > 0 ? 1 - residualSumOfSquares / syy : 1,
    activationEnergyBandKJ: { low: (b - halfWidthB) * toKJ, high: (b + halfWidthB) * toKJ },
    confidence,
    points: n,
    meanInverseKelvin: xMean,
    sxx,
    residualSd,
    tQuantile,
    testedRangeC: { min: Math.min(...temperatures), max: Math.max(...temperatures) },
  };
}

/** Expected life at another temperature, with the fit's confidence band. */
export function arrheniusLife(fit: ArrheniusFit, temperatureC: number): LifePrediction {
  const x = inverseKelvin('temperatureC', temperatureC);
  const lnT = fit.a + fit.b * x;
  const half =
    fit.tQuantile *
    fit.residualSd *
    Math.sqrt(1 / fit.points + (x - fit.meanInverseKelvin) ** 2 / fit.sxx);
  const { min, max } = fit.testedRangeC;
  return {
    hours: Math.exp(lnT),
    lowHours: Math.exp(lnT - half),
    highHours: Math.exp(lnT + half),
    extrapolationK: Math.max(0, min - temperatureC, temperatureC - max),
  };
}

/** The highest temperature at which the fitted (central) life still reaches `hours`. */
export function highestTemperatureForLife(fit: ArrheniusFit, hours: number): number {
  const excess = Math.log(requirePositive('hours', hours)) - fit.a;
  if (!(excess > 0)) {
    throw new EngineInputError('hours', `is shorter than the fit reaches at any temperature`);
  }
  return fit.b / excess - KELVIN_OFFSET;
}

/** Acceleration factor AF = exp[(Ea/R)(1/T_use − 1/T_test)] (ISO 11346). */
export function accelerationFactor(
  activationEnergyKJ: number,
  useC: number,
  testC: number,
): number {
  const slope = (requirePositive('activationEnergyKJ', activationEnergyKJ) * 1000) / GAS_CONSTANT;
  return Math.exp(slope * (inverseKelvin('useC', useC) - inverseKelvin('testC', testC)));
}

/**
 * Expected compression set after `hours` at `temperatureC`, when the fit's end-of-life times are
 * the times to reach `thresholdPercent` set. Assumes first-order kinetics, C = 100(1 − e^(−kt)),
 * with an Arrhenius rate k — a model choice, so one threshold time fixes k at each temperature:
 * C = 100[1 − (1 − C_f/100)^(t/t_f)], t_f the fitted life at that temperature.
 */
export function expectedCompressionSet(
  fit: ArrheniusFit,
  {
    thresholdPercent,
    temperatureC,
    hours,
  }: { thresholdPercent: number; temperatureC: number; hours: number },
): number {
  if (!(requireFinite('thresholdPercent', thresholdPercent) > 0 && thresholdPercent < 100)) {
    throw new EngineInputError(
      'thresholdPercent',
      `must lie between 0 and 100 %, got ${thresholdPercent}`,
    );
  }
  const thresholdHours = arrheniusLife(fit, temperatureC).hours;
  const remaining =
    (1 - thresholdPercent / 100) ** (requirePositive('hours', hours) / thresholdHours);
  return 100 * (1 - remaining);
}

import { EngineInputError } from './errors.js';

// Lanczos approximation of ln Γ (g = 7, n = 9; Numerical Recipes 3rd ed. §6.1), good to ~1e-15.
const LANCZOS = [
  0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313,
  -176.61502916214059, 12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6,
  1.5056327351493116e-7,
];

function logGamma(x: number): number {
  if (x < 0.5) return Math.log(Math.PI / Math.sin(Math.PI * x)) - logGamma(1 - x);
  const z = x - 1;
  let sum = LANCZOS[0] ?? 0;
  for (let i = 1; i < LANCZOS.length; i++) sum += (LANCZOS[i] ?? 0) / (z + i);
  const t = z + 7.5;
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(sum);
}

/** Continued fraction of the incomplete beta function, modified Lentz (Numerical Recipes §6.4). */
function betaContinuedFraction(x: number, a: number, b: number): number {
  const tiny = 1e-300;
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  d = 1 / (Math.abs(d) < tiny ? tiny : d);
  let h = d;
  for (let m = 1; m <= 300; m++) {
    for (const numerator of [
      (m * (b - m) * x) / ((a + 2 * m - 1) * (a + 2 * m)),
      -((a + m) * (a + b + m) * x) / ((a + 2 * m) * (a + 2 * m + 1)),
    ]) {
      d = 1 + numerator * d;
      d = 1 / (Math.abs(d) < tiny ? tiny : d);
      c = 1 + numerator / c;
      if (Math.abs(c) < tiny) c = tiny;
      h *= d * c;
    }
    if (Math.abs(d * c - 1) < 1e-16) break;
  }
  return h;
}

/** Regularised incomplete beta Iₓ(a, b). */
function incompleteBeta(x: number, a: number, b: number): number {
  if (x <= 0) return 0;
  if (x >= 1) return 1;
  const front = Math.exp(
    logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log(1 - x),
  );
  // The continued fraction converges fast only on this side of the mean; use symmetry otherwise.
  return x < (a + 1) / (a + b + 2)
    ? (front * betaContinuedFraction(x, a, b)) / a
    : 1 - (front * betaContinuedFraction(1 - x, b, a)) / b;
}

/** Student's t cumulative distribution with ν degrees of freedom. */
export function studentTCdf(t: number, degreesOfFreedom: number): number {
  const tail =
    0.5 * incompleteBeta(degreesOfFreedom / (degreesOfFreedom + t * t), degreesOfFreedom / 2, 0.5);
  return t >= 0 ? 1 - tail : tail;
}

/** Two-sided Student's t quantile: the t with P(|T| ≤ t) = confidence. */
export function studentTTwoSided(confidence: number, degreesOfFreedom: number): number {
  if (!(confidence > 0 && confidence < 1)) {
    throw new EngineInputError(
      'confidence',
      `must lie strictly between 0 and 1, got ${confidence}`,
    );
  }
  if (!(Number.isInteger(degreesOfFreedom) && degreesOfFreedom >= 1)) {
    throw new EngineInputError(
      'degreesOfFreedom',
      `must be a whole number ≥ 1, got ${degreesOfFreedom}`,
    );
  }
  const target = 0.5 + confidence / 2;
  // Bisection: the CDF is monotone and the bracket [0, 1e7] holds every quantile up to ν = 1, 99.99999 %.
  let low = 0;
  let high = 1e7;
  for (let i = 0; i < 200 && high - low > 1e-14 * high; i++) {
    const mid = 0.5 * (low + high);
    if (studentTCdf(mid, degreesOfFreedom) < target) low = mid;
    else high = mid;
  }
  return 0.5 * (low + high);
}

/** Binomial P(X ≤ k) for n trials with success probability p. */
export function binomialCdf(k: number, n: number, p: number): number {
  if (k >= n) return 1;
  if (k < 0) return 0;
  if (p === 0) return 1;
  if (p === 1) return 0;
  // Terms by the ratio pmf(i+1)/pmf(i) from pmf(0) = (1 − p)ⁿ, in logs so large n cannot underflow.
  const logRatio = Math.log(p / (1 - p));
  let logTerm = n * Math.log1p(-p);
  let sum = Math.exp(logTerm);
  for (let i = 0; i < k; i++) {
    logTerm += Math.log((n - i) / (i + 1)) + logRatio;
    sum += Math.exp(logTerm);
  }
  return Math.min(1, sum);
}

export function mean(values: readonly number[]): number {
  return values.reduce((s, v) => s + v, 0) / values.length;
}

/** Sample standard deviation (n − 1 in the denominator). */
export function sampleStandardDeviation(values: readonly number[]): number {
  const m = mean(values);
  return Math.sqrt(values.reduce((s, v) => s + (v - m) ** 2, 0) / (values.length - 1));
}

import { describe, expect, it } from 'vitest';
import { derivative, gradient, hessian, secondDerivative } from './derivatives.js';
import { EngineInputError } from './errors.js';
import {
  centralDifference,
  DIFFERENCE_STEPS,
  forwardDifference,
  relativeError,
} from './fixtures/finite-differences.js';
import { Real } from './real.js';
import type { Scalar } from './scalar.js';

/** f(x) = eˣ / √(sin³x + cos³x), the test function of Squire & Trapp 1998 and Martins et al. 2003. */
const squireTrapp = <T extends Scalar<T>>(x: T): T =>
  x.exp().div(x.sin().pow(3).add(x.cos().pow(3)).sqrt());

// REFERENCES §1 [D: 40-digit arithmetic, agrees with the papers' f′].
const F = 4.497780053946162;
const F1 = 4.053427893898621;
const F2 = 9.463073681596603;

describe('complex step on the test function of REFERENCES §1', () => {
  it('gives f, f′ and f″ at x = 1.5 to 1e-13 relative', () => {
    expect(relativeError(squireTrapp(new Real(1.5)).re, F)).toBeLessThanOrEqual(1e-13);
    expect(relativeError(derivative(squireTrapp, 1.5), F1)).toBeLessThanOrEqual(1e-13);
    expect(relativeError(secondDerivative(squireTrapp, 1.5), F2)).toBeLessThanOrEqual(1e-13);
  });

  it('beats forward and central differences at their best step (REFERENCES §1: ~1e-8, ~1e-10)', () => {
    const f = (x: number) => squireTrapp(new Real(x)).re;
    const best = (difference: typeof forwardDifference) =>
      Math.min(...DIFFERENCE_STEPS.map((h) => relativeError(difference(f, 1.5, h), F1)));
    const complexStep = relativeError(derivative(squireTrapp, 1.5), F1);
    expect(best(forwardDifference)).toBeGreaterThan(1e-10);
    expect(best(centralDifference)).toBeGreaterThan(1e-12);
    expect(complexStep).toBeLessThan(best(centralDifference) / 100);
  });
});

describe('gradient and Hessian', () => {
  // g(x, y) = x²y³ + e^(xy): closed-form partials [D].
  const g = <T extends Scalar<T>>([x, y]: T[]): T => x!.pow(2).mul(y!.pow(3)).add(x!.mul(y!).exp());
  const [x, y] = [0.7, 1.3];
  const e = Math.exp(x * y);

  it('match the closed-form partials of x²y³ + e^(xy) [D]', () => {
    const [gx, gy] = gradient(g, [x, y]);
    expect(relativeError(gx!, 2 * x * y ** 3 + y * e)).toBeLessThan(1e-14);
    expect(relativeError(gy!, 3 * x * x * y * y + x * e)).toBeLessThan(1e-14);
    const h = hessian(g, [x, y]);
    expect(relativeError(h[0]![0]!, 2 * y ** 3 + y * y * e)).toBeLessThan(1e-14);
    expect(relativeError(h[1]![1]!, 6 * x * x * y + x * x * e)).toBeLessThan(1e-14);
    expect(relativeError(h[0]![1]!, 6 * x * y * y + e + x * y * e)).toBeLessThan(1e-14);
    expect(h[1]![0]).toBe(h[0]![1]);
  });

  it('reject a non-finite point', () => {
    expect(() => derivative(squireTrapp, Number.NaN)).toThrow(EngineInputError);
    expect(() => hessian(g, [1, Number.POSITIVE_INFINITY])).toThrow(EngineInputError);
  });
});

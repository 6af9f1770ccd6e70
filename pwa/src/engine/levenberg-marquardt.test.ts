import { describe, expect, it } from 'vitest';
import { EngineInputError } from './errors.js';
import { levenbergMarquardt, type LeastSquaresProblem } from './levenberg-marquardt.js';

/*
 * Standard test problems of Moré, Garbow & Hillstrom, "Testing unconstrained optimization
 * software", ACM TOMS 7(1), 1981 [M for the numbering]; minima are known in closed form.
 */

describe('Levenberg–Marquardt on test problems (Moré, Garbow & Hillstrom 1981)', () => {
  it('Rosenbrock, r = (10(x₂ − x₁²), 1 − x₁) from (−1.2, 1), reaches (1, 1)', () => {
    const rosenbrock: LeastSquaresProblem = {
      evaluate: ([a, b]) => ({
        residuals: [10 * (b! - a! * a!), 1 - a!],
        jacobian: [
          [-20 * a!, 10],
          [-1, 0],
        ],
      }),
    };
    const fit = levenbergMarquardt(rosenbrock, [-1.2, 1]);
    expect(fit.x[0]).toBeCloseTo(1, 10);
    expect(fit.x[1]).toBeCloseTo(1, 10);
    expect(fit.cost).toBeLessThan(1e-20);
    expect(['gtol', 'xtol', 'ftol', 'ftol+xtol']).toContain(fit.stopReason);
  });

  it('badly scaled parameters (scales 1 and 1e-5) converge in few iterations thanks to Moré scaling', () => {
    // y = a·t + b·t³ with b ~ 1e-5: linear, so the least-squares answer is exact (normal equations [D]).
    const t = Array.from({ length: 20 }, (_, i) => 1 + 2 * i);
    const y = t.map((v) => 0.2 * v + 3e-5 * v ** 3 + 0.01 * Math.sin(v));
    const problem: LeastSquaresProblem = {
      evaluate: ([a, b]) => ({
        residuals: t.map((v, i) => a! * v + b! * v ** 3 - y[i]!),
        jacobian: t.map((v) => [v, v ** 3]),
      }),
    };
    const fit = levenbergMarquardt(problem, [1, 1]);
    const sum = (f: (v: number, i: number) => number) => t.reduce((acc, v, i) => acc + f(v, i), 0);
    const [s2, s4, s6] = [sum((v) => v ** 2), sum((v) => v ** 4), sum((v) => v ** 6)];
    const [g1, g3] = [sum((v, i) => v * y[i]!), sum((v, i) => v ** 3 * y[i]!)];
    const det = s2 * s6 - s4 * s4;
    expect(fit.x[0]).toBeCloseTo((g1 * s6 - s4 * g3) / det, 12);
    expect(fit.x[1]! / ((s2 * g3 - s4 * g1) / det)).toBeCloseTo(1, 9);
    expect(fit.iterations).toBeLessThan(10);
  });

  it('refuses trial points outside the domain and stays inside it', () => {
    // Minimise (log x − 3)² with x > 0 from x = 0.5: steps that leave the domain are refused.
    const problem: LeastSquaresProblem = {
      evaluate: ([x]) => (x! > 0 ? { residuals: [Math.log(x!) - 3], jacobian: [[1 / x!]] } : null),
    };
    const fit = levenbergMarquardt(problem, [0.5]);
    expect(fit.x[0]).toBeCloseTo(Math.exp(3), 8);
  });

  it('throws when the start is outside the domain', () => {
    const problem: LeastSquaresProblem = { evaluate: () => null };
    expect(() => levenbergMarquardt(problem, [0])).toThrow(EngineInputError);
  });
});

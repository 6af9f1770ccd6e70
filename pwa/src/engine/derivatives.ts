import { Bicomplex } from './bicomplex.js';
import { Complex } from './complex.js';
import { requireFinite } from './errors.js';
import { STEP } from './scalar.js';

/*
 * Derivatives of functions written once over the scalar interface (see scalar.ts): pass a
 * generic `<T extends Scalar<T>>(x: T) => T` and it is evaluated in the number type each
 * order needs. No differences are taken, so results are exact to rounding (REFERENCES §1).
 */

const STEP_SQUARED = STEP * STEP;

/** f′(x) = Im f(x + i·h) / h (Squire & Trapp 1998). */
export function derivative(f: (x: Complex) => Complex, x: number): number {
  return f(new Complex(requireFinite('x', x), STEP)).im / STEP;
}

/** f″(x): the i₁i₂ part of f(x + h·i₁ + h·i₂), over h² (Lantoine, Russell & Dargent 2012). */
export function secondDerivative(f: (x: Bicomplex) => Bicomplex, x: number): number {
  return f(new Bicomplex(requireFinite('x', x), STEP, STEP, 0)).i12 / STEP_SQUARED;
}

/** ∂f/∂xⱼ for every j, one complex evaluation each. */
export function gradient(f: (xs: Complex[]) => Complex, xs: readonly number[]): number[] {
  xs.forEach((x, j) => requireFinite(`xs[${j}]`, x));
  return xs.map((_, j) => f(xs.map((x, i) => new Complex(x, i === j ? STEP : 0))).im / STEP);
}

export interface SecondOrder {
  readonly gradient: number[];
  readonly hessian: number[][];
}

/**
 * ∂f/∂xⱼ and ∂²f/∂xⱼ∂xₖ: xⱼ stepped on i₁ and xₖ on i₂, one bicomplex evaluation per pair
 * j ≤ k; the i₁ parts of the diagonal evaluations carry the gradient.
 */
export function gradientAndHessian(
  f: (xs: Bicomplex[]) => Bicomplex,
  xs: readonly number[],
): SecondOrder {
  xs.forEach((x, j) => requireFinite(`xs[${j}]`, x));
  const g = xs.map(() => 0);
  const h = xs.map(() => xs.map(() => 0));
  xs.forEach((_, j) => {
    for (let k = j; k < xs.length; k++) {
      const point = xs.map((x, i) => new Bicomplex(x, i === j ? STEP : 0, i === k ? STEP : 0, 0));
      const result = f(point);
      const value = result.i12 / STEP_SQUARED;
      h[j]![k] = value;
      h[k]![j] = value;
      if (k === j) g[j] = result.i1 / STEP;
    }
  });
  return { gradient: g, hessian: h };
}

/** ∂²f/∂xⱼ∂xₖ. */
export function hessian(f: (xs: Bicomplex[]) => Bicomplex, xs: readonly number[]): number[][] {
  return gradientAndHessian(f, xs).hessian;
}

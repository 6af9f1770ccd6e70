/**
 * The number interface every engineering formula in the engine is written over, so one
 * source gives values (Real), first derivatives (Complex) and second derivatives (Bicomplex)
 * by the complex step (REFERENCES §1).
 *
 * How to write a function once for all three: make it generic in T, use only T's methods,
 * and make constants with `x.constant(v)` (or pass plain numbers as operands):
 *
 *   const load = <T extends Scalar<T>>(t: T): T => t.constant(1).div(t).log().mul(2.5);
 *   derivative(load, 4);        // d load / dt at t = 4, exact to rounding
 *   secondDerivative(load, 4);  // d² load / dt²
 *
 * A function that itself takes a stress (a derivative of W) needs one perturbation more than
 * its argument carries; write it over `Liftable<T>` instead (see `nominalStressOf`), which
 * Real and Complex implement, so `derivative` still applies to it.
 */
export interface Scalar<T extends Scalar<T>> {
  /** The real part: the value the formula has at the unperturbed point. */
  readonly re: number;
  /** `value` as a T with no perturbation. */
  constant(value: number): T;
  add(other: T | number): T;
  sub(other: T | number): T;
  mul(other: T | number): T;
  div(other: T | number): T;
  neg(): T;
  /** Integer, real or scalar exponent; a non-integer power needs a positive real part. */
  pow(exponent: T | number): T;
  exp(): T;
  log(): T;
  sqrt(): T;
  sin(): T;
  cos(): T;
  sinh(): T;
  cosh(): T;
  tanh(): T;
  coth(): T;
  /** The complexified absolute value: negate when the real part is negative. */
  abs(): T;
  /** Comparisons look at the real part only. */
  lt(other: T | number): boolean;
  le(other: T | number): boolean;
  gt(other: T | number): boolean;
  ge(other: T | number): boolean;
  /** Every part (real and perturbation) is finite. */
  isFinite(): boolean;
}

/**
 * A function written over a scalar type with one more perturbation unit than T, given a way to
 * bring other T values (constants, geometry) into that type.
 */
export type LiftedFunction<T> = <U extends Scalar<U>>(x: U, lift: (value: T | number) => U) => U;

/** A scalar type that can carry one more perturbation unit, so functions of it can be differentiated. */
export interface Liftable<T extends Liftable<T>> extends Scalar<T> {
  /** dg/dx at this point, by a complex step in a unit T does not use; T's own parts carry through. */
  derivativeOf(g: LiftedFunction<T>): T;
}

/**
 * Complex-step size. A power of two, so dividing by it is exact. Any perturbation part is
 * this small, which is why products of two parts of the same unit can be dropped (REFERENCES §1).
 */
export const STEP = 2 ** -66;

/** The real value of an operand. */
export function realPart(value: { re: number } | number): number {
  return typeof value === 'number' ? value : value.re;
}

import { jets, type Jet } from './elementary.js';
import { realPart, STEP, type Liftable, type LiftedFunction, type Scalar } from './scalar.js';

/*
 * Complex steps along several units at once, so one evaluation yields a whole gradient (or,
 * lifted, a whole row of mixed second derivatives: a fit Jacobian row of stresses). Each unit's
 * part is of order STEP, so products of two parts of the same unit lie below rounding and are
 * dropped (REFERENCES §1); products of parts of two different units would only feed mixed
 * components nobody reads, so they are not stored. What is stored is exact to rounding.
 * A missing part list (null) means all those parts are zero, which keeps the many values that
 * do not depend on the stepped quantities (stretches, invariants) as cheap as plain complex.
 */

/** A MultiComplex or number as a LiftedMultiComplex with nothing on i₀. */
function liftMultiComplex(value: MultiComplex | number): LiftedMultiComplex {
  return typeof value === 'number'
    ? new LiftedMultiComplex(value, 0, null)
    : new LiftedMultiComplex(value.re, 0, value.liftedParts());
}

/** Per-unit parts; null when all are zero. */
export type Parts = readonly number[] | null;

/** a·x + b·y elementwise, with null read as zeros. */
function combine(a: number, x: Parts, b: number, y: Parts): Parts {
  if (x === null) return y === null ? null : scaled(y, b);
  if (y === null) return scaled(x, a);
  const out = new Array<number>(x.length);
  for (let j = 0; j < x.length; j++) out[j] = a * x[j]! + b * y[j]!;
  return out;
}

function scaled(x: Parts, factor: number): Parts {
  if (x === null) return null;
  const out = new Array<number>(x.length);
  for (let j = 0; j < x.length; j++) out[j] = x[j]! * factor;
  return out;
}

/** Parts on iⱼ followed by zero cross parts, as LiftedMultiComplex stores them. */
function withZeroCross(parts: Parts): Parts {
  if (parts === null) return null;
  const out = new Array<number>(2 * parts.length).fill(0);
  for (let j = 0; j < parts.length; j++) out[j] = parts[j]!;
  return out;
}

function allFinite(x: Parts): boolean {
  return x === null || x.every(Number.isFinite);
}

/** re + Σⱼ partsⱼ·iⱼ with one unit iⱼ per direction. */
export class MultiComplex implements Liftable<MultiComplex> {
  constructor(
    readonly re: number,
    readonly parts: Parts,
  ) {}

  /** The point xs with xⱼ stepped on unit j: the seed of a gradient. */
  static seed(xs: readonly number[]): MultiComplex[] {
    return xs.map(
      (x, j) =>
        new MultiComplex(
          x,
          xs.map((_, k) => (k === j ? STEP : 0)),
        ),
    );
  }

  /** The part on unit j. */
  part(j: number): number {
    return this.parts?.[j] ?? 0;
  }

  constant(value: number): MultiComplex {
    return new MultiComplex(value, null);
  }
  add(other: MultiComplex | number): MultiComplex {
    return typeof other === 'number'
      ? new MultiComplex(this.re + other, this.parts)
      : new MultiComplex(this.re + other.re, combine(1, this.parts, 1, other.parts));
  }
  sub(other: MultiComplex | number): MultiComplex {
    return typeof other === 'number'
      ? new MultiComplex(this.re - other, this.parts)
      : new MultiComplex(this.re - other.re, combine(1, this.parts, -1, other.parts));
  }
  mul(other: MultiComplex | number): MultiComplex {
    return typeof other === 'number'
      ? new MultiComplex(this.re * other, scaled(this.parts, other))
      : new MultiComplex(this.re * other.re, combine(other.re, this.parts, this.re, other.parts));
  }
  div(other: MultiComplex | number): MultiComplex {
    if (typeof other === 'number') {
      return new MultiComplex(this.re / other, scaled(this.parts, 1 / other));
    }
    const q = this.re / other.re;
    return new MultiComplex(q, combine(1 / other.re, this.parts, -q / other.re, other.parts));
  }
  neg(): MultiComplex {
    return new MultiComplex(-this.re, scaled(this.parts, -1));
  }
  pow(exponent: MultiComplex | number): MultiComplex {
    if (typeof exponent === 'number') return this.power(exponent);
    if (exponent.parts === null) return this.power(exponent.re);
    return this.log().mul(exponent).exp();
  }
  exp(): MultiComplex {
    return this.apply(jets.exp(this.re));
  }
  log(): MultiComplex {
    return this.apply(jets.log(this.re));
  }
  sqrt(): MultiComplex {
    return this.apply(jets.sqrt(this.re));
  }
  sin(): MultiComplex {
    return this.apply(jets.sin(this.re));
  }
  cos(): MultiComplex {
    return this.apply(jets.cos(this.re));
  }
  sinh(): MultiComplex {
    return this.apply(jets.sinh(this.re));
  }
  cosh(): MultiComplex {
    return this.apply(jets.cosh(this.re));
  }
  tanh(): MultiComplex {
    return this.apply(jets.tanh(this.re));
  }
  coth(): MultiComplex {
    return this.apply(jets.coth(this.re));
  }
  abs(): MultiComplex {
    return this.re < 0 ? this.neg() : this;
  }
  lt(other: MultiComplex | number): boolean {
    return this.re < realPart(other);
  }
  le(other: MultiComplex | number): boolean {
    return this.re <= realPart(other);
  }
  gt(other: MultiComplex | number): boolean {
    return this.re > realPart(other);
  }
  ge(other: MultiComplex | number): boolean {
    return this.re >= realPart(other);
  }
  isFinite(): boolean {
    return Number.isFinite(this.re) && allFinite(this.parts);
  }

  /** The new step rides on an extra unit i₀; the result's parts are ∂(dg/dx)/∂(each unit). */
  derivativeOf(g: LiftedFunction<MultiComplex>): MultiComplex {
    const result = g(new LiftedMultiComplex(this.re, STEP, this.liftedParts()), liftMultiComplex);
    return new MultiComplex(result.lifted / STEP, scaled(result.cross, 1 / STEP));
  }

  /** The parts laid out as LiftedMultiComplex keeps them (cross parts zero), built once. */
  liftedParts(): Parts {
    if (this.lifted === undefined) this.lifted = withZeroCross(this.parts);
    return this.lifted;
  }
  private lifted: Parts | undefined;

  private power(p: number): MultiComplex {
    if (p === 0) return this.constant(1);
    if (p === 1) return this;
    return this.apply(jets.power(this.re, p));
  }
  private apply(jet: Jet): MultiComplex {
    return new MultiComplex(jet[0], scaled(this.parts, jet[1]));
  }
}

/**
 * A MultiComplex with one more unit i₀ (part `lifted`) and the cross parts i₀iⱼ: in every pair
 * (i₀, iⱼ) a bicomplex number. `d` holds the k parts on iⱼ followed by the k cross parts, in one
 * array so each operation allocates once.
 */
export class LiftedMultiComplex implements Scalar<LiftedMultiComplex> {
  constructor(
    readonly re: number,
    readonly lifted: number,
    readonly d: Parts,
  ) {}

  /** The cross parts i₀iⱼ, null when all are zero. */
  get cross(): Parts {
    return this.d === null ? null : this.d.slice(this.d.length / 2);
  }

  constant(value: number): LiftedMultiComplex {
    return new LiftedMultiComplex(value, 0, null);
  }
  add(other: LiftedMultiComplex | number): LiftedMultiComplex {
    return typeof other === 'number'
      ? new LiftedMultiComplex(this.re + other, this.lifted, this.d)
      : new LiftedMultiComplex(
          this.re + other.re,
          this.lifted + other.lifted,
          combine(1, this.d, 1, other.d),
        );
  }
  sub(other: LiftedMultiComplex | number): LiftedMultiComplex {
    return typeof other === 'number'
      ? new LiftedMultiComplex(this.re - other, this.lifted, this.d)
      : new LiftedMultiComplex(
          this.re - other.re,
          this.lifted - other.lifted,
          combine(1, this.d, -1, other.d),
        );
  }
  mul(other: LiftedMultiComplex | number): LiftedMultiComplex {
    if (typeof other === 'number') return this.scale(other);
    return new LiftedMultiComplex(
      this.re * other.re,
      this.re * other.lifted + this.lifted * other.re,
      product(this, other),
    );
  }
  div(other: LiftedMultiComplex | number): LiftedMultiComplex {
    if (typeof other === 'number') return this.scale(1 / other);
    return this.mul(other.apply(jets.reciprocal(other.re)));
  }
  neg(): LiftedMultiComplex {
    return this.scale(-1);
  }
  pow(exponent: LiftedMultiComplex | number): LiftedMultiComplex {
    if (typeof exponent === 'number') return this.power(exponent);
    if (exponent.lifted === 0 && exponent.d === null) return this.power(exponent.re);
    return this.powScalar(exponent);
  }
  exp(): LiftedMultiComplex {
    return this.apply(jets.exp(this.re));
  }
  log(): LiftedMultiComplex {
    return this.apply(jets.log(this.re));
  }
  sqrt(): LiftedMultiComplex {
    return this.apply(jets.sqrt(this.re));
  }
  sin(): LiftedMultiComplex {
    return this.apply(jets.sin(this.re));
  }
  cos(): LiftedMultiComplex {
    return this.apply(jets.cos(this.re));
  }
  sinh(): LiftedMultiComplex {
    return this.apply(jets.sinh(this.re));
  }
  cosh(): LiftedMultiComplex {
    return this.apply(jets.cosh(this.re));
  }
  tanh(): LiftedMultiComplex {
    return this.apply(jets.tanh(this.re));
  }
  coth(): LiftedMultiComplex {
    return this.apply(jets.coth(this.re));
  }
  abs(): LiftedMultiComplex {
    return this.re < 0 ? this.neg() : this;
  }
  lt(other: LiftedMultiComplex | number): boolean {
    return this.re < realPart(other);
  }
  le(other: LiftedMultiComplex | number): boolean {
    return this.re <= realPart(other);
  }
  gt(other: LiftedMultiComplex | number): boolean {
    return this.re > realPart(other);
  }
  ge(other: LiftedMultiComplex | number): boolean {
    return this.re >= realPart(other);
  }
  isFinite(): boolean {
    return Number.isFinite(this.re) && Number.isFinite(this.lifted) && allFinite(this.d);
  }

  private scale(factor: number): LiftedMultiComplex {
    return new LiftedMultiComplex(this.re * factor, this.lifted * factor, scaled(this.d, factor));
  }
  private power(p: number): LiftedMultiComplex {
    if (p === 0) return this.constant(1);
    if (p === 1) return this;
    return this.apply(jets.power(this.re, p));
  }
  /** exp(y·ln x) in one pass: Ogden's λ^α with α fitted, so worth not allocating thrice. */
  private powScalar(y: LiftedMultiComplex): LiftedMultiComplex {
    // 1^y = 1 with no parts (planar tests keep λ₂ = 1).
    if (this.re === 1 && this.lifted === 0 && this.d === null) return this;
    const ln = Math.log(this.re);
    const inverse = 1 / this.re;
    const lnLifted = this.lifted * inverse;
    const productLifted = y.re * lnLifted + y.lifted * ln;
    const e = Math.exp(y.re * ln);
    const [dx, dy] = [this.d, y.d];
    if (dx === null && dy === null) return new LiftedMultiComplex(e, e * productLifted, null);
    const k = (dx ?? dy)!.length / 2;
    const out = new Array<number>(2 * k);
    for (let j = 0; j < k; j++) {
      // Parts of ln x: b/a on iⱼ, d/a − b·c/a² on i₀iⱼ; then the product rule with y, then exp.
      const lnPart = dx === null ? 0 : dx[j]! * inverse;
      const lnCross = dx === null ? 0 : (dx[k + j]! - dx[j]! * lnLifted) * inverse;
      const yPart = dy === null ? 0 : dy[j]!;
      const yCross = dy === null ? 0 : dy[k + j]!;
      const part = y.re * lnPart + yPart * ln;
      const cross = y.re * lnCross + yCross * ln + lnPart * y.lifted + lnLifted * yPart;
      out[j] = e * part;
      out[k + j] = e * (cross + part * productLifted);
    }
    return new LiftedMultiComplex(e, e * productLifted, out);
  }
  /** f(x) to rounding: f′ on every part, plus f″·(iⱼ part)·(i₀ part) on each cross part. */
  private apply(jet: Jet): LiftedMultiComplex {
    const [value, first, second] = [jet[0], jet[1], jet[2]];
    const d = this.d;
    if (d === null) return new LiftedMultiComplex(value, first * this.lifted, null);
    const k = d.length / 2;
    const curvature = second * this.lifted;
    const out = new Array<number>(d.length);
    for (let j = 0; j < k; j++) {
      out[j] = first * d[j]!;
      out[k + j] = first * d[k + j]! + curvature * d[j]!;
    }
    return new LiftedMultiComplex(value, first * this.lifted, out);
  }
}

/** Parts of x·y: b·a′ + a·b′ on iⱼ, a·d′ + d·a′ + b·c′ + c·b′ on i₀iⱼ (the bicomplex rule). */
function product(x: LiftedMultiComplex, y: LiftedMultiComplex): Parts {
  const [dx, dy] = [x.d, y.d];
  if (dx === null) return dy === null ? null : oneSided(dy, x.re, x.lifted);
  if (dy === null) return oneSided(dx, y.re, y.lifted);
  const k = dx.length / 2;
  const out = new Array<number>(2 * k);
  for (let j = 0; j < k; j++) {
    out[j] = dx[j]! * y.re + x.re * dy[j]!;
    out[k + j] = x.re * dy[k + j]! + dx[k + j]! * y.re + dx[j]! * y.lifted + x.lifted * dy[j]!;
  }
  return out;
}

/** Parts of x·y when only y has any: a·b′ and a·d′ + c·b′. */
function oneSided(d: readonly number[], re: number, lifted: number): number[] {
  const k = d.length / 2;
  const out = new Array<number>(2 * k);
  for (let j = 0; j < k; j++) {
    out[j] = re * d[j]!;
    out[k + j] = re * d[k + j]! + lifted * d[j]!;
  }
  return out;
}

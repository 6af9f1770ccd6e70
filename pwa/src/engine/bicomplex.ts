import type { Complex } from './complex.js';
import { jets, type Jet } from './elementary.js';
import { realPart, type Scalar } from './scalar.js';

/**
 * Order-2 multicomplex number re + i1·i₁ + i2·i₂ + i12·i₁i₂ with i₁² = i₂² = −1 and
 * i₁i₂ = i₂i₁ (Lantoine, Russell & Dargent 2012). Perturbing x by STEP on both units leaves
 * f″(x)·STEP² in the i₁i₂ part, with no subtraction. Products that carry i₁² or i₂² are dropped:
 * with parts of order STEP they lie below rounding of the part they would land in
 * (the "accelerated" complex step, REFERENCES §1).
 */
export class Bicomplex implements Scalar<Bicomplex> {
  constructor(
    readonly re: number,
    readonly i1: number,
    readonly i2: number,
    readonly i12: number,
  ) {}

  /** A real or complex value (its imaginary part on i₁) as a bicomplex number. */
  static of(this: void, value: Complex | number): Bicomplex {
    return typeof value === 'number'
      ? new Bicomplex(value, 0, 0, 0)
      : new Bicomplex(value.re, value.im, 0, 0);
  }

  constant(value: number): Bicomplex {
    return new Bicomplex(value, 0, 0, 0);
  }
  add(other: Bicomplex | number): Bicomplex {
    return typeof other === 'number'
      ? new Bicomplex(this.re + other, this.i1, this.i2, this.i12)
      : new Bicomplex(
          this.re + other.re,
          this.i1 + other.i1,
          this.i2 + other.i2,
          this.i12 + other.i12,
        );
  }
  sub(other: Bicomplex | number): Bicomplex {
    return typeof other === 'number'
      ? new Bicomplex(this.re - other, this.i1, this.i2, this.i12)
      : new Bicomplex(
          this.re - other.re,
          this.i1 - other.i1,
          this.i2 - other.i2,
          this.i12 - other.i12,
        );
  }
  mul(other: Bicomplex | number): Bicomplex {
    if (typeof other === 'number') {
      return new Bicomplex(this.re * other, this.i1 * other, this.i2 * other, this.i12 * other);
    }
    return new Bicomplex(
      this.re * other.re,
      this.re * other.i1 + this.i1 * other.re,
      this.re * other.i2 + this.i2 * other.re,
      this.re * other.i12 + this.i1 * other.i2 + this.i2 * other.i1 + this.i12 * other.re,
    );
  }
  div(other: Bicomplex | number): Bicomplex {
    if (typeof other === 'number') return this.mul(1 / other);
    return this.mul(other.apply(jets.reciprocal(other.re)));
  }
  neg(): Bicomplex {
    return new Bicomplex(-this.re, -this.i1, -this.i2, -this.i12);
  }
  pow(exponent: Bicomplex | number): Bicomplex {
    if (typeof exponent === 'number') return this.power(exponent);
    if (exponent.i1 === 0 && exponent.i2 === 0 && exponent.i12 === 0) {
      return this.power(exponent.re);
    }
    return this.log().mul(exponent).exp();
  }
  exp(): Bicomplex {
    return this.apply(jets.exp(this.re));
  }
  log(): Bicomplex {
    return this.apply(jets.log(this.re));
  }
  sqrt(): Bicomplex {
    return this.apply(jets.sqrt(this.re));
  }
  sin(): Bicomplex {
    return this.apply(jets.sin(this.re));
  }
  cos(): Bicomplex {
    return this.apply(jets.cos(this.re));
  }
  sinh(): Bicomplex {
    return this.apply(jets.sinh(this.re));
  }
  cosh(): Bicomplex {
    return this.apply(jets.cosh(this.re));
  }
  tanh(): Bicomplex {
    return this.apply(jets.tanh(this.re));
  }
  coth(): Bicomplex {
    return this.apply(jets.coth(this.re));
  }
  abs(): Bicomplex {
    return this.re < 0 ? this.neg() : this;
  }
  lt(other: Bicomplex | number): boolean {
    return this.re < realPart(other);
  }
  le(other: Bicomplex | number): boolean {
    return this.re <= realPart(other);
  }
  gt(other: Bicomplex | number): boolean {
    return this.re > realPart(other);
  }
  ge(other: Bicomplex | number): boolean {
    return this.re >= realPart(other);
  }
  isFinite(): boolean {
    return (
      Number.isFinite(this.re) &&
      Number.isFinite(this.i1) &&
      Number.isFinite(this.i2) &&
      Number.isFinite(this.i12)
    );
  }

  private power(p: number): Bicomplex {
    if (p === 0) return new Bicomplex(1, 0, 0, 0);
    if (p === 1) return this;
    return this.apply(jets.power(this.re, p));
  }
  /** f(x) = f(a) + f′(a)(i1·i₁ + i2·i₂ + i12·i₁i₂) + f″(a)·i1·i2·i₁i₂ to rounding. */
  private apply([value, first, second]: Jet): Bicomplex {
    return new Bicomplex(
      value,
      first * this.i1,
      first * this.i2,
      first * this.i12 + second * this.i1 * this.i2,
    );
  }
}

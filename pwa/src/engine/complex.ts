import { Bicomplex } from './bicomplex.js';
import { jets, type Jet } from './elementary.js';
import { realPart, STEP, type Liftable, type LiftedFunction } from './scalar.js';

/**
 * re + im·i with im of order STEP (complex step, REFERENCES §1). Products of two imaginary
 * parts are dropped: they are STEP² relative to the real part, far below rounding.
 */
export class Complex implements Liftable<Complex> {
  constructor(
    readonly re: number,
    readonly im: number,
  ) {}

  constant(value: number): Complex {
    return new Complex(value, 0);
  }
  add(other: Complex | number): Complex {
    return typeof other === 'number'
      ? new Complex(this.re + other, this.im)
      : new Complex(this.re + other.re, this.im + other.im);
  }
  sub(other: Complex | number): Complex {
    return typeof other === 'number'
      ? new Complex(this.re - other, this.im)
      : new Complex(this.re - other.re, this.im - other.im);
  }
  mul(other: Complex | number): Complex {
    return typeof other === 'number'
      ? new Complex(this.re * other, this.im * other)
      : new Complex(this.re * other.re, this.re * other.im + this.im * other.re);
  }
  div(other: Complex | number): Complex {
    if (typeof other === 'number') return new Complex(this.re / other, this.im / other);
    const q = this.re / other.re;
    return new Complex(q, (this.im - q * other.im) / other.re);
  }
  neg(): Complex {
    return new Complex(-this.re, -this.im);
  }
  pow(exponent: Complex | number): Complex {
    if (typeof exponent === 'number') return this.power(exponent);
    if (exponent.im === 0) return this.power(exponent.re);
    return this.log().mul(exponent).exp();
  }
  exp(): Complex {
    return this.apply(jets.exp(this.re));
  }
  log(): Complex {
    return this.apply(jets.log(this.re));
  }
  sqrt(): Complex {
    return this.apply(jets.sqrt(this.re));
  }
  sin(): Complex {
    return this.apply(jets.sin(this.re));
  }
  cos(): Complex {
    return this.apply(jets.cos(this.re));
  }
  sinh(): Complex {
    return this.apply(jets.sinh(this.re));
  }
  cosh(): Complex {
    return this.apply(jets.cosh(this.re));
  }
  tanh(): Complex {
    return this.apply(jets.tanh(this.re));
  }
  coth(): Complex {
    return this.apply(jets.coth(this.re));
  }
  abs(): Complex {
    return this.re < 0 ? this.neg() : this;
  }
  lt(other: Complex | number): boolean {
    return this.re < realPart(other);
  }
  le(other: Complex | number): boolean {
    return this.re <= realPart(other);
  }
  gt(other: Complex | number): boolean {
    return this.re > realPart(other);
  }
  ge(other: Complex | number): boolean {
    return this.re >= realPart(other);
  }
  isFinite(): boolean {
    return Number.isFinite(this.re) && Number.isFinite(this.im);
  }

  /** The second unit i₂ carries the new step; this number's own part rides on i₁. */
  derivativeOf(g: LiftedFunction<Complex>): Complex {
    const result = g(new Bicomplex(this.re, this.im, STEP, 0), Bicomplex.of);
    return new Complex(result.i2 / STEP, result.i12 / STEP);
  }

  private power(p: number): Complex {
    if (p === 0) return new Complex(1, 0);
    if (p === 1) return this;
    return this.apply(jets.power(this.re, p));
  }
  private apply([value, first]: Jet): Complex {
    return new Complex(value, first * this.im);
  }
}

import { Complex } from './complex.js';
import { realPart, STEP, type Liftable, type LiftedFunction } from './scalar.js';

function liftReal(value: Real | number): Complex {
  return new Complex(realPart(value), 0);
}

/** A plain real number behind the scalar interface, for evaluating generic formulas. */
export class Real implements Liftable<Real> {
  constructor(readonly re: number) {}

  constant(value: number): Real {
    return new Real(value);
  }
  add(other: Real | number): Real {
    return new Real(this.re + realPart(other));
  }
  sub(other: Real | number): Real {
    return new Real(this.re - realPart(other));
  }
  mul(other: Real | number): Real {
    return new Real(this.re * realPart(other));
  }
  div(other: Real | number): Real {
    return new Real(this.re / realPart(other));
  }
  neg(): Real {
    return new Real(-this.re);
  }
  pow(exponent: Real | number): Real {
    return new Real(this.re ** realPart(exponent));
  }
  exp(): Real {
    return new Real(Math.exp(this.re));
  }
  log(): Real {
    return new Real(Math.log(this.re));
  }
  sqrt(): Real {
    return new Real(Math.sqrt(this.re));
  }
  sin(): Real {
    return new Real(Math.sin(this.re));
  }
  cos(): Real {
    return new Real(Math.cos(this.re));
  }
  sinh(): Real {
    return new Real(Math.sinh(this.re));
  }
  cosh(): Real {
    return new Real(Math.cosh(this.re));
  }
  tanh(): Real {
    return new Real(Math.tanh(this.re));
  }
  coth(): Real {
    return new Real(1 / Math.tanh(this.re));
  }
  abs(): Real {
    return new Real(Math.abs(this.re));
  }
  lt(other: Real | number): boolean {
    return this.re < realPart(other);
  }
  le(other: Real | number): boolean {
    return this.re <= realPart(other);
  }
  gt(other: Real | number): boolean {
    return this.re > realPart(other);
  }
  ge(other: Real | number): boolean {
    return this.re >= realPart(other);
  }
  isFinite(): boolean {
    return Number.isFinite(this.re);
  }

  derivativeOf(g: LiftedFunction<Real>): Real {
    const result = g(new Complex(this.re, STEP), liftReal);
    return new Real(result.im / STEP);
  }
}

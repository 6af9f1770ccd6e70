import {
  add,
  complex,
  cos,
  cosh,
  coth,
  divide,
  exp,
  log,
  multiply,
  pow,
  sin,
  sinh,
  sqrt,
  subtract,
  tanh,
  type Complex as MathComplex,
} from 'mathjs';
import { describe, expect, it } from 'vitest';
import { Bicomplex } from './bicomplex.js';
import { Complex } from './complex.js';
import { secondDerivative } from './derivatives.js';
import { relativeError } from './fixtures/finite-differences.js';
import { Real } from './real.js';
import { STEP } from './scalar.js';

// The scalar types drop products of two perturbation parts; with parts of size STEP that must
// leave the result equal to full complex arithmetic (complex.js inside mathjs, whose exp, log,
// sqrt, pow, trig and hyperbolic functions are exact for tiny imaginary parts: REFERENCES §1).
const a = 1.37;
const ours = new Complex(a, 0.8 * STEP);
const full = complex(a, 0.8 * STEP);

type Full = MathComplex;
const unary: [string, (z: Complex) => Complex, (z: Full) => Full][] = [
  ['exp', (z) => z.exp(), (z) => exp(z)],
  ['log', (z) => z.log(), (z) => log(z)],
  ['sqrt', (z) => z.sqrt(), (z) => sqrt(z)],
  ['sin', (z) => z.sin(), (z) => sin(z)],
  ['cos', (z) => z.cos(), (z) => cos(z)],
  ['sinh', (z) => z.sinh(), (z) => sinh(z)],
  ['cosh', (z) => z.cosh(), (z) => cosh(z)],
  ['tanh', (z) => z.tanh(), (z) => tanh(z)],
  ['coth', (z) => z.coth(), (z) => coth(z)],
  ['pow 2.7', (z) => z.pow(2.7), (z) => pow(z, 2.7) as Full],
  ['pow −3', (z) => z.pow(-3), (z) => pow(z, -3) as Full],
  ['pow z', (z) => z.pow(z), (z) => pow(z, z) as Full],
  ['1/z', (z) => z.constant(1).div(z), (z) => divide(1, z) as Full],
  ['z·(z+2)', (z) => z.mul(z.add(2)), (z) => multiply(z, add(z, 2)) as Full],
  ['(z−5)/(z+2)', (z) => z.sub(5).div(z.add(2)), (z) => divide(subtract(z, 5), add(z, 2)) as Full],
];

describe('Complex agrees with full complex arithmetic (complex.js) at step size', () => {
  it.each(unary)('%s', (_, f, g) => {
    const mine = f(ours);
    const theirs = g(full);
    expect(relativeError(mine.re, theirs.re)).toBeLessThanOrEqual(2e-16);
    expect(relativeError(mine.im, theirs.im)).toBeLessThanOrEqual(4e-16);
  });
});

describe('scalar semantics (REFERENCES §1 pitfalls)', () => {
  it('abs is the complexified one and comparisons read the real part', () => {
    const z = new Complex(-2, 3 * STEP);
    expect(z.abs().im).toBe(-3 * STEP);
    expect(new Complex(2, 3 * STEP).abs().im).toBe(3 * STEP);
    expect(z.lt(new Complex(-2, 5))).toBe(false);
    expect(z.le(-2)).toBe(true);
    expect(new Bicomplex(1, 1, 1, 1).gt(0.5)).toBe(true);
  });

  it('integer powers work at a zero real part, as (I1 − 3)² needs at λ = 1', () => {
    // d²/dx² x² at 0 is 2; x³ and its first derivative vanish there.
    expect(secondDerivative((x) => x.pow(2), 0)).toBe(2);
    expect(secondDerivative((x) => x.pow(3), 0)).toBe(0);
    expect(new Complex(0, STEP).pow(new Complex(2, 0)).im).toBe(0);
  });

  it('Real evaluates the same formula in plain numbers', () => {
    const r = new Real(0.5);
    expect(r.pow(r).re).toBe(0.5 ** 0.5);
    expect(r.coth().re).toBe(1 / Math.tanh(0.5));
  });
});

describe('Bicomplex second derivatives of elementary functions [D]', () => {
  const x = 0.83;
  const cases: [string, (z: Bicomplex) => Bicomplex, number][] = [
    ['exp', (z) => z.exp(), Math.exp(x)],
    ['log', (z) => z.log(), -1 / x ** 2],
    ['sqrt', (z) => z.sqrt(), -0.25 * x ** -1.5],
    ['sin', (z) => z.sin(), -Math.sin(x)],
    ['tanh', (z) => z.tanh(), (-2 * Math.tanh(x)) / Math.cosh(x) ** 2],
    ['coth', (z) => z.coth(), (2 * Math.cosh(x)) / Math.sinh(x) ** 3],
    ['x^x', (z) => z.pow(z), x ** x * ((Math.log(x) + 1) ** 2 + 1 / x)],
    ['1/(1+x²)', (z) => z.constant(1).div(z.mul(z).add(1)), (6 * x * x - 2) / (1 + x * x) ** 3],
  ];
  it.each(cases)('%s', (_, f, exact) => {
    expect(relativeError(secondDerivative(f, x), exact)).toBeLessThanOrEqual(1e-14);
  });
});

import { describe, expect, it } from 'vitest';
import { relativeError } from './fixtures/finite-differences.js';
import { EXAMPLE_MODELS } from './fixtures/models.js';
import type { ModelOf } from './material-model.js';
import { MultiComplex } from './multicomplex.js';
import { STEP, type Scalar } from './scalar.js';
import { uncheckedStress } from './stress.js';

/* Several complex steps at once, against closed-form partial derivatives [D]. */

describe('MultiComplex gradient in one evaluation', () => {
  it('f(x, y, z) = x² e^y / z + sin(xz) + x^y', () => {
    const f = <T extends Scalar<T>>([x, y, z]: T[]): T =>
      x!.mul(x!).mul(y!.exp()).div(z!).add(x!.mul(z!).sin()).add(x!.pow(y!));
    const [x, y, z] = [1.3, 0.4, 2.1];
    const value = f(MultiComplex.seed([x, y, z]));
    const exact = [
      (2 * x * Math.exp(y)) / z + z * Math.cos(x * z) + y * x ** (y - 1),
      (x * x * Math.exp(y)) / z + x ** y * Math.log(x),
      (-x * x * Math.exp(y)) / (z * z) + x * Math.cos(x * z),
    ];
    exact.forEach((d, j) => expect(relativeError(value.part(j) / STEP, d)).toBeLessThan(1e-14));
  });
});

describe('lifted MultiComplex: a whole row of mixed second derivatives', () => {
  it('g(t; a, b, c) = a t³ + e^(b t) c^t: ∂g/∂t and ∂²g/∂t∂(a, b, c)', () => {
    const [a, b, c, t] = [0.7, 0.3, 1.9, 1.4];
    const [sa, sb, sc] = MultiComplex.seed([a, b, c]);
    const dgdt = new MultiComplex(t, null).derivativeOf((u, lift) =>
      u
        .pow(3)
        .mul(lift(sa!))
        .add(u.mul(lift(sb!)).exp().mul(lift(sc!).pow(u))),
    );
    const e = Math.exp(b * t);
    const ct = c ** t;
    expect(relativeError(dgdt.re, 3 * a * t * t + b * e * ct + e * ct * Math.log(c))).toBeLessThan(
      1e-14,
    );
    const exact = [
      3 * t * t,
      e * ct * (1 + b * t + t * Math.log(c)),
      e * (t * c ** (t - 1)) * (b + Math.log(c)) + e * c ** (t - 1),
    ];
    exact.forEach((d, j) => expect(relativeError(dgdt.part(j) / STEP, d)).toBeLessThan(1e-13));
  });

  it('gives the Ogden Jacobian row of the uniaxial stress (closed form of REFERENCES §2 [D])', () => {
    // P = Σ μ(λ^(α−1) − λ^(−α/2−1)); ∂P/∂μ and ∂P/∂α by hand.
    const model = EXAMPLE_MODELS.ogden;
    const values = model.terms.flatMap((term) => [term.mu, term.alpha]);
    const seeds = MultiComplex.seed(values);
    const stepped: ModelOf<MultiComplex> = {
      kind: 'ogden',
      terms: model.terms.map((_, p) => ({ mu: seeds[2 * p]!, alpha: seeds[2 * p + 1]! })),
    };
    const l = 2.7;
    const row = uncheckedStress(stepped, 'uniaxial', new MultiComplex(l, null));
    model.terms.forEach(({ mu, alpha }, p) => {
      const [up, down] = [l ** (alpha - 1), l ** (-alpha / 2 - 1)];
      expect(relativeError(row.part(2 * p) / STEP, up - down)).toBeLessThan(1e-13);
      const dAlpha = mu * Math.log(l) * (up + 0.5 * down);
      expect(relativeError(row.part(2 * p + 1) / STEP, dAlpha)).toBeLessThan(1e-13);
    });
  });
});

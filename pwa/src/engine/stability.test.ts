import { describe, expect, it } from 'vitest';
import { MODE_GEOMETRY } from './fixtures/closed-forms.js';
import { EXAMPLE_MODELS } from './fixtures/models.js';
import type { MaterialModel, Mode } from './material-model.js';
import { druckerHessian, stabilityOf } from './stability.js';

/*
 * Drucker stability: Hessian of Ŵ(ε₁, ε₂) = W(e^ε₁, e^ε₂, e^(−ε₁−ε₂)) positive definite
 * (REFERENCES §4). For Mooney–Rivlin, with s = ε₁ + ε₂, the Hessian in closed form is [D]
 *   H₁₁ = 4C10(e^(2ε₁) + e^(−2s)) + 4C01(e^(−2ε₁) + e^(2s)), H₁₂ = 4C10 e^(−2s) + 4C01 e^(2s),
 *   H₂₂ = 4C10(e^(2ε₂) + e^(−2s)) + 4C01(e^(−2ε₂) + e^(2s)).
 */
function mooneyRivlinMinEigen(c10: number, c01: number, e1: number, e2: number): number {
  const s = e1 + e2;
  const h11 =
    4 * c10 * (Math.exp(2 * e1) + Math.exp(-2 * s)) +
    4 * c01 * (Math.exp(-2 * e1) + Math.exp(2 * s));
  const h12 = 4 * c10 * Math.exp(-2 * s) + 4 * c01 * Math.exp(2 * s);
  const h22 =
    4 * c10 * (Math.exp(2 * e2) + Math.exp(-2 * s)) +
    4 * c01 * (Math.exp(-2 * e2) + Math.exp(2 * s));
  return 0.5 * (h11 + h22) - Math.hypot(0.5 * (h11 - h22), h12);
}

/** Principal log strains (ε₁, ε₂) of each test at λ. */
const LOG_STRAINS: Record<Mode, (l: number) => [number, number]> = {
  uniaxial: (l) => [Math.log(l), -0.5 * Math.log(l)],
  equibiaxial: (l) => [Math.log(l), Math.log(l)],
  planar: (l) => [Math.log(l), 0],
};

describe('Drucker Hessian', () => {
  it('neo-Hookean C10 = 0.2, uniaxial λ = 2: [[3.6, 0.4], [0.4, 0.8]] (REFERENCES §4 [D])', () => {
    const h = druckerHessian(EXAMPLE_MODELS['neo-hookean'], 'uniaxial', 2);
    const expected = [
      [3.6, 0.4],
      [0.4, 0.8],
    ];
    h.forEach((row, i) => row.forEach((v, j) => expect(v).toBeCloseTo(expected[i]![j]!, 14)));
  });
});

describe('stability scan over λ ∈ [0.1, 10]', () => {
  it('neo-Hookean and positive Mooney–Rivlin are stable and monotonic everywhere', () => {
    for (const model of [EXAMPLE_MODELS['neo-hookean'], EXAMPLE_MODELS['mooney-rivlin']]) {
      for (const path of Object.values(stabilityOf(model))) {
        for (const side of [path.tension, path.compression]) {
          expect(side).toEqual({
            firstUnstableStretch: null,
            firstNonMonotonicStretch: null,
            limitStretch: null,
          });
        }
      }
    }
  });

  it('Mooney–Rivlin with negative C01 loses Drucker stability where the closed-form Hessian does', () => {
    const [c10, c01] = [0.2, -0.05];
    const model: MaterialModel = { kind: 'mooney-rivlin', c10, c01 };
    const stability = stabilityOf(model);
    let found = 0;
    for (const mode of ['uniaxial', 'equibiaxial', 'planar'] as const) {
      for (const side of ['tension', 'compression'] as const) {
        const at = stability[mode][side].firstUnstableStretch;
        if (at === null) continue;
        found++;
        // Just inside the reported stretch the closed form is still positive, just beyond it not.
        const inside = side === 'tension' ? at * (1 - 1e-7) : at * (1 + 1e-7);
        const beyond = side === 'tension' ? at * (1 + 1e-7) : at * (1 - 1e-7);
        expect(mooneyRivlinMinEigen(c10, c01, ...LOG_STRAINS[mode](inside))).toBeGreaterThan(0);
        expect(mooneyRivlinMinEigen(c10, c01, ...LOG_STRAINS[mode](beyond))).toBeLessThanOrEqual(0);
      }
    }
    expect(found).toBeGreaterThan(0);
  });

  it('non-monotonic stress is found where the closed-form dP/dλ changes sign (REFERENCES §2)', () => {
    // Uniaxial Mooney–Rivlin: P = c(λ)(C10 + C01/λ) turns over in compression when C01 < 0 [D].
    const [c10, c01] = [0.2, -0.05];
    const at = stabilityOf({ kind: 'mooney-rivlin', c10, c01 }).uniaxial.compression
      .firstNonMonotonicStretch!;
    const g = MODE_GEOMETRY.uniaxial;
    const slope = (l: number) => g.cSlope(l) * (c10 + c01 * g.k(l)) + g.c(l) * g.kSlope(l) * c01;
    expect(slope(at * (1 + 1e-7))).toBeGreaterThan(0);
    expect(slope(at * (1 - 1e-7))).toBeLessThanOrEqual(0);
  });

  it('Gent stops at its limiting stretch, I1 − 3 = Jm (Gent 1996)', () => {
    const jm = 20;
    const limit = stabilityOf({ kind: 'gent', mu: 0.3, jm }).uniaxial.tension.limitStretch!;
    expect(MODE_GEOMETRY.uniaxial.i1(limit) - 3).toBeCloseTo(jm, 8);
  });

  it('Arruda–Boyce stops where the chains lock, I1 = 3N (Arruda & Boyce 1993)', () => {
    const n = 8;
    const limit = stabilityOf({ kind: 'arruda-boyce', mu: 0.3, n }).equibiaxial.tension
      .limitStretch!;
    expect(MODE_GEOMETRY.equibiaxial.i1(limit) / 3).toBeCloseTo(n, 8);
  });

  it('a model unstable at λ = 1 (μ₀ < 0) is reported unstable from 1', () => {
    const stability = stabilityOf({ kind: 'neo-hookean', c10: -0.1 });
    expect(stability.planar.tension.firstUnstableStretch).toBe(1);
    expect(stability.planar.compression.firstNonMonotonicStretch).toBe(1);
  });
});

import { describe, expect, it } from 'vitest';
import { invariantClosedForm } from './fixtures/closed-forms.js';
import { relativeError } from './fixtures/finite-differences.js';
import { EXAMPLE_MODELS } from './fixtures/models.js';
import type { MaterialModel, Mode } from './material-model.js';
import {
  initialShearModulus,
  initialYoungsModulus,
  nominalStress,
  tangentStiffness,
} from './stress.js';

/*
 * Closed-form stresses and tangents, used only here as outside references (REFERENCES §2):
 * the invariant models through fixtures/closed-forms.ts, Ogden directly.
 */

/** W₁ and dW₁/dI₁ at I₁, and the constant W₂, of the built-in invariant models. */
type InvariantDerivatives = (i1: number) => { w1: number; w11: number; w2: number };

/** L⁻¹(x) by bisection on coth β − 1/β in plain numbers: independent of the engine's Newton. */
function inverseLangevinByBisection(x: number): number {
  let [lo, hi] = [1e-9, 1e4];
  for (let k = 0; k < 200; k++) {
    const mid = 0.5 * (lo + hi);
    if (1 / Math.tanh(mid) - 1 / mid < x) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

function invariantDerivatives(model: MaterialModel): InvariantDerivatives | null {
  switch (model.kind) {
    case 'neo-hookean':
      return () => ({ w1: model.c10, w11: 0, w2: 0 });
    case 'mooney-rivlin':
      return () => ({ w1: model.c10, w11: 0, w2: model.c01 });
    case 'yeoh':
      return (i1) => {
        const j = i1 - 3;
        return {
          w1: model.c10 + 2 * model.c20 * j + 3 * model.c30 * j * j,
          w11: 2 * model.c20 + 6 * model.c30 * j,
          w2: 0,
        };
      };
    case 'gent':
      // W₁ = (μ/2) / (1 − (I₁ − 3)/Jm) [D from Gent 1996].
      return (i1) => {
        const f = 1 - (i1 - 3) / model.jm;
        return { w1: model.mu / (2 * f), w11: model.mu / (2 * model.jm * f * f), w2: 0 };
      };
    case 'arruda-boyce':
      // W₁ = μβ/(6x), x = √(I₁/3N), β = L⁻¹(x), dβ/dx = 1/L′(β) [D from Arruda & Boyce 1993].
      return (i1) => {
        const x = Math.sqrt(i1 / (3 * model.n));
        const beta = inverseLangevinByBisection(x);
        const betaSlope = 1 / (beta ** -2 - Math.sinh(beta) ** -2);
        const xSlope = 1 / (6 * model.n * x);
        return {
          w1: (model.mu * beta) / (6 * x),
          w11: ((model.mu / 6) * (betaSlope * x - beta) * xSlope) / (x * x),
          w2: 0,
        };
      };
    case 'formula':
      // The example energy C1(I1−3) + C2(I1−3)² + C3(I2−3).
      return (i1) => {
        const { C1, C2, C3 } = model.constants as Record<'C1' | 'C2' | 'C3', number>;
        return { w1: C1 + 2 * C2 * (i1 - 3), w11: 2 * C2, w2: C3 };
      };
    case 'ogden':
      return null;
  }
}

/** Ogden (1972) closed forms: P = Σ μ(λ^(α−1) − λ^(−qα−1)), q = ½, 2, 1 by mode [S/D]. */
const OGDEN_Q: Record<Mode, number> = { uniaxial: 0.5, equibiaxial: 2, planar: 1 };

function closedForm(
  model: MaterialModel,
  mode: Mode,
  l: number,
): { stress: number; tangent: number } {
  if (model.kind === 'ogden') {
    const q = OGDEN_Q[mode];
    return model.terms.reduce(
      (sum, { mu, alpha }) => ({
        stress: sum.stress + mu * (l ** (alpha - 1) - l ** (-q * alpha - 1)),
        tangent:
          sum.tangent +
          mu * ((alpha - 1) * l ** (alpha - 2) + (q * alpha + 1) * l ** (-q * alpha - 2)),
      }),
      { stress: 0, tangent: 0 },
    );
  }
  const derivatives = invariantDerivatives(model)!;
  return invariantClosedForm(mode, l, (i1) => ({ ...derivatives(i1), w12: 0, w22: 0 }));
}

const MODES: Mode[] = ['uniaxial', 'equibiaxial', 'planar'];
const STRETCHES = [0.5, 0.8, 1.3, 2.2, 3.5];
const CASES = Object.values(EXAMPLE_MODELS).flatMap((model) =>
  MODES.flatMap((mode) => STRETCHES.map((l) => [model.kind, mode, l, model] as const)),
);

describe('stresses and tangents from W match the closed forms of REFERENCES §2 to 1e-13', () => {
  it.each(CASES)('%s %s λ = %d', (_, mode, l, model) => {
    const reference = closedForm(model, mode, l);
    expect(relativeError(nominalStress(model, mode, l), reference.stress)).toBeLessThanOrEqual(
      1e-13,
    );
    expect(relativeError(tangentStiffness(model, mode, l), reference.tangent)).toBeLessThanOrEqual(
      1e-13,
    );
  });
});

describe('check values of REFERENCES §2 [D, 30-digit arithmetic]', () => {
  it('neo-Hookean C10 = 0.2 at λ = 2: 0.7, 0.7875, 0.75', () => {
    const nh = EXAMPLE_MODELS['neo-hookean'];
    expect(relativeError(nominalStress(nh, 'uniaxial', 2), 0.7)).toBeLessThanOrEqual(1e-15);
    expect(relativeError(nominalStress(nh, 'equibiaxial', 2), 0.7875)).toBeLessThanOrEqual(1e-15);
    expect(relativeError(nominalStress(nh, 'planar', 2), 0.75)).toBeLessThanOrEqual(1e-15);
  });

  it('Mooney–Rivlin C10 = 0.16, C01 = 0.04, equibiaxial λ = 3: 3.11572016460905', () => {
    const mr = EXAMPLE_MODELS['mooney-rivlin'];
    expect(
      relativeError(nominalStress(mr, 'equibiaxial', 3), 3.11572016460905),
    ).toBeLessThanOrEqual(1e-14);
  });
});

describe('initial moduli (REFERENCES §2 table)', () => {
  const mu0 = (model: MaterialModel) => initialShearModulus(model);
  it('μ₀ = 2C10, 2(C10 + C01), 2C10, ½Σμα, μ', () => {
    expect(relativeError(mu0(EXAMPLE_MODELS['neo-hookean']), 0.4)).toBeLessThan(1e-15);
    expect(relativeError(mu0(EXAMPLE_MODELS['mooney-rivlin']), 0.4)).toBeLessThan(1e-15);
    expect(relativeError(mu0(EXAMPLE_MODELS.yeoh), 0.38)).toBeLessThan(1e-15);
    expect(
      relativeError(
        mu0(EXAMPLE_MODELS.ogden),
        0.5 * (0.61782 * 1.3 + 0.0011768 * 5 + 0.0098067 * 2),
      ),
    ).toBeLessThan(1e-15);
    expect(relativeError(mu0(EXAMPLE_MODELS.gent), 0.3)).toBeLessThan(1e-15);
    expect(initialYoungsModulus(EXAMPLE_MODELS.gent)).toBeCloseTo(0.9, 14);
  });

  it('Ogden 1972 constants give μ₀ ≈ 0.414 MPa (REFERENCES §3 [M])', () => {
    expect(mu0(EXAMPLE_MODELS.ogden)).toBeCloseTo(0.414, 3);
  });

  it('Arruda–Boyce: μ₀ = μ·(√N/3)·L⁻¹(1/√N) exactly, μ(1 + 3/5N + …) in series [D]', () => {
    // The table's "μ" is the large-N limit; the exact eight-chain energy is slightly stiffer.
    const { mu, n } = EXAMPLE_MODELS['arruda-boyce'] as { mu: number; n: number };
    const exact = ((mu * Math.sqrt(n)) / 3) * inverseLangevinByBisection(1 / Math.sqrt(n));
    expect(relativeError(mu0(EXAMPLE_MODELS['arruda-boyce']), exact)).toBeLessThan(1e-13);
    expect(relativeError(exact, mu * (1 + 3 / (5 * n) + 99 / (175 * n * n)))).toBeLessThan(1e-4);
  });
});

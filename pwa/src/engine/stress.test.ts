import { describe, expect, it } from 'vitest';
import { closedForm, inverseLangevinByBisection } from './fixtures/closed-forms.js';
import { relativeError } from './fixtures/finite-differences.js';
import { EXAMPLE_MODELS } from './fixtures/models.js';
import type { MaterialModel, Mode } from './material-model.js';
import {
  initialShearModulus,
  initialYoungsModulus,
  nominalStress,
  tangentStiffness,
} from './stress.js';

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

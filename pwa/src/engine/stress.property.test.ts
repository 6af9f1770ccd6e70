import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EngineInputError } from './errors.js';
import { EXAMPLE_MODELS } from './fixtures/models.js';
import type { MaterialModel, Mode } from './material-model.js';
import { nominalStress, tangentStiffness } from './stress.js';

/*
 * Identities every incompressible model satisfies (REFERENCES §2 [D]): P(1) = 0;
 * P_uniaxial(λ⁻²) = −λ³ P_equibiaxial(λ) (the same state, loaded the other way);
 * P_planar(λ) = −λ⁻² P_planar(1/λ).
 */

const modulus = fc.double({ min: 0.05, max: 2, noNaN: true });
const small = fc.double({ min: -0.01, max: 0.01, noNaN: true });
const alpha = fc.oneof(
  fc.double({ min: -4, max: -0.5, noNaN: true }),
  fc.double({ min: 0.5, max: 6, noNaN: true }),
);

const anyModel: fc.Arbitrary<MaterialModel> = fc.oneof(
  modulus.map((c10): MaterialModel => ({ kind: 'neo-hookean', c10 })),
  fc
    .tuple(modulus, modulus)
    .map(([c10, c01]): MaterialModel => ({ kind: 'mooney-rivlin', c10, c01 })),
  fc
    .tuple(modulus, small, fc.double({ min: 0, max: 1e-4, noNaN: true }))
    .map(([c10, c20, c30]): MaterialModel => ({ kind: 'yeoh', c10, c20, c30 })),
  fc
    .array(fc.tuple(modulus, alpha), { minLength: 1, maxLength: 3 })
    .map((terms): MaterialModel => ({
      kind: 'ogden',
      terms: terms.map(([mu, a]) => ({ mu, alpha: a })),
    })),
  fc
    .tuple(modulus, fc.double({ min: 40, max: 200, noNaN: true }))
    .map(([mu, jm]): MaterialModel => ({ kind: 'gent', mu, jm })),
  fc
    .tuple(modulus, fc.double({ min: 20, max: 100, noNaN: true }))
    .map(([mu, n]): MaterialModel => ({ kind: 'arruda-boyce', mu, n })),
  fc.tuple(modulus, small, modulus).map(([C1, C2, C3]): MaterialModel => ({
    kind: 'formula',
    energy: EXAMPLE_MODELS.formula.energy,
    constants: { C1, C2, C3 },
  })),
);

// Stretches kept where Gent (Jm ≥ 40) and Arruda–Boyce (N ≥ 20) are still defined.
const stretch = fc.double({ min: 0.6, max: 1.8, noNaN: true });
const MODES: Mode[] = ['uniaxial', 'equibiaxial', 'planar'];

function near(a: number, b: number): boolean {
  return Math.abs(a - b) <= 1e-12 * (Math.abs(a) + Math.abs(b)) + 1e-14;
}

describe('stress identities (REFERENCES §2 [D])', () => {
  it('P(1) = 0 in every mode', () => {
    fc.assert(
      fc.property(anyModel, fc.constantFrom(...MODES), (model, mode) =>
        near(nominalStress(model, mode, 1), 0),
      ),
    );
  });

  it('P_uniaxial(λ⁻²) = −λ³ P_equibiaxial(λ)', () => {
    fc.assert(
      fc.property(anyModel, stretch, (model, l) =>
        near(
          nominalStress(model, 'uniaxial', l ** -2),
          -(l ** 3) * nominalStress(model, 'equibiaxial', l),
        ),
      ),
    );
  });

  it('P_planar(λ) = −λ⁻² P_planar(1/λ)', () => {
    fc.assert(
      fc.property(anyModel, stretch, (model, l) =>
        near(nominalStress(model, 'planar', l), -(l ** -2) * nominalStress(model, 'planar', 1 / l)),
      ),
    );
  });
});

describe('input guards', () => {
  const badStretch = fc.oneof(
    fc.double({ max: 0, noNaN: true }),
    fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY),
  );

  it('stretch ≤ 0, NaN or infinite throws EngineInputError on the stretch', () => {
    fc.assert(
      fc.property(anyModel, fc.constantFrom(...MODES), badStretch, (model, mode, l) => {
        for (const f of [nominalStress, tangentStiffness]) {
          expect(() => f(model, mode, l)).toThrow(
            expect.objectContaining({
              name: 'EngineInputError',
              field: 'stretch',
            }),
          );
        }
      }),
    );
  });

  it('non-finite constants, bad mode, and model limits are refused by name', () => {
    const cases: [MaterialModel, Mode, number, string][] = [
      [{ kind: 'neo-hookean', c10: Number.NaN }, 'uniaxial', 2, 'c10'],
      [{ kind: 'ogden', terms: [{ mu: 0.4, alpha: 0 }] }, 'uniaxial', 2, 'terms[0].alpha'],
      [{ kind: 'ogden', terms: [] }, 'uniaxial', 2, 'terms'],
      [{ kind: 'gent', mu: 0.3, jm: -1 }, 'uniaxial', 2, 'jm'],
      [{ kind: 'gent', mu: 0.3, jm: 5 }, 'uniaxial', 3, 'stretch'],
      [{ kind: 'arruda-boyce', mu: 0.3, n: 1 }, 'uniaxial', 2, 'n'],
      [{ kind: 'arruda-boyce', mu: 0.3, n: 4 }, 'uniaxial', 4, 'stretch'],
      [{ kind: 'formula', energy: 'C (I1 - 3', constants: { C: 1 } }, 'uniaxial', 2, 'energy'],
      [{ kind: 'formula', energy: 'K (I1 - 3)', constants: { C: 1 } }, 'uniaxial', 2, 'energy'],
      [{ kind: 'neo-hookean', c10: 0.2 }, 'shear' as Mode, 2, 'mode'],
      [{ kind: 'hyper' } as unknown as MaterialModel, 'uniaxial', 2, 'kind'],
    ];
    for (const [model, mode, l, field] of cases) {
      let caught: unknown;
      try {
        nominalStress(model, mode, l);
      } catch (error) {
        caught = error;
      }
      expect(caught, `${model.kind} ${field}`).toBeInstanceOf(EngineInputError);
      expect((caught as EngineInputError).field).toBe(field);
    }
  });
});

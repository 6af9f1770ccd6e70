import { derivative, evaluate } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { invariantClosedForm } from './fixtures/closed-forms.js';
import { relativeError } from './fixtures/finite-differences.js';
import { checkFormula } from './formula.js';
import type { MaterialModel, Mode } from './material-model.js';
import { nominalStress, tangentStiffness } from './stress.js';

/*
 * Formula models against mathjs's symbolic derivative: W₁, W₂, W₁₁, W₁₂, W₂₂ from mathjs,
 * put into the closed forms of REFERENCES §2; the engine differentiates nothing symbolically.
 */

const ENERGIES: [string, Record<string, number>][] = [
  ['C10 * (I1 - 3) + C01 * (I2 - 3)', { C10: 0.16, C01: 0.04 }],
  ['C1 * (I1 - 3) + C2 * (I1 - 3)^2 + C3 * (I1 - 3)^3', { C1: 0.19, C2: -0.0015, C3: 3.8e-5 }],
  ['-(mu / 2) * Jm * log(1 - (I1 - 3) / Jm)', { mu: 0.3, Jm: 50 }],
  [
    'a / (2 * b) * (exp(b * (I1 - 3)) - 1) + c * (sqrt(I2) - sqrt(3))',
    { a: 0.3, b: 0.02, c: 0.05 },
  ],
  [
    'C11 * (I1 - 3) * (I2 - 3) + C10 * (I1 - 3) + k * (I1 - 3)^1.5',
    { C11: 0.002, C10: 0.2, k: 0.01 },
  ],
  [
    'g * cosh((I1 - 3) / 10) + h * tanh(I2 / 30) - g + t * sinh(I1 / 40)',
    { g: 0.5, h: 0.1, t: 0.05 },
  ],
];
const MODES: Mode[] = ['uniaxial', 'equibiaxial', 'planar'];
const STRETCHES = [0.6, 1.4, 2.5];

function mathjsPartials(energy: string, constants: Record<string, number>) {
  const d1 = derivative(energy, 'I1');
  const d2 = derivative(energy, 'I2');
  const [d11, d12, d22] = [derivative(d1, 'I1'), derivative(d1, 'I2'), derivative(d2, 'I2')];
  return (I1: number, I2: number) => {
    const scope = { ...constants, I1, I2 };
    const at = (node: typeof d1) => node.evaluate(scope) as number;
    return { w1: at(d1), w2: at(d2), w11: at(d11), w12: at(d12), w22: at(d22) };
  };
}

describe('formula models match mathjs symbolic derivatives to 1e-13', () => {
  const cases = ENERGIES.flatMap(([energy, constants]) =>
    MODES.flatMap((mode) => STRETCHES.map((l) => [energy, mode, l, constants] as const)),
  );
  it.each(cases)('%s, %s λ = %d', (energy, mode, l, constants) => {
    const model: MaterialModel = { kind: 'formula', energy, constants };
    const reference = invariantClosedForm(mode, l, mathjsPartials(energy, constants));
    expect(relativeError(nominalStress(model, mode, l), reference.stress)).toBeLessThanOrEqual(
      1e-13,
    );
    expect(relativeError(tangentStiffness(model, mode, l), reference.tangent)).toBeLessThanOrEqual(
      1e-13,
    );
  });
});

describe('ordinary notation', () => {
  it('reads `C (x)` as a product and `C (x)^2` as C·x², like mathjs with explicit `*`', () => {
    const typed = 'C1 (I1 - 3) + C2 (I1 - 3)^2 + 2 C3 (I2 - 3)(I1 - 3) - pi e C4 (I2 - 3)^3';
    const explicit = 'C1*(I1-3) + C2*(I1-3)^2 + 2*C3*(I2-3)*(I1-3) - pi*e*C4*(I2-3)^3';
    const constants = { C1: 0.2, C2: 0.01, C3: 0.003, C4: 1e-4 };
    const ours = (l: number) =>
      nominalStress({ kind: 'formula', energy: typed, constants }, 'planar', l);
    const reference = (l: number) =>
      invariantClosedForm('planar', l, mathjsPartials(explicit, constants)).stress;
    for (const l of STRETCHES) expect(relativeError(ours(l), reference(l))).toBeLessThan(1e-13);
    // Values, not only derivatives: mathjs evaluates the explicit form.
    const i1 = 4.2;
    const w = evaluate(explicit, { ...constants, I1: i1, I2: i1 }) as number;
    expect(w).toBeCloseTo(
      0.2 * 1.2 + 0.01 * 1.44 + 2 * 0.003 * 1.44 - Math.PI * Math.E * 1e-4 * 1.728,
      14,
    );
  });
});

describe('checkFormula', () => {
  it('accepts a good energy and lists unused constants', () => {
    expect(checkFormula('C10 (I1 - 3) + C01 (I2 - 3)', ['C10', 'C01', 'D1'])).toEqual({
      ok: true,
      error: null,
      unknownSymbols: [],
      unusedConstants: ['D1'],
    });
  });

  it('gives the 0-based position of a syntax error', () => {
    const check = checkFormula('C10 * (I1 - 3) + * C01', ['C10', 'C01']);
    expect(check.ok).toBe(false);
    expect(check.error?.position).toBe(17);
    expect(checkFormula('C10 (I1 - 3', ['C10']).error?.position).toBe(11);
  });

  it('lists unknown symbols, including a misspelt function', () => {
    const check = checkFormula('C10 (I1 - 3) + K (I2 - 3) + expp(I1)', ['C10']);
    expect(check.ok).toBe(false);
    expect(check.error).toBeNull();
    expect(check.unknownSymbols).toEqual(['K', 'expp']);
  });

  it.each([
    ['I1 > 3 ? I1 : 3', 'conditional'],
    ['W = I1', 'assignment'],
    ['log(I1, 2)', 'log with 2 arguments'],
    ['I1!', 'operator !'],
    ['[I1, I2]', 'array'],
  ])('refuses %s (%s)', (energy, what) => {
    const check = checkFormula(energy, []);
    expect(check.ok).toBe(false);
    expect(check.error?.message).toContain(what);
    expect(check.error?.position).toBeNull();
  });
});

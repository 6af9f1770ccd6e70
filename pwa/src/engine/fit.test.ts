import { Matrix, QrDecomposition } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { EngineInputError } from './errors.js';
import { fitModel, type FitObjective, type FitPoint } from './fit.js';
import { MODE_GEOMETRY } from './fixtures/closed-forms.js';
import { EXAMPLE_MODELS } from './fixtures/models.js';
import { treloarPoints } from './fixtures/treloar-1944.js';
import type { MaterialModel, Mode } from './material-model.js';
import { nominalStress } from './stress.js';

const TRELOAR = treloarPoints();

/*
 * Models linear in their constants have one least-squares answer, so our Levenberg–Marquardt
 * and a plain linear solve (ml-matrix QR) must agree to many digits on Treloar 1944
 * (REFERENCES §3). The design columns come from the closed forms of REFERENCES §2:
 * ∂P/∂C10 = c(λ), ∂P/∂C01 = c(λ)k(λ), ∂P/∂C20 = c(λ)·2(I1 − 3), ∂P/∂C30 = c(λ)·3(I1 − 3)².
 */
const DESIGN: Record<
  'neo-hookean' | 'mooney-rivlin' | 'yeoh',
  (mode: Mode, l: number) => number[]
> = {
  'neo-hookean': (mode, l) => [MODE_GEOMETRY[mode].c(l)],
  'mooney-rivlin': (mode, l) => {
    const g = MODE_GEOMETRY[mode];
    return [g.c(l), g.c(l) * g.k(l)];
  },
  yeoh: (mode, l) => {
    const g = MODE_GEOMETRY[mode];
    const j = g.i1(l) - 3;
    return [g.c(l), g.c(l) * 2 * j, g.c(l) * 3 * j * j];
  },
};

function linearSolve(
  kind: keyof typeof DESIGN,
  data: readonly FitPoint[],
  objective: FitObjective,
  weights: Partial<Record<Mode, number>> = {},
): number[] {
  const used = objective === 'relative' ? data.filter((p) => p.stress !== 0) : data;
  const scale = (p: FitPoint) =>
    Math.sqrt(weights[p.mode] ?? 1) / (objective === 'relative' ? p.stress : 1);
  const a = new Matrix(used.map((p) => DESIGN[kind](p.mode, p.stretch).map((v) => v * scale(p))));
  const b = Matrix.columnVector(used.map((p) => p.stress * scale(p)));
  return new QrDecomposition(a).solve(b).getColumn(0);
}

function constantsOf(model: MaterialModel): number[] {
  switch (model.kind) {
    case 'neo-hookean':
      return [model.c10];
    case 'mooney-rivlin':
      return [model.c10, model.c01];
    case 'yeoh':
      return [model.c10, model.c20, model.c30];
    default:
      throw new Error('not a linear model');
  }
}

describe('linear models on Treloar 1944 agree with ml-matrix least squares to ≥ 8 digits', () => {
  const cases: [keyof typeof DESIGN, FitObjective, Partial<Record<Mode, number>>][] = [
    ['neo-hookean', 'absolute', {}],
    ['neo-hookean', 'relative', {}],
    ['mooney-rivlin', 'absolute', {}],
    ['mooney-rivlin', 'relative', {}],
    ['yeoh', 'absolute', {}],
    ['yeoh', 'relative', {}],
    ['yeoh', 'absolute', { uniaxial: 0.25, planar: 2 }],
    ['mooney-rivlin', 'relative', { equibiaxial: 3 }],
  ];
  it.each(cases)('%s, %s objective, weights %o', (kind, objective, weights) => {
    const fit = fitModel({ model: EXAMPLE_MODELS[kind], data: TRELOAR, objective, weights });
    const reference = linearSolve(kind, TRELOAR, objective, weights);
    constantsOf(fit.model).forEach((value, j) => {
      expect(Math.abs(value - reference[j]!) / Math.abs(reference[j]!)).toBeLessThan(1e-8);
    });
  });

  it('without weights the objective is the plain sum of squares', () => {
    const fit = fitModel({ model: EXAMPLE_MODELS.yeoh, data: TRELOAR, objective: 'absolute' });
    const plain = TRELOAR.reduce(
      (sum, p) => sum + (nominalStress(fit.model, p.mode, p.stretch) - p.stress) ** 2,
      0,
    );
    expect(fit.cost).toBeCloseTo(plain, 12);
  });
});

describe('nonlinear fits on Treloar 1944, all three modes', () => {
  it('Ogden, three terms: close fit, better than the 1972 constants on these data', () => {
    // Ogden 1972: α = (1.3, 5, −2), μ = (0.618, 0.00118, −0.00981) MPa, μ₀ ≈ 0.414 (REFERENCES §3 [M]).
    // Ogden fits are not unique (Ogden, Saccomandi & Sgura 2004), so only the quality is pinned.
    const published = EXAMPLE_MODELS.ogden;
    const fit = fitModel({ model: published, data: TRELOAR, objective: 'absolute' });
    const publishedCost = TRELOAR.reduce(
      (sum, p) => sum + (nominalStress(published, p.mode, p.stretch) - p.stress) ** 2,
      0,
    );
    expect(fit.cost).toBeLessThan(publishedCost);
    for (const mode of ['uniaxial', 'equibiaxial', 'planar'] as const) {
      expect(fit.r2ByMode[mode]).toBeGreaterThan(0.99);
      expect(fit.rmsByMode[mode]).toBeLessThan(0.1);
    }
    expect(fit.mu0).toBeGreaterThan(0.3);
    expect(fit.mu0).toBeLessThan(0.45);
    expect(fit.e0).toBeCloseTo(3 * fit.mu0, 14);
    expect(['ftol', 'xtol', 'ftol+xtol', 'gtol']).toContain(fit.stopReason);
  });

  it('several Ogden starts never end worse than the given start alone', () => {
    const given = fitModel({
      model: EXAMPLE_MODELS.ogden,
      data: TRELOAR,
      objective: 'relative',
      starts: 'given',
    });
    const several = fitModel({ model: EXAMPLE_MODELS.ogden, data: TRELOAR, objective: 'relative' });
    expect(several.cost).toBeLessThanOrEqual(given.cost);
  });

  it('Arruda–Boyce lands near the published μ ≈ 0.27 MPa, N ≈ 26.5 (REFERENCES §3 [M])', () => {
    const fit = fitModel({
      model: EXAMPLE_MODELS['arruda-boyce'],
      data: TRELOAR,
      objective: 'absolute',
    });
    const { mu, n } = fit.model as { mu: number; n: number };
    expect(Math.abs(mu / 0.27 - 1)).toBeLessThan(0.15);
    expect(Math.abs(n / 26.5 - 1)).toBeLessThan(0.15);
  });

  it('Gent keeps Jm above I1 − 3 of the data and fits well', () => {
    const fit = fitModel({
      model: { kind: 'gent', mu: 0.3, jm: 80 },
      data: TRELOAR,
      objective: 'absolute',
    });
    const jm = (fit.model as { jm: number }).jm;
    expect(jm).toBeGreaterThan(7.61 ** 2 + 2 / 7.61 - 3);
    expect(fit.r2ByMode.uniaxial).toBeGreaterThan(0.98);
  });

  it('a formula model fits like the built-in model it spells out', () => {
    const formula = fitModel({
      model: {
        kind: 'formula',
        energy: 'A (I1 - 3) + B (I1 - 3)^2 + C (I1 - 3)^3',
        constants: { A: 0.2, B: 0, C: 0 },
      },
      data: TRELOAR,
      objective: 'absolute',
    });
    const reference = linearSolve('yeoh', TRELOAR, 'absolute');
    const { A, B, C } = (formula.model as { constants: Record<string, number> }).constants;
    [A!, B!, C!].forEach((value, j) => {
      expect(Math.abs(value / reference[j]! - 1)).toBeLessThan(1e-8);
    });
  });
});

describe('fitModel input guards', () => {
  const model = EXAMPLE_MODELS['neo-hookean'];
  it.each([
    ['no data', { model, data: [], objective: 'absolute' }, 'data'],
    [
      'stretch ≤ 0',
      { model, data: [{ mode: 'uniaxial', stretch: 0, stress: 1 }], objective: 'absolute' },
      'data[0].stretch',
    ],
    [
      'NaN stress',
      {
        model,
        data: [{ mode: 'uniaxial', stretch: 2, stress: Number.NaN }],
        objective: 'absolute',
      },
      'data[0].stress',
    ],
    [
      'bad mode',
      { model, data: [{ mode: 'torsion', stretch: 2, stress: 1 }], objective: 'absolute' },
      'data[0].mode',
    ],
    [
      'negative weight',
      { model, data: TRELOAR, objective: 'absolute', weights: { planar: -1 } },
      'weights.planar',
    ],
    ['bad objective', { model, data: TRELOAR, objective: 'squared' }, 'objective'],
    [
      'relative with zero stresses only',
      { model, data: [{ mode: 'uniaxial', stretch: 1, stress: 0 }], objective: 'relative' },
      'data',
    ],
    [
      'Gent start below the data',
      { model: { kind: 'gent', mu: 0.3, jm: 50 }, data: TRELOAR, objective: 'absolute' },
      'jm',
    ],
    [
      'Arruda–Boyce start below the data',
      { model: { kind: 'arruda-boyce', mu: 0.3, n: 10 }, data: TRELOAR, objective: 'absolute' },
      'n',
    ],
  ])('%s', (_, options, field) => {
    let caught: unknown;
    try {
      fitModel(options as Parameters<typeof fitModel>[0]);
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(EngineInputError);
    expect((caught as EngineInputError).field).toBe(field);
  });
});

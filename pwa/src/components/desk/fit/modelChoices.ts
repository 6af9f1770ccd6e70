import { modeStretches, Real, type FitPoint, type MaterialModel } from '../../../engine';
import type { SavedFormula } from '../formula/formulaLibrary';
import { MODEL_NAMES } from '../modelNames';

/** A model the engineer can tick for fitting, with where its search starts. */
export interface ModelChoice {
  key: string;
  label: string;
  start(data: readonly FitPoint[]): MaterialModel;
}

/** Largest I₁ in the data: Gent's Jm and Arruda–Boyce's N must start beyond what it demands. */
function largestFirstInvariant(data: readonly FitPoint[]): number {
  return Math.max(
    3,
    ...data.map(({ mode, stretch }) =>
      modeStretches(mode, new Real(stretch)).reduce((s, l) => s + l.re * l.re, 0),
    ),
  );
}

// Starts of the order of a soft filled rubber (μ₀ ≈ 0.4 MPa); Ogden's exponents as Ogden 1972.
const OGDEN_STARTS: Record<number, MaterialModel> = {
  1: { kind: 'ogden', terms: [{ mu: 0.4, alpha: 2 }] },
  2: {
    kind: 'ogden',
    terms: [
      { mu: 0.6, alpha: 1.3 },
      { mu: 0.002, alpha: 5 },
    ],
  },
  3: {
    kind: 'ogden',
    terms: [
      { mu: 0.6, alpha: 1.3 },
      { mu: 0.001, alpha: 5 },
      { mu: -0.01, alpha: -2 },
    ],
  },
};

export const BUILT_IN_CHOICES: readonly ModelChoice[] = [
  {
    key: 'neo-hookean',
    label: MODEL_NAMES['neo-hookean'],
    start: () => ({ kind: 'neo-hookean', c10: 0.2 }),
  },
  {
    key: 'mooney-rivlin',
    label: MODEL_NAMES['mooney-rivlin'],
    start: () => ({ kind: 'mooney-rivlin', c10: 0.16, c01: 0.02 }),
  },
  {
    key: 'yeoh',
    label: MODEL_NAMES.yeoh,
    start: () => ({ kind: 'yeoh', c10: 0.2, c20: -0.001, c30: 1e-5 }),
  },
  ...[1, 2, 3].map((terms): ModelChoice => ({
    key: `ogden-${terms}`,
    label: `${MODEL_NAMES.ogden}, ${terms} term${terms === 1 ? '' : 's'}`,
    start: () => OGDEN_STARTS[terms] as MaterialModel,
  })),
  {
    key: 'gent',
    label: MODEL_NAMES.gent,
    start: (data) => ({ kind: 'gent', mu: 0.3, jm: 2 * (largestFirstInvariant(data) - 3) + 10 }),
  },
  {
    key: 'arruda-boyce',
    label: MODEL_NAMES['arruda-boyce'],
    start: (data) => ({
      kind: 'arruda-boyce',
      mu: 0.3,
      n: Math.max(5, largestFirstInvariant(data)),
    }),
  },
];

/** A kept formula fits from the constants it was kept with. */
export function formulaChoice(formula: SavedFormula): ModelChoice {
  return {
    key: `formula:${formula.name}`,
    label: `${formula.name} (formula)`,
    start: () => ({ kind: 'formula', energy: formula.energy, constants: formula.constants }),
  };
}

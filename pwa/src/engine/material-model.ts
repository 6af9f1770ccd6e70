import { EngineInputError } from './errors.js';
import { requireFormula } from './formula.js';
import { realPart } from './scalar.js';

/** The three standard tests (REFERENCES §2). */
export type Mode = 'uniaxial' | 'equibiaxial' | 'planar';

export const MODES: readonly Mode[] = ['uniaxial', 'equibiaxial', 'planar'];

/** One Ogden (1972) term: (μ/α)(λ₁^α + λ₂^α + λ₃^α − 3). */
export interface OgdenTerm<C = number> {
  readonly mu: C;
  readonly alpha: C;
}

/**
 * An incompressible hyperelastic model (MPa), with its constants of type C so the same shape
 * carries plain numbers or perturbed scalars (for sensitivities and fit Jacobians).
 */
export type ModelOf<C> =
  | { readonly kind: 'neo-hookean'; readonly c10: C }
  | { readonly kind: 'mooney-rivlin'; readonly c10: C; readonly c01: C }
  | { readonly kind: 'yeoh'; readonly c10: C; readonly c20: C; readonly c30: C }
  | { readonly kind: 'ogden'; readonly terms: readonly OgdenTerm<C>[] }
  | { readonly kind: 'gent'; readonly mu: C; readonly jm: C }
  | { readonly kind: 'arruda-boyce'; readonly mu: C; readonly n: C }
  | {
      readonly kind: 'formula';
      /** W(I1, I2) in ordinary math notation, e.g. `C10 (I1 - 3) + C01 (I2 - 3)`. */
      readonly energy: string;
      readonly constants: Readonly<Record<string, C>>;
    };

export type MaterialModel = ModelOf<number>;
export type ModelKind = MaterialModel['kind'];

/**
 * The same model with every constant passed through f, visiting constants in one fixed order
 * (the order of the fit's parameter vector).
 */
export function mapConstants<A, B>(
  model: ModelOf<A>,
  f: (value: A, name: string) => B,
): ModelOf<B> {
  switch (model.kind) {
    case 'neo-hookean':
      return { kind: model.kind, c10: f(model.c10, 'c10') };
    case 'mooney-rivlin':
      return { kind: model.kind, c10: f(model.c10, 'c10'), c01: f(model.c01, 'c01') };
    case 'yeoh':
      return {
        kind: model.kind,
        c10: f(model.c10, 'c10'),
        c20: f(model.c20, 'c20'),
        c30: f(model.c30, 'c30'),
      };
    case 'ogden':
      return {
        kind: model.kind,
        terms: model.terms.map((term, p) => ({
          mu: f(term.mu, `terms[${p}].mu`),
          alpha: f(term.alpha, `terms[${p}].alpha`),
        })),
      };
    case 'gent':
      return { kind: model.kind, mu: f(model.mu, 'mu'), jm: f(model.jm, 'jm') };
    case 'arruda-boyce':
      return { kind: model.kind, mu: f(model.mu, 'mu'), n: f(model.n, 'n') };
    case 'formula':
      return {
        kind: model.kind,
        energy: model.energy,
        constants: Object.fromEntries(
          Object.entries(model.constants).map(([name, value]) => [
            name,
            f(value, `constants.${name}`),
          ]),
        ),
      };
  }
}

function isFiniteConstant(value: { isFinite(): boolean } | number): boolean {
  return typeof value === 'number' ? Number.isFinite(value) : value.isFinite();
}

/** Throws EngineInputError unless the model is one the engine can evaluate. */
export function checkModel<C extends { re: number; isFinite(): boolean } | number>(
  model: ModelOf<C>,
): void {
  mapConstants(model, (value, name) => {
    if (!isFiniteConstant(value)) {
      throw new EngineInputError(name, `must be a finite number, got ${realPart(value)}`);
    }
  });
  switch (model.kind) {
    case 'ogden':
      if (model.terms.length === 0) throw new EngineInputError('terms', 'need at least one term');
      model.terms.forEach((term, p) => {
        if (realPart(term.alpha) === 0) {
          throw new EngineInputError(`terms[${p}].alpha`, 'must not be 0');
        }
      });
      return;
    case 'gent':
      if (!(realPart(model.jm) > 0)) {
        throw new EngineInputError('jm', `must be above 0, got ${realPart(model.jm)}`);
      }
      return;
    case 'arruda-boyce':
      // The undeformed state needs λc/√N = 1/√N below 1.
      if (!(realPart(model.n) > 1)) {
        throw new EngineInputError('n', `must be above 1, got ${realPart(model.n)}`);
      }
      return;
    case 'formula':
      requireFormula(model.energy, model.constants);
      return;
    case 'neo-hookean':
    case 'mooney-rivlin':
    case 'yeoh':
      return;
    default:
      throw new EngineInputError(
        'kind',
        `is not a known model: ${(model as { kind: unknown }).kind}`,
      );
  }
}

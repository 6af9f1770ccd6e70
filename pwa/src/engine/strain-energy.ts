import { formulaEnergy } from './formula.js';
import { inverseLangevin, logSinh } from './inverse-langevin.js';
import type { ModelOf, OgdenTerm } from './material-model.js';
import type { Scalar } from './scalar.js';

/*
 * Each model as its strain-energy function W and nothing else (REFERENCES §2); stresses,
 * tangents, fit Jacobians and stability Hessians are complex-step derivatives of these.
 * Stretches are principal stretches of an incompressible state (λ₁λ₂λ₃ = 1).
 */

export type Stretches<T> = readonly [T, T, T];

/** Ogden (1972): Σₚ (μₚ/αₚ)(λ₁^αₚ + λ₂^αₚ + λ₃^αₚ − 3). */
function ogden<T extends Scalar<T>>(
  terms: readonly OgdenTerm<T | number>[],
  [l1, l2, l3]: Stretches<T>,
): T {
  return terms.reduce((w, { mu, alpha }) => {
    // The standard tests repeat a stretch (uniaxial λ₂ = λ₃, equibiaxial λ₁ = λ₂): power it once.
    const p1 = l1.pow(alpha);
    const p2 = l2 === l1 ? p1 : l2.pow(alpha);
    const p3 = l3 === l2 ? p2 : l3.pow(alpha);
    return w.add(p1.add(p2).add(p3).sub(3).mul(mu).div(alpha));
  }, l1.constant(0));
}

/** Arruda & Boyce (1993) eight-chain: μN[βx + ln(β / sinh β)], x = λc/√N, β = L⁻¹(x). */
function arrudaBoyce<T extends Scalar<T>>(mu: T | number, n: T | number, i1: T): T {
  const x = i1.div(n).div(3).sqrt();
  const beta = inverseLangevin(x);
  // ln(β / sinh β) as ln β − ln sinh β: near locking the ratio itself is tiny enough for its
  // second-order parts to underflow.
  return beta.mul(x).add(beta.log()).sub(logSinh(beta)).mul(n).mul(mu);
}

/** W of `model` at principal stretches `stretches`, evaluated in T. */
export function strainEnergy<T extends Scalar<T>>(
  model: ModelOf<T | number>,
  stretches: Stretches<T>,
): T {
  if (model.kind === 'ogden') return ogden(model.terms, stretches);
  const [l1, l2, l3] = stretches;
  const a = l1.mul(l1);
  const b = l2.mul(l2);
  const c = l3.mul(l3);
  const i1 = a.add(b).add(c);
  const one = i1.constant(1);
  const i2 = one.div(a).add(one.div(b)).add(one.div(c));
  const j1 = i1.sub(3);
  switch (model.kind) {
    case 'neo-hookean':
      return j1.mul(model.c10);
    case 'mooney-rivlin':
      return j1.mul(model.c10).add(i2.sub(3).mul(model.c01));
    case 'yeoh':
      return j1.mul(model.c30).add(model.c20).mul(j1).add(model.c10).mul(j1);
    case 'gent':
      // Gent (1996): −(μ/2) Jm ln(1 − (I1 − 3)/Jm).
      return one.sub(j1.div(model.jm)).log().mul(model.jm).mul(model.mu).mul(-0.5);
    case 'arruda-boyce':
      return arrudaBoyce(model.mu, model.n, i1);
    case 'formula':
      return formulaEnergy(model.energy, model.constants, i1, i2);
  }
}

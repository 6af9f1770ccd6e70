import { EngineInputError } from './errors.js';
import type { Scalar } from './scalar.js';

/**
 * β = L⁻¹(y) with L(β) = coth β − 1/β, by Newton's method carried out in T itself, so the
 * perturbation parts converge with the value (REFERENCES §1: "an inner Newton solve must
 * iterate in the same number type"). Started from Cohen's rational approximation
 * (Rheol. Acta 30:270, 1991 [M]), which is within 5 % everywhere on (0, 1).
 */
export function inverseLangevin<T extends Scalar<T>>(y: T): T {
  const x = y.re;
  if (!(x > 0 && x < 1)) {
    throw new EngineInputError(
      'stretch',
      `is at or beyond the chain locking stretch (λc/√N = ${x})`,
    );
  }
  let beta = y.constant((x * (3 - x * x)) / (1 - x * x));
  // Newton converges quadratically, so after a step below 1e-12 the value is exact to rounding
  // (L itself is only good to a few ulp: coth β − 1/β cancels at small β). Two more steps then
  // carry the first- and second-order perturbation parts to convergence as well.
  let settledSteps = 0;
  for (let iteration = 0; settledSteps < 3; iteration++) {
    if (iteration === 50)
      throw new EngineInputError('stretch', 'inverse Langevin did not converge');
    const langevin = beta.coth().sub(beta.constant(1).div(beta));
    const slope = beta.pow(-2).sub(cschSquared(beta));
    const step = langevin.sub(y).div(slope);
    beta = beta.sub(step);
    if (Math.abs(step.re) <= 1e-12 * beta.re) settledSteps++;
  }
  return beta;
}

/** Above this β, sinh β is written through e^(−2β) so it neither overflows nor underflows. */
const LARGE_BETA = 20;

/** 1/sinh²β. */
function cschSquared<T extends Scalar<T>>(beta: T): T {
  if (beta.lt(LARGE_BETA)) return beta.sinh().pow(-2);
  const e = beta.mul(-2).exp();
  return e.mul(4).div(e.sub(1).pow(2));
}

/** ln sinh β = β − ln 2 + ln(1 − e^(−2β)) at large β. */
export function logSinh<T extends Scalar<T>>(beta: T): T {
  if (beta.lt(LARGE_BETA)) return beta.sinh().log();
  return beta.sub(Math.LN2).add(beta.mul(-2).exp().neg().add(1).log());
}

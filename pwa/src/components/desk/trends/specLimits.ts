import type { DeskSpecRevision } from '../../../api/desk/types';
import { expectedLoad, moldedTolerance, type SpecificationLimits } from '../../../engine';
import { loadCaseOf } from '../spec/loadCase';
import type { Characteristic } from './subgroups';

/**
 * The specification limits of one characteristic in a released revision: the expected load's
 * tolerance band (lower bound of the low estimate to upper bound of the high one), the ISO 3302-1
 * thickness tolerance, and the hardness spec.
 */
export function specLimits(
  revision: DeskSpecRevision,
  characteristic: Characteristic,
): SpecificationLimits {
  const { body } = revision;
  if (characteristic === 'hardness') {
    return {
      lsl: body.hardness.nominal - body.hardness.tolerance,
      usl: body.hardness.nominal + body.hardness.tolerance,
    };
  }
  if (characteristic === 'thickness') {
    const t = body.geometry.thickness;
    const chosen = body.tolerance.dimensions?.thickness;
    const plusMinus = moldedTolerance(
      t,
      chosen?.class ?? body.tolerance.class,
      chosen?.kind ?? 'fixed',
    );
    return { lsl: t - plusMinus, usl: t + plusMinus };
  }
  if (!revision.fit) return {};
  const load = expectedLoad(loadCaseOf(body, revision.fit.model));
  const share = body.loadTolerancePercent / 100;
  return { lsl: load.low.load * (1 - share), usl: load.high.load * (1 + share) };
}

import type { DeskSpecRevision } from '../../../api/desk/types';
import { prepareSpec, type SpecificationLimits } from '../../../engine';
import { toPartSpec } from '../../../inspect/partSpec';
import { bodyTolerances } from '../spec/specDerived';
import type { Characteristic } from './subgroups';

/**
 * The specification limits of one characteristic in a released revision, as the verdicts use
 * them: the load band, the ISO 3302-1 thickness tolerance, and the hardness spec.
 */
export function specLimits(
  revision: DeskSpecRevision,
  characteristic: Characteristic,
): SpecificationLimits {
  const { body } = revision;
  if (characteristic === 'hardness') {
    const { nominal, tolerance } = body.hardness;
    return { lsl: nominal - tolerance, usl: nominal + tolerance };
  }
  if (characteristic === 'thickness') {
    const row = bodyTolerances(body).find((d) => d.name === 'thickness');
    if (!row || 'error' in row.plusMinus) return {};
    return { lsl: row.nominal - row.plusMinus.value, usl: row.nominal + row.plusMinus.value };
  }
  const spec = toPartSpec(revision);
  if (!spec) return {};
  const { lowerLoad, upperLoad } = prepareSpec(spec);
  return { lsl: lowerLoad, usl: upperLoad };
}

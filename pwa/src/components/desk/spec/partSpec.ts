import type { CompoundRecord, DeskSpecBody } from '../../../api/desk/types';
import type { PartSpec } from '../../../engine';
import { toPartSpec } from '../../../inspect/partSpec';

/**
 * The engine's spec for a draft: the body with the compound's current constants and bulk
 * modulus, as a release would freeze them. Null without published constants.
 */
export function draftPartSpec(
  body: DeskSpecBody,
  compound: CompoundRecord | undefined,
): PartSpec | null {
  const spec = compound?.currentFit ? toPartSpec({ body, fit: compound.currentFit }) : undefined;
  if (!spec) return null;
  return compound?.bulkModulusMPa ? { ...spec, bulkModulusMPa: compound.bulkModulusMPa } : spec;
}

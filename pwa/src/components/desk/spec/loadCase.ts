import type { DeskSpecBody } from '../../../api/desk/types';
import type { LoadCase, MaterialModel } from '../../../engine';

/**
 * The engine's load case for a spec body and the compound's fitted model. Unbonded faces are
 * held by friction, so the engine answers with the lubricated and bonded bounds.
 */
export function loadCaseOf(
  body: DeskSpecBody,
  model: MaterialModel,
  bulkModulusMPa?: number | null,
): LoadCase {
  return {
    geometry: body.geometry,
    faces: body.bonded ? 'bonded' : 'unbonded',
    model,
    nominalHardness: body.hardness.nominal,
    deflection: body.testDeflection,
    ...(bulkModulusMPa ? { bulkModulus: bulkModulusMPa } : {}),
  };
}

import {
  acceptanceWindows,
  prepareSpec,
  specLoadCase,
  specLoadTolerance,
  type AcceptanceWindows,
  type ExpectedLoad,
  type MaterialModel,
  type PartSpec,
} from '../engine.js';
import type { SpecBody } from './dto/spec-body.dto.js';

/** What the engine works out for a released revision: shown on the desk and tablet. */
export interface SpecDerived {
  expected: ExpectedLoad;
  lowerLoad: number;
  upperLoad: number;
  windows: AcceptanceWindows;
}

/**
 * A released body carries the compound's measured K: tablets build their PartSpec by spreading
 * the body, so they then judge with the same K as the server.
 */
export function frozenBody(
  body: SpecBody,
  bulkModulusMPa: number | null,
): SpecBody & { bulkModulusMPa?: number } {
  return bulkModulusMPa === null ? body : { ...body, bulkModulusMPa };
}

/** The revision as the engine judges parts against it: the body with the compound's constants. */
export function engineSpec(
  body: SpecBody,
  model: MaterialModel,
  bulkModulusMPa: number | null,
): PartSpec {
  return { ...body, model, bulkModulusMPa };
}

export function specDerived(spec: PartSpec): SpecDerived {
  const { expected, lowerLoad, upperLoad } = prepareSpec(spec);
  const windows = acceptanceWindows(specLoadCase(spec), specLoadTolerance(spec));
  return { expected, lowerLoad, upperLoad, windows };
}

import type { PartSpec } from '../engine/part-spec';
import type { Engine } from './engine';

export interface CurvePoint {
  deflection: number;
  /** Low and high estimate, N (equal for bonded or lubricated faces). */
  low: number;
  high: number;
  lowerLimit: number;
  upperLimit: number;
}

/** How far past the test deflection the curve goes, and never past this strain. */
const PAST_TEST = 1.3;
const MAX_STRAIN = 0.3;

/** The expected load against deflection with its tolerance band, for the review chart. */
export function loadCurve(engine: Engine, spec: PartSpec, steps = 30): CurvePoint[] {
  const base = engine.specLoadCase(spec);
  const tolerance = engine.specLoadTolerance(spec);
  const end = Math.min(spec.testDeflection * PAST_TEST, spec.geometry.thickness * MAX_STRAIN);
  const points: CurvePoint[] = [];
  for (let i = 1; i <= steps; i++) {
    const deflection = (end * i) / steps;
    const estimate = engine.expectedLoad({ ...base, deflection });
    const { lowerLoad, upperLoad } = engine.loadLimits(estimate, tolerance);
    points.push({
      deflection,
      low: estimate.low.load,
      high: estimate.high.load,
      lowerLimit: lowerLoad,
      upperLimit: upperLoad,
    });
  }
  return points;
}

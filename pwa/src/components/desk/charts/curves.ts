import { EngineInputError, nominalStress, type MaterialModel, type Mode } from '../../../engine';

export interface Point {
  x: number;
  y: number;
}

/** Colours for models and modes on desk charts, in the app's palette. */
export const SERIES_COLORS = [
  '#17434f',
  '#e39a2d',
  '#2f7d4f',
  '#8a3b7a',
  '#b3261e',
  '#4a6fa5',
  '#6b5b2a',
];

/**
 * P(λ) of a model in one mode over [from, to]. Models with a locking stretch (Gent,
 * Arruda–Boyce) end where the engine says the stretch is out of their range.
 */
export function stressCurve(
  model: MaterialModel,
  mode: Mode,
  from: number,
  to: number,
  steps = 80,
): Point[] {
  const points: Point[] = [];
  for (let i = 0; i <= steps; i++) {
    const x = from + ((to - from) * i) / steps;
    try {
      points.push({ x, y: nominalStress(model, mode, x) });
    } catch (error) {
      if (error instanceof EngineInputError) continue;
      throw error;
    }
  }
  return points;
}

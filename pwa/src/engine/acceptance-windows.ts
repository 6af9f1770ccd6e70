import { Complex } from './complex.js';
import type { Faces } from './compression-modulus.js';
import { EngineInputError, requireFinite } from './errors.js';
import {
  boundingFaces,
  caseVariables,
  expectedLoad,
  liftVariables,
  loadOf,
  prepareLoadCase,
  type LoadCase,
  type LoadVariables,
  type PreparedLoadCase,
} from './expected-load.js';
import { STEP } from './scalar.js';

/** Load tolerance, percent of the expected load below and above it. */
export interface LoadTolerance {
  minusPercent: number;
  plusPercent: number;
}

/** One edge of a window: the value at which the expected load meets a load limit. */
export interface WindowEdge {
  /** null when no value in the physical range reaches the limit (see reason). */
  value: number | null;
  /** Newton steps taken. */
  iterations: number;
  /** The load limit this edge meets, N. */
  targetLoad: number;
  reason?: string;
}

export interface AcceptanceWindows {
  lowerLoad: number;
  upperLoad: number;
  /** Thickness range (mm) that keeps the expected load inside the limits, other dimensions nominal. */
  thickness: { min: WindowEdge; max: WindowEdge };
  /** Hardness range (Shore A) that keeps the expected load inside the limits, nominal size. */
  hardness: { min: WindowEdge; max: WindowEdge };
}

/** Newton stops when the load is this close to its target, relative. */
export const WINDOW_TOLERANCE = 1e-10;
const MAX_ITERATIONS = 50;

export function checkLoadTolerance(tolerance: LoadTolerance): void {
  const { minusPercent, plusPercent } = tolerance;
  if (!(requireFinite('minusPercent', minusPercent) >= 0 && minusPercent < 100)) {
    throw new EngineInputError(
      'minusPercent',
      `must lie in 0 up to below 100 %, got ${minusPercent}`,
    );
  }
  if (!(requireFinite('plusPercent', plusPercent) >= 0)) {
    throw new EngineInputError('plusPercent', `must not be below 0 %, got ${plusPercent}`);
  }
}

/** The load limits: the low estimate less its tolerance, the high estimate plus its tolerance. */
export function loadLimits(
  estimate: { low: { load: number }; high: { load: number } },
  tolerance: LoadTolerance,
): { lowerLoad: number; upperLoad: number } {
  checkLoadTolerance(tolerance);
  return {
    lowerLoad: estimate.low.load * (1 - tolerance.minusPercent / 100),
    upperLoad: estimate.high.load * (1 + tolerance.plusPercent / 100),
  };
}

interface Unknown {
  name: string;
  start: number;
  /** Open interval of physical values. */
  min: number;
  max: number;
  /** The load variables with this unknown set to x. */
  variables: (x: Complex) => LoadVariables<Complex>;
}

/**
 * Newton's method on g(x) = F(x) − target, with F and dF/dx from one complex-step evaluation
 * per iteration (REFERENCES §1): x + i·h gives F in the real part and F′·h in the imaginary.
 * A step that leaves the physical range is halved back towards the last point.
 */
function solveEdge(
  prepared: PreparedLoadCase,
  faces: Faces,
  unknown: Unknown,
  targetLoad: number,
): WindowEdge {
  let x = unknown.start;
  for (let iterations = 0; iterations <= MAX_ITERATIONS; iterations++) {
    const f = loadOf(prepared, faces, unknown.variables(new Complex(x, STEP)));
    const residual = f.re - targetLoad;
    if (Math.abs(residual) <= WINDOW_TOLERANCE * Math.abs(targetLoad)) {
      return { value: x, iterations, targetLoad };
    }
    const slope = f.im / STEP;
    if (!(Number.isFinite(slope) && slope !== 0)) break;
    let next = x - residual / slope;
    for (let halvings = 0; !(next > unknown.min && next < unknown.max); halvings++) {
      if (halvings > 60) break;
      next = (x + next) / 2;
    }
    x = next;
  }
  return {
    value: null,
    iterations: MAX_ITERATIONS,
    targetLoad,
    reason: `no ${unknown.name} between ${unknown.min} and ${unknown.max} gives ${targetLoad.toFixed(1)} N`,
  };
}

/**
 * Thickness and hardness windows that keep the expected load inside its tolerance (REFERENCES
 * §5): each edge is where the high estimate meets the upper limit or the low estimate meets the
 * lower limit (for bonded or lubricated faces both estimates are the same).
 */
export function acceptanceWindows(input: LoadCase, tolerance: LoadTolerance): AcceptanceWindows {
  const prepared = prepareLoadCase(input);
  const { lowerLoad, upperLoad } = loadLimits(expectedLoad(input), tolerance);
  const [lowFaces, highFaces] = boundingFaces(input.faces);
  const complex = liftVariables(caseVariables(prepared), (v) => new Complex(v, 0));
  const thickness: Unknown = {
    name: 'thickness',
    start: input.geometry.thickness,
    min: Math.max(0, input.deflection),
    max: Infinity,
    variables: (t) => ({ ...complex, geometry: { ...complex.geometry, thickness: t } }),
  };
  const hardness: Unknown = {
    name: 'hardness',
    start: prepared.hardness,
    min: 0,
    max: 100,
    variables: (h) => ({ ...complex, hardness: h }),
  };
  // Load falls as thickness grows and rises with hardness.
  return {
    lowerLoad,
    upperLoad,
    thickness: {
      min: solveEdge(prepared, highFaces, thickness, upperLoad),
      max: solveEdge(prepared, lowFaces, thickness, lowerLoad),
    },
    hardness: {
      min: solveEdge(prepared, lowFaces, hardness, lowerLoad),
      max: solveEdge(prepared, highFaces, hardness, upperLoad),
    },
  };
}

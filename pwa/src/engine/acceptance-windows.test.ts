import { describe, expect, it } from 'vitest';
import { WINDOW_TOLERANCE, acceptanceWindows } from './acceptance-windows.js';
import { expectedLoad, type LoadCase } from './expected-load.js';
import { DEMO_PARTS } from './fixtures/demo-parts.js';
import { relativeError } from './fixtures/finite-differences.js';
import { specLoadCase, specLoadTolerance } from './part-spec.js';

// The forward function, evaluated afresh at a window edge: the outside check of the Newton solve.
function loadAt(
  c: LoadCase,
  change: { thickness?: number; hardness?: number },
  side: 'low' | 'high',
) {
  const geometry =
    change.thickness === undefined ? c.geometry : { ...c.geometry, thickness: change.thickness };
  return expectedLoad({ ...c, geometry, hardness: change.hardness ?? c.hardness })[side].load;
}

describe.each(Object.entries(DEMO_PARTS))('acceptance windows of the demo %s', (_, spec) => {
  const loadCase = specLoadCase(spec);
  const windows = acceptanceWindows(loadCase, specLoadTolerance(spec));
  const edges = [
    [
      windows.thickness.min,
      { thickness: windows.thickness.min.value ?? 0 },
      'high',
      windows.upperLoad,
    ],
    [
      windows.thickness.max,
      { thickness: windows.thickness.max.value ?? 0 },
      'low',
      windows.lowerLoad,
    ],
    [windows.hardness.min, { hardness: windows.hardness.min.value ?? 0 }, 'low', windows.lowerLoad],
    [
      windows.hardness.max,
      { hardness: windows.hardness.max.value ?? 0 },
      'high',
      windows.upperLoad,
    ],
  ] as const;

  it('each edge gives exactly the tolerance-limit load through the forward function', () => {
    for (const [edge, change, side, limit] of edges) {
      expect(edge.value).not.toBeNull();
      expect(edge.targetLoad).toBe(limit);
      expect(relativeError(loadAt(loadCase, change, side), limit)).toBeLessThan(
        2 * WINDOW_TOLERANCE,
      );
    }
  });

  it('Newton needs at most 6 iterations per edge (issue 3 §4)', () => {
    for (const [edge] of edges) expect(edge.iterations).toBeLessThanOrEqual(6);
  });

  it('the windows hold the nominal part, in order', () => {
    const { thickness, hardness } = windows;
    expect(thickness.min.value).toBeLessThan(spec.geometry.thickness);
    expect(thickness.max.value).toBeGreaterThan(spec.geometry.thickness);
    expect(hardness.min.value).toBeLessThan(spec.hardness.nominal);
    expect(hardness.max.value).toBeGreaterThan(spec.hardness.nominal);
  });
});

describe('unreachable edges', () => {
  it('report null with the reason instead of a value outside 0–100 Shore A', () => {
    // Gent's E at 0 Shore A is 0.157 MPa, above 1 % of the bushing's 5.5 MPa: no hardness is soft enough.
    const spec = DEMO_PARTS.bushing;
    const windows = acceptanceWindows(specLoadCase(spec), { minusPercent: 99, plusPercent: 10 });
    expect(windows.hardness.min.value).toBeNull();
    expect(windows.hardness.min.reason).toMatch(/no hardness between 0 and 100/);
    expect(windows.hardness.max.value).not.toBeNull();
  });

  it('rejects a tolerance below 0 or of 100 % and more', () => {
    const c = specLoadCase(DEMO_PARTS.bushing);
    expect(() => acceptanceWindows(c, { minusPercent: 100, plusPercent: 10 })).toThrow(
      expect.objectContaining({ field: 'minusPercent' }),
    );
    expect(() => acceptanceWindows(c, { minusPercent: 10, plusPercent: -1 })).toThrow(
      expect.objectContaining({ field: 'plusPercent' }),
    );
  });
});

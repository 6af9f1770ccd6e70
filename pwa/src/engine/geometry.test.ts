import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { loadedArea, shapeFactor, type Geometry } from './geometry.js';

describe('shapeFactor (REFERENCES §5: loaded area over free area)', () => {
  it('disc D 100, t 10 → 2.5 (REFERENCES §5 check)', () => {
    expect(shapeFactor({ shape: 'disc', diameter: 100, thickness: 10 })).toBe(2.5);
  });

  it('each shape against loaded area / bulge area worked by hand [D]', () => {
    // Annulus 60/30, t 12: (π/4)(60² − 30²) / (π(60 + 30)·12) = 30/48.
    expect(
      shapeFactor({ shape: 'annulus', outerDiameter: 60, innerDiameter: 30, thickness: 12 }),
    ).toBeCloseTo(0.625, 15);
    // Square 80, t 12: 80²/(4·80·12).
    expect(shapeFactor({ shape: 'square', side: 80, thickness: 12 })).toBeCloseTo(80 / 48, 15);
    // Rectangle 100 × 50, t 10: 5000/(2·150·10).
    expect(shapeFactor({ shape: 'rectangle', length: 100, width: 50, thickness: 10 })).toBeCloseTo(
      5 / 3,
      15,
    );
    // Long strip 50 wide, t 10: W/2t.
    expect(shapeFactor({ shape: 'strip', width: 50, thickness: 10 })).toBe(2.5);
  });

  it('a rectangle with L = W is the square, and a very long one tends to the strip (identities)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 500, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        (w, t) => {
          const rect = shapeFactor({ shape: 'rectangle', length: w, width: w, thickness: t });
          const square = shapeFactor({ shape: 'square', side: w, thickness: t });
          const long = shapeFactor({ shape: 'rectangle', length: 1e9 * w, width: w, thickness: t });
          const strip = shapeFactor({ shape: 'strip', width: w, thickness: t });
          return Math.abs(rect / square - 1) < 1e-12 && Math.abs(long / strip - 1) < 1e-8;
        },
      ),
    );
  });

  it('does not change when every dimension is scaled (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 200, noNaN: true }),
        fc.double({ min: 0.1, max: 0.9, noNaN: true }),
        fc.double({ min: 1, max: 50, noNaN: true }),
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        (d, share, t, k) => {
          const g = (s: number): Geometry => ({
            shape: 'annulus',
            outerDiameter: s * d,
            innerDiameter: s * share * d,
            thickness: s * t,
          });
          return Math.abs(shapeFactor(g(k)) / shapeFactor(g(1)) - 1) < 1e-12;
        },
      ),
    );
  });
});

describe('loadedArea', () => {
  it('plan areas (geometry)', () => {
    expect(loadedArea({ shape: 'disc', diameter: 100, thickness: 10 })).toBeCloseTo(
      2500 * Math.PI,
      9,
    );
    expect(
      loadedArea({ shape: 'annulus', outerDiameter: 60, innerDiameter: 30, thickness: 12 }),
    ).toBeCloseTo(675 * Math.PI, 9);
    expect(loadedArea({ shape: 'rectangle', length: 100, width: 50, thickness: 10 })).toBe(5000);
  });

  it('a strip without a length is per mm of length; with one, the whole face', () => {
    expect(loadedArea({ shape: 'strip', width: 50, thickness: 10 })).toBe(50);
    expect(loadedArea({ shape: 'strip', width: 50, thickness: 10, length: 400 })).toBe(20000);
  });
});

describe('geometry guards', () => {
  it.each([
    ['thickness', { shape: 'disc', diameter: 100, thickness: 0 }],
    ['thickness', { shape: 'disc', diameter: 100, thickness: -2 }],
    ['diameter', { shape: 'disc', diameter: Number.NaN, thickness: 10 }],
    ['side', { shape: 'square', side: Infinity, thickness: 10 }],
    ['innerDiameter', { shape: 'annulus', outerDiameter: 30, innerDiameter: 30, thickness: 5 }],
    ['innerDiameter', { shape: 'annulus', outerDiameter: 30, innerDiameter: 40, thickness: 5 }],
    ['length', { shape: 'strip', width: 20, thickness: 5, length: 0 }],
    ['shape', { shape: 'cone', diameter: 10, thickness: 5 }],
  ])('rejects a bad %s', (field, geometry) => {
    for (const f of [shapeFactor, loadedArea]) {
      expect(() => f(geometry as Geometry)).toThrow(
        expect.objectContaining({ name: 'EngineInputError', field }),
      );
    }
  });

  it('throws, never returns NaN, for any non-finite or non-positive thickness (property)', () => {
    fc.assert(
      fc.property(
        fc.oneof(fc.constantFrom(Number.NaN, Infinity, -Infinity, 0), fc.double({ max: 0 })),
        (thickness) => {
          expect(() => shapeFactor({ shape: 'disc', diameter: 50, thickness })).toThrow(
            expect.objectContaining({ field: 'thickness' }),
          );
        },
      ),
    );
  });
});

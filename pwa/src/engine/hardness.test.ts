import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  LINDLEY_NATURAL_RUBBER,
  materialFactorOf,
  medianHardness,
  youngsModulusFromShoreA,
} from './hardness.js';
import { Real } from './real.js';

describe('youngsModulusFromShoreA (Gent 1958)', () => {
  it('Shore A 50 → 2.4558 MPa (REFERENCES §6 [D])', () => {
    expect(youngsModulusFromShoreA(50)).toBeCloseTo(2.4558, 4);
  });

  it('rises with hardness (property of the relation)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 98, noNaN: true }), (h) => {
        return youngsModulusFromShoreA(h + 1) > youngsModulusFromShoreA(h);
      }),
    );
  });

  it('throws EngineInputError outside 0 up to below 100, and for non-finite values (property)', () => {
    fc.assert(
      fc.property(
        fc.oneof(
          fc.double({ max: -1e-9 }),
          fc.double({ min: 100 }),
          fc.constantFrom(Number.NaN, Infinity, -Infinity),
        ),
        (h) => {
          expect(() => youngsModulusFromShoreA(h)).toThrow(
            expect.objectContaining({ name: 'EngineInputError', field: 'shoreA' }),
          );
        },
      ),
    );
  });
});

describe('Lindley defaults (REFERENCES §5 [M] from memory, unverified)', () => {
  it('are labelled unverified and hold the REFERENCES rows', () => {
    expect(LINDLEY_NATURAL_RUBBER.verified).toBe(false);
    expect(LINDLEY_NATURAL_RUBBER.rows.map((r) => [r.shoreA, r.materialFactor])).toEqual([
      [30, 0.93],
      [40, 0.85],
      [50, 0.73],
      [60, 0.57],
      [70, 0.53],
    ]);
  });

  it('k at a row is the row, halfway is the mean, outside is held at the end row [D]', () => {
    const k = (h: number) => materialFactorOf(new Real(h), LINDLEY_NATURAL_RUBBER).re;
    expect(k(50)).toBeCloseTo(0.73, 15);
    expect(k(55)).toBeCloseTo(0.65, 15);
    expect(k(20)).toBe(0.93);
    expect(k(85)).toBe(0.53);
  });
});

describe('medianHardness', () => {
  it('is the middle reading of 3 or 5, the mean of the middle two of 4', () => {
    expect(medianHardness([62, 58, 60])).toBe(60);
    expect(medianHardness([61, 59, 60, 64, 57])).toBe(60);
    expect(medianHardness([60, 61, 59, 62])).toBe(60.5);
  });

  it('rejects no readings and readings outside 0–100', () => {
    expect(() => medianHardness([])).toThrow(expect.objectContaining({ field: 'hardness' }));
    expect(() => medianHardness([60, 101])).toThrow(
      expect.objectContaining({ field: 'hardness[1]' }),
    );
  });
});

import { describe, expect, it } from 'vitest';
import { EngineInputError } from './errors.js';
import { moldedTolerance, type DimensionKind, type ToleranceClass } from './molded-tolerance.js';

// ISO 3302-1 table as given in REFERENCES §8 [S: three public reproductions agree]:
// nominal inside the band, then M1 F, M1 C, M2 F, M2 C, M3 F, M3 C, M4.
const ROWS: [number, number[]][] = [
  [2, [0.08, 0.1, 0.1, 0.15, 0.25, 0.4, 0.5]],
  [5, [0.1, 0.12, 0.15, 0.2, 0.25, 0.4, 0.5]],
  [8, [0.1, 0.15, 0.2, 0.2, 0.3, 0.5, 0.7]],
  [12, [0.15, 0.2, 0.2, 0.25, 0.4, 0.6, 0.8]],
  [20, [0.2, 0.2, 0.25, 0.35, 0.5, 0.8, 1.0]],
  [30, [0.2, 0.25, 0.35, 0.4, 0.6, 1.0, 1.3]],
  [50, [0.25, 0.35, 0.4, 0.5, 0.8, 1.3, 1.6]],
  [80, [0.35, 0.4, 0.5, 0.7, 1.0, 1.6, 2.0]],
  [120, [0.4, 0.5, 0.7, 0.8, 1.3, 2.0, 2.5]],
];
const COLUMNS: [ToleranceClass, DimensionKind][] = [
  ['M1', 'fixed'],
  ['M1', 'closure'],
  ['M2', 'fixed'],
  ['M2', 'closure'],
  ['M3', 'fixed'],
  ['M3', 'closure'],
  ['M4', 'fixed'],
];

describe('moldedTolerance (ISO 3302-1, REFERENCES §8)', () => {
  it.each(ROWS)('nominal %s mm gives the table row', (nominal, row) => {
    COLUMNS.forEach(([cls, kind], i) => expect(moldedTolerance(nominal, cls, kind)).toBe(row[i]));
  });

  it('M4 has one value for fixed and closure dimensions (ISO 3302-1)', () => {
    expect(moldedTolerance(30, 'M4', 'closure')).toBe(moldedTolerance(30, 'M4', 'fixed'));
  });

  it('bands run "over … up to and including" (ISO 3302-1 [S])', () => {
    expect(moldedTolerance(4.0, 'M1', 'fixed')).toBe(0.08);
    expect(moldedTolerance(4.001, 'M1', 'fixed')).toBe(0.1);
    expect(moldedTolerance(6.3, 'M2', 'fixed')).toBe(0.15);
    expect(moldedTolerance(6.31, 'M2', 'fixed')).toBe(0.2);
    expect(moldedTolerance(10, 'M3', 'closure')).toBe(0.5);
    expect(moldedTolerance(10.01, 'M3', 'closure')).toBe(0.6);
    expect(moldedTolerance(100, 'M3', 'fixed')).toBe(1.0);
    expect(moldedTolerance(160, 'M3', 'fixed')).toBe(1.3);
  });

  it('over 160 mm is a percentage of the nominal (ISO 3302-1: M1 F 0.3 %, M3 C 1.3 %, M4 1.5 %)', () => {
    expect(moldedTolerance(200, 'M1', 'fixed')).toBeCloseTo(0.6, 12);
    expect(moldedTolerance(200, 'M3', 'closure')).toBeCloseTo(2.6, 12);
    expect(moldedTolerance(250, 'M4', 'closure')).toBeCloseTo(3.75, 12);
  });

  it.each([
    ['nominal', () => moldedTolerance(0, 'M3', 'fixed')],
    ['nominal', () => moldedTolerance(-5, 'M3', 'fixed')],
    ['nominal', () => moldedTolerance(Number.NaN, 'M3', 'fixed')],
    ['nominal', () => moldedTolerance(Infinity, 'M3', 'fixed')],
    ['tolClass', () => moldedTolerance(10, 'M5' as ToleranceClass, 'fixed')],
    ['tolClass', () => moldedTolerance(10, 'toString' as ToleranceClass, 'fixed')],
    ['kind', () => moldedTolerance(10, 'M2', 'flash' as DimensionKind)],
  ])('rejects a bad %s', (field, call) => {
    expect(call).toThrow(expect.objectContaining({ field }));
    expect(call).toThrow(EngineInputError);
  });
});

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compressionSetPercent } from './compression-set.js';
import { EngineInputError } from './errors.js';

describe('compressionSetPercent', () => {
  it('t₀ 12.5, tₙ 9.5, tᵢ 11.8 mm → 23.333 % (REFERENCES §7 [D], ASTM D395 B / ISO 815-1 formula)', () => {
    expect(compressionSetPercent({ original: 12.5, recovered: 11.8, spacer: 9.5 })).toBeCloseTo(
      23.333,
      3,
    );
  });

  it('full recovery is 0 % and no recovery is 100 % (definition, ASTM D395 B)', () => {
    expect(compressionSetPercent({ original: 12.5, recovered: 12.5, spacer: 9.5 })).toBe(0);
    expect(compressionSetPercent({ original: 12.5, recovered: 9.5, spacer: 9.5 })).toBe(100);
  });

  it.each([
    ['spacer', { original: 12.5, recovered: 11.8, spacer: 12.5 }],
    ['spacer', { original: 12.5, recovered: 11.8, spacer: 13 }],
    ['recovered', { original: 12.5, recovered: 12.6, spacer: 9.5 }],
    ['recovered', { original: 12.5, recovered: 9.4, spacer: 9.5 }],
    ['original', { original: 0, recovered: 11.8, spacer: 9.5 }],
    ['spacer', { original: 12.5, recovered: 11.8, spacer: -1 }],
    ['original', { original: Number.NaN, recovered: 11.8, spacer: 9.5 }],
    ['recovered', { original: 12.5, recovered: Infinity, spacer: 9.5 }],
  ])('rejects a non-physical %s (REFERENCES §7 guards)', (field, reading) => {
    expect(() => compressionSetPercent(reading)).toThrow(
      expect.objectContaining({ name: 'EngineInputError', field }),
    );
  });

  const reading = fc
    .tuple(
      fc.double({ min: 1, max: 50, noNaN: true }),
      fc.double({ min: 0.05, max: 0.95, noNaN: true }),
      fc.double({ min: 0, max: 1, noNaN: true }),
    )
    .map(([original, spacerShare, recovery]) => {
      const spacer = original * spacerShare;
      return { original, spacer, recovered: spacer + recovery * (original - spacer) };
    });

  it('lies in 0…100 % and falls as the piece recovers more (property)', () => {
    fc.assert(
      fc.property(reading, fc.double({ min: 0, max: 1, noNaN: true }), (r, more) => {
        const set = compressionSetPercent(r);
        const better = compressionSetPercent({
          ...r,
          recovered: r.recovered + more * (r.original - r.recovered),
        });
        return set >= 0 && set <= 100 + 1e-9 && better <= set + 1e-9;
      }),
    );
  });

  it('throws EngineInputError, never NaN, for any non-finite thickness (property)', () => {
    const bad = fc.constantFrom(Number.NaN, Infinity, -Infinity);
    fc.assert(
      fc.property(reading, bad, fc.constantFrom('original', 'recovered', 'spacer'), (r, v, key) => {
        expect(() => compressionSetPercent({ ...r, [key]: v })).toThrow(EngineInputError);
      }),
    );
  });
});

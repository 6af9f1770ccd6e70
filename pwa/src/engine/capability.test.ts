import { describe, expect, it } from 'vitest';
import { capabilityIndices } from './capability.js';

// Same hand-worked subgroups as the X̄–R test: mean 11, σ_within = (10/3)/2.326,
// overall sample σ of the 15 values = √(22/14) (hand computation [D]).
const subgroups = [
  [10, 12, 11, 13, 9],
  [11, 11, 12, 10, 11],
  [9, 10, 12, 11, 13],
];
const sigmaWithin = 10 / 3 / 2.326;
const sigmaOverall = Math.sqrt(22 / 14);

describe('capabilityIndices (Cp = (USL − LSL)/6σ, Cpk = min(USL − μ, μ − LSL)/3σ, REFERENCES §10 [M])', () => {
  it('two-sided, off-centre limits', () => {
    const c = capabilityIndices(subgroups, { lsl: 6, usl: 17 });
    expect(c.mean).toBeCloseTo(11, 12);
    expect(c.cp).toBeCloseTo(11 / (6 * sigmaWithin), 12);
    expect(c.cpk).toBeCloseTo(5 / (3 * sigmaWithin), 12);
    expect(c.pp).toBeCloseTo(11 / (6 * sigmaOverall), 12);
    expect(c.ppk).toBeCloseTo(5 / (3 * sigmaOverall), 12);
  });

  it('one-sided: only Cpk/Ppk from the given limit', () => {
    const c = capabilityIndices(subgroups, { usl: 16 });
    expect(c.cp).toBeNull();
    expect(c.cpk).toBeCloseTo(5 / (3 * sigmaWithin), 12);
  });

  it.each([
    ['limits', {}],
    ['usl', { lsl: 10, usl: 9 }],
    ['lsl', { lsl: Number.NaN, usl: 9 }],
  ])('rejects bad limits: %s', (field, limits) => {
    expect(() => capabilityIndices(subgroups, limits)).toThrow(expect.objectContaining({ field }));
  });

  it('rejects data without variation', () => {
    expect(() =>
      capabilityIndices(
        [
          [1, 1],
          [1, 1],
        ],
        { lsl: 0, usl: 2 },
      ),
    ).toThrow(expect.objectContaining({ field: 'subgroups' }));
  });
});

import { erf } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { XBAR_R_CONSTANTS, xbarRLimits } from './control-charts.js';

// d2(n) = E[range of n standard normals] = ∫ 1 − Φ(x)ⁿ − (1 − Φ(x))ⁿ dx (Tippett 1925), by the
// trapezoid rule with mathjs's erf: an outside check of the tabulated constants.
function d2ByIntegral(n: number): number {
  const phi = (x: number) => 0.5 * (1 + erf(x / Math.SQRT2));
  const h = 1e-3;
  let sum = 0;
  for (let x = -9; x <= 9; x += h) sum += 1 - phi(x) ** n - (1 - phi(x)) ** n;
  return sum * h;
}

describe('X̄–R constants (REFERENCES §10 table [S])', () => {
  it('hold the tabulated A2, d2, D3, D4 for n = 2…10', () => {
    expect(XBAR_R_CONSTANTS[2]).toEqual({ a2: 1.88, d2: 1.128, d3: 0, d4: 3.267 });
    expect(XBAR_R_CONSTANTS[5]).toEqual({ a2: 0.577, d2: 2.326, d3: 0, d4: 2.114 });
    expect(XBAR_R_CONSTANTS[7]).toEqual({ a2: 0.419, d2: 2.704, d3: 0.076, d4: 1.924 });
    expect(XBAR_R_CONSTANTS[10]).toEqual({ a2: 0.308, d2: 3.078, d3: 0.223, d4: 1.777 });
  });

  it('d2 agrees with the range integral to the table’s 3 decimals, and A2 with 3/(d2√n)', () => {
    for (let n = 2; n <= 10; n++) {
      const c = XBAR_R_CONSTANTS[n];
      expect(c?.d2).toBeCloseTo(d2ByIntegral(n), 3);
      expect(c?.a2).toBeCloseTo(3 / ((c?.d2 ?? 1) * Math.sqrt(n)), 2);
    }
  });
});

describe('xbarRLimits', () => {
  // Worked by hand [D]: means 11, 11, 11; ranges 4, 2, 4; R̄ = 10/3; n = 5 constants.
  const subgroups = [
    [10, 12, 11, 13, 9],
    [11, 11, 12, 10, 11],
    [9, 10, 12, 11, 13],
  ];

  it('worked subgroup example (hand computation with the n = 5 row)', () => {
    const limits = xbarRLimits(subgroups);
    expect(limits.grandMean).toBeCloseTo(11, 12);
    expect(limits.meanRange).toBeCloseTo(10 / 3, 12);
    expect(limits.xbarUcl).toBeCloseTo(11 + 0.577 * (10 / 3), 12);
    expect(limits.xbarLcl).toBeCloseTo(11 - 0.577 * (10 / 3), 12);
    expect(limits.rUcl).toBeCloseTo(7.04667, 5);
    expect(limits.rLcl).toBe(0);
    expect(limits.sigmaWithin).toBeCloseTo(1.433075, 6);
    expect(limits.ranges).toEqual([4, 2, 4]);
  });

  it.each([
    ['subgroups', [[1, 2, 3]]],
    ['subgroups', [[1], [2]]],
    ['subgroups', [Array(11).fill(1), Array(11).fill(2)]],
    [
      'subgroups[1]',
      [
        [1, 2, 3],
        [1, 2],
      ],
    ],
    [
      'subgroups[1][0]',
      [
        [1, 2],
        [Number.NaN, 2],
      ],
    ],
  ])('rejects %s', (field, input) => {
    expect(() => xbarRLimits(input)).toThrow(
      expect.objectContaining({ name: 'EngineInputError', field }),
    );
  });
});

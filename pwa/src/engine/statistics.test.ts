import { describe, expect, it } from 'vitest';
import { binomialCdf, sampleStandardDeviation, studentTTwoSided } from './statistics.js';

describe('studentTTwoSided', () => {
  // Two-sided 95 % and 99 % points of Student's t, any statistics textbook's t table [S].
  it.each([
    [0.95, 1, 12.706],
    [0.95, 2, 4.303],
    [0.95, 3, 3.182],
    [0.95, 10, 2.228],
    [0.95, 30, 2.042],
    [0.99, 5, 4.032],
    [0.9, 4, 2.132],
  ])('confidence %s with ν = %s is %s (t table)', (confidence, nu, expected) => {
    expect(studentTTwoSided(confidence, nu)).toBeCloseTo(expected, 3);
  });

  it('ν = 1 is the Cauchy quantile tan(π·0.475) (closed form)', () => {
    expect(studentTTwoSided(0.95, 1)).toBeCloseTo(Math.tan(Math.PI * 0.475), 9);
  });

  it('rejects a confidence outside (0, 1) and a fractional ν', () => {
    expect(() => studentTTwoSided(1, 3)).toThrow(expect.objectContaining({ field: 'confidence' }));
    expect(() => studentTTwoSided(0.95, 2.5)).toThrow(
      expect.objectContaining({ field: 'degreesOfFreedom' }),
    );
  });
});

describe('binomialCdf', () => {
  it('n = 80, k ≤ 2, p = 1 % → 0.9534 (REFERENCES §9 [D])', () => {
    expect(binomialCdf(2, 80, 0.01)).toBeCloseTo(0.9534, 4);
  });

  it('n = 3150, k ≤ 1, p = 0.05 % matches the sum of the two terms written out [D]', () => {
    const q = 1 - 0.0005;
    expect(binomialCdf(1, 3150, 0.0005)).toBeCloseTo(q ** 3150 + 3150 * 0.0005 * q ** 3149, 12);
  });

  it('is 1 at p = 0 and 0 at p = 1 below n', () => {
    expect(binomialCdf(0, 10, 0)).toBe(1);
    expect(binomialCdf(9, 10, 1)).toBe(0);
  });
});

describe('sampleStandardDeviation', () => {
  it('of 2, 4, 4, 4, 5, 5, 7, 9 is √(32/7) (hand computation [D])', () => {
    expect(sampleStandardDeviation([2, 4, 4, 4, 5, 5, 7, 9])).toBeCloseTo(Math.sqrt(32 / 7), 14);
  });
});

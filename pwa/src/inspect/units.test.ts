import { beforeAll, describe, expect, it } from 'vitest';
import { formatHardness, formatQuantity, loadUnitParser, parseQuantity, toTyped } from './units';

beforeAll(() => loadUnitParser());

describe('parseQuantity', () => {
  it('reads a bare number in the person’s own units', () => {
    expect(parseQuantity('12.7', 'length', 'metric')).toEqual({ value: 12.7 });
    // 1 in = 25.4 mm exactly (international inch).
    expect(parseQuantity('0.5', 'length', 'imperial')).toEqual({ value: 12.7 });
    expect(parseQuantity('12,7', 'length', 'metric')).toEqual({ value: 12.7 });
  });

  it('converts forces: 1 lbf = 4.4482216152605 N exactly', () => {
    const parsed = parseQuantity('100', 'force', 'imperial');
    expect('value' in parsed && parsed.value).toBeCloseTo(444.82216152605, 10);
  });

  it('reads a number with any unit spelled out, whatever the person’s system', () => {
    const inches = parseQuantity('0.5 in', 'length', 'metric');
    expect('value' in inches && inches.value).toBeCloseTo(12.7, 12);
    const prime = parseQuantity('0.5"', 'length', 'metric');
    expect('value' in prime && prime.value).toBeCloseTo(12.7, 12);
    const kilonewtons = parseQuantity('2.1 kN', 'force', 'imperial');
    expect('value' in kilonewtons && kilonewtons.value).toBeCloseTo(2100, 9);
  });

  it('says what is wrong instead of guessing', () => {
    expect(parseQuantity('2 kN', 'length', 'metric')).toEqual({ problem: 'That is not a length.' });
    expect(parseQuantity('abc', 'length', 'metric')).toMatchObject({ problem: expect.any(String) });
    expect(parseQuantity('60 N', 'hardness', 'metric')).toMatchObject({
      problem: 'Type the durometer reading as a plain number.',
    });
    expect(parseQuantity('  ', 'length', 'metric')).toEqual({ empty: true });
  });
});

describe('display', () => {
  it('shows SI values in the person’s units', () => {
    expect(formatQuantity(25.4, 'length', 'imperial')).toBe('1.0000\u00a0in');
    expect(formatQuantity(1880.4, 'force', 'metric')).toBe('1880\u00a0N');
    expect(formatQuantity(undefined, 'force', 'metric')).toBe('—');
  });

  it('turns a stored value back into what the person would type', () => {
    expect(toTyped(12.7, 'length', 'imperial')).toBe('0.5');
    expect(toTyped(1880, 'force', 'metric')).toBe('1880');
  });

  it('shows the median of the durometer readings', () => {
    expect(formatHardness([57, 55, 56])).toBe('56\u00a0Shore\u00a0A');
    expect(formatHardness([55, 56, 57, 60])).toBe('56.5\u00a0Shore\u00a0A');
  });
});

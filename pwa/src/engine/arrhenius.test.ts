import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  GAS_CONSTANT,
  accelerationFactor,
  arrheniusFit,
  arrheniusLife,
  expectedCompressionSet,
  highestTemperatureForLife,
} from './arrhenius.js';

// Life data made from ln t = a + Ea/(R T) with Ea = 100 kJ/mol (REFERENCES §7 round trip).
const EA = 100;
const A = -25;
const B = (EA * 1000) / GAS_CONSTANT;
const life = (temperatureC: number) => Math.exp(A + B / (temperatureC + 273.15));
const exact = [70, 85, 100, 125].map((temperatureC) => ({
  temperatureC,
  hours: life(temperatureC),
}));

describe('arrheniusFit (ISO 11346, ln t = a + b/T)', () => {
  it('fits exact 100 kJ/mol data back to 100.000 kJ/mol (REFERENCES §7 round trip)', () => {
    const fit = arrheniusFit(exact);
    expect(fit.activationEnergyKJ).toBeCloseTo(100, 3);
    expect(fit.a).toBeCloseTo(A, 6);
    expect(fit.r2).toBeCloseTo(1, 12);
    expect(fit.activationEnergyBandKJ.high - fit.activationEnergyBandKJ.low).toBeLessThan(1e-6);
  });

  it('predicts the generating formula at another temperature [D]', () => {
    const fit = arrheniusFit(exact);
    const at40 = arrheniusLife(fit, 40);
    expect(at40.hours / life(40)).toBeCloseTo(1, 8);
    expect(at40.extrapolationK).toBeCloseTo(30, 12);
    expect(arrheniusLife(fit, 90).extrapolationK).toBe(0);
  });

  it('highest temperature for a life inverts the formula: T = b/(ln t − a) [D]', () => {
    const fit = arrheniusFit(exact);
    expect(highestTemperatureForLife(fit, life(55))).toBeCloseTo(55, 6);
  });

  it('Ea band on scattered data is b ± t(0.975, n−2)·s/√Sxx · R (OLS slope interval, any regression text [S])', () => {
    const points = [
      { temperatureC: 70, hours: 4200 },
      { temperatureC: 85, hours: 1100 },
      { temperatureC: 100, hours: 410 },
      { temperatureC: 125, hours: 55 },
    ];
    const fit = arrheniusFit(points);
    // Independent recomputation with the tabulated t(0.975, 2) = 4.303 [S: t table].
    const x = points.map((p) => 1 / (p.temperatureC + 273.15));
    const y = points.map((p) => Math.log(p.hours));
    const xm = x.reduce((s, v) => s + v) / 4;
    const ym = y.reduce((s, v) => s + v) / 4;
    const sxx = x.reduce((s, v) => s + (v - xm) ** 2, 0);
    const b = x.reduce((s, v, i) => s + (v - xm) * ((y[i] ?? 0) - ym), 0) / sxx;
    const rss = x.reduce((s, v, i) => s + ((y[i] ?? 0) - (ym + b * (v - xm))) ** 2, 0);
    const half = (4.303 * Math.sqrt(rss / 2)) / Math.sqrt(sxx);
    expect(fit.activationEnergyKJ).toBeCloseTo((b * GAS_CONSTANT) / 1000, 9);
    expect(fit.activationEnergyBandKJ.low).toBeCloseTo(((b - half) * GAS_CONSTANT) / 1000, 2);
    expect(fit.activationEnergyBandKJ.high).toBeCloseTo(((b + half) * GAS_CONSTANT) / 1000, 2);
    const at23 = arrheniusLife(fit, 23);
    expect(at23.lowHours).toBeLessThan(at23.hours);
    expect(at23.highHours).toBeGreaterThan(at23.hours);
  });

  it.each([
    ['points', [exact[0], exact[1]]],
    ['points', [exact[0], exact[0], exact[1]]],
    ['points[1].hours', [exact[0], { temperatureC: 85, hours: 0 }, exact[2]]],
    ['points[2].temperatureC', [exact[0], exact[1], { temperatureC: -300, hours: 5 }]],
    ['points[0].temperatureC', [{ temperatureC: Number.NaN, hours: 5 }, exact[1], exact[2]]],
    ['points', exact.map((p, i) => ({ ...p, hours: 10 * (i + 1) }))],
  ])('rejects %s', (field, points) => {
    expect(() => arrheniusFit(points as never)).toThrow(
      expect.objectContaining({ name: 'EngineInputError', field }),
    );
  });
});

describe('accelerationFactor', () => {
  it('Ea 100 kJ/mol, 23 °C use against 70 °C test → 260.47 (ISO 11346 formula, hand computation [D])', () => {
    expect(accelerationFactor(100, 23, 70)).toBeCloseTo(260.466, 2);
  });
});

describe('expectedCompressionSet (first-order kinetics on the fitted threshold times)', () => {
  const fit = arrheniusFit(exact);

  it('equals the threshold set at the fitted threshold time [D]', () => {
    expect(
      expectedCompressionSet(fit, { thresholdPercent: 50, temperatureC: 90, hours: life(90) }),
    ).toBeCloseTo(50, 8);
  });

  it('two threshold times give 75 % for a 50 % threshold: 1 − ½² [D]', () => {
    expect(
      expectedCompressionSet(fit, { thresholdPercent: 50, temperatureC: 90, hours: 2 * life(90) }),
    ).toBeCloseTo(75, 8);
  });

  it('rises with time and with temperature (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 20, max: 120, noNaN: true }),
        fc.double({ min: 1, max: 1e5, noNaN: true }),
        (temperatureC, hours) => {
          const set = (t: number, h: number) =>
            expectedCompressionSet(fit, { thresholdPercent: 40, temperatureC: t, hours: h });
          const base = set(temperatureC, hours);
          return set(temperatureC, hours * 1.5) >= base && set(temperatureC + 5, hours) >= base;
        },
      ),
    );
  });

  it('rejects a threshold outside 0…100 %', () => {
    expect(() =>
      expectedCompressionSet(fit, { thresholdPercent: 100, temperatureC: 90, hours: 5 }),
    ).toThrow(expect.objectContaining({ field: 'thresholdPercent' }));
  });
});

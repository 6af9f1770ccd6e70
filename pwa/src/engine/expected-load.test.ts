import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { apparentCompressionModulus } from './compression-modulus.js';
import { expectedLoad, type LoadCase } from './expected-load.js';
import { centralDifference, relativeError } from './fixtures/finite-differences.js';
import { LINDLEY_NATURAL_RUBBER, youngsModulusFromShoreA } from './hardness.js';

const disc = { shape: 'disc', diameter: 100, thickness: 10 } as const;
const pad: LoadCase = {
  geometry: disc,
  faces: 'bonded',
  model: { kind: 'mooney-rivlin', c10: 0.3, c01: 0.05 },
  nominalHardness: 50,
  deflection: 1,
};
const load = (c: LoadCase) => expectedLoad(c).low.load;

// Gent 1958 written out here, independent of the engine's form.
const gent = (h: number) => (0.0981 * (56 + 7.62336 * h)) / (0.137505 * (254 - 2.54 * h));

describe('expectedLoad F(δ) = A·Φ·|P(λ)| (REFERENCES §5)', () => {
  it('lubricated neo-Hookean equals A·2C₁₀|λ − λ⁻²| (Rivlin & Saunders 1951 closed form, REFERENCES §2)', () => {
    const c: LoadCase = { ...pad, faces: 'lubricated', model: { kind: 'neo-hookean', c10: 0.35 } };
    const lambda = 0.9;
    expect(
      relativeError(load(c), 2500 * Math.PI * 0.7 * Math.abs(lambda - lambda ** -2)),
    ).toBeLessThan(1e-14);
  });

  it('tends to E_c·A·δ/t at small strain (REFERENCES §5)', () => {
    const delta = 1e-6;
    const e0 = 6 * (0.3 + 0.05);
    const ec = apparentCompressionModulus({
      geometry: pad.geometry,
      faces: 'bonded',
      youngsModulus: e0,
      materialFactor: 0.73,
      bulkModulus: LINDLEY_NATURAL_RUBBER.bulkModulus,
      bulkCorrection: 'lubrication',
    });
    expect(
      relativeError(load({ ...pad, deflection: delta }), (ec * 2500 * Math.PI * delta) / 10),
    ).toBeLessThan(1e-6);
  });

  it('a measured hardness scales a lubricated load by E_Gent(H)/E_Gent(H₀) (Gent 1958)', () => {
    const c: LoadCase = { ...pad, faces: 'lubricated' };
    expect(load({ ...c, hardness: 56 }) / load(c)).toBeCloseTo(gent(56) / gent(50), 13);
  });

  it('stiffness and sensitivities agree with central differences of the forward load (outside check)', () => {
    const result = expectedLoad({ ...pad, hardness: 53 }).low;
    const h = 1e-5;
    const byDelta = centralDifference((d) => load({ ...pad, hardness: 53, deflection: d }), 1, h);
    const byT = centralDifference(
      (t) => load({ ...pad, hardness: 53, geometry: { ...disc, thickness: t } }),
      10,
      h,
    );
    const byD = centralDifference(
      (d) => load({ ...pad, hardness: 53, geometry: { ...disc, diameter: d } }),
      100,
      h,
    );
    const byH = centralDifference((x) => load({ ...pad, hardness: x }), 53, h);
    expect(relativeError(result.stiffness, byDelta)).toBeLessThan(1e-7);
    expect(relativeError(result.sensitivities.thickness ?? 0, byT)).toBeLessThan(1e-7);
    expect(relativeError(result.sensitivities.diameter ?? 0, byD)).toBeLessThan(1e-7);
    expect(relativeError(result.sensitivities.hardness ?? 0, byH)).toBeLessThan(1e-7);
  });

  it('unbonded faces give the lubricated and the bonded estimate as bounds (REFERENCES §5)', () => {
    const unbonded = expectedLoad({ ...pad, faces: 'unbonded' });
    expect(unbonded.low.load).toBe(load({ ...pad, faces: 'lubricated' }));
    expect(unbonded.high.load).toBe(load(pad));
    expect(unbonded.low.shapeAmplification).toBe(1);
  });

  it('load rises with deflection and hardness and falls with thickness (properties)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 4, noNaN: true }),
        fc.double({ min: 25, max: 75, noNaN: true }),
        fc.double({ min: 6, max: 20, noNaN: true }),
        (deflection, hardness, thickness) => {
          const c: LoadCase = {
            ...pad,
            deflection,
            hardness,
            geometry: { ...pad.geometry, thickness },
          };
          const f = load(c);
          return (
            load({ ...c, deflection: deflection * 1.05 }) > f &&
            load({ ...c, hardness: hardness + 0.5 }) > f &&
            load({ ...c, geometry: { ...c.geometry, thickness: thickness * 1.05 } }) < f
          );
        },
      ),
    );
  });
});

describe('validity flags (REFERENCES §5 cautions)', () => {
  const codes = (c: LoadCase) => expectedLoad(c).flags.map((f) => f.code);

  it('none for a moderate bonded pad', () => {
    expect(codes(pad)).toEqual([]);
  });
  it('shape factor outside 0.5–20', () => {
    expect(codes({ ...pad, geometry: { shape: 'disc', diameter: 1000, thickness: 10 } })).toContain(
      'shape-factor-range',
    );
    expect(codes({ ...pad, geometry: { shape: 'disc', diameter: 15, thickness: 10 } })).toContain(
      'shape-factor-range',
    );
  });
  it('strain over 15 %', () => {
    expect(codes({ ...pad, deflection: 2 })).toContain('strain-over-15-percent');
  });
  it('tension in a bonded part', () => {
    expect(codes({ ...pad, deflection: -0.5 })).toContain('tension-in-bonded-part');
  });
  it('hardness outside Gent’s 20–80 and outside the k table', () => {
    expect(codes({ ...pad, hardness: 85 })).toEqual(
      expect.arrayContaining(['hardness-outside-gent-range', 'material-factor-held']),
    );
  });
});

describe('input guards', () => {
  it.each([
    ['thickness', { geometry: { shape: 'disc', diameter: 100, thickness: 0 } }],
    [
      'innerDiameter',
      { geometry: { shape: 'annulus', outerDiameter: 50, innerDiameter: 60, thickness: 10 } },
    ],
    ['deflection', { deflection: 10 }],
    ['deflection', { deflection: 0 }],
    ['deflection', { deflection: Number.NaN }],
    ['deflection', { deflection: -1, faces: 'lubricated' }],
    ['hardness', { hardness: 101 }],
    ['nominalHardness', { nominalHardness: -3 }],
    ['faces', { faces: 'glued' }],
    ['c10', { model: { kind: 'neo-hookean', c10: Infinity } }],
    ['bulkModulus', { bulkModulus: 0 }],
  ])('rejects a bad %s', (field, change) => {
    expect(() => expectedLoad({ ...pad, ...change } as LoadCase)).toThrow(
      expect.objectContaining({ name: 'EngineInputError', field }),
    );
  });

  it('never returns NaN for a non-finite input (property)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(Number.NaN, Infinity, -Infinity),
        fc.constantFrom('deflection', 'hardness', 'nominalHardness', 'bulkModulus'),
        (bad, key) => {
          expect(() => expectedLoad({ ...pad, [key]: bad })).toThrow(
            expect.objectContaining({ name: 'EngineInputError' }),
          );
        },
      ),
    );
  });
});

describe('Gent check against the engine relation', () => {
  it('the test’s own Gent formula agrees with the engine at 50 Shore A', () => {
    expect(gent(50)).toBeCloseTo(youngsModulusFromShoreA(50), 14);
  });
});

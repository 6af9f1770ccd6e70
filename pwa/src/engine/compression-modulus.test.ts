import { describe, expect, it } from 'vitest';
import {
  annulusHoleFactorOf,
  apparentCompressionModulus,
  withBulkCompressibilityOf,
} from './compression-modulus.js';
import { Real } from './real.js';

// Modified Bessel functions by their power series (Abramowitz & Stegun 9.6.10), for the exact
// compressible bonded-disc modulus E_c = K[1 − 2I₁(β)/(βI₀(β))], β² = 48GS²/K (REFERENCES §5 [D]).
function besselI(order: 0 | 1, x: number): number {
  // First term (x/2)^ν / ν!, with 0! = 1! = 1.
  let term = (x / 2) ** order;
  let sum = term;
  for (let k = 1; k < 200; k++) {
    term *= (x / 2) ** 2 / (k * (k + order));
    sum += term;
  }
  return sum;
}
function exactDiscModulus(g: number, k: number, s: number): number {
  const beta = Math.sqrt((48 * g * s * s) / k);
  return k * (1 - (2 * besselI(1, beta)) / (beta * besselI(0, beta)));
}

describe('bulk-compressibility corrections (REFERENCES §5)', () => {
  // G = 1, K = 2000, S = 10: the incompressible lubrication-theory modulus is 6GS² = 600 MPa.
  const incompressible = new Real(600);

  it('exact Bessel solution is 429.99 MPa (REFERENCES §5 [D], computed here from the series)', () => {
    expect(exactDiscModulus(1, 2000, 10)).toBeCloseTo(429.99, 2);
  });

  it('4/(3K) form gives 428.57 and the 1/K form 461.54 MPa (REFERENCES §5 [D])', () => {
    expect(withBulkCompressibilityOf(incompressible, 2000, 'lubrication').re).toBeCloseTo(
      428.57,
      2,
    );
    expect(withBulkCompressibilityOf(incompressible, 2000, 'gent-lindley').re).toBeCloseTo(
      461.54,
      2,
    );
    expect(withBulkCompressibilityOf(incompressible, 2000, 'none').re).toBe(600);
  });

  it('the default lubrication form is the closer one to the exact disc solution', () => {
    const exact = exactDiscModulus(1, 2000, 10);
    const lubrication = withBulkCompressibilityOf(incompressible, 2000, 'lubrication').re;
    const gentLindley = withBulkCompressibilityOf(incompressible, 2000, 'gent-lindley').re;
    expect(Math.abs(lubrication - exact)).toBeLessThan(Math.abs(gentLindley - exact));
  });
});

describe('annulus hole factor (bearing literature after Constantinou et al., REFERENCES §5)', () => {
  it('F(2) = 0.6719 (REFERENCES §5 [D])', () => {
    expect(annulusHoleFactorOf(new Real(2)).re).toBeCloseTo(0.6719, 4);
  });
});

describe('apparentCompressionModulus', () => {
  const disc = { shape: 'disc', diameter: 100, thickness: 10 } as const;
  const base = {
    youngsModulus: 3,
    materialFactor: 0.73,
    bulkModulus: 2000,
    bulkCorrection: 'none',
  } as const;

  it('bonded disc: E₀(1 + 2kS²) (Gent & Lindley 1959)', () => {
    expect(apparentCompressionModulus({ ...base, geometry: disc, faces: 'bonded' })).toBeCloseTo(
      3 * (1 + 2 * 0.73 * 2.5 ** 2),
      12,
    );
  });

  it('long strip: (4/3)E₀(1 + kS²) (REFERENCES §5 [M])', () => {
    const strip = { shape: 'strip', width: 50, thickness: 10 } as const;
    expect(apparentCompressionModulus({ ...base, geometry: strip, faces: 'bonded' })).toBeCloseTo(
      (4 / 3) * 3 * (1 + 0.73 * 2.5 ** 2),
      12,
    );
  });

  it('lubricated faces leave E₀ (no bulging constraint)', () => {
    expect(apparentCompressionModulus({ ...base, geometry: disc, faces: 'lubricated' })).toBe(3);
  });

  it('an annulus with a pin-hole tends to the disc of the same S', () => {
    const annulus = {
      shape: 'annulus',
      outerDiameter: 100,
      innerDiameter: 1e-6,
      thickness: 10,
    } as const;
    const bonded = { ...base, faces: 'bonded' } as const;
    // F → 1 only logarithmically as the hole closes, so compare loosely.
    expect(
      apparentCompressionModulus({ ...bonded, geometry: annulus }) /
        apparentCompressionModulus({ ...bonded, geometry: disc }),
    ).toBeGreaterThan(0.9);
  });

  it.each([
    ['youngsModulus', { youngsModulus: 0 }],
    ['materialFactor', { materialFactor: -0.1 }],
    ['bulkModulus', { bulkModulus: Number.NaN }],
    ['bulkCorrection', { bulkCorrection: 'guess' }],
    ['faces', { faces: 'glued' }],
  ])('rejects a bad %s', (field, change) => {
    expect(() =>
      apparentCompressionModulus({ ...base, geometry: disc, faces: 'bonded', ...change } as never),
    ).toThrow(expect.objectContaining({ name: 'EngineInputError', field }));
  });
});

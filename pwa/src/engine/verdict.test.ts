import { describe, expect, it } from 'vitest';
import type { PartMeasurement, PartSpec } from './part-spec.js';
import { samplingPlan } from './sampling.js';
import { lotVerdict, partVerdict, prepareSpec, type PartVerdict } from './verdict.js';

// A lubricated neo-Hookean disc whose expected load is 1 880 N by the closed form
// F = A·2C₁₀|λ − λ⁻²| (Rivlin & Saunders 1951, REFERENCES §2): the example of DESIGN §3.
const area = 2500 * Math.PI;
const lambda = 0.9;
const c10 = 1880 / (area * 2 * Math.abs(lambda - lambda ** -2));
const spec: PartSpec = {
  geometry: { shape: 'disc', diameter: 100, thickness: 10 },
  bonded: false,
  unbondedFaces: 'lubricated',
  model: { kind: 'neo-hookean', c10 },
  testDeflection: 1,
  loadTolerancePercent: 10,
  tolerance: { class: 'M2', dimensions: { thickness: { class: 'M3', kind: 'closure' } } },
  hardness: { nominal: 60, tolerance: 5 },
  compressionSetLimitPercent: 25,
};
const prepared = prepareSpec(spec);
const only = (m: PartMeasurement, name: string) =>
  partVerdict(prepared, m).characteristics.find((c) => c.characteristic === name);

describe('load verdict', () => {
  it('reads "load 2 140 N is 14 % above the expected 1 880 N ± 10 %" (DESIGN §3 example)', () => {
    const load = only({ load: 2140 }, 'load');
    expect(load?.status).toBe('out');
    expect(load?.reason).toBe(
      'load 2 140 N is 14 % above the expected 1 880 N ± 10 %, over the upper limit 2 068 N',
    );
  });

  it('near = inside the outer 10 % of the band’s width (band 1 692–2 068 N, near beyond 2 030.4 N)', () => {
    expect(only({ load: 2000 }, 'load')?.status).toBe('within');
    expect(only({ load: 2040 }, 'load')?.status).toBe('near');
    expect(only({ load: 2068 }, 'load')?.status).toBe('near');
    expect(only({ load: 2069 }, 'load')?.status).toBe('out');
    expect(only({ load: 1700 }, 'load')?.reason).toBe(
      'load 1 700 N is 9.6 % below the expected 1 880 N ± 10 %, near the lower limit 1 692 N',
    );
  });

  it('the near share is configurable', () => {
    const wide = prepareSpec(spec, { nearFraction: 0.25 });
    const [load] = partVerdict(wide, { load: 2000 }).characteristics;
    expect(load?.status).toBe('near');
  });

  it('adds what the measured size and hardness predict for this very part', () => {
    expect(only({ load: 1900, thickness: 10.3 }, 'load')?.reason).toMatch(
      /; its measured size and hardness predict 1 [0-9]{3} N$/,
    );
  });

  it('unbonded friction-held faces are judged against lubricated-to-bonded bounds (REFERENCES §5)', () => {
    const bounds = prepareSpec({ ...spec, unbondedFaces: 'friction' });
    const { low, high } = bounds.expected;
    expect(bounds.lowerLoad).toBeCloseTo(low.load * 0.9, 9);
    expect(bounds.upperLoad).toBeCloseTo(high.load * 1.1, 9);
    const between = partVerdict(bounds, { load: (low.load + high.load) / 2 }).characteristics;
    expect(between[0]?.status).toBe('within');
    expect(between[0]?.reason).toMatch(/lies between the lubricated- and bonded-face estimates/);
  });
});

describe('dimension, hardness and compression-set verdicts', () => {
  it('thickness against its ISO 3302-1 class: 10.42 mm on 10 ± 0.50 (M3 closure, 6.3–10 band)', () => {
    const thickness = only({ thickness: 10.42 }, 'thickness');
    expect(thickness?.status).toBe('near');
    expect(thickness?.reason).toBe(
      'thickness 10.42 mm is 0.42 mm above the nominal 10.00 mm ± 0.50 mm (ISO 3302-1 M3 closure), near the upper limit 10.50 mm',
    );
  });

  it('an unlisted dimension takes the spec class as fixed: diameter 100 is ± 0.50 (M2 F, 63–100)', () => {
    const diameter = only({ dimensions: { diameter: 100.6 } }, 'diameter');
    expect(diameter?.upper).toBeCloseTo(100.5, 12);
    expect(diameter?.status).toBe('out');
  });

  it('a dimension given as undefined is not measured, so another shape’s name does not fail', () => {
    const verdict = partVerdict(prepared, {
      dimensions: { diameter: 100.2, side: undefined, width: undefined },
    });
    expect(verdict.characteristics.map((c) => c.characteristic)).toEqual(['diameter', 'defects']);
  });

  it('hardness by the median of the readings (REFERENCES §6)', () => {
    expect(only({ hardness: [66, 64, 67] }, 'hardness')?.reason).toBe(
      'hardness 66 Shore A (median of 3) is 6 points above the nominal 60 ± 5, over the upper limit 65',
    );
    expect(only({ hardness: [18, 60, 61] }, 'hardness')?.reason).toMatch(/unreliable$/);
  });

  it('compression set is one-sided: near only by the limit', () => {
    expect(only({ compressionSetPercent: 1 }, 'compression-set')?.status).toBe('within');
    expect(only({ compressionSetPercent: 23 }, 'compression-set')?.reason).toBe(
      'compression set 23.0 % is near the limit 25.0 %',
    );
    expect(only({ compressionSetPercent: 26 }, 'compression-set')?.status).toBe('out');
  });

  it.each([
    ['side', { dimensions: { side: 10 } }],
    ['thickness', { thickness: -1 }],
    ['load', { load: Number.NaN }],
    ['hardness[0]', { hardness: [120] }],
    ['compressionSetPercent', { compressionSetPercent: 140 }],
    [
      'defects[0].severity',
      { defects: [{ type: 'flash', location: 'cosmetic', severity: 'bad' }] },
    ],
  ])('rejects a bad %s', (field, measurement) => {
    expect(() => partVerdict(prepared, measurement as PartMeasurement)).toThrow(
      expect.objectContaining({ name: 'EngineInputError', field }),
    );
  });
});

describe('part rule', () => {
  it('a minor defect marks the part near but conforming; a major one makes it nonconforming', () => {
    const minor = partVerdict(prepared, {
      load: 1880,
      defects: [{ type: 'flash', location: 'cosmetic', severity: 'minor' }],
    });
    expect(minor).toMatchObject({ status: 'near', conforming: true, criticalDefects: 0 });
    const major = partVerdict(prepared, {
      defects: [{ type: 'non-fill', location: 'sealing', severity: 'major' }],
    });
    expect(major).toMatchObject({ status: 'out', conforming: false });
    expect(major.characteristics[0]?.reason).toBe(
      '1 major (non-fill on a sealing surface): critical and major defects make the part nonconforming',
    );
  });

  it('is plain data that survives JSON', () => {
    const verdict = partVerdict(prepared, { thickness: 10.1, hardness: [60, 61, 59], load: 1900 });
    expect(JSON.parse(JSON.stringify(verdict))).toEqual(verdict);
  });
});

describe('lot verdict (ISO 2859-1 single sampling)', () => {
  const plan = samplingPlan({ lotSize: 1000, level: 'II', aql: 1.0, severity: 'normal' });
  const good = partVerdict(prepared, { load: 1880 });
  const bad = partVerdict(prepared, { load: 2500 });
  const parts = (n: number, nonconforming: number): PartVerdict[] =>
    Array.from({ length: n }, (_, i) => (i < nonconforming ? bad : good));

  it('accepts 2 nonconforming of 80 at Ac 2 and rejects at 3, as soon as it is reached', () => {
    expect(lotVerdict(plan, parts(80, 2))).toMatchObject({ decision: 'accept', nonconforming: 2 });
    const rejected = lotVerdict(plan, parts(30, 3));
    expect(rejected.decision).toBe('reject');
    expect(rejected.reason).toBe(
      '3 of 30 inspected parts nonconforming (sample 80, accept up to 2, reject at 3): lot rejected',
    );
    expect(lotVerdict(plan, parts(40, 1))).toMatchObject({ decision: 'open' });
  });

  it('one critical defect rejects the lot whatever the count (documented rule)', () => {
    const critical = partVerdict(prepared, {
      defects: [{ type: 'bond failure', location: 'flexing', severity: 'critical' }],
    });
    const verdict = lotVerdict(plan, [...parts(79, 0), critical]);
    expect(verdict).toMatchObject({ decision: 'reject', criticalDefects: 1, nonconforming: 1 });
  });
});

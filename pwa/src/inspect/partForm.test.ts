import { beforeAll, describe, expect, it } from 'vitest';
import { partFields, partTexts, readPart } from './partForm';
import { loadUnitParser, toTyped } from './units';

beforeAll(() => loadUnitParser());

const annulus = { shape: 'annulus', outerDiameter: 70, innerDiameter: 30, thickness: 15 } as const;

describe('part form', () => {
  it('asks for the plan dimensions of the part’s shape', () => {
    expect(partFields(annulus, 3).map((f) => f.name)).toEqual([
      'thickness',
      'outerDiameter',
      'innerDiameter',
      'hardness1',
      'hardness2',
      'hardness3',
      'load',
    ]);
    expect(partFields({ shape: 'disc', diameter: 50, thickness: 10 }, 5)).toHaveLength(8);
  });

  it('turns typed texts into SI measurements and leaves blank fields out', () => {
    const fields = partFields(annulus, 3);
    const read = readPart(
      fields,
      { thickness: '0.6', outerDiameter: '', hardness1: '70', hardness2: '71', load: '500' },
      'imperial',
    );
    expect(read.problems).toEqual({});
    expect(read.measurements.thickness).toBeCloseTo(15.24, 12);
    expect(read.measurements.dimensions).toBeUndefined();
    expect(read.measurements.hardness).toEqual([70, 71]);
    expect(read.measurements.load).toBeCloseTo(2224.11080763025, 9);
  });

  it('keeps a problem per field', () => {
    const read = readPart(partFields(annulus, 3), { thickness: 'twelve' }, 'metric');
    expect(read.problems.thickness).toBeDefined();
    expect(read.empty).toBe(true);
  });

  it('gives a saved part back as texts for a correction', () => {
    const fields = partFields(annulus, 3);
    const measurements = { thickness: 15.1, hardness: [70, 71, 69], load: 2100 };
    const texts = partTexts(fields, measurements, (si, kind) => toTyped(si, kind, 'metric'));
    expect(texts).toEqual({
      thickness: '15.1',
      hardness1: '70',
      hardness2: '71',
      hardness3: '69',
      load: '2100',
    });
    expect(readPart(fields, texts, 'metric').measurements).toEqual(measurements);
  });
});

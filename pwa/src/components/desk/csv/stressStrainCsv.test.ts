import { describe, expect, it } from 'vitest';
import { applyMapping, guessMapping, parseLabNumber, readCsvTable } from './stressStrainCsv';

describe('reading lab CSV files', () => {
  it('detects the header, keeps line numbers and skips blank lines', () => {
    const table = readCsvTable('mode,stretch,stress_MPa\nuniaxial,1.12,0.14\n\nplanar,1.06,0.07\n');
    expect(table.hasHeader).toBe(true);
    expect(table.headers).toEqual(['mode', 'stretch', 'stress_MPa']);
    expect(table.rows.map((r) => r.line)).toEqual([2, 4]);
  });

  it('reads semicolon files with decimal commas', () => {
    const table = readCsvTable('Elongation %;Stress kPa\n12;140\n24,5;230\n');
    const mapping = guessMapping(table);
    expect(mapping).toMatchObject({ strainMeasure: 'strain-percent', stressUnit: 'kPa' });
    const { accepted } = applyMapping(table, { ...mapping, mode: { fixed: 'uniaxial' } });
    expect(accepted.map((p) => [p.stretch, p.stress])).toEqual([
      [1.12, 0.14],
      [1.245, 0.23],
    ]);
  });

  it('names columns when the file has no header', () => {
    const table = readCsvTable('1.12,0.14\n1.24,0.23\n');
    expect(table.hasHeader).toBe(false);
    expect(table.headers).toEqual(['Column 1', 'Column 2']);
    expect(table.rows).toHaveLength(2);
  });

  it('parses the number forms labs write and nothing else', () => {
    expect(parseLabNumber(' 1,25 ')).toBe(1.25);
    expect(parseLabNumber('1.2e-3')).toBe(0.0012);
    expect(parseLabNumber('-.5')).toBe(-0.5);
    for (const bad of ['', 'n/a', '1.2.3', '1,2,3', '0x10', 'Infinity', '12 MPa']) {
      expect(parseLabNumber(bad)).toBeNull();
    }
  });
});

describe('checking rows', () => {
  const text = [
    'mode,stretch,stress',
    'uniaxial,1.12,0.14', // 2 ok
    'uniaxial,abc,0.2', // 3 not a number
    'shear box,1.2,0.3', // 4 unknown mode
    'planar,0,0', // 5 stretch 0
    'planar,1.3,-0.2', // 6 wrong sign
    'equibiaxial,1.2,', // 7 no stress
    'equibiaxial,0.8,-0.1', // 8 ok (compression)
    'uniaxial,75,1', // 9 beyond any rubber
  ].join('\n');

  it('rejects each bad row with its line number and reason', () => {
    const table = readCsvTable(text);
    const result = applyMapping(table, guessMapping(table));
    expect(result.accepted.map((p) => p.line)).toEqual([2, 8]);
    expect(result.rejected).toEqual([
      { line: 3, reason: 'strain "abc" is not a number' },
      { line: 4, reason: 'test mode "shear box" is not uniaxial, equibiaxial or planar' },
      { line: 5, reason: 'stretch 0 is not above 0 (the specimen cannot vanish)' },
      { line: 6, reason: 'stress -0.2 MPa has the wrong sign for stretch 1.3' },
      { line: 7, reason: 'no stress value' },
      { line: 9, reason: 'stretch 75 is beyond 20: check the strain column and measure' },
    ]);
  });

  it('converts stress units exactly to MPa', () => {
    const table = readCsvTable('stretch,stress\n2,100\n');
    const at = (stressUnit: 'psi' | 'kgf/cm²' | 'Pa') =>
      applyMapping(table, { ...guessMapping(table), stressUnit }).accepted[0]?.stress;
    // 1 psi = 4.4482216152605 N / 645.16 mm² and 1 kgf = 9.80665 N, both exact by definition.
    expect(at('psi')).toBeCloseTo(0.689475729316836, 14);
    expect(at('kgf/cm²')).toBeCloseTo(9.80665, 12);
    expect(at('Pa')).toBeCloseTo(1e-4, 18);
  });

  it('turns engineering strain into stretch', () => {
    const table = readCsvTable('strain,stress\n0.5,0.3\n-0.2,-0.4\n');
    const { accepted } = applyMapping(table, guessMapping(table));
    expect(accepted.map((p) => p.stretch)).toEqual([1.5, 0.8]);
  });
});

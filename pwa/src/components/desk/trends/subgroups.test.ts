import { describe, expect, it } from 'vitest';
import type { MeasurementRow } from '../../../api/desk/types';
import { xbarRLimits } from '../../../engine';
import { lotSubgroups, outOfControl } from './subgroups';

function row(lot: string, day: number, load: number | null, sampleIndex: number): MeasurementRow {
  return {
    inspectionId: `${lot}-${sampleIndex}`,
    lotId: lot,
    lotNumber: `L-${lot}`,
    specRevisionId: 'rev',
    pressId: 'p1',
    pressCode: 'P1',
    cavity: 1,
    moldedAt: `2026-11-${String(day).padStart(2, '0')}T06:00:00Z`,
    sampleIndex,
    recordedAt: '2026-11-30T00:00:00Z',
    thickness: 10,
    hardness: 60,
    load,
    conforming: true,
  };
}

const lots = (loads: number[][]) =>
  loads.flatMap((values, lot) => values.map((v, i) => row(String(lot + 1), lot + 1, v, i + 1)));

describe('lot subgroups for X̄–R charts', () => {
  it('makes one equal-size subgroup per lot in molding order and leaves short lots out', () => {
    const rows = [
      ...lots([
        [1, 2, 3],
        [4, 5, 6, 7],
        [8, 9, 10],
      ]),
      row('9', 9, 11, 1),
      row('9', 9, null, 2),
    ];
    const grouping = lotSubgroups(rows.reverse(), 'load');
    expect(grouping.size).toBe(3);
    expect(grouping.subgroups.map((s) => s.lotNumber)).toEqual(['L-1', 'L-2', 'L-3']);
    expect(grouping.subgroups[1]?.values).toEqual([4, 5, 6]);
    expect(grouping.leftOut).toEqual([{ lotNumber: 'L-9', count: 1 }]);
  });

  it('marks subgroups beyond the limits (A2 = 1.880 for n = 2, REFERENCES §10)', () => {
    const grouping = lotSubgroups(
      lots([
        [10, 10.2],
        [10.1, 9.9],
        [10, 10.2],
        [9.9, 10.1],
        [12, 12.2],
      ]),
      'load',
    );
    const limits = xbarRLimits(grouping.subgroups.map((s) => s.values));
    // By hand: X̿ = 10.46, R̄ = 0.2, so the X̄ limits are 10.46 ± 1.880 × 0.2 = 10.084 … 10.836.
    expect(limits.xbarLcl).toBeCloseTo(10.084, 10);
    const flagged = outOfControl(grouping.subgroups, limits);
    expect(flagged.map((f) => [f.subgroup.lotNumber, f.reasons])).toEqual([
      ['L-2', ['mean below its lower limit']],
      ['L-4', ['mean below its lower limit']],
      ['L-5', ['mean above its upper limit']],
    ]);
  });
});

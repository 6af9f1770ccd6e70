import { describe, expect, it } from 'vitest';
import type { Inspection, LotDetail, Press } from '../types';
import { measurementRows } from './measurementRows';

const inspection = (
  id: string,
  measurements: Inspection['measurements'],
  supersededBy: string | null = null,
) =>
  ({
    id,
    sampleIndex: 1,
    supersededBy,
    measurements,
    conforming: true,
    recordedAt: '2026-11-02T08:00:00Z',
  }) as Inspection;

const lot = {
  id: 'lot-1',
  lotNumber: 'L-1',
  specRevisionId: 'rev-1',
  pressId: 'press-1',
  cavity: 2,
  moldedAt: '2026-11-02T06:00:00Z',
  inspections: [
    inspection('old', { load: 900 }, 'new'),
    inspection('new', { thickness: 10.1, hardness: [58, 61, 60], load: 1000 }),
  ],
} as unknown as LotDetail;

describe('trend rows from lots', () => {
  it('keeps current inspections only, with the median hardness and the press code', () => {
    const rows = measurementRows([lot], [{ id: 'press-1', code: 'P2' } as Press]);
    expect(rows).toHaveLength(1);
    // Median of 58, 61, 60 is 60.
    expect(rows[0]).toMatchObject({
      inspectionId: 'new',
      pressCode: 'P2',
      cavity: 2,
      thickness: 10.1,
      hardness: 60,
      load: 1000,
    });
  });

  it('leaves what was not measured empty', () => {
    const rows = measurementRows([{ ...lot, inspections: [inspection('x', {})] }], []);
    expect(rows[0]).toMatchObject({ thickness: null, hardness: null, load: null, pressCode: '?' });
  });
});

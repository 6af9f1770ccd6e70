import { medianHardness } from '../../engine';
import type { LotDetail, Press } from '../types';
import type { MeasurementRow } from './types';

/** One row per current sampled part; hardness is the median of its readings, as verdicts use. */
export function measurementRows(
  lots: readonly LotDetail[],
  presses: readonly Press[],
): MeasurementRow[] {
  const pressCode = new Map(presses.map((p) => [p.id, p.code]));
  return lots.flatMap((lot) =>
    lot.inspections
      .filter((inspection) => !inspection.supersededBy)
      .map((inspection) => {
        const { thickness, hardness, load } = inspection.measurements;
        return {
          inspectionId: inspection.id,
          lotId: lot.id,
          lotNumber: lot.lotNumber,
          specRevisionId: lot.specRevisionId,
          pressId: lot.pressId,
          pressCode: pressCode.get(lot.pressId) ?? '?',
          cavity: lot.cavity,
          moldedAt: lot.moldedAt,
          sampleIndex: inspection.sampleIndex,
          recordedAt: inspection.recordedAt,
          thickness: thickness ?? null,
          hardness: hardness?.length ? medianHardness(hardness) : null,
          load: load ?? null,
          conforming: inspection.conforming,
        };
      }),
  );
}

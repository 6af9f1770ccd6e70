import type { DefectRecord, LotVerdict, PartVerdict, PreparedSpec } from '../engine/index';
import type { LotPlan } from '../api/types';
import type { LotRecords } from '../offline/catalog';
import type { Engine } from './engine';

export interface LotTally {
  lot: LotVerdict;
  /** Each current part's verdict with the defects logged on it since. */
  parts: Map<string, PartVerdict>;
  /** Ids of the parts that count as nonconforming. */
  bad: Set<string>;
}

/** A defect belongs to its sample, whichever revision of the part record it was logged on. */
function defectsOn(sampleIndex: number, records: LotRecords): DefectRecord[] {
  return records.defects
    .filter((defect) => defect.partId && records.sampleOf.get(defect.partId) === sampleIndex)
    .map(({ type, location, severity, sizeMm }) => ({ type, location, severity, sizeMm }));
}

/**
 * The lot as the engine judges it from this tablet's records, the way the server recounts it:
 * a part's verdict is worked out again with the defects logged on its sample since.
 */
export function lotTally(
  engine: Engine,
  prepared: PreparedSpec,
  plan: LotPlan,
  records: LotRecords,
): LotTally {
  const verdicts = new Map(
    records.parts.slice(0, plan.sampleSize).map((part) => [
      part.id,
      engine.partVerdict(prepared, {
        ...part.measurements,
        defects: defectsOn(part.sampleIndex, records),
      }),
    ]),
  );
  const bad = new Set([...verdicts].filter(([, v]) => !v.conforming).map(([id]) => id));
  return { lot: engine.lotVerdict(plan, [...verdicts.values()]), parts: verdicts, bad };
}

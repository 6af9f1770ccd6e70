import type { DefectRecord, LotVerdict, PartVerdict, PreparedSpec } from '../engine/index';
import type { LotPlan } from '../api/types';
import type { LocalDefect, LocalPart } from '../offline/records';
import type { Engine } from './engine';

export interface LotTally {
  lot: LotVerdict;
  /** Each current part's verdict with the defects logged on it since. */
  parts: Map<string, PartVerdict>;
  /** Ids of the parts that count as nonconforming. */
  bad: Set<string>;
}

function defectsOn(partId: string, defects: LocalDefect[]): DefectRecord[] {
  return defects
    .filter((defect) => defect.partId === partId)
    .map(({ type, location, severity, sizeMm }) => ({ type, location, severity, sizeMm }));
}

/**
 * The lot as the engine judges it from this tablet's records. A part's verdict is worked out
 * again here because a defect may be logged after its measurements were saved.
 */
export function lotTally(
  engine: Engine,
  prepared: PreparedSpec,
  plan: LotPlan,
  parts: LocalPart[],
  defects: LocalDefect[],
): LotTally {
  const verdicts = new Map(
    parts.slice(0, plan.sampleSize).map((part) => [
      part.id,
      engine.partVerdict(prepared, {
        ...part.measurements,
        defects: defectsOn(part.id, defects),
      }),
    ]),
  );
  const bad = new Set([...verdicts].filter(([, v]) => !v.conforming).map(([id]) => id));
  return { lot: engine.lotVerdict(plan, [...verdicts.values()]), parts: verdicts, bad };
}

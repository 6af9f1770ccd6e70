import type { MeasurementRow } from '../../../api/desk/types';
import type { XbarRLimits } from '../../../engine';

export type Characteristic = 'load' | 'thickness' | 'hardness';

export const CHARACTERISTICS: Record<Characteristic, { label: string; unit: string }> = {
  load: { label: 'load at the test deflection', unit: 'N' },
  thickness: { label: 'thickness', unit: 'mm' },
  hardness: { label: 'hardness (median)', unit: 'Shore A' },
};

export interface Subgroup {
  lotId: string;
  lotNumber: string;
  moldedAt: string;
  pressCode: string;
  cavity: number;
  values: number[];
}

export interface Subgrouping {
  size: number;
  subgroups: Subgroup[];
  /** Lots with fewer parts measured than the subgroup size, left off the charts. */
  leftOut: { lotNumber: string; count: number }[];
}

/** Control charts need 2…10 values per subgroup (the tabulated constants). */
const MIN_SIZE = 2;
const MAX_SIZE = 10;

/**
 * One subgroup per lot, in molding order. X̄–R needs equal subgroups, so the size is the one
 * most lots reach (at most 10) and each lot gives its first that many sampled parts.
 */
export function lotSubgroups(
  rows: readonly MeasurementRow[],
  characteristic: Characteristic,
): Subgrouping {
  const byLot = new Map<string, { row: MeasurementRow; samples: [number, number][] }>();
  for (const row of rows) {
    const value = row[characteristic];
    if (value === null || !Number.isFinite(value)) continue;
    const entry = byLot.get(row.lotId) ?? { row, samples: [] };
    entry.samples.push([row.sampleIndex, value]);
    byLot.set(row.lotId, entry);
  }
  const lots = [...byLot.values()].map(({ row, samples }) => ({
    row,
    values: samples.sort((a, b) => a[0] - b[0]).map(([, value]) => value),
  }));
  const counts = new Map<number, number>();
  for (const lot of lots) {
    const n = Math.min(lot.values.length, MAX_SIZE);
    counts.set(n, (counts.get(n) ?? 0) + 1);
  }
  // The most common size; on a tie the larger, which estimates σ from more parts.
  let size = 0;
  let best = 0;
  for (const [n, count] of counts) {
    if (n >= MIN_SIZE && (count > best || (count === best && n > size))) {
      size = n;
      best = count;
    }
  }
  const subgroups: Subgroup[] = [];
  const leftOut: Subgrouping['leftOut'] = [];
  for (const { row, values } of lots) {
    if (size === 0 || values.length < size) {
      leftOut.push({ lotNumber: row.lotNumber, count: values.length });
      continue;
    }
    subgroups.push({
      lotId: row.lotId,
      lotNumber: row.lotNumber,
      moldedAt: row.moldedAt,
      pressCode: row.pressCode,
      cavity: row.cavity,
      values: values.slice(0, size),
    });
  }
  subgroups.sort(
    (a, b) => a.moldedAt.localeCompare(b.moldedAt) || a.lotNumber.localeCompare(b.lotNumber),
  );
  return { size, subgroups, leftOut };
}

export interface OutOfControl {
  index: number;
  subgroup: Subgroup;
  reasons: string[];
}

/** Subgroups whose mean or range falls outside the chart limits (Shewhart's basic rule). */
export function outOfControl(subgroups: readonly Subgroup[], limits: XbarRLimits): OutOfControl[] {
  return subgroups.flatMap((subgroup, index) => {
    const mean = limits.means[index] ?? Number.NaN;
    const range = limits.ranges[index] ?? Number.NaN;
    const reasons = [
      mean > limits.xbarUcl ? 'mean above its upper limit' : null,
      mean < limits.xbarLcl ? 'mean below its lower limit' : null,
      range > limits.rUcl ? 'range above its upper limit' : null,
      range < limits.rLcl ? 'range below its lower limit' : null,
    ].filter((reason): reason is string => reason !== null);
    return reasons.length ? [{ index, subgroup, reasons }] : [];
  });
}

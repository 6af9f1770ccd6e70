import { EngineInputError, requirePositive } from './errors.js';

export type ToleranceClass = 'M1' | 'M2' | 'M3' | 'M4';
/** Fixed dimensions are set by one mold part; closure dimensions cross the parting line (flash). */
export type DimensionKind = 'fixed' | 'closure';

interface ToleranceBand {
  /** Band holds nominals over the previous band's limit up to and including this one, mm. */
  upTo: number;
  /** ± mm: M1 F, M1 C, M2 F, M2 C, M3 F, M3 C, M4 (one value for both kinds). */
  values: readonly [number, number, number, number, number, number, number];
}

// ISO 3302-1 molded-product tolerances, ± mm, bands "over … up to and including" (REFERENCES §8 [S]).
const BANDS: readonly ToleranceBand[] = [
  { upTo: 4.0, values: [0.08, 0.1, 0.1, 0.15, 0.25, 0.4, 0.5] },
  { upTo: 6.3, values: [0.1, 0.12, 0.15, 0.2, 0.25, 0.4, 0.5] },
  { upTo: 10, values: [0.1, 0.15, 0.2, 0.2, 0.3, 0.5, 0.7] },
  { upTo: 16, values: [0.15, 0.2, 0.2, 0.25, 0.4, 0.6, 0.8] },
  { upTo: 25, values: [0.2, 0.2, 0.25, 0.35, 0.5, 0.8, 1.0] },
  { upTo: 40, values: [0.2, 0.25, 0.35, 0.4, 0.6, 1.0, 1.3] },
  { upTo: 63, values: [0.25, 0.35, 0.4, 0.5, 0.8, 1.3, 1.6] },
  { upTo: 100, values: [0.35, 0.4, 0.5, 0.7, 1.0, 1.6, 2.0] },
  { upTo: 160, values: [0.4, 0.5, 0.7, 0.8, 1.3, 2.0, 2.5] },
];
// Over 160 mm the tolerance is a percentage of the nominal, same column order.
const PERCENT_OVER_160 = [0.3, 0.4, 0.5, 0.7, 0.8, 1.3, 1.5] as const;

type Column = 0 | 1 | 2 | 3 | 4 | 5 | 6;
const COLUMNS: Record<ToleranceClass, Record<DimensionKind, Column>> = {
  M1: { fixed: 0, closure: 1 },
  M2: { fixed: 2, closure: 3 },
  M3: { fixed: 4, closure: 5 },
  M4: { fixed: 6, closure: 6 },
};

function column(tolClass: ToleranceClass, kind: DimensionKind): Column {
  // Specs arrive as JSON, so the union types are checked again here.
  const byKind = Object.hasOwn(COLUMNS, tolClass) ? COLUMNS[tolClass] : undefined;
  if (!byKind) throw new EngineInputError('tolClass', `must be M1, M2, M3 or M4, got ${tolClass}`);
  if (kind !== 'fixed' && kind !== 'closure') {
    throw new EngineInputError('kind', `must be 'fixed' or 'closure', got ${kind}`);
  }
  return byKind[kind];
}

/** ISO 3302-1 tolerance (± mm) for a molded dimension of this nominal size, class and kind. */
export function moldedTolerance(
  nominal: number,
  tolClass: ToleranceClass,
  kind: DimensionKind,
): number {
  requirePositive('nominal', nominal);
  const c = column(tolClass, kind);
  const band = BANDS.find((b) => nominal <= b.upTo);
  return band ? band.values[c] : (nominal * PERCENT_OVER_160[c]) / 100;
}

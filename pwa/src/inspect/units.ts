import type { UnitSystem } from '../offline/db';

/** What a field measures; the engine always takes mm, N and Shore A. */
export type QuantityKind = 'length' | 'force' | 'hardness';

interface UnitInfo {
  symbol: string;
  /** How many SI units (mm, N) one of this unit is; exact by definition. */
  toSi: number;
  decimals: number;
}

const UNITS: Record<QuantityKind, Record<UnitSystem, UnitInfo>> = {
  length: {
    metric: { symbol: 'mm', toSi: 1, decimals: 2 },
    imperial: { symbol: 'in', toSi: 25.4, decimals: 4 },
  },
  force: {
    metric: { symbol: 'N', toSi: 1, decimals: 0 },
    // 1 lbf = 4.4482216152605 N exactly (international pound and standard gravity).
    imperial: { symbol: 'lbf', toSi: 4.4482216152605, decimals: 1 },
  },
  hardness: {
    metric: { symbol: 'Shore A', toSi: 1, decimals: 0 },
    imperial: { symbol: 'Shore A', toSi: 1, decimals: 0 },
  },
};

const SI_SYMBOL: Record<QuantityKind, string> = { length: 'mm', force: 'N', hardness: '' };

export function unitOf(kind: QuantityKind, system: UnitSystem): UnitInfo {
  return UNITS[kind][system];
}

/** An SI value in the person's units, e.g. 25.4 mm → "1.0000 in". */
export function formatQuantity(si: number | undefined, kind: QuantityKind, system: UnitSystem) {
  if (si === undefined) return '—';
  const unit = unitOf(kind, system);
  // A no-break space keeps a value and its unit on one line in narrow table columns.
  return `${(si / unit.toSi).toFixed(unit.decimals)}\u00a0${unit.symbol}`;
}

export type Parsed = { value: number } | { problem: string } | { empty: true };

const BARE_NUMBER = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)$/;

// mathjs is large; it is fetched only when someone types a unit, and the part form warms it.
let math: typeof import('mathjs') | undefined;
export async function loadUnitParser(): Promise<void> {
  math ??= await import('mathjs');
}

function withUnit(text: string, kind: QuantityKind): Parsed {
  if (!math) return { problem: 'Reading units…' };
  if (kind === 'hardness') return { problem: 'Type the durometer reading as a plain number.' };
  let quantity;
  try {
    // Inches are often written with a double prime: 0.5" .
    quantity = math.unit(text.replace(',', '.').replace(/\s*(″|")$/, ' in'));
  } catch {
    return { problem: `"${text}" is not a number with a unit.` };
  }
  if (!quantity.equalBase(math.unit(`1 ${SI_SYMBOL[kind]}`))) {
    return { problem: `That is not a ${kind}.` };
  }
  return { value: quantity.toNumber(SI_SYMBOL[kind]) };
}

/**
 * What a person typed, in SI. A bare number is in their own units; a number with a unit
 * ("0.5 in", "2.1 kN") is converted by mathjs, so either system can be typed anywhere.
 */
export function parseQuantity(text: string, kind: QuantityKind, system: UnitSystem): Parsed {
  const trimmed = text.trim();
  if (!trimmed) return { empty: true };
  const parsed = BARE_NUMBER.test(trimmed)
    ? { value: Number(trimmed.replace(',', '.')) * unitOf(kind, system).toSi }
    : withUnit(trimmed, kind);
  if ('value' in parsed && !Number.isFinite(parsed.value)) return { problem: 'Not a number.' };
  return parsed;
}

/**
 * Durometer readings as shown in tables: their median, the value that counts. Display only;
 * verdicts take the engine's own median.
 */
export function formatHardness(readings: number[] | undefined): string {
  if (!readings?.length) return '—';
  const sorted = [...readings].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  const value = sorted.length % 2 ? sorted[mid] : ((sorted[mid - 1] ?? 0) + (sorted[mid] ?? 0)) / 2;
  return `${value}\u00a0Shore\u00a0A`;
}

/** An SI value as a bare number in the person's units, for a field to be edited. */
export function toTyped(si: number, kind: QuantityKind, system: UnitSystem): string {
  const unit = unitOf(kind, system);
  return String(Number((si / unit.toSi).toFixed(unit.decimals + 2)));
}

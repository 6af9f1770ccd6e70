import { EngineInputError, requireInRange } from './errors.js';
import { binomialCdf } from './statistics.js';

export type InspectionLevel = 'I' | 'II' | 'III';
export type InspectionSeverity = 'normal' | 'tightened' | 'reduced';

// Sample-size code letters; S (3150) exists only in the tightened table (MIL-STD-105E Table II-B).
const LETTERS = [
  'A',
  'B',
  'C',
  'D',
  'E',
  'F',
  'G',
  'H',
  'J',
  'K',
  'L',
  'M',
  'N',
  'P',
  'Q',
  'R',
  'S',
] as const;
export type CodeLetter = (typeof LETTERS)[number];

// ISO 2859-1 Table 1 (= MIL-STD-105E Table I), general levels: upper lot size of each row, and
// the letter of each row per level (REFERENCES §9: level II [S], levels I and III [M]).
const LOT_SIZE_UPPER = [8, 15, 25, 50, 90, 150, 280, 500, 1200, 3200, 10000, 35000, 150000, 500000];
const LETTERS_BY_LEVEL: Record<InspectionLevel, string> = {
  I: 'AABCCDEFGHJKLMN',
  II: 'ABCDEFGHJKLMNPQ',
  III: 'BCDEFGHJKLMNPQR',
};

interface TableShape {
  sampleSizes: readonly number[];
  /**
   * The cells of one AQL column, by the letter's offset from the letter where the normal table
   * first has Ac 0: `pattern[offset]` is [Ac, Re] or an arrow; before the pattern the column
   * points down, after it up. Every column of a master table has the same shape, moved one
   * letter per preferred AQL step, so one pattern reproduces the whole table.
   */
  pattern: readonly (readonly [number, number] | 'up' | 'down')[];
}

const TABLES: Record<InspectionSeverity, TableShape> = {
  // ISO 2859-1 Table 2-A / MIL-STD-105E Table II-A (REFERENCES §9 [S]): one ↑ and one ↓ between
  // the Ac 0 and Ac 1 rows; Ac 0, 1, 2, 3, 5, 7, 10, 14, 21, Re = Ac + 1.
  normal: {
    sampleSizes: [2, 3, 5, 8, 13, 20, 32, 50, 80, 125, 200, 315, 500, 800, 1250, 2000],
    pattern: [
      [0, 1],
      'up',
      'down',
      [1, 2],
      [2, 3],
      [3, 4],
      [5, 6],
      [7, 8],
      [10, 11],
      [14, 15],
      [21, 22],
    ],
  },
  // Table II-B as reproduced at nibs.org (MIL-STD-105E): Ac 0 one letter later than normal, then
  // ↓ ↓, then Ac 1, 2, 3, 5, 8, 12, 18.
  tightened: {
    sampleSizes: [2, 3, 5, 8, 13, 20, 32, 50, 80, 125, 200, 315, 500, 800, 1250, 2000, 3150],
    pattern: [
      'down',
      [0, 1],
      'down',
      'down',
      [1, 2],
      [2, 3],
      [3, 4],
      [5, 6],
      [8, 9],
      [12, 13],
      [18, 19],
    ],
  },
  // Table II-C [M] from memory: sample sizes two letters smaller, and a gap between Ac and Re —
  // a count inside the gap accepts the lot but ends reduced inspection (see lotDecision).
  reduced: {
    sampleSizes: [2, 2, 2, 3, 5, 8, 13, 20, 32, 50, 80, 125, 200, 315, 500, 800],
    pattern: [
      [0, 1],
      'up',
      'down',
      [0, 2],
      [1, 3],
      [1, 4],
      [2, 5],
      [3, 6],
      [5, 8],
      [7, 10],
      [10, 13],
    ],
  },
};

/** Preferred AQLs for percent nonconforming (ISO 2859-1 restricts larger ones to nonconformities). */
export const PREFERRED_AQLS = [
  0.01, 0.015, 0.025, 0.04, 0.065, 0.1, 0.15, 0.25, 0.4, 0.65, 1.0, 1.5, 2.5, 4.0, 6.5, 10,
] as const;
const INDEX_OF_6_5 = PREFERRED_AQLS.indexOf(6.5);

// Tightened, letter A, AQL 10 holds an arrow in the reproduced Table II-B, not the Ac 0 the
// pattern would put there.
const TIGHTENED_AQL_10_AT_A = 'down';

export interface SamplingPlanInput {
  lotSize: number;
  level: InspectionLevel;
  /** Acceptance quality limit, percent nonconforming; one of PREFERRED_AQLS. */
  aql: number;
  severity: InspectionSeverity;
}

export interface SamplingPlan extends SamplingPlanInput {
  /** Table 1 letter for the lot size and level. */
  codeLetter: CodeLetter;
  /** The letter whose plan applies once any arrow is followed: its sample size is the one used. */
  planLetter: CodeLetter;
  sampleSize: number;
  accept: number;
  reject: number;
  /** The table's sample size reached the lot size: inspect every part. */
  inspectAll: boolean;
}

type Cell = readonly [number, number] | 'up' | 'down';

function cellAt(severity: InspectionSeverity, aqlIndex: number, letterIndex: number): Cell {
  if (severity === 'tightened' && aqlIndex === PREFERRED_AQLS.length - 1 && letterIndex === 0) {
    return TIGHTENED_AQL_10_AT_A;
  }
  // The normal table's Ac 0 sits at A (index 0) for AQL 6.5 and one letter later per smaller step.
  const offset = letterIndex - (INDEX_OF_6_5 - aqlIndex);
  const { pattern } = TABLES[severity];
  if (offset < 0) return 'down';
  return pattern[offset] ?? 'up';
}

function requireSeverity(severity: InspectionSeverity): void {
  if (!Object.hasOwn(TABLES, severity)) {
    throw new EngineInputError('severity', `must be normal, tightened or reduced, got ${severity}`);
  }
}

export type MasterTableCell = { accept: number; reject: number } | 'up' | 'down';

/** One cell of a master table as printed — a plan or an arrow — before any arrow is followed. */
export function masterTableCell(
  severity: InspectionSeverity,
  aql: number,
  letter: CodeLetter,
): MasterTableCell {
  requireSeverity(severity);
  const letterIndex = LETTERS.indexOf(letter);
  if (letterIndex < 0 || letterIndex >= TABLES[severity].sampleSizes.length) {
    throw new EngineInputError('letter', `is not a row of the ${severity} table: ${letter}`);
  }
  const cell = cellAt(severity, aqlIndexOf(aql), letterIndex);
  return typeof cell === 'string' ? cell : { accept: cell[0], reject: cell[1] };
}

function aqlIndexOf(aql: number): number {
  const index = PREFERRED_AQLS.findIndex((a) => Math.abs(a - aql) <= 1e-9 * a);
  if (index < 0) {
    throw new EngineInputError(
      'aql',
      `must be a preferred AQL (${PREFERRED_AQLS.join(', ')}), got ${aql}`,
    );
  }
  return index;
}

/** The plan at a letter, following arrows; an arrow that would leave the table is followed the other way. */
function resolvePlan(severity: InspectionSeverity, aqlIndex: number, letterIndex: number) {
  const rows = TABLES[severity].sampleSizes.length;
  const start = cellAt(severity, aqlIndex, letterIndex);
  if (typeof start !== 'string') return { letterIndex, cell: start };
  const step = start === 'up' ? -1 : 1;
  for (const direction of [step, -step]) {
    for (let k = letterIndex + direction; k >= 0 && k < rows; k += direction) {
      const cell = cellAt(severity, aqlIndex, k);
      if (typeof cell !== 'string') return { letterIndex: k, cell };
    }
  }
  throw new Error('unreachable: every AQL column holds a plan');
}

export function codeLetterFor(lotSize: number, level: InspectionLevel): CodeLetter {
  if (!Number.isInteger(lotSize) || lotSize < 1) {
    throw new EngineInputError('lotSize', `must be a whole number of parts ≥ 1, got ${lotSize}`);
  }
  const letters = Object.hasOwn(LETTERS_BY_LEVEL, level) ? LETTERS_BY_LEVEL[level] : undefined;
  if (!letters) throw new EngineInputError('level', `must be I, II or III, got ${level}`);
  const row = LOT_SIZE_UPPER.findIndex((upper) => lotSize <= upper);
  return letters[row < 0 ? LOT_SIZE_UPPER.length : row] as CodeLetter;
}

/** ISO 2859-1 single sampling plan for a lot: sample size and accept/reject numbers. */
export function samplingPlan(input: SamplingPlanInput): SamplingPlan {
  const { lotSize, level, aql, severity } = input;
  const codeLetter = codeLetterFor(lotSize, level);
  const aqlIndex = aqlIndexOf(aql);
  requireSeverity(severity);
  const { letterIndex, cell } = resolvePlan(severity, aqlIndex, LETTERS.indexOf(codeLetter));
  const tableSize = TABLES[severity].sampleSizes[letterIndex] ?? 0;
  return {
    lotSize,
    level,
    aql: PREFERRED_AQLS[aqlIndex] ?? aql,
    severity,
    codeLetter,
    planLetter: LETTERS[letterIndex] ?? codeLetter,
    sampleSize: Math.min(tableSize, lotSize),
    accept: cell[0],
    reject: cell[1],
    inspectAll: tableSize >= lotSize,
  };
}

/**
 * Accept number of the normal table one AQL step tighter, in the plan's own row — what the
 * switching score asks (ISO 2859-1:1999 9.3.3.2 [M]); null where that cell holds an arrow.
 */
export function acceptOneStepTighter(plan: SamplingPlan): number | null {
  const aqlIndex = aqlIndexOf(plan.aql);
  if (aqlIndex === 0) return null;
  const cell = cellAt('normal', aqlIndex - 1, LETTERS.indexOf(plan.planLetter));
  return typeof cell === 'string' ? null : cell[0];
}

/** Probability that the plan accepts a lot with this fraction nonconforming (binomial OC curve). */
export function acceptanceProbability(
  plan: Pick<SamplingPlan, 'sampleSize' | 'accept'>,
  fractionNonconforming: number,
): number {
  requireInRange('fractionNonconforming', fractionNonconforming, 0, 1);
  return binomialCdf(plan.accept, plan.sampleSize, fractionNonconforming);
}

export type LotDecision = 'accept' | 'reject' | 'open';

export interface LotDecisionResult {
  decision: LotDecision;
  /** Accepted with a count inside a reduced plan's gap: switch back to normal inspection. */
  returnToNormal: boolean;
}

/** Decision on a lot so far: reject as soon as the reject number is reached, accept once the sample is complete. */
export function lotDecision(
  plan: Pick<SamplingPlan, 'sampleSize' | 'accept' | 'reject'>,
  { inspected, nonconforming }: { inspected: number; nonconforming: number },
): LotDecisionResult {
  if (!Number.isInteger(inspected) || inspected < 0 || inspected > plan.sampleSize) {
    throw new EngineInputError(
      'inspected',
      `must be a whole number 0…${plan.sampleSize}, got ${inspected}`,
    );
  }
  if (!Number.isInteger(nonconforming) || nonconforming < 0 || nonconforming > inspected) {
    throw new EngineInputError(
      'nonconforming',
      `must be a whole number 0…${inspected}, got ${nonconforming}`,
    );
  }
  if (nonconforming >= plan.reject) return { decision: 'reject', returnToNormal: false };
  if (inspected < plan.sampleSize) return { decision: 'open', returnToNormal: false };
  return { decision: 'accept', returnToNormal: nonconforming > plan.accept };
}

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  PREFERRED_AQLS,
  acceptanceProbability,
  codeLetterFor,
  lotDecision,
  masterTableCell,
  samplingPlan,
  type CodeLetter,
  type InspectionSeverity,
} from './sampling.js';

describe('code letters (ISO 2859-1 Table 1)', () => {
  // Level II rows with both range ends (REFERENCES §9 [S]).
  it.each([
    [2, 'A'],
    [8, 'A'],
    [9, 'B'],
    [15, 'B'],
    [16, 'C'],
    [25, 'C'],
    [26, 'D'],
    [50, 'D'],
    [51, 'E'],
    [90, 'E'],
    [91, 'F'],
    [150, 'F'],
    [151, 'G'],
    [280, 'G'],
    [281, 'H'],
    [500, 'H'],
    [501, 'J'],
    [1200, 'J'],
    [1201, 'K'],
    [3200, 'K'],
    [3201, 'L'],
    [10000, 'L'],
    [10001, 'M'],
    [35000, 'M'],
    [35001, 'N'],
    [150000, 'N'],
    [150001, 'P'],
    [500000, 'P'],
    [500001, 'Q'],
    [5_000_000, 'Q'],
  ])('level II: lot %s → %s', (lot, letter) => {
    expect(codeLetterFor(lot, 'II')).toBe(letter);
  });

  // Levels I and III by row: REFERENCES §9 gives them [M] from memory; they agree with Table I as
  // reproduced in the "AQL Sampling Chart" at pdfcoffee.com and wisetool.com/sampling.htm [S].
  const lots = [5, 12, 20, 40, 70, 120, 200, 400, 1000, 2000, 5000, 20000, 100000, 300000, 600000];
  it('level I rows: A A B C C D E F G H J K L M N', () => {
    expect(lots.map((n) => codeLetterFor(n, 'I')).join('')).toBe('AABCCDEFGHJKLMN');
  });
  it('level III rows: B C D E F G H J K L M N P Q R', () => {
    expect(lots.map((n) => codeLetterFor(n, 'III')).join('')).toBe('BCDEFGHJKLMNPQR');
  });

  it.each([
    ['lotSize', () => codeLetterFor(0, 'II')],
    ['lotSize', () => codeLetterFor(12.5, 'II')],
    ['lotSize', () => codeLetterFor(Number.NaN, 'II')],
    ['level', () => codeLetterFor(100, 'IV' as 'I')],
  ])('rejects a bad %s', (field, call) => {
    expect(call).toThrow(expect.objectContaining({ name: 'EngineInputError', field }));
  });
});

// MIL-STD-105E Tables II-A (normal) and II-B (tightened) as reproduced at
// nibs.org/FMOC/DPW_AC/AC-TABLE.ASC [S], columns AQL 0.65 … 10: a number is the reject number
// (Ac = Re − 1), v an arrow down, ^ an arrow up.
const AQL_COLUMNS = [0.65, 1.0, 1.5, 2.5, 4.0, 6.5, 10];
const NORMAL_ROWS: Record<string, string> = {
  A: 'v v v v v 1 ^',
  B: 'v v v v 1 ^ v',
  C: 'v v v 1 ^ v 2',
  D: 'v v 1 ^ v 2 3',
  E: 'v 1 ^ v 2 3 4',
  F: '1 ^ v 2 3 4 6',
  G: '^ v 2 3 4 6 8',
  H: 'v 2 3 4 6 8 11',
  J: '2 3 4 6 8 11 15',
  K: '3 4 6 8 11 15 22',
  L: '4 6 8 11 15 22 ^',
  M: '6 8 11 15 22 ^ ^',
  N: '8 11 15 22 ^ ^ ^',
  P: '11 15 22 ^ ^ ^ ^',
  Q: '15 22 ^ ^ ^ ^ ^',
};
const TIGHTENED_ROWS: Record<string, string> = {
  A: 'v v v v v v v',
  B: 'v v v v v 1 v',
  C: 'v v v v 1 v v',
  D: 'v v v 1 v v 2',
  E: 'v v 1 v v 2 3',
  F: 'v 1 v v 2 3 4',
  G: '1 v v 2 3 4 6',
  H: 'v v 2 3 4 6 9',
  J: 'v 2 3 4 6 9 13',
  K: '2 3 4 6 9 13 19',
  L: '3 4 6 9 13 19 ^',
};

function expectRows(severity: InspectionSeverity, rows: Record<string, string>) {
  for (const [letter, row] of Object.entries(rows)) {
    row.split(' ').forEach((token, i) => {
      const printed =
        token === 'v' ? 'down' : token === '^' ? 'up' : { accept: +token - 1, reject: +token };
      expect(
        masterTableCell(severity, AQL_COLUMNS[i] ?? 0, letter as CodeLetter),
        `${letter}`,
      ).toEqual(printed);
    });
  }
}

describe('master tables as printed', () => {
  it('normal inspection matches MIL-STD-105E Table II-A (nibs.org reproduction [S])', () => {
    expectRows('normal', NORMAL_ROWS);
  });
  it('tightened inspection matches MIL-STD-105E Table II-B (nibs.org reproduction [S])', () => {
    expectRows('tightened', TIGHTENED_ROWS);
  });

  it('Ac 0 sits at A for 6.5, B 4.0, C 2.5, D 1.5, E 1.0, F 0.65, then one letter per step (REFERENCES §9 [S])', () => {
    const ac0 = 'QPNMLKJHGFEDCBA';
    PREFERRED_AQLS.slice(0, 15).forEach((aql, i) => {
      expect(masterTableCell('normal', aql, ac0[i] as CodeLetter)).toEqual({
        accept: 0,
        reject: 1,
      });
    });
  });

  it('along a normal column Ac runs 0, 1, 2, 3, 5, 7, 10, 14, 21 with one ↑ and one ↓ after Ac 0 (REFERENCES §9 [S])', () => {
    const column = 'ABCDEFGHJKLMNPQR'
      .split('')
      .map((l) => masterTableCell('normal', 6.5, l as CodeLetter));
    expect(column.map((c) => (typeof c === 'string' ? c : c.accept))).toEqual([
      0,
      'up',
      'down',
      1,
      2,
      3,
      5,
      7,
      10,
      14,
      21,
      'up',
      'up',
      'up',
      'up',
      'up',
    ]);
  });
});

describe('samplingPlan', () => {
  it('lot 1000, level II, AQL 1.0 normal → J, n 80, Ac 2 Re 3 (Table II-A row J)', () => {
    expect(
      samplingPlan({ lotSize: 1000, level: 'II', aql: 1.0, severity: 'normal' }),
    ).toMatchObject({
      codeLetter: 'J',
      planLetter: 'J',
      sampleSize: 80,
      accept: 2,
      reject: 3,
      inspectAll: false,
    });
  });

  it('an ↑ takes the plan above with its sample size: J at AQL 0.25 → H, n 50, Ac 0 (Table II-A)', () => {
    expect(
      samplingPlan({ lotSize: 1000, level: 'II', aql: 0.25, severity: 'normal' }),
    ).toMatchObject({
      codeLetter: 'J',
      planLetter: 'H',
      sampleSize: 50,
      accept: 0,
      reject: 1,
    });
  });

  it('a ↓ takes the plan below with its sample size: J at AQL 0.40 → K, n 125, Ac 1 (Table II-A)', () => {
    expect(
      samplingPlan({ lotSize: 1000, level: 'II', aql: 0.4, severity: 'normal' }),
    ).toMatchObject({
      planLetter: 'K',
      sampleSize: 125,
      accept: 1,
      reject: 2,
    });
  });

  it('a ↓ past the lot size means 100 % inspection: lot 10 at AQL 0.65 → F (n 20) → all 10 (ISO 2859-1 note to Table 2-A)', () => {
    expect(samplingPlan({ lotSize: 10, level: 'II', aql: 0.65, severity: 'normal' })).toMatchObject(
      {
        codeLetter: 'B',
        planLetter: 'F',
        sampleSize: 10,
        accept: 0,
        reject: 1,
        inspectAll: true,
      },
    );
  });

  it('lot 1000 at AQL 1.0 tightened → n 80, Ac 1 Re 2 (Table II-B row J)', () => {
    expect(
      samplingPlan({ lotSize: 1000, level: 'II', aql: 1.0, severity: 'tightened' }),
    ).toMatchObject({
      sampleSize: 80,
      accept: 1,
      reject: 2,
    });
  });

  it('bottom-edge cells (aqlinspectorsrule.com, AQLs below 0.065 [S])', () => {
    const lot = 600000; // level III → R
    // Normal 0.015 at R → P, n 800, Ac 0.
    expect(
      samplingPlan({ lotSize: lot, level: 'III', aql: 0.015, severity: 'normal' }),
    ).toMatchObject({
      planLetter: 'P',
      sampleSize: 800,
      accept: 0,
    });
    // Reduced 0.015 at R → P, n 315, Ac 0 Re 1.
    expect(
      samplingPlan({ lotSize: lot, level: 'III', aql: 0.015, severity: 'reduced' }),
    ).toMatchObject({
      planLetter: 'P',
      sampleSize: 315,
      accept: 0,
      reject: 1,
    });
    // Tightened 0.025 at Q and R → n 3150, Ac 1 Re 2.
    for (const lotSize of [200000, lot]) {
      expect(
        samplingPlan({ lotSize, level: 'III', aql: 0.025, severity: 'tightened' }),
      ).toMatchObject({
        planLetter: 'S',
        sampleSize: 3150,
        accept: 1,
        reject: 2,
      });
    }
  });

  it('reduced lot 1000 at AQL 1.0 → n 32, Ac 1 Re 3 (MIL-STD-105E Table II-C, [M] from memory)', () => {
    expect(
      samplingPlan({ lotSize: 1000, level: 'II', aql: 1.0, severity: 'reduced' }),
    ).toMatchObject({
      sampleSize: 32,
      accept: 1,
      reject: 3,
    });
  });

  it('every plan has Re > Ac, n ≤ lot size, and tightened never accepts more than normal (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 2_000_000 }),
        fc.constantFrom('I' as const, 'II' as const, 'III' as const),
        fc.constantFrom(...PREFERRED_AQLS),
        (lotSize, level, aql) => {
          const normal = samplingPlan({ lotSize, level, aql, severity: 'normal' });
          const tightened = samplingPlan({ lotSize, level, aql, severity: 'tightened' });
          const reduced = samplingPlan({ lotSize, level, aql, severity: 'reduced' });
          for (const plan of [normal, tightened, reduced]) {
            expect(plan.reject).toBeGreaterThan(plan.accept);
            expect(plan.sampleSize).toBeLessThanOrEqual(lotSize);
          }
          expect(tightened.accept / tightened.sampleSize).toBeLessThanOrEqual(
            normal.accept / normal.sampleSize,
          );
        },
      ),
    );
  });

  it.each([
    ['aql', { lotSize: 100, level: 'II', aql: 0.5, severity: 'normal' }],
    ['aql', { lotSize: 100, level: 'II', aql: 15, severity: 'normal' }],
    ['severity', { lotSize: 100, level: 'II', aql: 1, severity: 'skip' }],
    ['lotSize', { lotSize: -4, level: 'II', aql: 1, severity: 'normal' }],
  ])('rejects a bad %s', (field, input) => {
    expect(() => samplingPlan(input as never)).toThrow(expect.objectContaining({ field }));
  });
});

describe('acceptanceProbability and lotDecision', () => {
  it('n 80, Ac 2 at 1 % nonconforming → 0.9534 (REFERENCES §9 [D], binomial)', () => {
    expect(acceptanceProbability({ sampleSize: 80, accept: 2 }, 0.01)).toBeCloseTo(0.9534, 4);
  });

  it('falls as the lot gets worse (property of every OC curve)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 0.5, noNaN: true }), (p) => {
        const plan = { sampleSize: 80, accept: 2 };
        return acceptanceProbability(plan, p + 0.01) <= acceptanceProbability(plan, p);
      }),
    );
  });

  it('rejects a fraction outside 0…1', () => {
    expect(() => acceptanceProbability({ sampleSize: 80, accept: 2 }, 1.5)).toThrow(
      expect.objectContaining({ field: 'fractionNonconforming' }),
    );
  });

  it('rejects as soon as Re is reached, accepts only with the sample complete (ISO 2859-1 clause 11)', () => {
    const plan = { sampleSize: 80, accept: 2, reject: 3 };
    expect(lotDecision(plan, { inspected: 10, nonconforming: 3 }).decision).toBe('reject');
    expect(lotDecision(plan, { inspected: 79, nonconforming: 1 }).decision).toBe('open');
    expect(lotDecision(plan, { inspected: 80, nonconforming: 2 })).toEqual({
      decision: 'accept',
      returnToNormal: false,
    });
  });

  it('a count inside a reduced plan’s gap accepts and returns to normal (MIL-STD-105E 10.1.4, via Z1.4 8.3.4 [S])', () => {
    expect(
      lotDecision({ sampleSize: 32, accept: 1, reject: 3 }, { inspected: 32, nonconforming: 2 }),
    ).toEqual({
      decision: 'accept',
      returnToNormal: true,
    });
  });

  it('rejects counts that cannot be', () => {
    const plan = { sampleSize: 80, accept: 2, reject: 3 };
    expect(() => lotDecision(plan, { inspected: 81, nonconforming: 0 })).toThrow(
      expect.objectContaining({ field: 'inspected' }),
    );
    expect(() => lotDecision(plan, { inspected: 5, nonconforming: 6 })).toThrow(
      expect.objectContaining({ field: 'nonconforming' }),
    );
  });
});

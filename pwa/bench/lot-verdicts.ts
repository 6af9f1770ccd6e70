import { DEMO_PARTS } from '../src/engine/fixtures/demo-parts.js';
import {
  lotVerdict,
  moldedTolerance,
  partVerdict,
  prepareSpec,
  samplingPlan,
  type PartMeasurement,
  type PartSpec,
} from '../src/engine/index.js';

const LOT_SIZE = 2000; // level II → code letter K, 125 parts at AQL 1.0
const REPEATS = 7;

// A small fixed-seed generator (Park–Miller) so every run judges the same lot.
function random(seed: number): () => number {
  let state = seed;
  return () => {
    state = (state * 48271) % 2147483647;
    return state / 2147483647;
  };
}

/**
 * A sampled lot around the spec: thickness within its ISO 3302-1 tolerance, hardness
 * readings ±4 points, load ±12 %, a minor defect on one part in twenty and a major on one in fifty.
 */
function sampledLot(
  spec: PartSpec,
  expectedLoad: number,
  count: number,
  seed: number,
): PartMeasurement[] {
  const next = random(seed);
  const around = (nominal: number, spread: number) => nominal + (2 * next() - 1) * spread;
  const thickness = spec.tolerance.dimensions?.thickness ?? {
    class: spec.tolerance.class,
    kind: 'fixed',
  };
  const tolerance = moldedTolerance(spec.geometry.thickness, thickness.class, thickness.kind);
  return Array.from({ length: count }, () => {
    const roll = next();
    return {
      thickness: around(spec.geometry.thickness, tolerance),
      hardness: [0, 1, 2].map(() => Math.round(around(spec.hardness.nominal, 4))),
      load: around(expectedLoad, 0.12 * expectedLoad),
      defects:
        roll < 0.02
          ? [{ type: 'non-fill', location: 'sealing', severity: 'major' }]
          : roll < 0.07
            ? [{ type: 'flash', location: 'cosmetic', severity: 'minor' }]
            : [],
    };
  });
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[sorted.length >> 1] ?? Number.NaN;
}

/** (c) Verdicts for a 125-part lot per demo part: prepare once, judge every part, decide the lot. */
export function run(): void {
  const plan = samplingPlan({ lotSize: LOT_SIZE, level: 'II', aql: 1.0, severity: 'normal' });
  const rows = Object.entries(DEMO_PARTS).map(([name, spec], index) => {
    const prepareTimes: number[] = [];
    const judgeTimes: number[] = [];
    let summary = '';
    for (let r = 0; r < REPEATS; r++) {
      const t0 = performance.now();
      const prepared = prepareSpec(spec);
      const t1 = performance.now();
      const lot = sampledLot(spec, prepared.expected.high.load, plan.sampleSize, 20261201 + index);
      const t2 = performance.now();
      const verdicts = lot.map((m) => partVerdict(prepared, m));
      const decision = lotVerdict(plan, verdicts);
      const t3 = performance.now();
      prepareTimes.push(t1 - t0);
      judgeTimes.push(t3 - t2);
      summary = `${decision.nonconforming} nc → ${decision.decision}`;
    }
    const judge = median(judgeTimes);
    return {
      part: name,
      'prepare ms': median(prepareTimes).toFixed(2),
      [`${plan.sampleSize} verdicts ms`]: judge.toFixed(2),
      'µs / part': ((judge * 1000) / plan.sampleSize).toFixed(0),
      lot: summary,
    };
  });
  console.log(
    `(c) lot verdicts: lot ${LOT_SIZE}, level II, AQL 1.0 → ${plan.codeLetter}, n ${plan.sampleSize}, Ac ${plan.accept} Re ${plan.reject}; median of ${REPEATS} runs`,
  );
  console.table(rows);
}

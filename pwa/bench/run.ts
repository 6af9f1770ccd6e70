/*
 * npm run bench -w pwa: from one run, (a) the error of forward and central differences next
 * to the complex step, against closed forms; (b) Yeoh and three-term Ogden fitted to all three
 * Treloar modes by our Levenberg–Marquardt and by ml-levenberg-marquardt from the same start;
 * (c) verdicts for a sampled lot.
 */
import { levenbergMarquardt as mlLevenbergMarquardt } from 'ml-levenberg-marquardt';
import { fitModel } from '../src/engine/fit.js';
import { closedForm } from '../src/engine/fixtures/closed-forms.js';
import {
  centralDifference,
  forwardDifference,
  relativeError,
} from '../src/engine/fixtures/finite-differences.js';
import { EXAMPLE_MODELS } from '../src/engine/fixtures/models.js';
import { treloarPoints } from '../src/engine/fixtures/treloar-1944.js';
import {
  mapConstants,
  MODES,
  type MaterialModel,
  type Mode,
} from '../src/engine/material-model.js';
import { MultiComplex } from '../src/engine/multicomplex.js';
import { Real } from '../src/engine/real.js';
import { STEP } from '../src/engine/scalar.js';
import { strainEnergy } from '../src/engine/strain-energy.js';
import { modeStretches, nominalStress, uncheckedStress } from '../src/engine/stress.js';
import { run as lotVerdicts } from './lot-verdicts.js';

function table(headers: readonly string[], rows: readonly (readonly string[])[]): string {
  const widths = headers.map((h, j) => Math.max(h.length, ...rows.map((row) => row[j]!.length)));
  const line = (cells: readonly string[]) =>
    cells
      .map((cell, j) => (j === 0 ? cell.padEnd(widths[j]!) : cell.padStart(widths[j]!)))
      .join('  ');
  return [line(headers), widths.map((w) => '-'.repeat(w)).join('  '), ...rows.map(line)].join('\n');
}

const exponent = (x: number) => (x === 0 ? '0' : x.toExponential(1));

// (a) ---------------------------------------------------------------------------------------

/** Usual steps: √ε·λ for forward, ∛ε·λ for central differences. */
const FORWARD_STEP = Math.sqrt(Number.EPSILON);
const CENTRAL_STEP = Math.cbrt(Number.EPSILON);
const STRETCHES = [0.5, 1.5, 2.5, 4];

function derivativeErrors(): void {
  const rows: string[][] = [];
  const worst = { forward: 0, central: 0, complex: 0 };
  for (const model of Object.values(EXAMPLE_MODELS) as MaterialModel[]) {
    for (const mode of MODES) {
      for (const l of STRETCHES) {
        const reference = closedForm(model, mode, l).stress;
        const factor = mode === 'equibiaxial' ? 0.5 : 1;
        const energy = (x: number) =>
          factor * strainEnergy(model, modeStretches(mode, new Real(x))).re;
        const errors = {
          forward: relativeError(forwardDifference(energy, l, FORWARD_STEP * l), reference),
          central: relativeError(centralDifference(energy, l, CENTRAL_STEP * l), reference),
          complex: relativeError(nominalStress(model, mode, l), reference),
        };
        worst.forward = Math.max(worst.forward, errors.forward);
        worst.central = Math.max(worst.central, errors.central);
        worst.complex = Math.max(worst.complex, errors.complex);
        if (mode === 'uniaxial') {
          rows.push([
            model.kind,
            String(l),
            reference.toPrecision(10),
            exponent(errors.forward),
            exponent(errors.central),
            exponent(errors.complex),
          ]);
        }
      }
    }
  }
  console.log(
    '(a) Stress P = dW/dλ from the strain energy: relative error against the closed form',
  );
  console.log(
    '    forward difference h = √ε·λ, central h = ∛ε·λ, complex step h = 2⁻⁶⁶ (uniaxial rows)\n',
  );
  console.log(
    table(['model', 'λ', 'P closed form, MPa', 'forward', 'central', 'complex step'], rows),
  );
  console.log(
    `\n    worst over ${Object.keys(EXAMPLE_MODELS).length} models × 3 modes × ${STRETCHES.length} stretches: ` +
      `forward ${exponent(worst.forward)}, central ${exponent(worst.central)}, complex step ${exponent(worst.complex)}\n`,
  );
}

// (b) ---------------------------------------------------------------------------------------

const DATA = treloarPoints();
const REPEATS = 15;

interface SolverRun {
  readonly model: MaterialModel;
  readonly iterations: number;
}

function parametersOf(model: MaterialModel): number[] {
  const values: number[] = [];
  mapConstants(model, (value) => values.push(value));
  return values;
}

function withParameters<C>(model: MaterialModel, values: readonly C[]) {
  let k = 0;
  return mapConstants(model, () => values[k++]!);
}

/** The sum of squared stress residuals, computed the same way for every solver's answer. */
function cost(model: MaterialModel): number {
  return DATA.reduce(
    (sum, p) => sum + (nominalStress(model, p.mode, p.stretch) - p.stress) ** 2,
    0,
  );
}

function ours(start: MaterialModel): SolverRun {
  const fit = fitModel({ model: start, data: DATA, objective: 'absolute', starts: 'given' });
  return { model: fit.model, iterations: fit.iterations };
}

/**
 * ml-levenberg-marquardt on the same residuals (x = point index), from the same start, with
 * its defaults (damping 1e-2, 100 iterations; it has no convergence test) and either forward
 * differences with step 1e-6 (its default 0.1 is far too coarse for C30 ~ 1e-5, and steps
 * relative to each constant end in NaN on Ogden) or our exact multicomplex Jacobian rows.
 */
function theirs(start: MaterialModel, exactJacobian: boolean): SolverRun {
  const stress = (values: number[]) => {
    const model = withParameters<number>(start, values);
    return (i: number) => {
      const p = DATA[i]!;
      return uncheckedStress(model, p.mode as Mode, new Real(p.stretch)).re;
    };
  };
  const jacobian = (values: number[]) => {
    const model = withParameters<MultiComplex | number>(start, MultiComplex.seed(values));
    return (i: number) => {
      const p = DATA[i]!;
      const row = uncheckedStress(model, p.mode, new MultiComplex(p.stretch, null));
      return values.map((_, j) => row.part(j) / STEP);
    };
  };
  const x0 = parametersOf(start);
  const result = mlLevenbergMarquardt(
    { x: DATA.map((_, i) => i), y: DATA.map((p) => p.stress) },
    stress,
    {
      initialValues: x0,
      maxIterations: 100,
      errorTolerance: 1e-12,
      ...(exactJacobian ? { jacobianFunction: jacobian } : { gradientDifference: 1e-6 }),
    },
  );
  return {
    model: withParameters<number>(start, result.parameterValues),
    iterations: result.iterations,
  };
}

function fitComparison(): void {
  const solvers: [string, (start: MaterialModel) => SolverRun][] = [
    ['ours: LM, Moré scaling, multicomplex Jacobian', ours],
    ['ml-levenberg-marquardt, finite differences', (s) => theirs(s, false)],
    ['ml-levenberg-marquardt, our exact Jacobian', (s) => theirs(s, true)],
  ];
  const rows: string[][] = [];
  const verdicts: string[] = [];
  for (const [name, start] of [
    ['Yeoh', EXAMPLE_MODELS.yeoh],
    ['Ogden N = 3', EXAMPLE_MODELS.ogden],
  ] as const) {
    const times = solvers.map(() => [] as number[]);
    const runs: SolverRun[] = [];
    for (let r = -2; r < REPEATS; r++) {
      solvers.forEach(([, solve], s) => {
        const t0 = performance.now();
        const run = solve(start);
        const elapsed = performance.now() - t0;
        if (r >= 0) times[s]!.push(elapsed);
        runs[s] = run;
      });
    }
    const best = times.map((t) => Math.min(...t));
    const costs = runs.map((run) => cost(run.model));
    solvers.forEach(([solver], s) => {
      rows.push([
        name,
        solver,
        best[s]!.toFixed(2),
        s === 0 ? '1' : (best[s]! / best[0]!).toFixed(1),
        String(runs[s]!.iterations),
        costs[s]!.toPrecision(10),
      ]);
    });
    const judged = solvers.slice(1).map(([solver], k) => {
      const ratio = best[k + 1]! / best[0]!;
      const costOk = costs[0]! <= costs[k + 1]! * (1 + 1e-9);
      const goal = ratio >= 3 && costOk ? 'met' : 'not met';
      const label = solver.replace('ml-levenberg-marquardt, ', '');
      return `${ratio.toFixed(1)}× vs ${label}, cost ${costOk ? 'equal or lower' : 'HIGHER'}, goal ≥ 3× ${goal}`;
    });
    verdicts.push(`    ${name}: ours ${judged.join('; ')}`);
  }
  console.log(
    `(b) Fits to Treloar 1944, all three modes (${DATA.length} points), absolute objective, same start;` +
      ` best wall time of ${REPEATS} interleaved runs (the machine is shared)`,
  );
  console.log('    ours = the whole fitModel call, statistics and stability scan included\n');
  console.log(
    table(['model', 'solver', 'ms', 'time ×', 'iterations', 'cost Σ(P − P_test)²'], rows),
  );
  console.log(`\n${verdicts.join('\n')}\n`);
}

derivativeErrors();
fitComparison();
lotVerdicts();

import { useId, useState } from 'react';
import type { Objective, TestSet } from '../../../api/desk/types';
import { MODES, type FitPoint, type Mode } from '../../../engine';
import type { ModelChoice } from './modelChoices';

export interface FitRequest {
  testSets: TestSet[];
  data: FitPoint[];
  choices: ModelChoice[];
  objective: Objective;
  /** Only modes whose weight differs from 1; empty means the plain sum over all points. */
  weights: Partial<Record<Mode, number>>;
}

interface Props {
  testSets: TestSet[];
  choices: readonly ModelChoice[];
  busy: boolean;
  onFit(request: FitRequest): void;
}

/** Which tests, which models, which objective and how much each mode counts. */
export function FitSetup({ testSets, choices, busy, onFit }: Props) {
  const id = useId();
  const [setIds, setSetIds] = useState(() => new Set(testSets.map((s) => s.id)));
  const [picked, setPicked] = useState(() => new Set(['yeoh']));
  const [objective, setObjective] = useState<Objective>('absolute');
  const [weights, setWeights] = useState<Record<Mode, string>>({
    uniaxial: '1',
    equibiaxial: '1',
    planar: '1',
  });

  const chosenSets = testSets.filter((s) => setIds.has(s.id));
  const modes = MODES.filter((mode) => chosenSets.some((s) => s.mode === mode));
  const weightProblem = modes.find(
    (mode) => !(Number(weights[mode]) >= 0 && weights[mode].trim() !== ''),
  );
  const toggle = (set: Set<string>, key: string) => {
    const next = new Set(set);
    if (next.has(key)) next.delete(key);
    else next.add(key);
    return next;
  };

  function fit() {
    const data = chosenSets.flatMap((s) =>
      s.points.map((p) => ({ mode: s.mode, stretch: p.stretch, stress: p.stress })),
    );
    const changed = Object.fromEntries(
      modes
        .filter((mode) => Number(weights[mode]) !== 1)
        .map((mode) => [mode, Number(weights[mode])]),
    );
    onFit({
      testSets: chosenSets,
      data,
      choices: choices.filter((c) => picked.has(c.key)),
      objective,
      weights: changed,
    });
  }

  return (
    <section className="desk-card" aria-label="Fit setup">
      <div className="desk-grid desk-grid--2">
        <fieldset className="desk-bare">
          <legend className="desk-label">Test data to fit</legend>
          {testSets.map((set) => (
            <label key={set.id} className="desk-check">
              <input
                type="checkbox"
                checked={setIds.has(set.id)}
                onChange={() => setSetIds(toggle(setIds, set.id))}
              />
              {set.name} ({set.mode}, {set.points.length} points)
            </label>
          ))}
        </fieldset>
        <fieldset className="desk-bare">
          <legend className="desk-label">Models</legend>
          <div className="desk-checks">
            {choices.map((choice) => (
              <label key={choice.key} className="desk-check">
                <input
                  type="checkbox"
                  checked={picked.has(choice.key)}
                  onChange={() => setPicked(toggle(picked, choice.key))}
                />
                {choice.label}
              </label>
            ))}
          </div>
        </fieldset>
      </div>
      <div className="desk-grid desk-grid--4">
        <div className="desk-field">
          <label htmlFor={`${id}-objective`}>Objective</label>
          <select
            id={`${id}-objective`}
            value={objective}
            onChange={(e) => setObjective(e.target.value as Objective)}
          >
            <option value="absolute">absolute: Σ(P − P_test)², favours large strains</option>
            <option value="relative">relative: Σ((P − P_test)/P_test)², every point alike</option>
          </select>
        </div>
        {modes.map((mode) => (
          <div className="desk-field" key={mode}>
            <label htmlFor={`${id}-w-${mode}`}>weight of {mode}</label>
            <input
              id={`${id}-w-${mode}`}
              inputMode="decimal"
              value={weights[mode]}
              aria-invalid={weightProblem === mode}
              onChange={(e) => setWeights({ ...weights, [mode]: e.target.value })}
            />
          </div>
        ))}
      </div>
      <p className="desk-muted">
        Weights multiply each mode's squared residuals; raise a short planar or equibiaxial test so
        the long uniaxial one does not drown it.
      </p>
      <div className="desk-actions">
        <button
          type="button"
          className="desk-primary"
          disabled={
            busy || chosenSets.length === 0 || picked.size === 0 || weightProblem !== undefined
          }
          onClick={fit}
        >
          {busy ? 'Fitting…' : `Fit ${picked.size} model${picked.size === 1 ? '' : 's'}`}
        </button>
      </div>
    </section>
  );
}

import { useId } from 'react';
import { ConstantsTable } from './ConstantsTable';
import type { FormulaDraft, FormulaReview } from './reviewFormula';
import { SyntaxMarker } from './SyntaxMarker';

interface Props {
  draft: FormulaDraft;
  review: FormulaReview;
  onChange(draft: FormulaDraft): void;
}

/** The energy, its constants, and what is wrong with them as they are typed. */
export function FormulaEditor({ draft, review, onChange }: Props) {
  const id = useId();
  const syntax = review.problems.find((p) => p.position !== undefined);
  const errors = review.problems.filter((p) => p.severity === 'error');
  const warnings = review.problems.filter((p) => p.severity === 'warning');

  function addConstant(name = '') {
    onChange({ ...draft, constants: [...draft.constants, { name, value: '0.1' }] });
  }

  return (
    <section className="desk-card" aria-label="Formula">
      <div className="desk-field">
        <label htmlFor={`${id}-name`}>Name of the model</label>
        <input
          id={`${id}-name`}
          value={draft.name}
          onChange={(e) => onChange({ ...draft, name: e.target.value })}
        />
      </div>
      <div className="desk-field">
        <label htmlFor={`${id}-energy`}>W(I1, I2) =</label>
        <textarea
          id={`${id}-energy`}
          rows={3}
          spellCheck={false}
          value={draft.energy}
          aria-invalid={errors.length > 0}
          aria-describedby={`${id}-check`}
          onChange={(e) => onChange({ ...draft, energy: e.target.value })}
        />
      </div>
      {syntax?.position !== undefined && (
        <SyntaxMarker energy={draft.energy} position={syntax.position} />
      )}
      <div id={`${id}-check`} aria-live="polite">
        {errors.length === 0 ? (
          <p className="desk-callout desk-callout--ok">Reads correctly.</p>
        ) : (
          <ul className="desk-callout desk-callout--error" aria-label="Formula errors">
            {errors.map((problem, index) => (
              <li key={index}>{problem.message}</li>
            ))}
          </ul>
        )}
        {warnings.length > 0 && (
          <ul className="desk-callout desk-callout--warn" aria-label="Formula warnings">
            {warnings.map((problem, index) => (
              <li key={index}>{problem.message}</li>
            ))}
          </ul>
        )}
      </div>
      <ConstantsTable
        constants={draft.constants}
        problems={review.problems}
        onChange={(constants) => onChange({ ...draft, constants })}
      />
      <div className="desk-actions">
        <button type="button" onClick={() => addConstant()}>
          Add a constant
        </button>
        {review.unknownNames.map((name) => (
          <button key={name} type="button" onClick={() => addConstant(name)}>
            Add {name} as a constant
          </button>
        ))}
      </div>
    </section>
  );
}

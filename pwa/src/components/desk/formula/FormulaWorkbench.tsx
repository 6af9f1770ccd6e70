import { useMemo, useState } from 'react';
import { FormulaEditor } from './FormulaEditor';
import { FormulaPreview } from './FormulaPreview';
import { reviewFormula, type FormulaDraft } from './reviewFormula';
import type { SavedFormula } from './formulaLibrary';

interface Props {
  initial: FormulaDraft;
  onSave(formula: SavedFormula): void;
}

/** Write, check and preview one formula model, then keep it for fitting. */
export function FormulaWorkbench({ initial, onSave }: Props) {
  const [draft, setDraft] = useState(initial);
  const review = useMemo(() => reviewFormula(draft), [draft]);
  const canSave = review.model !== null && draft.name.trim() !== '';
  return (
    <div className="desk-split">
      <div>
        <FormulaEditor draft={draft} review={review} onChange={setDraft} />
        <div className="desk-actions" style={{ marginTop: '0.75rem' }}>
          <button
            type="button"
            className="desk-primary"
            disabled={!canSave}
            onClick={() =>
              review.model &&
              onSave({
                name: draft.name.trim(),
                energy: review.model.energy,
                constants: review.model.constants,
              })
            }
          >
            Keep in my formulas
          </button>
        </div>
      </div>
      <FormulaPreview model={review.model} mu0={review.mu0} />
    </div>
  );
}

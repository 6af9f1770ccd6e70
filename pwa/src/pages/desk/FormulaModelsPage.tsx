import { useState } from 'react';
import { DeskLayout } from '../../components/desk/DeskLayout';
import { FormulaHelp } from '../../components/desk/formula/FormulaHelp';
import { draftFromSaved, useFormulaLibrary } from '../../components/desk/formula/formulaLibrary';
import { FormulaWorkbench } from '../../components/desk/formula/FormulaWorkbench';
import type { FormulaDraft } from '../../components/desk/formula/reviewFormula';

const STARTER: FormulaDraft = {
  name: 'Three-term invariant',
  energy: 'C10 (I1 - 3) + C01 (I2 - 3) + C11 (I1 - 3) (I2 - 3)',
  constants: [
    { name: 'C10', value: '0.16' },
    { name: 'C01', value: '0.02' },
    { name: 'C11', value: '0.0005' },
  ],
};

/** Custom strain-energy functions: write, check, preview and keep them for fitting. */
export default function FormulaModelsPage() {
  const { formulas, save, remove } = useFormulaLibrary();
  const [editing, setEditing] = useState<{ key: number; draft: FormulaDraft }>({
    key: 0,
    draft: STARTER,
  });
  const openDraft = (draft: FormulaDraft) => setEditing(({ key }) => ({ key: key + 1, draft }));

  return (
    <DeskLayout title="Formula models">
      <div className="desk-row desk-row--between">
        <h1>Formula models</h1>
        <button type="button" onClick={() => openDraft({ name: '', energy: '', constants: [] })}>
          Start an empty formula
        </button>
      </div>
      <FormulaHelp />
      <FormulaWorkbench key={editing.key} initial={editing.draft} onSave={save} />
      <h2>My formulas</h2>
      {formulas.length === 0 ? (
        <p className="desk-muted">
          Formulas you keep appear here and in the list of models to fit on every compound.
        </p>
      ) : (
        <table className="desk-table" aria-label="My formulas">
          <thead>
            <tr>
              <th scope="col">name</th>
              <th scope="col">W(I1, I2)</th>
              <th scope="col">constants</th>
              <th scope="col" />
            </tr>
          </thead>
          <tbody>
            {formulas.map((formula) => (
              <tr key={formula.name}>
                <td>{formula.name}</td>
                <td className="desk-code">{formula.energy}</td>
                <td>{Object.keys(formula.constants).join(', ')}</td>
                <td>
                  <div className="desk-actions">
                    <button type="button" onClick={() => openDraft(draftFromSaved(formula))}>
                      Edit
                    </button>
                    <button type="button" onClick={() => remove(formula.name)}>
                      Delete
                    </button>
                  </div>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </DeskLayout>
  );
}

import { editableRows } from '../editableRows';
import type { FormulaDraft, FormulaProblem } from './reviewFormula';

interface Props {
  constants: FormulaDraft['constants'];
  problems: FormulaProblem[];
  onChange(constants: FormulaDraft['constants']): void;
}

/** Named constants with their starting values; a row with a problem is marked where it is. */
export function ConstantsTable({ constants, problems, onChange }: Props) {
  const { set, remove } = editableRows(constants, onChange);
  return (
    <table className="desk-table desk-table--compact" aria-label="Constants">
      <thead>
        <tr>
          <th scope="col">name</th>
          <th scope="col">value</th>
          <th scope="col" />
        </tr>
      </thead>
      <tbody>
        {constants.map((constant, index) => {
          const bad = problems.some((p) => p.constantIndex === index);
          return (
            <tr key={index}>
              <td>
                <input
                  aria-label={`name of constant ${index + 1}`}
                  className="desk-code"
                  value={constant.name}
                  aria-invalid={bad}
                  onChange={(e) => set(index, { name: e.target.value })}
                />
              </td>
              <td>
                <input
                  aria-label={`value of ${constant.name || `constant ${index + 1}`}`}
                  inputMode="decimal"
                  value={constant.value}
                  aria-invalid={bad}
                  onChange={(e) => set(index, { value: e.target.value })}
                />
              </td>
              <td>
                <button type="button" onClick={() => remove(index)}>
                  Remove
                </button>
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

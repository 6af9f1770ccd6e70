import { editableRows } from '../editableRows';

export interface AgingRow {
  temperature: string;
  hours: string;
}

interface Props {
  rows: AgingRow[];
  onChange(rows: AgingRow[]): void;
}

export function rowProblem(row: AgingRow): string | null {
  const t = Number(row.temperature);
  const h = Number(row.hours);
  if (row.temperature.trim() === '' && row.hours.trim() === '') return null;
  if (!Number.isFinite(t) || row.temperature.trim() === '' || t <= -273.15)
    return 'temperature must be a number in °C';
  if (!Number.isFinite(h) || !(h > 0)) return 'hours must be a number above 0';
  return null;
}

/** Times to the end-of-life threshold, one row per oven temperature. */
export function AgingTable({ rows, onChange }: Props) {
  const { set, remove } = editableRows(rows, onChange);
  return (
    <>
      <table className="desk-table desk-table--compact" aria-label="Aging results">
        <thead>
          <tr>
            <th scope="col">oven, °C</th>
            <th scope="col">hours to threshold</th>
            <th scope="col" />
            <th scope="col" />
          </tr>
        </thead>
        <tbody>
          {rows.map((row, index) => {
            const problem = rowProblem(row);
            return (
              <tr key={index}>
                <td>
                  <input
                    aria-label={`temperature ${index + 1}`}
                    inputMode="decimal"
                    value={row.temperature}
                    aria-invalid={!!problem}
                    onChange={(e) => set(index, { temperature: e.target.value })}
                  />
                </td>
                <td>
                  <input
                    aria-label={`hours ${index + 1}`}
                    inputMode="decimal"
                    value={row.hours}
                    aria-invalid={!!problem}
                    onChange={(e) => set(index, { hours: e.target.value })}
                  />
                </td>
                <td className="desk-muted">{problem}</td>
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
      <div className="desk-actions">
        <button type="button" onClick={() => onChange([...rows, { temperature: '', hours: '' }])}>
          Add a temperature
        </button>
      </div>
    </>
  );
}

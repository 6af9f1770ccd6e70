import type { ImportResult } from './stressStrainCsv';
import { MODES, pointsByMode } from './stressStrainCsv';

/** What will be saved per mode, and every row left out with its line and reason. */
export function ImportSummary({ result }: { result: ImportResult }) {
  const groups = pointsByMode(result.accepted);
  return (
    <section aria-label="Import check">
      <p>
        <strong>{result.accepted.length}</strong> points ready:{' '}
        {MODES.filter((mode) => groups[mode]?.length)
          .map((mode) => `${mode} ${groups[mode]?.length}`)
          .join(', ') || 'none'}
        .
      </p>
      {result.rejected.length > 0 && (
        <div className="desk-callout desk-callout--warn" role="alert">
          <p>
            {result.rejected.length} {result.rejected.length === 1 ? 'row was' : 'rows were'} left
            out:
          </p>
          <table className="desk-table desk-table--compact" aria-label="Rows left out">
            <thead>
              <tr>
                <th scope="col">line</th>
                <th scope="col">reason</th>
              </tr>
            </thead>
            <tbody>
              {result.rejected.map((row, index) => (
                <tr key={`${row.line}-${index}`}>
                  <td>{row.line}</td>
                  <td>{row.reason}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}

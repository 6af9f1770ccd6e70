import type { CsvTable } from './stressStrainCsv';

const PREVIEW_ROWS = 8;

/** The first rows as read, with their line numbers, so a wrong delimiter or header shows at once. */
export function CsvPreview({ table }: { table: CsvTable }) {
  const shown = table.rows.slice(0, PREVIEW_ROWS);
  return (
    <div className="desk-scroll">
      <table className="desk-table desk-table--compact" aria-label="File preview">
        <thead>
          <tr>
            <th scope="col">line</th>
            {table.headers.map((header, index) => (
              <th key={index} scope="col">
                {header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {shown.map((row) => (
            <tr key={row.line}>
              <td className="desk-muted">{row.line}</td>
              {table.headers.map((_, index) => (
                <td key={index}>{row.cells[index] ?? ''}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {table.rows.length > PREVIEW_ROWS && (
        <p className="desk-muted">
          …and {table.rows.length - PREVIEW_ROWS} more rows
          {table.hasHeader ? ' below the header' : ''}.
        </p>
      )}
    </div>
  );
}

import type { TestSet } from '../../../api/desk/types';
import { formatNumber } from '../format';

/** The stress–strain tests on file for a compound. */
export function TestSetTable({ sets }: { sets: TestSet[] }) {
  if (sets.length === 0)
    return <p className="desk-muted">No test data yet: bring in a lab file below.</p>;
  return (
    <table className="desk-table" aria-label="Test data">
      <thead>
        <tr>
          <th scope="col">test</th>
          <th scope="col">mode</th>
          <th scope="col" className="num">
            points
          </th>
          <th scope="col" className="num">
            stretch range
          </th>
          <th scope="col" className="num">
            max stress, MPa
          </th>
          <th scope="col" className="num">
            °C
          </th>
        </tr>
      </thead>
      <tbody>
        {sets.map((set) => {
          const stretches = set.points.map((p) => p.stretch);
          return (
            <tr key={set.id}>
              <td>{set.name}</td>
              <td>{set.mode}</td>
              <td className="num">{set.points.length}</td>
              <td className="num">
                {formatNumber(Math.min(...stretches), 3)} –{' '}
                {formatNumber(Math.max(...stretches), 3)}
              </td>
              <td className="num">
                {formatNumber(Math.max(...set.points.map((p) => p.stress)), 3)}
              </td>
              <td className="num">{formatNumber(set.temperatureC ?? null, 3)}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

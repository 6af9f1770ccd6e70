import { Link } from 'react-router-dom';
import type { UnitSystem } from '../../offline/db';
import type { LotRecords } from '../../offline/catalog';
import type { LotTally } from '../../inspect/lotTally';
import { formatHardness, formatQuantity } from '../../inspect/units';
import { RecordState } from './RecordState';
import { StandingBadge } from './StandingBadge';

interface PartsTableProps {
  records: LotRecords;
  /** The engine's judgement, once it has loaded. */
  tally: LotTally | undefined;
  units: UnitSystem;
  /** While the lot is open a part can be corrected: a new record that replaces it. */
  correctable: boolean;
}

/** The lot's sampled parts as recorded on this tablet, newest correction of each. */
export function PartsTable({ records, tally, units, correctable }: PartsTableProps) {
  if (records.parts.length === 0) return <p>No part checked yet.</p>;
  return (
    <table className="data-table" data-testid="parts-table">
      <thead>
        <tr>
          <th>Part</th>
          <th>Thickness</th>
          <th>Hardness</th>
          <th>Load</th>
          <th>Verdict</th>
          <th>Counts as</th>
          <th>Where</th>
          {correctable && <th />}
        </tr>
      </thead>
      <tbody>
        {records.parts.map((part) => {
          const verdict = tally?.parts.get(part.id);
          return (
            <tr key={part.id}>
              <td>
                {part.sampleIndex}
                {part.supersedes && ' (corrected)'}
              </td>
              <td>{formatQuantity(part.measurements.thickness, 'length', units)}</td>
              <td>{formatHardness(part.measurements.hardness)}</td>
              <td>{formatQuantity(part.measurements.load, 'force', units)}</td>
              <td>{verdict && <StandingBadge standing={verdict.status} />}</td>
              <td>{tally && (tally.bad.has(part.id) ? <strong>bad</strong> : 'good')}</td>
              <td>
                <RecordState op={records.ops.get(part.id)} />
              </td>
              {correctable && (
                <td>
                  <Link className="table-link" to={`/lots/${part.lotId}/part?correct=${part.id}`}>
                    Correct
                  </Link>
                </td>
              )}
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

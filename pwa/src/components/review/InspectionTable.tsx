import type { Inspection } from '../../api/types';
import type { VerdictStatus } from '../../engine/index';
import { asPartVerdict } from '../../inspect/deviceVerdict';
import { formatHardness, formatQuantity } from '../../inspect/units';
import type { UnitSystem } from '../../offline/db';
import { StandingBadge } from '../inspect/StandingBadge';
import { when } from '../time';

/** The server's per-part records: current revisions only, the tablet's verdict beside the server's. */
export function InspectionTable({
  inspections,
  units,
}: {
  inspections: Inspection[];
  units: UnitSystem;
}) {
  const current = inspections
    .filter((inspection) => !inspection.supersededBy)
    .sort((a, b) => a.sampleIndex - b.sampleIndex);
  return (
    <table className="data-table" data-testid="inspection-table">
      <thead>
        <tr>
          <th>Part</th>
          <th>Thickness</th>
          <th>Hardness</th>
          <th>Load</th>
          <th>Server's verdict</th>
          <th>Tablet showed</th>
          <th>Recorded</th>
        </tr>
      </thead>
      <tbody>
        {current.map((inspection) => {
          const judged = asPartVerdict(inspection.serverVerdict);
          const reasons = judged?.characteristics
            .filter((c) => c.status !== 'within')
            .map((c) => c.reason);
          const shown = inspection.deviceVerdict.status as VerdictStatus | undefined;
          return (
            <tr key={inspection.id}>
              <td>
                {inspection.sampleIndex}
                {inspection.supersedes && ' (corrected)'}
              </td>
              <td>{formatQuantity(inspection.measurements.thickness, 'length', units)}</td>
              <td>{formatHardness(inspection.measurements.hardness)}</td>
              <td>{formatQuantity(inspection.measurements.load, 'force', units)}</td>
              <td>
                {judged && <StandingBadge standing={judged.status} />}{' '}
                {inspection.conforming ? 'good' : <strong>bad</strong>}
                {reasons?.map((reason) => (
                  <div key={reason} className="reason">
                    {reason}
                  </div>
                ))}
              </td>
              <td>{shown && <StandingBadge standing={shown} />}</td>
              <td>{when(inspection.recordedAt)}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

import type { Inspection } from '../../api/types';
import { asPartVerdict } from '../../inspect/deviceVerdict';
import { formatHardness, formatQuantity } from '../../inspect/units';
import type { UnitSystem } from '../../offline/db';
import { StandingBadge } from '../inspect/StandingBadge';

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
          <th>Tablet said</th>
          <th>Server counts it</th>
          <th>Recorded</th>
        </tr>
      </thead>
      <tbody>
        {current.map((inspection) => {
          const shown = asPartVerdict(inspection.deviceVerdict);
          const reasons = shown?.characteristics
            .filter((c) => c.status !== 'within')
            .map((c) => c.reason);
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
                {shown && <StandingBadge standing={shown.status} />}
                {reasons?.map((reason) => (
                  <div key={reason} className="reason">
                    {reason}
                  </div>
                ))}
              </td>
              <td>{inspection.conforming ? 'good' : <strong>bad</strong>}</td>
              <td>{new Date(inspection.recordedAt).toLocaleString()}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

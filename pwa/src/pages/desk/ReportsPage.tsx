import { useId, useState } from 'react';
import { Link } from 'react-router-dom';
import { useCompounds } from '../../api/desk/compounds';
import { useLots, usePresses } from '../../api/desk/lots';
import { useSpecs } from '../../api/desk/specs';
import { DeskLayout } from '../../components/desk/DeskLayout';
import { formatDate } from '../../components/desk/format';
import { QueryState } from '../../components/desk/QueryState';

const VERDICT_BADGE = { pass: 'within', flagged: 'out', pending: 'near' } as const;

function LotReports() {
  const id = useId();
  const [specId, setSpecId] = useState('');
  const [flagged, setFlagged] = useState(false);
  const specs = useSpecs();
  const presses = usePresses();
  const lots = useLots({ specId: specId || undefined, flagged: flagged || undefined, limit: 200 });
  const specName = (sid: string) => specs.data?.find((s) => s.id === sid)?.partNumber ?? '–';
  const pressCode = (pid: string) => presses.data?.find((p) => p.id === pid)?.code ?? '–';
  return (
    <section className="desk-card" aria-label="Lot reports">
      <h3>Lot reports for customers</h3>
      <div className="desk-row desk-row--wrap">
        <div className="desk-field">
          <label htmlFor={`${id}-spec`}>Part</label>
          <select id={`${id}-spec`} value={specId} onChange={(e) => setSpecId(e.target.value)}>
            <option value="">all parts</option>
            {(specs.data ?? []).map((s) => (
              <option key={s.id} value={s.id}>
                {s.partNumber} · {s.name}
              </option>
            ))}
          </select>
        </div>
        <label className="desk-check">
          <input type="checkbox" checked={flagged} onChange={(e) => setFlagged(e.target.checked)} />
          only flagged lots waiting for a disposition
        </label>
      </div>
      <QueryState query={lots} what="the lots">
        {(list) =>
          list.length === 0 ? (
            <p className="desk-muted">No lots match.</p>
          ) : (
            <table className="desk-table" aria-label="Lots">
              <thead>
                <tr>
                  <th scope="col">lot</th>
                  <th scope="col">part</th>
                  <th scope="col">press · cavity</th>
                  <th scope="col">molded</th>
                  <th scope="col" className="num">
                    lot size
                  </th>
                  <th scope="col">verdict</th>
                  <th scope="col">disposition</th>
                  <th scope="col" />
                </tr>
              </thead>
              <tbody>
                {list.map((lot) => (
                  <tr key={lot.id}>
                    <td>{lot.lotNumber}</td>
                    <td>{specName(lot.specId)}</td>
                    <td>
                      {pressCode(lot.pressId)} · {lot.cavity}
                    </td>
                    <td>{formatDate(lot.moldedAt)}</td>
                    <td className="num">{lot.lotSize}</td>
                    <td>
                      <span
                        className={`desk-badge desk-badge--${VERDICT_BADGE[lot.serverVerdict]}`}
                      >
                        {lot.serverVerdict}
                      </span>
                    </td>
                    <td>{lot.dispositionAction ?? '–'}</td>
                    <td>
                      <div className="desk-actions">
                        <Link className="desk-button" to={`/review/${lot.id}/report`}>
                          Report and CSV
                        </Link>
                        <Link className="desk-button" to={`/review/${lot.id}`}>
                          Lot
                        </Link>
                      </div>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          )
        }
      </QueryState>
    </section>
  );
}

function FitReports() {
  const compounds = useCompounds();
  return (
    <section className="desk-card" aria-label="Fit reports">
      <h3>Fit reports</h3>
      <p className="desk-muted">
        The constants in use for each compound, with their fit against the lab data.
      </p>
      <QueryState query={compounds} what="the compounds">
        {(list) => (
          <table className="desk-table" aria-label="Compounds with constants">
            <tbody>
              {list.map((c) => (
                <tr key={c.id}>
                  <td>
                    {c.code} · {c.name}
                  </td>
                  <td>
                    {c.currentFit ? (
                      <Link
                        className="desk-button"
                        to={`/desk/reports/compounds/${c.id}/fits/${c.currentFit.id}`}
                      >
                        Fit report, v{c.currentFit.version}
                      </Link>
                    ) : (
                      <span className="desk-muted">no published constants</span>
                    )}
                  </td>
                  <td>
                    <Link to={`/desk/compounds/${c.id}`}>all versions</Link>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </QueryState>
    </section>
  );
}

/** Reports that leave the plant: lot reports for customers and compounds' fit reports. */
export default function ReportsPage() {
  return (
    <DeskLayout title="Reports">
      <h1>Reports</h1>
      <LotReports />
      <FitReports />
    </DeskLayout>
  );
}

import type { LotReport } from '../../api/desk/types';
import { defectLabel } from '../../inspect/defects';
import { formatHardness, formatQuantity } from '../../inspect/units';
import { CautionNote } from '../inspect/CautionNote';
import { PlanSummary } from '../inspect/PlanSummary';
import { DispositionHistory } from '../review/DispositionHistory';
import './lot-report.css';

/**
 * The lot report as a customer or auditor receives it: what was checked, against which
 * revision and plan, what was found, what was decided. Laid out for paper (A4/Letter).
 */
export function LotReportView({ report }: { report: LotReport }) {
  const { lot, spec, revision, press, inspections, defects, dispositions } = report;
  const current = inspections
    .filter((i) => !i.supersededBy)
    .sort((a, b) => a.sampleIndex - b.sampleIndex);
  const verdict =
    lot.serverVerdict === 'flagged'
      ? 'Flagged'
      : lot.serverVerdict === 'pass'
        ? 'Passed'
        : 'Pending';

  return (
    <article className="lot-report" data-testid="lot-report">
      <header>
        <h1>Lot report {lot.lotNumber}</h1>
        <p>
          {spec.partNumber} {spec.name}, revision {revision.revision} · press {press.code} · cavity{' '}
          {lot.cavity} · lot of {lot.lotSize} molded {new Date(lot.moldedAt).toLocaleDateString()}
        </p>
        <p className="lot-report-verdict">
          {verdict}: {lot.nonconforming} nonconforming of {current.length} sampled (accept{' '}
          {lot.plan.accept}, reject {lot.plan.reject})
        </p>
      </header>
      <PlanSummary plan={lot.plan} sampling={revision.body.sampling} />
      <h2>Sampled parts</h2>
      <table className="data-table">
        <thead>
          <tr>
            <th>#</th>
            <th className="num">Thickness</th>
            <th className="num">Hardness</th>
            <th className="num">Load</th>
            <th>Result</th>
          </tr>
        </thead>
        <tbody>
          {current.map((i) => (
            <tr key={i.id}>
              <td>{i.sampleIndex}</td>
              <td className="num">
                {formatQuantity(i.measurements.thickness, 'length', 'metric')}
              </td>
              <td className="num">{formatHardness(i.measurements.hardness)}</td>
              <td className="num">{formatQuantity(i.measurements.load, 'force', 'metric')}</td>
              <td>{i.conforming ? 'conforming' : 'nonconforming'}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <h2>Defects</h2>
      {defects.length === 0 ? (
        <p>None.</p>
      ) : (
        <ul>
          {defects.map((d) => (
            <li key={d.id}>
              {defectLabel(d.type)} — {d.severity}, {d.location}
              {d.note && `: ${d.note}`}
            </li>
          ))}
        </ul>
      )}
      <h2>Decisions</h2>
      <DispositionHistory dispositions={dispositions} />
      <CautionNote body={revision.body} />
      <footer>Made by Gumshoe on {new Date(report.generatedAt).toLocaleString()}.</footer>
    </article>
  );
}

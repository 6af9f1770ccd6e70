import type { LotReport, ReportPart } from '../../api/types';
import { defectLabel } from '../../inspect/defects';
import { formatHardness, formatQuantity } from '../../inspect/units';
import { PlanSummary } from '../inspect/PlanSummary';
import { StandingBadge } from '../inspect/StandingBadge';
import { ACTIONS } from '../review/DispositionForm';
import { when } from '../time';
import './lot-report.css';

const VERDICT_WORDS = { flagged: 'Flagged', pass: 'Passed', pending: 'Not yet decided' } as const;

function dimensions(part: ReportPart): string {
  const entries = Object.entries(part.measurements.dimensions ?? {});
  return entries.length ? entries.map(([name, mm]) => `${name} ${mm} mm`).join(', ') : '—';
}

function window(
  edge: { min: { value: number | null }; max: { value: number | null } } | undefined,
  unit: string,
) {
  const show = (v: number | null) => (v === null ? '—' : v.toFixed(unit === 'mm' ? 2 : 1));
  return edge ? `${show(edge.min.value)} – ${show(edge.max.value)} ${unit}` : '—';
}

/**
 * The lot report as a customer or auditor receives it: what was checked, against which
 * revision and plan, what was found and decided. Laid out for paper; the server's own
 * notice on what the estimates mean closes it.
 */
export function LotReportView({ report }: { report: LotReport }) {
  const { lot, part, compound, press, plan, verdict, expected, parts, dispositions } = report;
  const label = (action: string) => ACTIONS.find((a) => a.value === action)?.label ?? action;
  return (
    <article className="lot-report" data-testid="lot-report">
      <header>
        <h1>Lot report {lot.lotNumber}</h1>
        <p>
          {part.partNumber} {part.name}, revision {part.revision} · compound {compound.code}{' '}
          {compound.name} · press {press.code} · cavity {lot.cavity} · lot of {lot.lotSize}, molded{' '}
          {new Date(lot.moldedAt).toLocaleDateString()}
        </p>
        <p className="lot-report-verdict" data-testid="report-verdict">
          {VERDICT_WORDS[verdict.lot]}: {verdict.reason}
        </p>
      </header>
      <PlanSummary plan={plan} sampling={plan} />
      {expected && (
        <p>
          Expected load at the test deflection {expected.lowerLoad.toFixed(0)} –{' '}
          {expected.upperLoad.toFixed(0)} N; thickness window{' '}
          {window(expected.windows?.thickness, 'mm')}; hardness window{' '}
          {window(expected.windows?.hardness, 'Shore A')}.
        </p>
      )}
      <h2>Sampled parts</h2>
      <table className="data-table">
        <thead>
          <tr>
            <th>#</th>
            <th className="num">Thickness</th>
            <th>Plan dimensions</th>
            <th className="num">Hardness</th>
            <th className="num">Load</th>
            <th>Result</th>
            <th>Recorded</th>
          </tr>
        </thead>
        <tbody>
          {parts.map((p) => (
            <tr key={p.recordId}>
              <td>
                {p.sampleIndex}
                {p.supersedes && ' (corrected)'}
              </td>
              <td className="num">
                {formatQuantity(p.measurements.thickness, 'length', 'metric')}
              </td>
              <td>{dimensions(p)}</td>
              <td className="num">{formatHardness(p.measurements.hardness)}</td>
              <td className="num">{formatQuantity(p.measurements.load, 'force', 'metric')}</td>
              <td>
                <StandingBadge standing={p.status} />{' '}
                {p.conforming ? 'conforming' : 'nonconforming'}
                {p.characteristics
                  .filter((c) => c.status !== 'within')
                  .map((c) => (
                    <div key={c.characteristic} className="reason">
                      {c.reason}
                    </div>
                  ))}
                {p.defects.map((d, i) => (
                  <div key={i} className="reason">
                    {defectLabel(d.type)} — {d.severity}, {d.location}
                    {d.note && `: ${d.note}`}
                  </div>
                ))}
              </td>
              <td>
                {p.recordedBy}, {when(p.recordedAt)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <h2>Decisions</h2>
      {dispositions.length === 0 ? (
        <p>None yet.</p>
      ) : (
        <ul>
          {dispositions.map((d) => (
            <li key={d.decidedAt}>
              <strong>{label(d.action)}</strong> by {d.decidedBy}, {when(d.decidedAt)} — {d.note}
            </li>
          ))}
        </ul>
      )}
      <aside className="caution">{report.notice}</aside>
      <footer>Made by Gumshoe on {new Date(report.generatedAt).toLocaleString()}.</footer>
    </article>
  );
}

import { capabilityIndices, type SpecificationLimits } from '../../../engine';
import { engineAnswer } from '../engineAnswer';
import { formatNumber } from '../format';

/** Common practice: Cpk ≥ 1.33 for ongoing production, ≥ 1.67 for new or critical characteristics. */
const ONGOING = 1.33;
const CRITICAL = 1.67;

interface Props {
  subgroups: number[][];
  limits: SpecificationLimits;
  unit: string;
}

function Verdict({ value }: { value: number | null }) {
  if (value === null) return <span className="desk-muted">one-sided spec</span>;
  if (value >= CRITICAL)
    return <span className="desk-badge desk-badge--within">meets {CRITICAL}</span>;
  if (value >= ONGOING)
    return (
      <span className="desk-badge desk-badge--near">
        meets {ONGOING}, not {CRITICAL}
      </span>
    );
  return <span className="desk-badge desk-badge--out">below {ONGOING}</span>;
}

/** Cp, Cpk from σ within subgroups and Pp, Ppk from the overall σ, against the usual targets. */
export function CapabilityPanel({ subgroups, limits, unit }: Props) {
  const answer = engineAnswer(() => capabilityIndices(subgroups, limits));
  if ('error' in answer)
    return <p className="desk-callout desk-callout--warn">No capability figures: {answer.error}</p>;
  const c = answer.value;
  const rows: [string, number | null, string][] = [
    ['Cp', c.cp, 'spread within lots against the tolerance'],
    ['Cpk', c.cpk, 'the same, counting how far the mean is off centre'],
    ['Pp', c.pp, 'overall spread, lot-to-lot shifts included'],
    ['Ppk', c.ppk, 'overall, counting the mean'],
  ];
  return (
    <section className="desk-card" aria-label="Capability">
      <h3>Capability</h3>
      <p className="desk-muted">
        limits {formatNumber(limits.lsl)} – {formatNumber(limits.usl)} {unit} · mean{' '}
        {formatNumber(c.mean)} · σ within {formatNumber(c.sigmaWithin)} · σ overall{' '}
        {formatNumber(c.sigmaOverall)}
      </p>
      <table className="desk-table" aria-label="Capability indices">
        <tbody>
          {rows.map(([name, value, meaning]) => (
            <tr key={name}>
              <th scope="row">{name}</th>
              <td className="num" data-testid={`capability-${name}`}>
                {formatNumber(value, 3)}
              </td>
              <td>
                <Verdict value={value} />
              </td>
              <td className="desk-muted">{meaning}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="desk-muted">
        Targets are common practice: {ONGOING} for ongoing production, {CRITICAL} for new or
        critical characteristics; the customer's requirement decides.
      </p>
    </section>
  );
}

import type { Disposition } from '../../api/types';
import { when } from '../time';
import { ACTIONS } from './DispositionForm';

export function DispositionHistory({ dispositions }: { dispositions: Disposition[] }) {
  if (dispositions.length === 0) return <p>No decision yet.</p>;
  const label = (action: string) => ACTIONS.find((a) => a.value === action)?.label ?? action;
  return (
    <ul className="disposition-history" data-testid="dispositions">
      {[...dispositions]
        .sort((a, b) => b.decidedAt.localeCompare(a.decidedAt))
        .map((d) => (
          <li key={d.id}>
            <strong>{label(d.action)}</strong> · {when(d.decidedAt)} — {d.note}
          </li>
        ))}
    </ul>
  );
}

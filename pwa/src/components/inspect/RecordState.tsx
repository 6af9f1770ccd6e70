import type { OutboxOp } from '../../offline/db';

/** Where a record is: still only on this tablet, on the server, or refused with the reason. */
export function RecordState({ op }: { op: OutboxOp | undefined }) {
  if (!op) return <span>—</span>;
  if (op.state === 'sent') return <span className="record-sent">On server</span>;
  if (op.state === 'waiting') return <span className="record-waiting">On tablet</span>;
  return (
    <span className="record-refused" role="alert">
      Refused: {op.reason}
    </span>
  );
}

import type { OutboxOp } from '../offline/db';
import { defectLabel } from './defects';

interface AnyPayload {
  lotNumber?: string;
  sampleIndex?: number;
  supersedes?: string;
  type?: string;
  severity?: string;
}

/** An outbox operation in the inspector's words, for the sending page. */
export function describeOp(op: OutboxOp): string {
  const payload = (op.payload ?? {}) as AnyPayload;
  switch (op.type) {
    case 'lot.open':
      return `Lot ${payload.lotNumber ?? ''} started`;
    case 'inspection.record':
      return payload.supersedes
        ? `Correction of part ${payload.sampleIndex}`
        : `Part ${payload.sampleIndex}`;
    case 'defect.record':
      return `Defect: ${defectLabel(payload.type ?? '')} (${payload.severity})`;
    case 'lot.submit':
      return 'Lot finished';
    default:
      return op.type;
  }
}

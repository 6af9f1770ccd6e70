import type { PulledSpec } from '../../api/types';
import type { LocalLot } from '../../offline/records';
import { usePresses } from '../../offline/catalog';
import { Facts } from '../Facts';

export function LotFacts({ lot, spec }: { lot: LocalLot; spec: PulledSpec | undefined }) {
  const press = usePresses()?.find((p) => p.id === lot.pressId);
  const facts: [string, string][] = [
    ['Part', spec ? `${spec.partNumber} ${spec.name}` : '…'],
    ['Revision', spec ? String(spec.revision) : '…'],
    ['Press', press?.code ?? '…'],
    ['Cavity', String(lot.cavity)],
    ['Lot size', String(lot.lotSize)],
    ['Molded', new Date(lot.moldedAt).toLocaleDateString()],
  ];
  return <Facts facts={facts} />;
}

import { IonButton } from '@ionic/react';
import { useLiveQuery } from 'dexie-react-hooks';
import { Link } from 'react-router-dom';
import type { Press } from '../../api/types';
import { Screen } from '../../components/Screen';
import { usePresses, useOpenLots, useReleasedSpecs } from '../../offline/catalog';
import { db } from '../../offline/db';
import type { LocalLot } from '../../offline/records';
import '../../components/inspect/board.css';

/** Parts checked so far per lot, counted on the device. */
function useChecked(lots: LocalLot[] | undefined): Map<string, number> {
  return (
    useLiveQuery(async () => {
      const counts = new Map<string, number>();
      if (!lots?.length) return counts;
      const parts = await db.parts
        .where('lotId')
        .anyOf(lots.map((lot) => lot.id))
        .toArray();
      const replaced = new Set(parts.map((part) => part.supersedes));
      for (const part of parts) {
        if (!replaced.has(part.id)) counts.set(part.lotId, (counts.get(part.lotId) ?? 0) + 1);
      }
      return counts;
    }, [lots]) ?? new Map()
  );
}

function PressCard({
  press,
  lots,
  checked,
}: {
  press: Press;
  lots: LocalLot[];
  checked: Map<string, number>;
}) {
  const specs = useReleasedSpecs();
  const partOf = (lot: LocalLot) => specs?.find((spec) => spec.specId === lot.specId);
  return (
    <section className="press-card" data-testid={`press-${press.code}`}>
      <header>
        <h2>{press.code}</h2>
        <span>
          {press.name} · {press.kind}
        </span>
      </header>
      {lots.length === 0 ? (
        <p className="press-idle">No lot open.</p>
      ) : (
        <ul className="press-lots">
          {lots.map((lot) => (
            <li key={lot.id}>
              <Link to={`/lots/${lot.id}`} className="lot-link">
                <strong>{lot.lotNumber}</strong>
                <span>
                  {partOf(lot)?.partNumber ?? 'part'} · cavity {lot.cavity}
                </span>
                <span className="lot-progress">
                  {checked.get(lot.id) ?? 0} of {lot.plan.sampleSize} checked
                </span>
              </Link>
            </li>
          ))}
        </ul>
      )}
      <IonButton expand="block" routerLink={`/presses/${press.id}/start`}>
        Start a lot
      </IonButton>
    </section>
  );
}

/** The inspector's start: every press with the lots open on it. */
export function BoardPage() {
  const presses = usePresses();
  const lots = useOpenLots();
  const checked = useChecked(lots);

  return (
    <Screen title="Presses">
      {presses?.length === 0 && (
        <p className="empty-note">
          This tablet has no presses yet. Connect it to the plant network once: it fetches the
          presses and part specs, and keeps them for offline use.
        </p>
      )}
      <div className="press-board">
        {presses?.map((press) => (
          <PressCard
            key={press.id}
            press={press}
            lots={lots?.filter((lot) => lot.pressId === press.id) ?? []}
            checked={checked}
          />
        ))}
      </div>
    </Screen>
  );
}

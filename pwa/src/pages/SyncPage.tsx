import { IonButton } from '@ionic/react';
import { useLiveQuery } from 'dexie-react-hooks';
import { useEffect, useState } from 'react';
import { Screen } from '../components/Screen';
import { when } from '../components/time';
import { describeOp } from '../inspect/describeOp';
import { db, getMeta, tabletName } from '../offline/db';
import { sendAgain } from '../offline/outbox';
import { requestPersistentStorage } from '../offline/persist';
import { useSyncState } from '../offline/useSyncState';

const SHOWN = 50;

function usePersisted(): boolean | undefined {
  const [persisted, setPersisted] = useState<boolean>();
  useEffect(() => {
    void requestPersistentStorage().then(setPersisted);
  }, []);
  return persisted;
}

/** Everything still on this tablet only, and everything the server refused, with its reason. */
export function SyncPage() {
  const state = useSyncState();
  const persisted = usePersisted();
  const waiting = useLiveQuery(
    () => db.outbox.where('state').equals('waiting').limit(SHOWN).sortBy('seq'),
    [],
  );
  const people = useLiveQuery(() => db.people.toArray(), []);
  const device = useLiveQuery(() => getMeta<string>('deviceId'));
  const nameOf = (userId: string) => people?.find((p) => p.userId === userId)?.name ?? userId;

  return (
    <Screen title="Sending">
      <p>
        {state?.status?.lastSyncAt
          ? `Last complete sync ${when(state.status.lastSyncAt)}.`
          : 'Not synced yet.'}{' '}
        {persisted === false &&
          'The browser has not promised to keep this storage: send your work soon.'}
        {persisted && 'The browser keeps this storage even when space runs low.'}
        {device && ` The administrator sees this tablet as ${tabletName(device)}.`}
      </p>
      {state?.status?.error && (
        <p className="field-error" role="alert">
          {state.status.error}
        </p>
      )}

      <h2 className="section-title">Refused by the server</h2>
      <ul className="plain-list">
        {state?.rejected.length === 0 && state.rejectedPhotos.length === 0 && (
          <li>Nothing refused.</li>
        )}
        {state?.rejected.map((op) => (
          <li key={op.opId} data-testid="refused-op">
            <div>
              <h3>{describeOp(op)}</h3>
              <p>
                {nameOf(op.authorId)}, {when(op.createdAt)}
              </p>
              <p className="field-error">{op.reason}</p>
            </div>
            <IonButton fill="outline" onClick={() => void sendAgain(op.opId)}>
              Send again
            </IonButton>
          </li>
        ))}
        {state?.rejectedPhotos.map((photo) => (
          <li key={photo.sha256}>
            <div>
              <h3>Photo of a defect</h3>
              <p className="field-error">{photo.reason}</p>
            </div>
          </li>
        ))}
      </ul>

      <h2 className="section-title">
        Waiting to send ({state?.waitingRecords ?? 0} records, {state?.waitingPhotos ?? 0} photos)
      </h2>
      <ul className="plain-list">
        {waiting?.map((op) => (
          <li key={op.opId}>
            <span>{describeOp(op)}</span>
            <span>
              {nameOf(op.authorId)}, {when(op.createdAt)}
            </span>
          </li>
        ))}
      </ul>
    </Screen>
  );
}

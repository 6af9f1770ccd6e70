import { IonButton, IonSpinner } from '@ionic/react';
import { Link } from 'react-router-dom';
import { syncScheduler } from '../offline/scheduler';
import { useOnline, useSyncState } from '../offline/useSyncState';
import { when } from './time';
import './status-strip.css';

function plural(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

/**
 * Always on screen: what is still on this tablet only, when it last reached the server,
 * and what went wrong — so nobody has to guess whether their work is safe.
 */
export function StatusStrip() {
  const state = useSyncState();
  const online = useOnline();
  if (!state) return null;
  const { waitingRecords, waitingPhotos, rejected, rejectedPhotos, status } = state;
  const refused = rejected.length + rejectedPhotos.length;
  const waiting =
    waitingRecords + waitingPhotos === 0
      ? 'Nothing waiting'
      : `Waiting to send: ${plural(waitingRecords, 'record', 'records')}, ${plural(waitingPhotos, 'photo', 'photos')}`;

  return (
    <div className="status-strip" role="status" data-testid="status-strip">
      <div className="status-facts">
        <span className={online ? 'dot dot-online' : 'dot dot-offline'} aria-hidden />
        <span>{online ? 'Online' : 'Offline'}</span>
        <span data-testid="status-waiting">{waiting}</span>
        <span>Last sync {status?.lastSyncAt ? when(status.lastSyncAt) : 'not yet'}</span>
        {refused > 0 && (
          <Link className="status-refused" to="/sync">
            {plural(refused, 'item', 'items')} refused — see why
          </Link>
        )}
        {status?.error && (
          <span className="status-error" data-testid="status-error" title={status.error}>
            {status.error}
          </span>
        )}
      </div>
      <div className="status-actions">
        <IonButton
          size="default"
          fill="outline"
          onClick={() => void syncScheduler.syncNow()}
          disabled={status?.running}
        >
          {status?.running ? <IonSpinner name="dots" /> : 'Sync now'}
        </IonButton>
        <Link className="status-details" to="/sync">
          Details
        </Link>
      </div>
    </div>
  );
}

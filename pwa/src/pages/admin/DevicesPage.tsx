import { IonButton, useIonAlert } from '@ionic/react';
import { useLiveQuery } from 'dexie-react-hooks';
import { useDevices, useRevokeDevice } from '../../api/admin';
import type { Device } from '../../api/types';
import { QueryState } from '../../components/desk/QueryState';
import { Screen } from '../../components/Screen';
import { when } from '../../components/time';
import { getMeta, tabletName } from '../../offline/db';
import { describeSyncError } from '../../offline/sync';

function DeviceRow({ device, mine }: { device: Device; mine: boolean }) {
  const revoke = useRevokeDevice();
  const [confirm] = useIonAlert();
  const label = mine ? 'This device' : tabletName(device.deviceId);
  const ask = () =>
    void confirm({
      header: mine ? 'Sign out the device you are using?' : `Sign out ${label}?`,
      message:
        'Everyone signed in on it is signed out at once and needs their password to sign in ' +
        'again. Records not yet sent stay on the tablet until someone signs in on it.',
      buttons: [
        { text: 'Keep signed in', role: 'cancel' },
        {
          text: 'Sign out',
          role: 'destructive',
          handler: () => revoke.mutate(device.deviceId),
        },
      ],
    });
  return (
    <tr>
      <td>
        <strong>{label}</strong>
        <div>
          <small>first seen {when(device.firstSeenAt)}</small>
        </div>
      </td>
      <td>{device.people.map((person) => person.name).join(', ')}</td>
      <td>{when(device.lastSignInAt)}</td>
      <td>
        {device.lastPushAt ? `${when(device.lastPushAt)} (${device.appliedOps} records)` : 'never'}
      </td>
      <td className="num">{device.activeSessions}</td>
      <td>
        <IonButton fill="outline" color="danger" disabled={revoke.isPending} onClick={ask}>
          Sign out this tablet
        </IonButton>
        {revoke.data && (
          <div role="status">
            {revoke.data.revoked === 1
              ? '1 sign-in ended'
              : `${revoke.data.revoked} sign-ins ended`}
          </div>
        )}
        {revoke.error && <div className="field-error">{describeSyncError(revoke.error)}</div>}
      </td>
    </tr>
  );
}

/**
 * The tablets people have signed in on. A lost or stolen one is signed out here: its tokens stop
 * working at once, so whoever has it cannot reach the server.
 */
export function DevicesPage() {
  const devices = useDevices();
  const here = useLiveQuery(() => getMeta<string>('deviceId'));
  return (
    <Screen title="Devices">
      <QueryState query={devices} what="the devices">
        {(list) =>
          list.length === 0 ? (
            <p className="empty-note">No one has signed in on a tablet yet.</p>
          ) : (
            <table className="data-table" data-testid="devices-table">
              <thead>
                <tr>
                  <th>Device</th>
                  <th>People</th>
                  <th>Last sign-in</th>
                  <th>Last sent</th>
                  <th className="num">Signed in now</th>
                  <th>Sign out</th>
                </tr>
              </thead>
              <tbody>
                {list.map((device) => (
                  <DeviceRow
                    key={device.deviceId}
                    device={device}
                    mine={device.deviceId === here}
                  />
                ))}
              </tbody>
            </table>
          )
        }
      </QueryState>
    </Screen>
  );
}

import { screen, waitFor } from '@testing-library/react';
import { beforeEach, describe, expect, it } from 'vitest';
import { db, setMeta } from '../offline/db';
import { markRejected } from '../offline/outbox';
import { openLot, recordDefect } from '../offline/records';
import { SYNC_STATUS_KEY } from '../offline/scheduler';
import { deviceWithOpenLot, PAD_LOT } from '../testing/deviceFixtures';
import { renderPage } from '../testing/renderPage';
import { StatusStrip } from './StatusStrip';

const photo = {
  sha256: 'cd'.repeat(32),
  blob: new Blob(['x'], { type: 'image/jpeg' }),
  mime: 'image/jpeg',
  width: 10,
  height: 10,
};

describe('status strip', () => {
  beforeEach(deviceWithOpenLot);

  it('always says what is waiting, when it last synced and what went wrong', async () => {
    renderPage('/', '/', <StatusStrip />);
    expect((await screen.findByTestId('status-waiting')).textContent).toBe('Nothing waiting');
    expect(screen.getByText('Last sync not yet')).toBeTruthy();

    const lot = await openLot({ ...PAD_LOT, lotNumber: 'L-200' }, 'u-ines');
    await recordDefect(
      { lotId: lot.id, type: 'flash', location: 'sealing', severity: 'minor' },
      photo,
      'u-ines',
    );
    await waitFor(() =>
      expect(screen.getByTestId('status-waiting').textContent).toBe(
        'Waiting to send: 2 records, 1 photo',
      ),
    );

    await setMeta(SYNC_STATUS_KEY, {
      running: false,
      failures: 1,
      lastSyncAt: new Date().toISOString(),
      error: 'The server answered 500: database is locked',
    });
    expect((await screen.findByTestId('status-error')).textContent).toBe(
      'The server answered 500: database is locked',
    );
    expect(screen.queryByText('Last sync not yet')).toBeNull();
  });

  it('points to refused records', async () => {
    const lot = await openLot({ ...PAD_LOT, lotNumber: 'L-201' }, 'u-ines');
    const op = await db.outbox.where('recordId').equals(lot.id).first();
    await markRejected(op?.opId ?? '', 'lot number L-201 is already used');
    renderPage('/', '/', <StatusStrip />);
    expect((await screen.findByText('1 item refused — see why')).getAttribute('href')).toBe(
      '/sync',
    );
  });
});

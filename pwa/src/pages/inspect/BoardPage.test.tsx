import { screen, waitFor } from '@testing-library/react';
import { beforeEach, describe, expect, it } from 'vitest';
import type { Lot } from '../../api/types';
import { db } from '../../offline/db';
import { markSent } from '../../offline/outbox';
import { submitLot } from '../../offline/records';
import { deviceWithOpenLot, PAD_LOT } from '../../testing/deviceFixtures';
import { renderPage } from '../../testing/renderPage';
import { BoardPage } from './BoardPage';

/** The lot as pull would deliver it from the server. */
function onServer(status: Lot['status']): Lot {
  return {
    ...PAD_LOT,
    status,
    nonconforming: 0,
    serverVerdict: 'pending',
    deviceVerdict: null,
    flaggedAt: null,
    dispositionAction: null,
  };
}

describe('press board', () => {
  beforeEach(deviceWithOpenLot);

  it('shows each press with its open lots and how far they are', async () => {
    renderPage('/presses', '/presses', <BoardPage />);
    const press = await screen.findByTestId('press-P1');
    expect(press.textContent).toContain('L-100');
    expect(press.textContent).toContain('0 of 3 checked');
  });

  it('drops a finished lot, and shows it again when a supervisor reopens it', async () => {
    await submitLot(PAD_LOT.id, { verdict: 'pass', nonconforming: 0 }, 'u-ines');
    renderPage('/presses', '/presses', <BoardPage />);
    await waitFor(() =>
      expect(screen.getByTestId('press-P1').textContent).toContain('No lot open'),
    );

    // Reopened on the server: it counts only once this tablet has nothing left to send for it.
    await db.server.put({ kind: 'lot', id: PAD_LOT.id, data: onServer('open') });
    expect(screen.getByTestId('press-P1').textContent).toContain('No lot open');
    const ops = await db.outbox.toArray();
    await markSent(ops.map((op) => op.opId));
    await waitFor(() => expect(screen.getByTestId('press-P1').textContent).toContain('L-100'));
  });
});

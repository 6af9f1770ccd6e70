import { screen, waitFor } from '@testing-library/react';
import { beforeEach, describe, expect, it } from 'vitest';
import { loadEngine } from '../../inspect/engine';
import { toPartSpec } from '../../inspect/partSpec';
import { recordDefect, recordPart } from '../../offline/records';
import { deviceWithOpenLot, PAD_LOT, PAD_SPEC } from '../../testing/deviceFixtures';
import { renderPage } from '../../testing/renderPage';
import { LotPage } from './LotPage';

async function recordPadPart(sampleIndex: number, loadFactor: number) {
  const engine = await loadEngine();
  const prepared = engine.prepareSpec(toPartSpec(PAD_SPEC) ?? ({} as never));
  const measurements = { thickness: 12, load: prepared.expected.low.load * loadFactor };
  const verdict = engine.partVerdict(prepared, measurements);
  return recordPart(
    {
      lotId: PAD_LOT.id,
      sampleIndex,
      measurements,
      verdict,
      conforming: verdict.conforming,
    },
    'u-ines',
  );
}

async function standing() {
  return screen.findByTestId('lot-standing', {}, { timeout: 15_000 });
}

describe('lot at the press', () => {
  beforeEach(deviceWithOpenLot);

  it('shows the plan and how far the check has come', async () => {
    await recordPadPart(1, 1);
    renderPage(`/lots/${PAD_LOT.id}`, '/lots/:lotId', <LotPage />);
    expect((await standing()).dataset.decision).toBe('open');
    expect(screen.getByTestId('plan-sample-size').textContent).toBe('3');
    expect(screen.getByTestId('plan-reject').textContent).toBe('1');
    expect(screen.getByText('Check part 2')).toBeTruthy();
    expect(screen.getByTestId('caution').textContent).toMatch(/qualified engineer/);
  });

  it('flags the lot when bad parts reach the reject number', async () => {
    await recordPadPart(1, 1);
    await recordPadPart(2, 1.5);
    renderPage(`/lots/${PAD_LOT.id}`, '/lots/:lotId', <LotPage />);
    const banner = await standing();
    await waitFor(() => expect(banner.dataset.decision).toBe('reject'));
    expect(banner.textContent).toMatch(/Flagged/);
    expect(screen.getByText('Finish lot').closest('ion-button')?.hasAttribute('disabled')).toBe(
      false,
    );
  });

  it('counts a major defect logged later against its part', async () => {
    const part = await recordPadPart(1, 1);
    await recordDefect(
      { lotId: PAD_LOT.id, partId: part.id, type: 'void', location: 'flexing', severity: 'major' },
      undefined,
      'u-ines',
    );
    renderPage(`/lots/${PAD_LOT.id}`, '/lots/:lotId', <LotPage />);
    const banner = await standing();
    await waitFor(() => expect(banner.dataset.decision).toBe('reject'));
    expect(screen.getByText('Voids or porosity')).toBeTruthy();
  });
});

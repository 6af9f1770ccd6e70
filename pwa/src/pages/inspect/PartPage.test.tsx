import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { beforeEach, describe, expect, it } from 'vitest';
import { loadEngine } from '../../inspect/engine';
import { toPartSpec } from '../../inspect/partSpec';
import { db } from '../../offline/db';
import { deviceWithOpenLot, PAD_LOT, PAD_SPEC } from '../../testing/deviceFixtures';
import { renderPage } from '../../testing/renderPage';
import { PartPage } from './PartPage';

async function expectedPadLoad(): Promise<number> {
  const engine = await loadEngine();
  const spec = toPartSpec(PAD_SPEC);
  if (!spec) throw new Error('the pad has a fit');
  return engine.prepareSpec(spec).expected.low.load;
}

/** The first render waits for the engine's chunk to load, which is slow on a cold, busy machine. */
async function openPartPage() {
  renderPage(`/lots/${PAD_LOT.id}/part`, '/lots/:lotId/part', <PartPage />);
  await screen.findByTestId('field-load', {}, { timeout: 15_000 });
}

function type(testId: string, value: string) {
  fireEvent.change(screen.getByTestId(testId), { target: { value } });
}

describe('part entry', () => {
  beforeEach(deviceWithOpenLot);

  it('shows the engine’s verdict and its reason as each value is typed', async () => {
    const expected = await expectedPadLoad();
    await openPartPage();
    expect(screen.getByText('Type a value to see how the part stands.')).toBeTruthy();

    type('field-thickness', '12.02');
    const panel = screen.getByTestId('verdict-panel');
    expect(within(panel).getByTestId('reason-thickness').textContent).toMatch(/nominal 12.00 mm/);

    type('field-load', String(Math.round(expected)));
    expect(within(panel).getByTestId('reason-load').textContent).toMatch(
      /load .* N is .* expected/,
    );
    expect(screen.getByTestId('verdict-overall').textContent).not.toBe('Out');

    type('field-load', String(Math.round(expected * 1.4)));
    expect(screen.getByTestId('verdict-overall').textContent).toBe('Out');
    expect(within(panel).getByTestId('reason-load').textContent).toMatch(/over the upper limit/);
  });

  it('saves the part with what the tablet showed and queues it for the server', async () => {
    const expected = await expectedPadLoad();
    await openPartPage();
    type('field-thickness', '12');
    type('field-hardness1', '55');
    type('field-hardness2', '56');
    type('field-hardness3', '54');
    type('field-load', String(Math.round(expected * 1.4)));
    fireEvent.click(screen.getByText('Save part 1'));

    await screen.findByTestId('saved-note');
    const [part] = await db.parts.toArray();
    expect(part).toMatchObject({
      sampleIndex: 1,
      conforming: false,
      measurements: { thickness: 12, hardness: [55, 56, 54] },
      verdict: { status: 'out' },
    });
    const op = await db.outbox
      .where('recordId')
      .equals(part?.id ?? '')
      .first();
    expect(op).toMatchObject({ type: 'inspection.record', state: 'waiting', authorId: 'u-ines' });
    // The form moves on to the next sampled part.
    await waitFor(() => expect(screen.getByText('Save part 2')).toBeTruthy());
  });

  it('names the field the engine refuses', async () => {
    await openPartPage();
    type('field-thickness', '-3');
    expect((await screen.findAllByRole('alert')).map((a) => a.textContent).join(' ')).toMatch(
      /thickness/,
    );
    expect(screen.getByText('Save part 1').closest('ion-button')?.hasAttribute('disabled')).toBe(
      true,
    );
  });
});

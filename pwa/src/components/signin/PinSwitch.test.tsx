import { fireEvent, render, screen } from '@testing-library/react';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { MAX_PIN_TRIES, setPin } from '../../auth/pin';
import { db } from '../../offline/db';
import { INES } from '../../testing/deviceFixtures';
import { PinSwitch } from './PinSwitch';

function enter(pin: string) {
  fireEvent.change(screen.getByTestId('pin-input'), { target: { value: pin } });
  fireEvent.submit(screen.getByTestId('pin-input').closest('form') as HTMLFormElement);
}

describe('switching in by PIN', () => {
  beforeEach(async () => {
    await db.people.clear();
    await db.people.put({ ...INES, accessToken: 'a', refreshToken: 'r' });
    await setPin(INES.userId, '2468');
  });

  it('keeps only a bcrypt hash of the PIN on the device', async () => {
    const stored = await db.people.get(INES.userId);
    expect(stored?.pinHash).toMatch(/^\$2[aby]\$10\$/);
    expect(JSON.stringify(stored)).not.toContain('2468');
  });

  it('lets the right PIN in without any network', async () => {
    const fetch = vi.fn();
    vi.stubGlobal('fetch', fetch);
    const onSwitched = vi.fn();
    render(<PinSwitch person={INES} onSwitched={onSwitched} onCancel={() => undefined} />);
    enter('2468');
    await vi.waitFor(() => expect(onSwitched).toHaveBeenCalled(), { timeout: 5_000 });
    expect(fetch).not.toHaveBeenCalled();
    vi.unstubAllGlobals();
  });

  it('counts wrong PINs and then asks for the password', async () => {
    render(<PinSwitch person={INES} onSwitched={() => undefined} onCancel={() => undefined} />);
    enter('1111');
    expect((await screen.findByRole('alert', {}, { timeout: 5_000 })).textContent).toBe(
      `Wrong PIN. ${MAX_PIN_TRIES - 1} tries left.`,
    );
    for (let i = 1; i < MAX_PIN_TRIES; i++) {
      enter('1111');
      await vi.waitFor(async () =>
        expect((await db.people.get(INES.userId))?.failedPins ?? MAX_PIN_TRIES).toBeGreaterThan(i),
      );
    }
    expect(
      (await screen.findByText('Too many wrong PINs. Sign in with your password.')).textContent,
    ).toBeTruthy();
    const locked = await db.people.get(INES.userId);
    expect(locked?.pinHash).toBeUndefined();
    expect(locked?.refreshToken).toBeUndefined();
  }, 30_000);
});

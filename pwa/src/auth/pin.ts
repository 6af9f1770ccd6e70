import { db } from '../offline/db';

/** Same cost as the server's passwords: slow enough to make guessing a stolen hash tedious. */
const BCRYPT_COST = 10;
export const MAX_PIN_TRIES = 5;
const PIN_PATTERN = /^\d{4,8}$/;

export function pinProblem(pin: string): string | undefined {
  return PIN_PATTERN.test(pin) ? undefined : 'A PIN is 4 to 8 digits.';
}

// bcryptjs is only needed on the switch screen, so it stays out of the first download.
const bcrypt = () => import('bcryptjs');

export async function setPin(userId: string, pin: string): Promise<void> {
  const problem = pinProblem(pin);
  if (problem) throw new Error(problem);
  const { hash } = await bcrypt();
  await db.people.update(userId, { pinHash: await hash(pin, BCRYPT_COST), failedPins: 0 });
}

export type PinCheck =
  { outcome: 'ok' } | { outcome: 'locked' } | { outcome: 'wrong'; triesLeft: number };

/**
 * Checks a quick-switch PIN entirely on the device, so it works without a connection.
 * After MAX_PIN_TRIES wrong PINs the PIN and tokens are dropped: a password sign-in is needed.
 */
export async function checkPin(userId: string, pin: string): Promise<PinCheck> {
  const person = await db.people.get(userId);
  if (!person?.pinHash) return { outcome: 'locked' };
  const { compare } = await bcrypt();
  if (await compare(pin, person.pinHash)) {
    await db.people.update(userId, { failedPins: 0, lastActiveAt: new Date().toISOString() });
    return { outcome: 'ok' };
  }
  const failedPins = person.failedPins + 1;
  if (failedPins >= MAX_PIN_TRIES) {
    await db.people.update(userId, {
      failedPins,
      pinHash: undefined,
      accessToken: undefined,
      refreshToken: undefined,
    });
    return { outcome: 'locked' };
  }
  await db.people.update(userId, { failedPins });
  return { outcome: 'wrong', triesLeft: MAX_PIN_TRIES - failedPins };
}

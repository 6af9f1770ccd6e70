import { ApiError, request } from '../api/http';
import type { User } from '../api/types';
import { db, deviceId, type DevicePerson } from '../offline/db';

interface Session {
  accessToken: string;
  refreshToken: string;
  /** Seconds the access token is good for. */
  expiresIn: number;
  user: User;
}

/** The person has no usable token on this device; they must sign in with their password. */
export class SignInNeeded extends Error {
  constructor(readonly userId: string) {
    super('sign-in needed');
    this.name = 'SignInNeeded';
  }
}

/** Refresh a little early so a token does not expire between the check and its use. */
const EARLY_MS = 30_000;

function tokenFields(session: Session): Partial<DevicePerson> {
  return {
    accessToken: session.accessToken,
    refreshToken: session.refreshToken,
    accessExpiresAt: Date.now() + session.expiresIn * 1000,
  };
}

function usable(
  person: DevicePerson | undefined,
): person is DevicePerson & { accessToken: string } {
  return !!person?.accessToken && (person.accessExpiresAt ?? 0) - EARLY_MS > Date.now();
}

/**
 * Password sign-in. It names this device, which is what later lets the server accept
 * this person's records from this tablet even when someone else's token pushes them.
 */
export async function signIn(email: string, password: string): Promise<DevicePerson> {
  const session = await request<Session>('/auth/login', {
    method: 'POST',
    body: { email, password, deviceId: await deviceId() },
  });
  return db.transaction('rw', db.people, async () => {
    const known = await db.people.get(session.user.id);
    const person: DevicePerson = {
      units: 'metric',
      failedPins: 0,
      ...known,
      userId: session.user.id,
      name: session.user.name,
      email: session.user.email,
      role: session.user.role,
      ...tokenFields(session),
      lastActiveAt: new Date().toISOString(),
    };
    await db.people.put(person);
    return person;
  });
}

async function refreshNow(userId: string): Promise<string> {
  const person = await db.people.get(userId);
  if (usable(person)) return person.accessToken;
  if (!person?.refreshToken) throw new SignInNeeded(userId);
  try {
    const session = await request<Session>('/auth/refresh', {
      method: 'POST',
      body: { refreshToken: person.refreshToken },
    });
    await db.people.update(userId, tokenFields(session));
    return session.accessToken;
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) {
      // Revoked or run out: only a password sign-in helps now.
      await db.people.update(userId, { accessToken: undefined, refreshToken: undefined });
      throw new SignInNeeded(userId);
    }
    throw error;
  }
}

const refreshing = new Map<string, Promise<string>>();

/**
 * A valid access token for this person, refreshing when needed (`stale` after the server
 * answered 401 to the one we had). Refresh tokens rotate and presenting a spent one revokes
 * the whole sign-in, so only one refresh per person may run at a time — across tabs too
 * (Web Locks), not only within this one.
 */
export async function accessTokenFor(userId: string, stale?: string): Promise<string> {
  const person = await db.people.get(userId);
  if (!person) throw new SignInNeeded(userId);
  if (usable(person) && person.accessToken !== stale) return person.accessToken;
  if (stale && person.accessToken === stale) {
    await db.people.update(userId, { accessExpiresAt: 0 });
  }
  let pending = refreshing.get(userId);
  if (!pending) {
    const run = () => refreshNow(userId);
    const locked = navigator.locks ? navigator.locks.request(`refresh:${userId}`, run) : run();
    pending = locked.finally(() => refreshing.delete(userId));
    refreshing.set(userId, pending);
  }
  return pending;
}

/**
 * Sign-out forgets this person's tokens and PIN on the device. Their unsynced records stay
 * in the outbox: the server accepts them later under anyone's token from this tablet,
 * because they were made while this person was signed in here.
 */
export async function signOut(userId: string): Promise<void> {
  const person = await db.people.get(userId);
  if (person?.refreshToken) {
    // Best effort: offline, the server-side sign-in simply runs out on its own.
    await request('/auth/logout', {
      method: 'POST',
      body: { refreshToken: person.refreshToken },
      timeoutMs: 5_000,
    }).catch(() => undefined);
  }
  await db.people.update(userId, {
    accessToken: undefined,
    accessExpiresAt: undefined,
    refreshToken: undefined,
    pinHash: undefined,
  });
}

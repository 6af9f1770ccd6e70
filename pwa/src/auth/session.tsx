import { useLiveQuery } from 'dexie-react-hooks';
import { createContext, useContext, type ReactNode } from 'react';
import { db, getMeta, setMeta, type DevicePerson, type UnitSystem } from '../offline/db';

const CURRENT = 'currentUserId';

/** Who is using the tablet right now; survives reloads because it lives in the device store. */
export async function currentPerson(): Promise<DevicePerson | undefined> {
  const id = await getMeta<string>(CURRENT);
  return id ? db.people.get(id) : undefined;
}

export async function makeCurrent(userId: string): Promise<void> {
  await db.transaction('rw', db.people, db.meta, async () => {
    await db.people.update(userId, { lastActiveAt: new Date().toISOString() });
    await setMeta(CURRENT, userId);
  });
}

/** Hands the tablet over: the person stays known here and can come back by PIN. */
export async function leaveDevice(): Promise<void> {
  await setMeta(CURRENT, undefined);
}

export async function setUnits(userId: string, units: UnitSystem): Promise<void> {
  await db.people.update(userId, { units });
}

export interface SessionState {
  /** False only while the device store is first being read. */
  loaded: boolean;
  person?: DevicePerson;
}

const SessionContext = createContext<SessionState | undefined>(undefined);

function useStoredSession(skip: boolean): SessionState {
  const person = useLiveQuery(
    async () => (skip ? undefined : ((await currentPerson()) ?? null)),
    [skip],
  );
  return person === undefined ? { loaded: false } : { loaded: true, person: person ?? undefined };
}

/**
 * Reads the session once for the whole app, so a page mounting later has it on its first
 * render. Ionic's outlet waits only briefly for a route's IonPage; a page that first renders
 * nothing while IndexedDB answers can be left invisible.
 */
export function SessionProvider({ children }: { children: ReactNode }) {
  const session = useStoredSession(false);
  return <SessionContext.Provider value={session}>{children}</SessionContext.Provider>;
}

/** The person using the tablet; outside a SessionProvider (tests) it reads the store itself. */
export function useSession(): SessionState {
  const provided = useContext(SessionContext);
  const own = useStoredSession(provided !== undefined);
  return provided ?? own;
}

/** People who may switch back in by PIN, most recent first. */
export function usePeopleWithPin(): DevicePerson[] {
  return (
    useLiveQuery(
      async () =>
        (await db.people.toArray())
          .filter((p) => p.pinHash)
          .sort((a, b) => b.lastActiveAt.localeCompare(a.lastActiveAt)),
      [],
    ) ?? []
  );
}

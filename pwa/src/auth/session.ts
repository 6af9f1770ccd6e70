import { useLiveQuery } from 'dexie-react-hooks';
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
  /** Undefined while the device store is being read. */
  loaded: boolean;
  person?: DevicePerson;
}

export function useSession(): SessionState {
  const person = useLiveQuery(async () => (await currentPerson()) ?? null, []);
  return person === undefined ? { loaded: false } : { loaded: true, person: person ?? undefined };
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

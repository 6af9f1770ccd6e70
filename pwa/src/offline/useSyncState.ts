import { useLiveQuery } from 'dexie-react-hooks';
import { useEffect, useState } from 'react';
import { db, getMeta, type OutboxOp, type StoredPhoto } from './db';
import { SYNC_STATUS_KEY, type SyncStatus } from './scheduler';

export interface SyncState {
  waitingRecords: number;
  waitingPhotos: number;
  rejected: OutboxOp[];
  rejectedPhotos: StoredPhoto[];
  status?: SyncStatus;
}

/** What the status strip and the sync page show, live from the device store. */
export function useSyncState(): SyncState | undefined {
  return useLiveQuery(async () => {
    const [waitingRecords, waitingPhotos, rejected, rejectedPhotos, status] = await Promise.all([
      db.outbox.where('state').equals('waiting').count(),
      db.photos.where('state').equals('waiting').count(),
      db.outbox.where('state').equals('rejected').toArray(),
      db.photos.where('state').equals('rejected').toArray(),
      getMeta<SyncStatus>(SYNC_STATUS_KEY),
    ]);
    return { waitingRecords, waitingPhotos, rejected, rejectedPhotos, status };
  }, []);
}

/** The browser's idea of being online; it can be wrong one way only (online but unreachable). */
export function useOnline(): boolean {
  const [online, setOnline] = useState(navigator.onLine);
  useEffect(() => {
    const update = () => setOnline(navigator.onLine);
    window.addEventListener('online', update);
    window.addEventListener('offline', update);
    return () => {
      window.removeEventListener('online', update);
      window.removeEventListener('offline', update);
    };
  }, []);
  return online;
}

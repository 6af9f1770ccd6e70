import { useCallback } from 'react';
import { useSession } from '../../auth/session';
import { callAs } from '../client';
import type { RequestOptions } from '../http';

export type DeskCall = <T>(path: string, options?: Omit<RequestOptions, 'token'>) => Promise<T>;

/** Calls the server as whoever is signed in on this device; the desk has no other way out. */
export function useDeskCall(): { call: DeskCall; ready: boolean; userId?: string } {
  const { person } = useSession();
  const userId = person?.userId;
  const call = useCallback<DeskCall>(
    (path, options) => {
      if (!userId) return Promise.reject(new Error('Sign in to use the quality desk.'));
      return callAs(userId, path, options);
    },
    [userId],
  );
  return { call, ready: userId !== undefined, userId };
}

/** Every desk query key starts here, so one invalidation can refresh the whole desk. */
export const deskKey = (...parts: unknown[]) => ['desk', ...parts] as const;

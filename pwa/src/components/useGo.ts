import { useIonRouter } from '@ionic/react';
import { useMemo } from 'react';

/**
 * Navigation that keeps Ionic's page stack in step with the browser history. React Router's
 * own `replace` leaves Ionic showing a page from deep in its stack, so screens use these.
 */
export function useGo() {
  const router = useIonRouter();
  return useMemo(
    () => ({
      /** A fresh start at this page: sign-in, a person's home, the board after a lot. */
      root: (path: string) => router.push(path, 'root', 'replace'),
      /** Onwards, with this page taking the place of the current one in history. */
      instead: (path: string) => router.push(path, 'forward', 'replace'),
      /** Back to where the person came from, or to `fallback` when they came from outside. */
      back: (fallback: string) =>
        router.canGoBack() ? router.goBack() : router.push(fallback, 'back', 'replace'),
    }),
    [router],
  );
}

import { Suspense, type ReactNode } from 'react';
import type { Role } from '../api/types';
import { useSession } from '../auth/session';

/**
 * Renders the page only for the roles it is for. It never redirects by itself: Ionic keeps
 * earlier pages mounted, and a redirect from each of them would fight over the location.
 * SessionGate sends the person to the right place. Also the Suspense boundary for lazy pages.
 */
export function RequireRole({ roles, children }: { roles: readonly Role[]; children: ReactNode }) {
  const { person } = useSession();
  if (!person || !roles.includes(person.role)) return null;
  return <Suspense fallback={null}>{children}</Suspense>;
}

import { Suspense, type ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import type { Role } from '../api/types';
import { useSession } from '../auth/session';
import { homeFor } from '../routes';

/**
 * Shows the page only to the roles it is for: nobody on the tablet → sign-in; the wrong
 * role → that person's own start page. Also the Suspense boundary for lazily loaded pages.
 * While waiting it renders nothing rather than a stand-in page: Ionic's outlet takes the
 * first IonPage it sees as the route's page, and a stand-in would leave the real one hidden.
 */
export function RequireRole({ roles, children }: { roles: readonly Role[]; children: ReactNode }) {
  const { loaded, person } = useSession();
  const location = useLocation();
  if (!loaded) return null;
  if (!person) return <Navigate to="/sign-in" replace state={{ from: location.pathname }} />;
  if (!roles.includes(person.role)) return <Navigate to={homeFor(person.role)} replace />;
  return <Suspense fallback={null}>{children}</Suspense>;
}

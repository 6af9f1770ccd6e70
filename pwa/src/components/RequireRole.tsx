import { IonPage, IonSpinner } from '@ionic/react';
import { Suspense, type ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import type { Role } from '../api/types';
import { useSession } from '../auth/session';
import { homeFor } from '../routes';

function Waiting() {
  return (
    <IonPage className="ion-justify-content-center ion-align-items-center">
      <IonSpinner />
    </IonPage>
  );
}

/**
 * Shows the page only to the roles it is for: nobody on the tablet → sign-in; the wrong
 * role → that person's own start page. Also the Suspense boundary for lazily loaded pages.
 */
export function RequireRole({ roles, children }: { roles: readonly Role[]; children: ReactNode }) {
  const { loaded, person } = useSession();
  const location = useLocation();
  if (!loaded) return <Waiting />;
  if (!person) return <Navigate to="/sign-in" replace state={{ from: location.pathname }} />;
  if (!roles.includes(person.role)) return <Navigate to={homeFor(person.role)} replace />;
  return <Suspense fallback={<Waiting />}>{children}</Suspense>;
}

import { useEffect } from 'react';
import { useLocation } from 'react-router-dom';
import { useSession } from '../auth/session';
import { preloadPagesFor, redirectFor } from '../routes';
import { useGo } from './useGo';

/**
 * The one place that moves a person to where they belong: to sign-in when nobody is on the
 * tablet, to their own start when a page is not for their role or does not exist.
 */
export function SessionGate() {
  const { loaded, person } = useSession();
  const { pathname } = useLocation();
  const { root } = useGo();
  const role = person?.role;
  useEffect(() => {
    if (role) preloadPagesFor(role);
  }, [role]);
  useEffect(() => {
    if (!loaded) return;
    const target = redirectFor(pathname, role);
    if (target) root(target);
  }, [loaded, role, pathname, root]);
  return null;
}

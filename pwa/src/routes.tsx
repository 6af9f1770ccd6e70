import { lazy, type ComponentType } from 'react';
import { matchPath } from 'react-router-dom';
import {
  albumsOutline,
  alertCircleOutline,
  cloudUploadOutline,
  constructOutline,
  flaskOutline,
  mailOutline,
  peopleOutline,
} from 'ionicons/icons';
import type { Role } from './api/types';
import { BoardPage } from './pages/inspect/BoardPage';
import { DefectPage } from './pages/inspect/DefectPage';
import { LotPage } from './pages/inspect/LotPage';
import { OpenLotPage } from './pages/inspect/OpenLotPage';
import { PartPage } from './pages/inspect/PartPage';
import { SyncPage } from './pages/SyncPage';

export interface AppRoute {
  path: string;
  roles: readonly Role[];
  page: ComponentType;
}

export interface NavEntry {
  path: string;
  roles: readonly Role[];
  label: string;
  icon: string;
  /** Menu heading the entry sits under. */
  section: 'Work' | 'Desk' | 'Administration';
}

/** Pages used away from the press load on first visit, keeping the inspector's download small. */
function lazyPage<M>(load: () => Promise<M>, name: keyof M): ComponentType {
  return lazy(async () => ({ default: (await load())[name] as ComponentType }));
}

const AT_THE_PRESS: readonly Role[] = ['inspector', 'supervisor'];
const REVIEWERS: readonly Role[] = ['supervisor', 'quality'];
const ADMIN: readonly Role[] = ['admin'];

const workRoutes: AppRoute[] = [
  {
    path: '/review',
    roles: REVIEWERS,
    page: lazyPage(() => import('./pages/review/ReviewQueuePage'), 'ReviewQueuePage'),
  },
  { path: '/presses', roles: AT_THE_PRESS, page: BoardPage },
  { path: '/sync', roles: AT_THE_PRESS, page: SyncPage },
  { path: '/presses/:pressId/start', roles: AT_THE_PRESS, page: OpenLotPage },
  { path: '/lots/:lotId', roles: AT_THE_PRESS, page: LotPage },
  { path: '/lots/:lotId/part', roles: AT_THE_PRESS, page: PartPage },
  { path: '/lots/:lotId/defect', roles: AT_THE_PRESS, page: DefectPage },
  {
    path: '/review/:lotId',
    roles: REVIEWERS,
    page: lazyPage(() => import('./pages/review/LotReviewPage'), 'LotReviewPage'),
  },
  {
    path: '/review/:lotId/report',
    roles: REVIEWERS,
    page: lazyPage(() => import('./pages/review/LotReportPage'), 'LotReportPage'),
  },
];

const adminRoutes: AppRoute[] = [
  {
    path: '/admin/people',
    roles: ADMIN,
    page: lazyPage(() => import('./pages/admin/PeoplePage'), 'PeoplePage'),
  },
  {
    path: '/admin/presses',
    roles: ADMIN,
    page: lazyPage(() => import('./pages/admin/PressesPage'), 'PressesPage'),
  },
  {
    path: '/admin/mail',
    roles: ADMIN,
    page: lazyPage(() => import('./pages/admin/MailPage'), 'MailPage'),
  },
];

/** The quality desk mounts its own routes (pages/desk/routes.tsx); these are only the menu's. */
export const DESK_ROLES: readonly Role[] = ['quality'];

export const ROUTES: readonly AppRoute[] = [...workRoutes, ...adminRoutes];

/** The side menu, in the order a person of each role reaches for things. */
const NAV: readonly NavEntry[] = [
  { path: '/desk', roles: DESK_ROLES, label: 'Quality desk', icon: flaskOutline, section: 'Desk' },
  {
    path: '/review',
    roles: REVIEWERS,
    label: 'Flagged lots',
    icon: alertCircleOutline,
    section: 'Work',
  },
  { path: '/presses', roles: AT_THE_PRESS, label: 'Presses', icon: albumsOutline, section: 'Work' },
  {
    path: '/sync',
    roles: AT_THE_PRESS,
    label: 'Sending',
    icon: cloudUploadOutline,
    section: 'Work',
  },
  {
    path: '/admin/people',
    roles: ADMIN,
    label: 'People',
    icon: peopleOutline,
    section: 'Administration',
  },
  {
    path: '/admin/presses',
    roles: ADMIN,
    label: 'Presses',
    icon: constructOutline,
    section: 'Administration',
  },
  {
    path: '/admin/mail',
    roles: ADMIN,
    label: 'Mail outbox',
    icon: mailOutline,
    section: 'Administration',
  },
];

export function navFor(role: Role): NavEntry[] {
  return NAV.filter((entry) => entry.roles.includes(role));
}

/** Where a person lands after signing in: the first entry of their menu. */
export function homeFor(role: Role): string {
  return navFor(role)[0]?.path ?? '/sign-in';
}

/** Pages anyone may see; `/pin` needs someone on the tablet but any role. */
const OPEN_PATHS = ['/sign-in'];

function rolesAt(pathname: string): readonly Role[] | undefined {
  if (pathname === '/pin') return ['inspector', 'supervisor', 'quality', 'admin'];
  if (pathname === '/desk' || pathname.startsWith('/desk/')) return DESK_ROLES;
  return ROUTES.find((route) => matchPath(route.path, pathname))?.roles;
}

/** Where a person at this path should be sent instead, or undefined to stay. */
export function redirectFor(pathname: string, role: Role | undefined): string | undefined {
  if (OPEN_PATHS.includes(pathname)) return undefined;
  if (!role) return '/sign-in';
  const allowed = rolesAt(pathname);
  return allowed?.includes(role) ? undefined : homeFor(role);
}

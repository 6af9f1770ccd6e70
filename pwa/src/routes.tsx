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
  tabletLandscapeOutline,
} from 'ionicons/icons';
import type { Role } from './api/types';
import { BoardPage } from './pages/inspect/BoardPage';

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

const preloads: { roles: readonly Role[]; load: () => Promise<unknown> }[] = [];

/**
 * Pages load apart from the first screen, keeping the inspector's first download small. Each is
 * fetched once someone of its roles is on the tablet and the browser is idle (preloadPagesFor),
 * so opening it does not wait on the network: Ionic's outlet gives a page only a moment.
 */
function lazyPage<M>(roles: readonly Role[], load: () => Promise<M>, name: keyof M): ComponentType {
  preloads.push({ roles, load });
  return lazy(async () => ({ default: (await load())[name] as ComponentType }));
}

/** Give the first screen this long to itself before fetching the rest. */
const PRELOAD_AFTER_MS = 3000;

/** Fetches the role's pages when the browser is idle, once the first screen has had its turn. */
export function preloadPagesFor(role: Role): void {
  const idle = window.requestIdleCallback ?? ((run: () => void) => run());
  setTimeout(
    () =>
      idle(() => {
        for (const page of preloads) if (page.roles.includes(role)) void page.load();
      }),
    PRELOAD_AFTER_MS,
  );
}

const AT_THE_PRESS: readonly Role[] = ['inspector', 'supervisor'];
const REVIEWERS: readonly Role[] = ['supervisor', 'quality'];
const ADMIN: readonly Role[] = ['admin'];

const workRoutes: AppRoute[] = [
  {
    path: '/review',
    roles: REVIEWERS,
    page: lazyPage(REVIEWERS, () => import('./pages/review/ReviewQueuePage'), 'ReviewQueuePage'),
  },
  // The board is the inspector's first screen; the rest of their pages follow it on idle.
  { path: '/presses', roles: AT_THE_PRESS, page: BoardPage },
  {
    path: '/sync',
    roles: AT_THE_PRESS,
    page: lazyPage(AT_THE_PRESS, () => import('./pages/SyncPage'), 'SyncPage'),
  },
  {
    path: '/presses/:pressId/start',
    roles: AT_THE_PRESS,
    page: lazyPage(AT_THE_PRESS, () => import('./pages/inspect/OpenLotPage'), 'OpenLotPage'),
  },
  {
    path: '/lots/:lotId',
    roles: AT_THE_PRESS,
    page: lazyPage(AT_THE_PRESS, () => import('./pages/inspect/LotPage'), 'LotPage'),
  },
  {
    path: '/lots/:lotId/part',
    roles: AT_THE_PRESS,
    page: lazyPage(AT_THE_PRESS, () => import('./pages/inspect/PartPage'), 'PartPage'),
  },
  {
    path: '/lots/:lotId/defect',
    roles: AT_THE_PRESS,
    page: lazyPage(AT_THE_PRESS, () => import('./pages/inspect/DefectPage'), 'DefectPage'),
  },
  {
    path: '/review/:lotId',
    roles: REVIEWERS,
    page: lazyPage(REVIEWERS, () => import('./pages/review/LotReviewPage'), 'LotReviewPage'),
  },
  {
    path: '/review/:lotId/report',
    roles: REVIEWERS,
    page: lazyPage(REVIEWERS, () => import('./pages/review/LotReportPage'), 'LotReportPage'),
  },
];

const adminRoutes: AppRoute[] = [
  {
    path: '/admin/people',
    roles: ADMIN,
    page: lazyPage(ADMIN, () => import('./pages/admin/PeoplePage'), 'PeoplePage'),
  },
  {
    path: '/admin/presses',
    roles: ADMIN,
    page: lazyPage(ADMIN, () => import('./pages/admin/PressesPage'), 'PressesPage'),
  },
  {
    path: '/admin/devices',
    roles: ADMIN,
    page: lazyPage(ADMIN, () => import('./pages/admin/DevicesPage'), 'DevicesPage'),
  },
  {
    path: '/admin/mail',
    roles: ADMIN,
    page: lazyPage(ADMIN, () => import('./pages/admin/MailPage'), 'MailPage'),
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
    path: '/admin/devices',
    roles: ADMIN,
    label: 'Devices',
    icon: tabletLandscapeOutline,
    section: 'Administration',
  },
  {
    path: '/admin/mail',
    roles: ADMIN,
    label: 'Mail',
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

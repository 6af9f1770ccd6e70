import { lazy, Suspense, type ComponentType, type ReactElement } from 'react';
import { Navigate, Route } from 'react-router-dom';

/*
 * The quality engineer's desk. Every screen is its own chunk, loaded when first opened, so none
 * of it (nor recharts or papaparse) enters the inspector's initial bundle.
 */

type Loader = () => Promise<{ default: ComponentType }>;

const loaders: [path: string, load: Loader][] = [
  ['/desk/compounds', () => import('./CompoundsPage')],
  ['/desk/compounds/:compoundId', () => import('./CompoundPage')],
  ['/desk/compounds/:compoundId/fit', () => import('./FitPage')],
  ['/desk/formulas', () => import('./FormulaModelsPage')],
  ['/desk/aging', () => import('./AgingPage')],
  ['/desk/specs', () => import('./SpecsPage')],
  ['/desk/specs/:specId', () => import('./SpecPage')],
  ['/desk/trends', () => import('./TrendsPage')],
  ['/desk/reports', () => import('./ReportsPage')],
  ['/desk/reports/compounds/:compoundId/fits/:fitId', () => import('./FitReportPage')],
];

function Loading() {
  return <p style={{ padding: '2rem' }}>Opening the desk…</p>;
}

// Made once: a lazy component created per render would remount its page every time.
const pages = loaders.map(([path, load]) => ({ path, Page: lazy(load) }));

/** The desk's routes, for the quality role: `{deskRoutes(guard)}` inside the router outlet. */
export function deskRoutes(
  guard: (page: ReactElement) => ReactElement = (page) => page,
): ReactElement[] {
  return [
    <Route key="/desk" path="/desk" element={<Navigate to="/desk/compounds" replace />} />,
    ...pages.map(({ path, Page }) => (
      <Route
        key={path}
        path={path}
        element={guard(
          <Suspense fallback={<Loading />}>
            <Page />
          </Suspense>,
        )}
      />
    )),
  ];
}

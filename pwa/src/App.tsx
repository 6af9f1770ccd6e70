import { IonApp, IonRouterOutlet, IonSplitPane } from '@ionic/react';
import { IonReactRouter } from '@ionic/react-router';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useEffect } from 'react';
import { Route } from 'react-router-dom';
import { AppMenu } from './components/AppMenu';
import { SessionProvider, useSession } from './auth/session';
import { RequireRole } from './components/RequireRole';
import { SessionGate } from './components/SessionGate';
import { UpdatePrompt } from './components/UpdatePrompt';
import { requestPersistentStorage } from './offline/persist';
import { syncScheduler } from './offline/scheduler';
import { SetPinPage } from './pages/SetPinPage';
import { SignInPage } from './pages/SignInPage';
import { deskRoutes } from './pages/desk/routes';
import { DESK_ROLES, ROUTES } from './routes';

const queryClient = new QueryClient({
  defaultOptions: {
    // Server data on the review and admin pages; retries are the sync engine's job, not theirs.
    queries: { retry: 1, staleTime: 15_000, networkMode: 'always' },
  },
});

/** Routes start once the session is known, so every page can render its IonPage at once. */
function AppRoutes() {
  const { loaded } = useSession();
  if (!loaded) return null;
  return (
    <IonReactRouter>
      <IonSplitPane contentId="main" when="(min-width: 1100px)">
        <SessionGate />
        <AppMenu contentId="main" />
        <IonRouterOutlet id="main">
          <Route path="/sign-in" element={<SignInPage />} />
          <Route path="/pin" element={<SetPinPage />} />
          {ROUTES.map(({ path, roles, page: Page }) => (
            <Route
              key={path}
              path={path}
              element={
                <RequireRole roles={roles}>
                  <Page />
                </RequireRole>
              }
            />
          ))}
          {deskRoutes((page) => (
            <RequireRole roles={DESK_ROLES}>{page}</RequireRole>
          ))}
        </IonRouterOutlet>
      </IonSplitPane>
    </IonReactRouter>
  );
}

export default function App() {
  useEffect(() => {
    void requestPersistentStorage();
    syncScheduler.start();
    return () => syncScheduler.stop();
  }, []);

  return (
    <QueryClientProvider client={queryClient}>
      <IonApp>
        <SessionProvider>
          <AppRoutes />
        </SessionProvider>
        <UpdatePrompt />
      </IonApp>
    </QueryClientProvider>
  );
}

import { IonApp, IonRouterOutlet } from '@ionic/react';
import { IonReactRouter } from '@ionic/react-router';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { Route } from 'react-router-dom';
import { UpdatePrompt } from './components/UpdatePrompt';
import { ShellHomePage } from './pages/ShellHomePage';

const queryClient = new QueryClient();

export default function App() {
  return (
    <QueryClientProvider client={queryClient}>
      <IonApp>
        <IonReactRouter>
          <IonRouterOutlet>
            <Route path="/" element={<ShellHomePage />} />
          </IonRouterOutlet>
        </IonReactRouter>
        <UpdatePrompt />
      </IonApp>
    </QueryClientProvider>
  );
}

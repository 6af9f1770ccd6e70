import { IonContent, IonHeader, IonPage, IonTitle, IonToolbar } from '@ionic/react';

export function ShellHomePage() {
  return (
    <IonPage>
      <IonHeader>
        <IonToolbar>
          <IonTitle>Gumshoe</IonTitle>
        </IonToolbar>
      </IonHeader>
      <IonContent className="ion-padding">
        <h1 data-testid="app-title">Gumshoe</h1>
        <p>Checks molded rubber parts at the press, online or off.</p>
      </IonContent>
    </IonPage>
  );
}

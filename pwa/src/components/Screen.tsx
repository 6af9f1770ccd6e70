import {
  IonBackButton,
  IonButtons,
  IonContent,
  IonFooter,
  IonHeader,
  IonMenuButton,
  IonPage,
  IonTitle,
  IonToolbar,
} from '@ionic/react';
import type { ReactNode } from 'react';
import { StatusStrip } from './StatusStrip';

interface ScreenProps {
  title: string;
  /** Where the back arrow leads when there is no history (a reload, a link from outside). */
  back?: string;
  actions?: ReactNode;
  children: ReactNode;
}

/** The frame of every signed-in screen: title bar, content, and the sync status strip. */
export function Screen({ title, back, actions, children }: ScreenProps) {
  return (
    <IonPage>
      <IonHeader>
        <IonToolbar>
          <IonButtons slot="start">
            {back ? <IonBackButton defaultHref={back} text="" /> : <IonMenuButton />}
          </IonButtons>
          <IonTitle>{title}</IonTitle>
          {actions && <IonButtons slot="end">{actions}</IonButtons>}
        </IonToolbar>
      </IonHeader>
      <IonContent className="ion-padding">{children}</IonContent>
      <IonFooter>
        <StatusStrip />
      </IonFooter>
    </IonPage>
  );
}

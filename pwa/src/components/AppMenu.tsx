import {
  IonButton,
  IonContent,
  IonHeader,
  IonIcon,
  IonItem,
  IonLabel,
  IonList,
  IonListHeader,
  IonMenu,
  IonMenuToggle,
  IonSegment,
  IonSegmentButton,
  IonTitle,
  IonToolbar,
  useIonAlert,
} from '@ionic/react';
import { useLocation, useNavigate } from 'react-router-dom';
import { leaveDevice, setUnits, useSession } from '../auth/session';
import { signOut } from '../auth/tokens';
import type { UnitSystem } from '../offline/db';
import { navFor, type NavEntry } from '../routes';
import { useColorScheme, type ColorScheme } from '../theme/colorScheme';
import './app-menu.css';

const SECTIONS: NavEntry['section'][] = ['Work', 'Desk', 'Administration'];

/** Side menu: the person's pages by role, their units, the theme, and handing over the tablet. */
export function AppMenu({ contentId }: { contentId: string }) {
  const { person } = useSession();
  const { pathname } = useLocation();
  const navigate = useNavigate();
  const [scheme, setScheme] = useColorScheme();
  const [confirm] = useIonAlert();
  const entries = person ? navFor(person.role) : [];

  const handOver = async () => {
    await leaveDevice();
    navigate('/sign-in', { replace: true });
  };
  const askSignOut = () => {
    if (!person) return;
    void confirm({
      header: `Sign ${person.name} out?`,
      message:
        'Their tokens and PIN are removed from this tablet. Records they made stay here until ' +
        'they reach the server.',
      buttons: [
        { text: 'Keep signed in', role: 'cancel' },
        {
          text: 'Sign out',
          role: 'destructive',
          handler: () => void signOut(person.userId).then(handOver),
        },
      ],
    });
  };

  return (
    <IonMenu contentId={contentId} disabled={!person} className="app-menu">
      <IonHeader>
        <IonToolbar>
          <IonTitle>Gumshoe</IonTitle>
        </IonToolbar>
      </IonHeader>
      <IonContent>
        {SECTIONS.map((section) => {
          const inSection = entries.filter((entry) => entry.section === section);
          if (inSection.length === 0) return null;
          return (
            <IonList key={section}>
              <IonListHeader>{section}</IonListHeader>
              {inSection.map(({ path, label, icon }) => (
                <IonMenuToggle key={path} autoHide={false}>
                  <IonItem
                    button
                    routerLink={path}
                    detail={false}
                    color={pathname.startsWith(path) ? 'light' : undefined}
                  >
                    <IonIcon icon={icon} slot="start" aria-hidden />
                    <IonLabel>{label}</IonLabel>
                  </IonItem>
                </IonMenuToggle>
              ))}
            </IonList>
          );
        })}
        {person && (
          <div className="app-menu-person">
            <p>
              <strong data-testid="current-person">{person.name}</strong>
              <br />
              {person.role}
            </p>
            <p className="app-menu-label">Units</p>
            <IonSegment
              value={person.units}
              onIonChange={(e) => void setUnits(person.userId, e.detail.value as UnitSystem)}
            >
              <IonSegmentButton value="metric">mm · N</IonSegmentButton>
              <IonSegmentButton value="imperial">in · lbf</IonSegmentButton>
            </IonSegment>
            <p className="app-menu-label">Theme</p>
            <IonSegment
              value={scheme}
              onIonChange={(e) => setScheme(e.detail.value as ColorScheme)}
            >
              <IonSegmentButton value="device">Auto</IonSegmentButton>
              <IonSegmentButton value="light">Light</IonSegmentButton>
              <IonSegmentButton value="dark">Dark</IonSegmentButton>
            </IonSegment>
            <IonMenuToggle autoHide={false}>
              <IonButton expand="block" onClick={() => void handOver()}>
                Hand over the tablet
              </IonButton>
            </IonMenuToggle>
            <IonButton expand="block" fill="outline" color="danger" onClick={askSignOut}>
              Sign out
            </IonButton>
          </div>
        )}
      </IonContent>
    </IonMenu>
  );
}

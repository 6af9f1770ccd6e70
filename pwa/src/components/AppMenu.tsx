import {
  IonButton,
  IonContent,
  IonHeader,
  IonIcon,
  IonMenu,
  IonMenuToggle,
  IonTitle,
  IonToolbar,
  useIonAlert,
} from '@ionic/react';
import { NavLink } from 'react-router-dom';
import { leaveDevice, setUnits, useSession } from '../auth/session';
import { signOut } from '../auth/tokens';
import type { UnitSystem } from '../offline/db';
import { navFor, type NavEntry } from '../routes';
import { useColorScheme, type ColorScheme } from '../theme/colorScheme';
import { Segmented } from './Segmented';
import { useGo } from './useGo';
import './app-menu.css';

const SECTIONS: NavEntry['section'][] = ['Work', 'Desk', 'Administration'];

const UNIT_CHOICES: { value: UnitSystem; label: string }[] = [
  { value: 'metric', label: 'mm · N' },
  { value: 'imperial', label: 'in · lbf' },
];

const SCHEME_CHOICES: { value: ColorScheme; label: string }[] = [
  { value: 'device', label: 'Auto' },
  { value: 'light', label: 'Light' },
  { value: 'dark', label: 'Dark' },
];

/** Side menu: the person's pages by role, their units, the theme, and handing over the tablet. */
export function AppMenu({ contentId }: { contentId: string }) {
  const { person } = useSession();
  const go = useGo();
  const [scheme, setScheme] = useColorScheme();
  const [confirm] = useIonAlert();
  const entries = person ? navFor(person.role) : [];

  const handOver = async () => {
    await leaveDevice();
    go.root('/sign-in');
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
        <nav aria-label="Pages">
          {SECTIONS.map((section) => {
            const inSection = entries.filter((entry) => entry.section === section);
            if (inSection.length === 0) return null;
            return (
              <div key={section} className="app-menu-section">
                <h2>{section}</h2>
                {inSection.map(({ path, label, icon }) => (
                  <IonMenuToggle key={path} autoHide={false}>
                    <NavLink to={path} className="app-menu-link">
                      <IonIcon icon={icon} aria-hidden />
                      {label}
                    </NavLink>
                  </IonMenuToggle>
                ))}
              </div>
            );
          })}
        </nav>
        {person && (
          <div className="app-menu-person">
            <p>
              <strong data-testid="current-person">{person.name}</strong>
              <br />
              {person.role}
            </p>
            <Segmented
              label="Units"
              value={person.units}
              options={UNIT_CHOICES}
              onChange={(units) => void setUnits(person.userId, units)}
            />
            <Segmented label="Theme" value={scheme} options={SCHEME_CHOICES} onChange={setScheme} />
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

import {
  IonButtons,
  IonContent,
  IonHeader,
  IonMenuButton,
  IonPage,
  IonTitle,
  IonToolbar,
} from '@ionic/react';
import type { ReactNode } from 'react';
import { NavLink } from 'react-router-dom';
import './desk.css';

const SECTIONS = [
  { to: '/desk/compounds', label: 'Compounds' },
  { to: '/desk/formulas', label: 'Formula models' },
  { to: '/desk/aging', label: 'Set and aging' },
  { to: '/desk/specs', label: 'Part specs' },
  { to: '/desk/trends', label: 'Trends' },
  { to: '/desk/reports', label: 'Reports' },
];

interface Props {
  title: string;
  children: ReactNode;
}

/** Every desk screen: the desk's own sections along the top, the screen's work below. */
export function DeskLayout({ title, children }: Props) {
  return (
    <IonPage>
      <IonHeader>
        <IonToolbar>
          <IonButtons slot="start">
            <IonMenuButton />
          </IonButtons>
          <IonTitle>Quality desk · {title}</IonTitle>
        </IonToolbar>
      </IonHeader>
      <IonContent>
        <div className="desk">
          <nav className="desk-nav" aria-label="Desk sections">
            {SECTIONS.map((section) => (
              <NavLink key={section.to} to={section.to}>
                {section.label}
              </NavLink>
            ))}
          </nav>
          <main className="desk-main">{children}</main>
        </div>
      </IonContent>
    </IonPage>
  );
}

import { IonContent, IonPage } from '@ionic/react';
import { useEffect, useState } from 'react';
import { makeCurrent, usePeopleWithPin, useSession } from '../auth/session';
import type { DevicePerson } from '../offline/db';
import { syncScheduler } from '../offline/scheduler';
import { homeFor } from '../routes';
import { useGo } from '../components/useGo';
import { PasswordSignIn } from '../components/signin/PasswordSignIn';
import { PinSwitch } from '../components/signin/PinSwitch';
import '../components/signin/sign-in.css';

/**
 * Two ways in: a password (needs the server, and registers the person on this tablet), or a
 * PIN for someone who signed in here before (works offline, checked on the device).
 */
export function SignInPage() {
  const { root } = useGo();
  const { person: current } = useSession();
  const people = usePeopleWithPin();
  const [switching, setSwitching] = useState<DevicePerson>();
  const [arriving, setArriving] = useState<string>();

  // Move on only once the session shows the new person, so no page sees a stale session.
  useEffect(() => {
    if (!arriving || current?.userId !== arriving) return;
    root(current.pinHash ? homeFor(current.role) : '/pin');
  }, [arriving, current, root]);

  const enter = async (person: DevicePerson) => {
    await makeCurrent(person.userId);
    void syncScheduler.syncNow();
    setArriving(person.userId);
  };

  return (
    <IonPage>
      <IonContent className="ion-padding">
        <div className="sign-in">
          <header className="sign-in-brand">
            <img src="/icon.svg" alt="" width={72} height={72} />
            <div>
              <h1>Gumshoe</h1>
              <p>Part checks at the press</p>
            </div>
          </header>
          {people.length > 0 && (
            <section className="sign-in-panel" aria-labelledby="on-tablet">
              <h2 id="on-tablet">On this tablet</h2>
              {switching ? (
                <PinSwitch
                  person={switching}
                  onSwitched={() => void enter(switching)}
                  onCancel={() => setSwitching(undefined)}
                />
              ) : (
                <div className="person-tiles">
                  {people.map((person) => (
                    <button
                      key={person.userId}
                      type="button"
                      className="person-tile"
                      onClick={() => setSwitching(person)}
                    >
                      <strong>{person.name}</strong>
                      <span>{person.role}</span>
                    </button>
                  ))}
                </div>
              )}
            </section>
          )}
          <section className="sign-in-panel" aria-labelledby="with-password">
            <h2 id="with-password">Sign in with a password</h2>
            <PasswordSignIn onSignedIn={(person) => void enter(person)} />
          </section>
        </div>
      </IonContent>
    </IonPage>
  );
}

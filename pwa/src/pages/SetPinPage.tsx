import { IonButton, IonContent, IonPage } from '@ionic/react';
import { useState } from 'react';
import { setPin } from '../auth/pin';
import { useSession } from '../auth/session';
import { PinPad } from '../components/PinPad';
import { useGo } from '../components/useGo';
import { homeFor } from '../routes';
import '../components/signin/sign-in.css';

/** Right after a first password sign-in: a PIN lets this person switch back in, offline too. */
export function SetPinPage() {
  const { person } = useSession();
  const { root } = useGo();
  const [first, setFirst] = useState<string>();
  const [message, setMessage] = useState<string>();
  if (!person) return null;
  const home = homeFor(person.role);

  const submit = async (pin: string) => {
    if (!first) {
      setFirst(pin);
      setMessage(undefined);
      return;
    }
    if (pin !== first) {
      setFirst(undefined);
      setMessage('The two PINs differ. Start again.');
      return;
    }
    await setPin(person.userId, pin);
    root(home);
  };

  return (
    <IonPage>
      <IonContent className="ion-padding">
        <div className="sign-in">
          <section className="sign-in-panel">
            <h1>Choose a PIN, {person.name}</h1>
            <p>
              With a PIN of 4 to 8 digits you can switch back to yourself on this tablet, even
              without a connection. It is kept on this tablet only, as a hash.
            </p>
            <PinPad
              key={first ? 'confirm' : 'choose'}
              label={first ? 'Type it again' : 'New PIN'}
              submitLabel={first ? 'Save PIN' : 'Next'}
              message={message}
              onSubmit={(pin) => void submit(pin)}
            />
            <IonButton fill="clear" onClick={() => root(home)}>
              Not now
            </IonButton>
          </section>
        </div>
      </IonContent>
    </IonPage>
  );
}

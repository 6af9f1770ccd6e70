import { IonButton } from '@ionic/react';
import { useState } from 'react';
import { checkPin } from '../../auth/pin';
import type { DevicePerson } from '../../offline/db';
import { PinPad } from '../PinPad';

interface PinSwitchProps {
  person: DevicePerson;
  onSwitched(): void;
  onCancel(): void;
}

/** Switching back in by PIN: checked against the hash on the device, so no network is needed. */
export function PinSwitch({ person, onSwitched, onCancel }: PinSwitchProps) {
  const [message, setMessage] = useState<string>();
  const [busy, setBusy] = useState(false);

  const submit = async (pin: string) => {
    setBusy(true);
    const check = await checkPin(person.userId, pin);
    setBusy(false);
    if (check.outcome === 'ok') return onSwitched();
    if (check.outcome === 'locked') {
      setMessage('Too many wrong PINs. Sign in with your password.');
      return;
    }
    const left = check.triesLeft;
    setMessage(`Wrong PIN. ${left} ${left === 1 ? 'try' : 'tries'} left.`);
  };

  return (
    <div className="pin-switch">
      <PinPad
        label={`PIN for ${person.name}`}
        submitLabel="Switch in"
        message={message}
        busy={busy}
        onSubmit={(pin) => void submit(pin)}
      />
      <IonButton fill="clear" onClick={onCancel}>
        Someone else
      </IonButton>
    </div>
  );
}

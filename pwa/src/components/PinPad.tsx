import { IonButton } from '@ionic/react';
import { useState } from 'react';
import './pin-pad.css';

interface PinPadProps {
  label: string;
  submitLabel: string;
  /** Shown under the field, e.g. "Wrong PIN, 3 tries left". */
  message?: string;
  busy?: boolean;
  onSubmit(pin: string): void;
}

const KEYS = ['1', '2', '3', '4', '5', '6', '7', '8', '9'];

/** Large keys for gloved fingers; a real field beside them for a keyboard or a scanner wedge. */
export function PinPad({ label, submitLabel, message, busy, onSubmit }: PinPadProps) {
  const [pin, setPin] = useState('');
  const press = (digit: string) => setPin((current) => (current + digit).slice(0, 8));
  const submit = () => {
    if (pin.length < 4) return;
    onSubmit(pin);
    setPin('');
  };

  return (
    <form
      className="pin-pad"
      onSubmit={(event) => {
        event.preventDefault();
        submit();
      }}
    >
      <label>
        <span>{label}</span>
        <input
          type="password"
          inputMode="numeric"
          autoComplete="off"
          pattern="\d*"
          maxLength={8}
          value={pin}
          aria-label={label}
          data-testid="pin-input"
          onChange={(event) => setPin(event.target.value.replace(/\D/g, '').slice(0, 8))}
        />
      </label>
      {message && (
        <p className="pin-message" role="alert">
          {message}
        </p>
      )}
      <div className="pin-keys">
        {KEYS.map((key) => (
          <IonButton key={key} fill="outline" onClick={() => press(key)}>
            {key}
          </IonButton>
        ))}
        <IonButton fill="clear" onClick={() => setPin((current) => current.slice(0, -1))}>
          ⌫
        </IonButton>
        <IonButton fill="outline" onClick={() => press('0')}>
          0
        </IonButton>
        <IonButton type="submit" disabled={busy || pin.length < 4}>
          {submitLabel}
        </IonButton>
      </div>
    </form>
  );
}

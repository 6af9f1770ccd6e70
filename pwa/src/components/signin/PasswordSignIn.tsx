import { IonButton, IonSpinner } from '@ionic/react';
import { useState, type FormEvent } from 'react';
import { ApiError, NetworkError } from '../../api/http';
import { signIn } from '../../auth/tokens';
import type { DevicePerson } from '../../offline/db';
import { Field } from '../Field';

function problemWith(error: unknown): string {
  if (error instanceof ApiError && error.status === 401)
    return 'That email and password do not match.';
  if (error instanceof ApiError && error.status === 429) {
    return 'Too many tries. Wait a minute, then try again.';
  }
  if (error instanceof NetworkError) {
    return 'The plant server cannot be reached. Someone who signed in on this tablet before can switch in with their PIN.';
  }
  return error instanceof ApiError ? error.reason : 'Sign-in failed.';
}

/**
 * Email and password. Plain state rather than react-hook-form: this is the first screen, and
 * two fields do not justify fetching the form library before the inspector's board.
 */
export function PasswordSignIn({ onSignedIn }: { onSignedIn(person: DevicePerson): void }) {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [missing, setMissing] = useState<{ email?: string; password?: string }>({});
  const [problem, setProblem] = useState<string>();
  const [busy, setBusy] = useState(false);

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const blanks = {
      email: email.trim() ? undefined : 'Enter your email.',
      password: password ? undefined : 'Enter your password.',
    };
    setMissing(blanks);
    if (blanks.email || blanks.password) return;
    setProblem(undefined);
    setBusy(true);
    try {
      onSignedIn(await signIn(email.trim(), password));
    } catch (error) {
      setProblem(problemWith(error));
    } finally {
      setBusy(false);
    }
  };

  return (
    <form className="sign-in-form" onSubmit={(event) => void submit(event)} noValidate>
      <Field label="Email" error={missing.email}>
        <input
          type="email"
          name="email"
          autoComplete="username"
          value={email}
          onChange={(event) => setEmail(event.target.value)}
        />
      </Field>
      <Field label="Password" error={missing.password}>
        <input
          type="password"
          name="password"
          autoComplete="current-password"
          value={password}
          onChange={(event) => setPassword(event.target.value)}
        />
      </Field>
      {problem && (
        <p className="field-error" role="alert">
          {problem}
        </p>
      )}
      <IonButton type="submit" expand="block" disabled={busy}>
        {busy ? <IonSpinner name="dots" /> : 'Sign in'}
      </IonButton>
    </form>
  );
}

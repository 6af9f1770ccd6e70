import { IonButton, IonSpinner } from '@ionic/react';
import { useForm } from 'react-hook-form';
import { useState } from 'react';
import { ApiError, NetworkError } from '../../api/http';
import { signIn } from '../../auth/tokens';
import type { DevicePerson } from '../../offline/db';
import { Field } from '../Field';

interface Credentials {
  email: string;
  password: string;
}

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

export function PasswordSignIn({ onSignedIn }: { onSignedIn(person: DevicePerson): void }) {
  const { register, handleSubmit, formState } = useForm<Credentials>();
  const [problem, setProblem] = useState<string>();

  const submit = handleSubmit(async ({ email, password }) => {
    setProblem(undefined);
    try {
      onSignedIn(await signIn(email.trim(), password));
    } catch (error) {
      setProblem(problemWith(error));
    }
  });

  return (
    <form className="sign-in-form" onSubmit={(event) => void submit(event)} noValidate>
      <Field label="Email" error={formState.errors.email?.message}>
        <input
          type="email"
          autoComplete="username"
          {...register('email', { required: 'Enter your email.' })}
        />
      </Field>
      <Field label="Password" error={formState.errors.password?.message}>
        <input
          type="password"
          autoComplete="current-password"
          {...register('password', { required: 'Enter your password.' })}
        />
      </Field>
      {problem && (
        <p className="field-error" role="alert">
          {problem}
        </p>
      )}
      <IonButton type="submit" expand="block" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? <IonSpinner name="dots" /> : 'Sign in'}
      </IonButton>
    </form>
  );
}

import type { ReactNode } from 'react';
import './field.css';

interface FieldProps {
  label: string;
  error?: string;
  hint?: ReactNode;
  children: ReactNode;
}

/** A labelled input with room for its error: big type and targets for use at arm's length. */
export function Field({ label, error, hint, children }: FieldProps) {
  return (
    <label className={error ? 'field field-invalid' : 'field'}>
      <span className="field-label">{label}</span>
      {children}
      {hint && <span className="field-hint">{hint}</span>}
      {error && (
        <span className="field-error" role="alert">
          {error}
        </span>
      )}
    </label>
  );
}

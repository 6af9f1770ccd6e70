import type { ReactNode } from 'react';

/** A failure the user has to act on, announced to screen readers as it appears. */
export function ErrorAlert({ children }: { children: ReactNode }) {
  return (
    <p className="desk-callout desk-callout--error" role="alert">
      {children}
    </p>
  );
}

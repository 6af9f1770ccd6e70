import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';

interface Props<T> {
  query: UseQueryResult<T>;
  what: string;
  children(data: T): ReactNode;
}

/** Loading and failure of one server read, said the same way on every desk screen. */
export function QueryState<T>({ query, what, children }: Props<T>) {
  if (query.isPending) {
    return <p className="desk-muted">Fetching {what}…</p>;
  }
  if (query.isError) {
    return (
      <p className="desk-callout desk-callout--error" role="alert">
        Could not fetch {what}: {query.error.message}
      </p>
    );
  }
  return <>{children(query.data)}</>;
}

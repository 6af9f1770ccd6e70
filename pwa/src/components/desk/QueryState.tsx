import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { ErrorAlert } from './ErrorAlert';

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
      <ErrorAlert>
        Could not fetch {what}: {query.error.message}
      </ErrorAlert>
    );
  }
  return <>{children(query.data)}</>;
}

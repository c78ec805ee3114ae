import type { ReactNode } from 'react';
import { EmptyState } from './empty-state.js';
import { ErrorState } from './error-state.js';
import { LoadingState } from './loading-state.js';

/** The parts of a TanStack Query result this switch reads. */
export interface QueryLike<T> {
  isPending: boolean;
  isError: boolean;
  error: Error | null;
  data: T | undefined;
  refetch: () => unknown;
}

export interface QueryStateProps<T> {
  query: QueryLike<T>;
  /** Words for the spinner ("Loading the groups"), or a skeleton shaped like the content. */
  loading: string | ReactNode;
  /**
   * The failure in words: a title (the query's own message and a retry follow), or a render
   * function for a failure that needs its own screen (a 404 page).
   */
  error: string | ((error: Error, retry: () => void) => ReactNode);
  /** True when the answer has nothing to show; `empty` is shown instead of the content. */
  isEmpty?: (data: T) => boolean;
  /** A title for the empty state, or the whole empty screen (it may depend on the answer). */
  empty?: string | ((data: T) => ReactNode);
  /**
   * Keep showing earlier data when a refetch fails (the caller says so in a banner), instead of
   * replacing it with the error. Off by default: an error replaces the content.
   */
  keepDataOnError?: boolean;
  children: (data: T) => ReactNode;
}

/**
 * One switch for a query's loading, error, empty and content states, so every page says each the
 * same way: a spinner with words, the failure in words with "Try again", a plain empty message.
 */
export function QueryState<T>({
  query,
  loading,
  error,
  isEmpty,
  empty,
  keepDataOnError = false,
  children,
}: QueryStateProps<T>) {
  const retry = () => void query.refetch();
  if (query.isPending) return <>{typeof loading === 'string' ? <LoadingState label={loading} /> : loading}</>;
  if (query.isError && query.error && (query.data === undefined || !keepDataOnError)) {
    return (
      <>
        {typeof error === 'string' ? (
          <ErrorState title={error} message={query.error.message} onRetry={retry} />
        ) : (
          error(query.error, retry)
        )}
      </>
    );
  }
  const data = query.data as T;
  if (isEmpty?.(data)) {
    if (typeof empty === 'function') return <>{empty(data)}</>;
    if (empty) return <EmptyState title={empty} />;
  }
  return <>{children(data)}</>;
}

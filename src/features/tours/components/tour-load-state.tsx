import type { UseQueryResult } from '@tanstack/react-query';
import { ErrorState } from '@/components/error-state';
import { Loading } from '@/components/spinner';
import { isApiError } from '@/lib/api';
import { TourNotFound } from './tour-not-found';

/**
 * What a page built on one tour shows until the tour is there: a spinner (as wide as the page
 * will be, so nothing jumps), "Tour not found" for a 404, or the error with a way to try again.
 * Pages render it while their query has not succeeded.
 */
export function TourLoadState({ query, width }: { query: Pick<UseQueryResult, 'isError' | 'error' | 'refetch'>; width: 'max-w-3xl' | 'max-w-6xl' | 'max-w-7xl' }) {
  if (!query.isError) {
    return (
      <div className={`mx-auto ${width} px-4 sm:px-6`}>
        <Loading label="Loading the tour…" />
      </div>
    );
  }
  if (isApiError(query.error) && query.error.status === 404) return <TourNotFound />;
  return (
    <div className="mx-auto max-w-3xl px-4 sm:px-6">
      <ErrorState title="The tour could not be loaded" error={query.error} onRetry={() => void query.refetch()} />
    </div>
  );
}

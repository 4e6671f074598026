import { useParams, type LoaderFunctionArgs } from 'react-router';
import { authorPageQueryOptions } from '@/features/tours/api/watch-api';
import { AuthorPage } from '@/features/tours/components/author-page';
import { pageFromParams } from '@/features/tours/lib/page-param';
import { NotFoundRoute } from './not-found';
import { queryClient } from '@/lib/query-client';

function authorIdOf(raw: string | undefined): number | null {
  if (!raw || !/^\d{1,9}$/.test(raw)) return null;
  const id = Number(raw);
  return id >= 1 ? id : null;
}

/** Fetches the author's page while its code is set up. */
export function authorLoader({ params, request }: LoaderFunctionArgs) {
  const id = authorIdOf(params.authorId);
  if (id) void queryClient.prefetchQuery(authorPageQueryOptions(id, pageFromParams(new URL(request.url).searchParams)));
  return null;
}

/** /authors/:authorId, open to everyone. */
export function AuthorRoute() {
  const id = authorIdOf(useParams().authorId);
  return id ? <AuthorPage key={id} authorId={id} /> : <NotFoundRoute />;
}

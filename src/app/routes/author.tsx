import { useParams, type LoaderFunctionArgs } from 'react-router';
import { authorPageQueryOptions } from '@/features/tours/api/watch-api';
import { AuthorPage } from '@/features/tours/components/author-page';
import { pageFromParams } from '@/lib/route-params';
import { queryClient } from '@/lib/query-client';
import { positiveIntParam } from '@/lib/route-params';
import { NotFoundRoute } from './not-found';

/** Fetches the author's page while its code is set up. */
export function authorLoader({ params, request }: LoaderFunctionArgs) {
  const id = positiveIntParam(params.authorId);
  if (id) void queryClient.prefetchQuery(authorPageQueryOptions(id, pageFromParams(new URL(request.url).searchParams)));
  return null;
}

/** /authors/:authorId, open to everyone. */
export function AuthorRoute() {
  const id = positiveIntParam(useParams().authorId);
  return id ? <AuthorPage key={id} authorId={id} /> : <NotFoundRoute />;
}

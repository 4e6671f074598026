import { useParams, type LoaderFunctionArgs } from 'react-router';
import { hasRole } from '@shared/schemas/common';
import { cultivarIndexQueryOptions, cultivarQueryOptions } from '@/features/cultivars/api/cultivars-api';
import { CultivarIndexPage } from '@/features/cultivars/components/cultivar-index-page';
import { CultivarRecordPage } from '@/features/cultivars/components/cultivar-record-page';
import { ProposePage } from '@/features/cultivars/components/propose-page';
import { apiQueryFromFilters, filtersFromParams } from '@/features/cultivars/lib/index-params';
import { meQueryOptions } from '@/lib/auth';
import { queryClient } from '@/lib/query-client';
import { RequireUser } from '../guards';

/** Starts loading the index page the address asks for. */
export function cultivarIndexLoader({ request }: LoaderFunctionArgs) {
  const me = queryClient.getQueryData(meQueryOptions().queryKey);
  const filters = filtersFromParams(new URL(request.url).searchParams, hasRole(me?.role, 'moderator'));
  void queryClient.prefetchQuery(cultivarIndexQueryOptions(apiQueryFromFilters(filters)));
  return null;
}

/** Starts loading the record while the page's code is set up. */
export function cultivarLoader({ params }: LoaderFunctionArgs) {
  if (params.slug) void queryClient.prefetchQuery(cultivarQueryOptions(params.slug));
  return null;
}

/** /cultivars, open to everyone. */
export function CultivarIndexRoute() {
  return <CultivarIndexPage />;
}

/** /cultivars/:slug, open to everyone (proposals only to their proposer and moderators). */
export function CultivarRoute() {
  const slug = useParams().slug ?? '';
  return <CultivarRecordPage key={slug} slug={slug} />;
}

/** /cultivars/new, for authors and above (the server enforces it). */
export function NewCultivarRoute() {
  return <RequireUser role="author">{() => <ProposePage />}</RequireUser>;
}

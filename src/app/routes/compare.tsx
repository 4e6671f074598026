import type { LoaderFunctionArgs } from 'react-router';
import { compareQueryOptions } from '@/features/compare/api/compare-api';
import { ComparePage } from '@/features/compare/components/compare-page';
import { parseCompareIds } from '@/features/compare/lib/compare-ids';
import { queryClient } from '@/lib/query-client';

/** Starts loading the comparison the address asks for while the page's code is set up. */
export function compareLoader({ request }: LoaderFunctionArgs) {
  const { ids, status } = parseCompareIds(new URL(request.url).searchParams.get('ids'));
  if (status === 'ok') void queryClient.prefetchQuery(compareQueryOptions(ids));
  return null;
}

/** /compare?ids=…, side by side, open to everyone. */
export function CompareRoute() {
  return <ComparePage />;
}

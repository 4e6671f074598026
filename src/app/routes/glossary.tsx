import type { LoaderFunctionArgs } from 'react-router';
import { glossaryQueryOptions } from '@/features/glossary/api/glossary-api';
import { GlossaryPage } from '@/features/glossary/components/glossary-page';
import { letterParam } from '@/features/glossary/lib/glossary-words';
import { queryClient } from '@/lib/query-client';

/** Starts loading the glossary view the address asks for. */
export function glossaryLoader({ request }: LoaderFunctionArgs) {
  const params = new URL(request.url).searchParams;
  void queryClient.prefetchQuery(glossaryQueryOptions((params.get('q') ?? '').trim(), letterParam(params.get('letter'))));
  return null;
}

/** /glossary, open to everyone. */
export function GlossaryRoute() {
  return <GlossaryPage />;
}

import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { glossaryResponseSchema, type GlossaryResponse } from '@shared/schemas/glossary';
import { api } from '@/lib/api';
import { glossaryKeys } from './glossary-keys';

/** The A–Z bar and the entries for a search (fuzzy on the server) and/or a letter. */
export function fetchGlossary(q: string, letter: string, signal?: AbortSignal): Promise<GlossaryResponse> {
  return api.get('/api/glossary', { query: { q, letter }, schema: glossaryResponseSchema, signal });
}

/** Query options for one glossary view. */
export function glossaryQueryOptions(q: string, letter: string) {
  return queryOptions({ queryKey: glossaryKeys.list(q, letter), queryFn: ({ signal }) => fetchGlossary(q, letter, signal), placeholderData: keepPreviousData });
}

/** The glossary as the address asks for it. */
export function useGlossary(q: string, letter: string) {
  return useQuery(glossaryQueryOptions(q, letter));
}

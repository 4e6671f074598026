import type { CultivarIndexQuery } from '@shared/schemas/cultivars';

/** Cache keys of cultivar records: index pages per filter set, one record per slug, its look-alikes. */
export const cultivarKeys = {
  all: ['cultivars'] as const,
  lists: () => [...cultivarKeys.all, 'list'] as const,
  list: (q: Partial<CultivarIndexQuery>) => [...cultivarKeys.lists(), q] as const,
  details: () => [...cultivarKeys.all, 'detail'] as const,
  detail: (idOrSlug: string) => [...cultivarKeys.details(), idOrSlug] as const,
  lookalikes: (idOrSlug: string) => [...cultivarKeys.all, 'lookalikes', idOrSlug] as const,
};

/** Cache keys of "where to see it": one entry per record, order and page. */
export const whereToSeeKeys = {
  all: ['where-to-see'] as const,
  list: (slug: string, order: 'oldest' | 'newest', page: number) => [...whereToSeeKeys.all, slug, order, page] as const,
};

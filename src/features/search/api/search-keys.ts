/** Cache keys of the site search: one entry per search text and page. */
export const searchKeys = {
  all: ['search'] as const,
  results: (q: string, page: number) => [...searchKeys.all, q, page] as const,
};

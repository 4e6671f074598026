/** Cache keys of side by side: one comparison per id list. */
export const compareKeys = {
  all: ['compare'] as const,
  details: () => [...compareKeys.all, 'detail'] as const,
  detail: (ids: readonly number[]) => [...compareKeys.details(), ids.join(',')] as const,
};

import type { FinderRequestBody } from './finder-api';

/** Cache keys of the tree finder: one result per request body, look-alikes per record. */
export const finderKeys = {
  all: ['finder'] as const,
  results: () => [...finderKeys.all, 'result'] as const,
  result: (body: FinderRequestBody) => [...finderKeys.results(), body] as const,
  lookalikes: (id: number) => [...finderKeys.all, 'lookalikes', id] as const,
};

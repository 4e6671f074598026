/** Paging of a tours list as sent to the API. */
export interface TourListParams {
  page: number;
  pageSize: number;
}

/**
 * Cache keys for tours: public lists and the author's own list hang under `lists()`, one tour
 * and its transcode status under `detail(id)`, so a change can refresh exactly what it touched.
 */
export const tourKeys = {
  all: ['tours'] as const,
  lists: () => [...tourKeys.all, 'list'] as const,
  publicList: (params: TourListParams) => [...tourKeys.lists(), 'public', params] as const,
  mine: () => [...tourKeys.lists(), 'mine'] as const,
  mineList: (params: TourListParams) => [...tourKeys.mine(), params] as const,
  details: () => [...tourKeys.all, 'detail'] as const,
  detail: (id: number) => [...tourKeys.details(), id] as const,
  job: (id: number) => [...tourKeys.detail(id), 'job'] as const,
};

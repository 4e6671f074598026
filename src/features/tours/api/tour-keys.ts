/** Paging of a tours list as sent to the API, with the browse filters of the public list. */
export interface TourListParams {
  page: number;
  pageSize: number;
  author?: number;
  garden?: string;
  cultivar?: string;
  group?: string;
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
  /** Everyone with a published tour (the browse filter's author choices): a list, so publishing refreshes it. */
  authorList: () => [...tourKeys.lists(), 'authors'] as const,
  mineList: (params: TourListParams) => [...tourKeys.mine(), params] as const,
  details: () => [...tourKeys.all, 'detail'] as const,
  detail: (id: number) => [...tourKeys.details(), id] as const,
  job: (id: number) => [...tourKeys.detail(id), 'job'] as const,
  /** The tour page's one request (tour, stops with tree cards, caption tracks). */
  watch: (id: number) => [...tourKeys.detail(id), 'watch'] as const,
  /** Cues of a caption track for the transcript; the version makes an edited track a new entry. */
  trackCues: (trackId: number, version: number) => [...tourKeys.all, 'track-cues', trackId, version] as const,
  /** The cultivar record a browse filter names (for its printed name). */
  browseRecord: (slug: string) => [...tourKeys.all, 'browse-record', slug] as const,
  authors: () => [...tourKeys.all, 'author'] as const,
  author: (id: number, page: number) => [...tourKeys.authors(), id, page] as const,
};

import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { storedCueSchema, trackSchema } from '@shared/schemas/captions';
import { authorListSchema, authorPageSchema, watchResponseSchema, type AuthorPage, type WatchResponse } from '@shared/schemas/watch';
import { api } from '@/lib/api';
import { tourKeys } from './tour-keys';

const trackCuesSchema = z.object({ track: trackSchema, cues: z.array(storedCueSchema) });
/** A caption track with its cues, as the transcript reads it. */
export type TrackCues = z.infer<typeof trackCuesSchema>;

/** Everything the tour page shows, in one request: the tour, its stops with tree cards and its caption tracks. */
export function fetchWatch(id: number, signal?: AbortSignal): Promise<WatchResponse> {
  return api.get(`/api/tours/${id}/watch`, { schema: watchResponseSchema, signal });
}

/** The cues of one caption track (the transcript beside the player). */
export function fetchTrackCues(trackId: number, signal?: AbortSignal): Promise<TrackCues> {
  return api.get(`/api/tracks/${trackId}`, { schema: trackCuesSchema, signal });
}

/** An author's public page: who they are and a page of their published tours. */
export function fetchAuthorPage(id: number, page: number, pageSize: number, signal?: AbortSignal): Promise<AuthorPage> {
  return api.get(`/api/authors/${id}`, { query: { page, pageSize }, schema: authorPageSchema, signal });
}

/** Query options for the tour page, shared by the page and its route loader. */
export function watchQueryOptions(id: number) {
  return queryOptions({ queryKey: tourKeys.watch(id), queryFn: ({ signal }) => fetchWatch(id, signal) });
}

/** Query options for a transcript; a track's cues only change with its version, which is in the key. */
export function trackCuesQueryOptions(trackId: number, version: number) {
  return queryOptions({ queryKey: tourKeys.trackCues(trackId, version), queryFn: ({ signal }) => fetchTrackCues(trackId, signal), staleTime: 5 * 60_000 });
}

/** Tours per page on an author's page. */
export const AUTHOR_TOURS_PAGE_SIZE = 12;

/** Everyone with a published tour, by name. */
export function authorListQueryOptions() {
  return queryOptions({
    queryKey: tourKeys.authorList(),
    queryFn: ({ signal }) => api.get('/api/authors', { schema: authorListSchema, signal }).then((r) => r.items),
    staleTime: 5 * 60_000,
  });
}

/** Query options for an author's page. */
export function authorPageQueryOptions(id: number, page: number) {
  return queryOptions({ queryKey: tourKeys.author(id, page), queryFn: ({ signal }) => fetchAuthorPage(id, page, AUTHOR_TOURS_PAGE_SIZE, signal) });
}

/** The tour page's data. */
export function useWatch(id: number) {
  return useQuery(watchQueryOptions(id));
}

/** The cues of the transcript's track, once there is one. */
export function useTrackCues(track: { id: number; version: number } | null) {
  return useQuery({ ...trackCuesQueryOptions(track?.id ?? 0, track?.version ?? 0), enabled: track != null });
}

/** An author's page. */
export function useAuthorPage(id: number, page: number) {
  return useQuery(authorPageQueryOptions(id, page));
}

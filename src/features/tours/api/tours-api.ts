import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { z } from 'zod';
import {
  jobSummarySchema,
  tourPage,
  tourSchema,
  tourStateSchema,
  type JobSummary,
  type TourDto,
  type TourPage,
  type TourState,
  type UpdateTourInput,
} from '@shared/schemas/tours';
import { api } from '@/lib/api';
import { tourKeys, type TourListParams } from './tour-keys';

const tourResponse = z.object({ tour: tourSchema });
const jobResponse = z.object({ job: jobSummarySchema.nullable() });
const jobStatusSchema = z.object({ state: tourStateSchema, failureReason: z.string().nullable(), job: jobSummarySchema.nullable() });

/** What the status endpoint says about a tour's transcode. */
export type TourJobStatus = z.infer<typeof jobStatusSchema>;

/** How often the transcode status is asked for while a job is queued or running. */
export const JOB_POLL_MS = 1_000;

/** True while the tour's video is being prepared: a queued or running job, or the processing state. */
export function isBusy(state: TourState, job: JobSummary | null | undefined): boolean {
  return state === 'processing' || job?.state === 'queued' || job?.state === 'running';
}

/** Published tours, newest first, for everyone. */
export function fetchPublicTours(params: TourListParams, signal?: AbortSignal): Promise<TourPage> {
  return api.get('/api/tours', { query: { ...params }, schema: tourPage, signal });
}

/** The signed-in author's tours in every state, each with its latest transcode job. */
export function fetchMyTours(params: TourListParams, signal?: AbortSignal): Promise<TourPage> {
  return api.get('/api/tours', { query: { ...params, mine: '1' }, schema: tourPage, signal });
}

/** One tour as the viewer may see it (404 for drafts of others). */
export function fetchTour(id: number, signal?: AbortSignal): Promise<TourDto> {
  return api.get(`/api/tours/${id}`, { schema: tourResponse, signal }).then((r) => r.tour);
}

/** The transcode status of one tour (authors, moderators, admins). */
export function fetchTourJob(id: number, signal?: AbortSignal): Promise<TourJobStatus> {
  return api.get(`/api/tours/${id}/job`, { schema: jobStatusSchema, signal });
}

/** Saves changed details; the server sanitises the description. */
export function updateTour(id: number, input: UpdateTourInput): Promise<TourDto> {
  return api.patch(`/api/tours/${id}`, input, { schema: tourResponse }).then((r) => r.tour);
}

/** Makes a ready tour public, or takes a published one back to private. */
export function setPublished(id: number, publish: boolean): Promise<TourDto> {
  return api.post(`/api/tours/${id}/${publish ? 'publish' : 'unpublish'}`, undefined, { schema: tourResponse }).then((r) => r.tour);
}

/** Queues the transcode again, after a failure or to re-run it. */
export function retranscode(id: number): Promise<JobSummary | null> {
  return api.post(`/api/tours/${id}/transcode`, {}, { schema: jobResponse }).then((r) => r.job);
}

/** Deletes the tour with its video files. */
export function deleteTour(id: number): Promise<void> {
  return api.delete<void>(`/api/tours/${id}`);
}

/** Query options for a page of the public list; the old page stays on screen while the next loads. */
export function publicToursQueryOptions(params: TourListParams) {
  return queryOptions({
    queryKey: tourKeys.publicList(params),
    queryFn: ({ signal }) => fetchPublicTours(params, signal),
    placeholderData: keepPreviousData,
  });
}

/**
 * Query options for "My tours". While any tour on the page is being prepared the list asks again
 * every couple of seconds, so badges and percentages move without a reload; then it stops.
 */
export function myToursQueryOptions(params: TourListParams) {
  return queryOptions({
    queryKey: tourKeys.mineList(params),
    queryFn: ({ signal }) => fetchMyTours(params, signal),
    placeholderData: keepPreviousData,
    refetchInterval: (query) => (query.state.data?.items.some((t) => isBusy(t.state, t.job)) ? 2 * JOB_POLL_MS : false),
  });
}

/** Query options for one tour, shared by the pages and the route loaders that prefetch it. */
export function tourQueryOptions(id: number) {
  return queryOptions({ queryKey: tourKeys.detail(id), queryFn: ({ signal }) => fetchTour(id, signal) });
}

/** Query options for the transcode status; never cached as fresh, since it changes every second. */
export function tourJobQueryOptions(id: number) {
  return queryOptions({
    queryKey: tourKeys.job(id),
    queryFn: ({ signal }) => fetchTourJob(id, signal),
    staleTime: 0,
    refetchInterval: (query) => {
      const data = query.state.data;
      if (query.state.status === 'error') return false;
      return !data || isBusy(data.state, data.job) ? JOB_POLL_MS : false;
    },
  });
}

/** A page of published tours. */
export function usePublicTours(params: TourListParams) {
  return useQuery(publicToursQueryOptions(params));
}

/** How many tours are published, for the home page; undefined until known. */
export function usePublishedTourCount() {
  return useQuery({ ...publicToursQueryOptions({ page: 1, pageSize: 1 }), select: (page) => page.total });
}

/** A page of the signed-in author's tours. */
export function useMyTours(params: TourListParams) {
  return useQuery(myToursQueryOptions(params));
}

/** One tour. */
export function useTour(id: number) {
  return useQuery(tourQueryOptions(id));
}

function refreshTour(client: QueryClient, tour: TourDto) {
  client.setQueryData(tourKeys.detail(tour.id), tour);
  void client.invalidateQueries({ queryKey: tourKeys.lists() });
}

/**
 * Polls the transcode status of a tour while `enabled`, copies it into the cached tour so every
 * badge agrees, and reloads the tour once the job ends (the renditions and poster are new then).
 */
export function useTourJob(id: number, enabled: boolean) {
  const client = useQueryClient();
  const query = useQuery({ ...tourJobQueryOptions(id), enabled });
  const data = query.data;
  useEffect(() => {
    if (!data) return;
    const old = client.getQueryData<TourDto>(tourKeys.detail(id));
    if (!old) return;
    client.setQueryData<TourDto>(tourKeys.detail(id), { ...old, state: data.state, failureReason: data.failureReason, job: data.job });
    if (isBusy(old.state, old.job) && !isBusy(data.state, data.job)) {
      void client.invalidateQueries({ queryKey: tourKeys.detail(id), exact: true });
      void client.invalidateQueries({ queryKey: tourKeys.lists() });
    }
  }, [data, client, id]);
  return query;
}

/** Saves the details form. */
export function useUpdateTour(id: number) {
  const client = useQueryClient();
  return useMutation({ mutationFn: (input: UpdateTourInput) => updateTour(id, input), onSuccess: (tour) => refreshTour(client, tour) });
}

/** Publish / Unpublish. */
export function useSetPublished(id: number) {
  const client = useQueryClient();
  return useMutation({ mutationFn: (publish: boolean) => setPublished(id, publish), onSuccess: (tour) => refreshTour(client, tour) });
}

/** "Try again" after a failed transcode; the status poll picks the new job up at once. */
export function useRetranscode() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => retranscode(id),
    onSuccess: (_job, id) => {
      void client.invalidateQueries({ queryKey: tourKeys.detail(id) });
      void client.invalidateQueries({ queryKey: tourKeys.lists() });
    },
  });
}

/** Deletes a tour and forgets everything cached about it. */
export function useDeleteTour() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => deleteTour(id),
    onSuccess: (_v, id) => {
      client.removeQueries({ queryKey: tourKeys.detail(id) });
      void client.invalidateQueries({ queryKey: tourKeys.lists() });
    },
  });
}

/** Puts a tour the server just answered with (after an upload) into the cache. */
export function useRememberTour() {
  const client = useQueryClient();
  return (tour: TourDto) => refreshTour(client, tour);
}

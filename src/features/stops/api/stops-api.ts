import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { cultivarDetailSchema, type CultivarDetail } from '@shared/schemas/cultivars';
import { stopSchema, stopSuggestionSchema, type StopDto, type StopInput, type StopSuggestion, type UpdateStopInput } from '@shared/schemas/stops';
import { jobSummarySchema, type JobSummary } from '@shared/schemas/tours';
import { api } from '@/lib/api';
import { stopKeys } from './stop-keys';

const stopList = z.object({ items: z.array(stopSchema) });
const stopResponse = z.object({ stop: stopSchema });
const suggestionList = z.object({ items: z.array(stopSuggestionSchema) });
// The answer holds the record in full; the stop editor reads the detail part.
const proposedResponse = z.object({ cultivar: cultivarDetailSchema });
const jobResponse = z.object({ job: jobSummarySchema });

/** What a record proposal sends: the name parts only (a moderator completes the record). */
export interface ProposeRecordInput {
  genus: string;
  species: string | null;
  groupName: string | null;
  epithet: string;
}

/** The stops of a tour in time order. */
export function fetchStops(tourId: number, signal?: AbortSignal): Promise<StopDto[]> {
  return api.get(`/api/tours/${tourId}/stops`, { schema: stopList, signal }).then((r) => r.items);
}

/** Adds a stop (409 stop_overlap, 400 stop_past_end or cultivar_missing when a rule is broken). */
export function createStop(tourId: number, input: StopInput): Promise<StopDto> {
  return api.post(`/api/tours/${tourId}/stops`, input, { schema: stopResponse }).then((r) => r.stop);
}

/** Changes some fields of a stop under the same rules. */
export function updateStop(stopId: number, input: UpdateStopInput): Promise<StopDto> {
  return api.patch(`/api/stops/${stopId}`, input, { schema: stopResponse }).then((r) => r.stop);
}

/** Removes a stop. */
export function deleteStop(stopId: number): Promise<void> {
  return api.delete<void>(`/api/stops/${stopId}`);
}

/** Stops Grovewalk proposes from names heard in the captions of one language. */
export function fetchSuggestions(tourId: number, lang: string | null, signal?: AbortSignal): Promise<StopSuggestion[]> {
  return api.get(`/api/tours/${tourId}/stop-suggestions`, { query: { lang }, schema: suggestionList, signal }).then((r) => r.items);
}

/** Queues the re-transcode that puts keyframes at the stop starts (202 with the job). */
export function placeKeyframes(tourId: number): Promise<JobSummary> {
  return api.post(`/api/tours/${tourId}/keyframes`, {}, { schema: jobResponse }).then((r) => r.job);
}

/** Proposes a new record (approved at once only when a moderator proposes it). */
export function proposeRecord(input: ProposeRecordInput): Promise<CultivarDetail> {
  return api.post('/api/cultivars', input, { schema: proposedResponse }).then((r) => r.cultivar);
}

/** Query options for a tour's stops. */
export function stopsQueryOptions(tourId: number) {
  return queryOptions({ queryKey: stopKeys.list(tourId), queryFn: ({ signal }) => fetchStops(tourId, signal) });
}

/** Query options for the suggestions; always asked afresh, since captions and stops change under them. */
export function suggestionsQueryOptions(tourId: number, lang: string | null) {
  return queryOptions({ queryKey: stopKeys.suggestions(tourId, lang), queryFn: ({ signal }) => fetchSuggestions(tourId, lang, signal), staleTime: 0 });
}

/** A tour's stops. */
export function useStops(tourId: number) {
  return useQuery(stopsQueryOptions(tourId));
}

/** Suggested stops, only while `enabled` (the panel is open and a track exists). */
export function useStopSuggestions(tourId: number, lang: string | null, enabled: boolean) {
  return useQuery({ ...suggestionsQueryOptions(tourId, lang), enabled });
}

function useRefreshStops(tourId: number) {
  const client = useQueryClient();
  return () => {
    void client.invalidateQueries({ queryKey: stopKeys.list(tourId) });
    void client.invalidateQueries({ queryKey: stopKeys.allSuggestions(tourId) });
  };
}

/** "Add stop". */
export function useCreateStop(tourId: number) {
  const refresh = useRefreshStops(tourId);
  return useMutation({ mutationFn: (input: StopInput) => createStop(tourId, input), onSuccess: refresh });
}

/** Saving a stop's edits. */
export function useUpdateStop(tourId: number) {
  const refresh = useRefreshStops(tourId);
  return useMutation({ mutationFn: ({ stopId, input }: { stopId: number; input: UpdateStopInput }) => updateStop(stopId, input), onSuccess: refresh });
}

/** Deleting a stop. */
export function useDeleteStop(tourId: number) {
  const refresh = useRefreshStops(tourId);
  return useMutation({ mutationFn: (stopId: number) => deleteStop(stopId), onSuccess: refresh });
}

/** "Prepare the video again for exact jumps": a new transcode with keyframes at the stop starts. */
export function usePlaceKeyframes(tourId: number) {
  return useMutation({ mutationFn: () => placeKeyframes(tourId) });
}

/** "Propose a new cultivar record". */
export function useProposeRecord() {
  return useMutation({ mutationFn: proposeRecord });
}

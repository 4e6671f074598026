import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { trackDetailSchema, trackSchema, type StoredCue } from '@shared/schemas/captions';
import {
  acceptFixResponseSchema,
  detectionReportSchema,
  proposeFixResponseSchema,
  spellingFixDetailSchema,
  spellingFixPage,
  undoFixResponseSchema,
  type ProposeFixInput,
  type SpellingFixRow,
  type SpellingFixStatusName,
} from '@shared/schemas/spelling-fixes';
import { tourPage, tourSchema } from '@shared/schemas/tours';
import { api } from '@/lib/api';
import { buildPreview, type CuePreview } from '../lib/change-preview';
import { spellingKeys } from './spelling-keys';

/** Rows per page of the moderators' queue. */
export const QUEUE_PAGE_SIZE = 20;

const fixResponse = z.object({ fix: spellingFixDetailSchema });
const tracksResponse = z.object({ items: z.array(trackSchema) });

/** A viewer's flag: the words as the caption has them, the record they name, and the cue. */
export function proposeFix(input: ProposeFixInput) {
  return api.post('/api/spelling-fixes', input, { schema: proposeFixResponseSchema });
}

/** Query options for one page of the queue. */
export function fixesQueryOptions(status: SpellingFixStatusName, page: number) {
  return queryOptions({
    queryKey: spellingKeys.list(status, page),
    queryFn: ({ signal }) => api.get('/api/spelling-fixes', { query: { status, page, pageSize: QUEUE_PAGE_SIZE }, schema: spellingFixPage, signal }),
    placeholderData: keepPreviousData,
  });
}

/** Query options for one fix with its audit (moderators). */
export function fixQueryOptions(id: number) {
  return queryOptions({
    queryKey: spellingKeys.detail(id),
    queryFn: ({ signal }) => api.get(`/api/spelling-fixes/${id}`, { schema: fixResponse, signal }).then((r) => r.fix),
  });
}

/** Query options for a tour's details (the names page shows its title). */
export function tourQueryOptions(tourId: number) {
  return queryOptions({ queryKey: spellingKeys.tour(tourId), queryFn: ({ signal }) => api.get(`/api/tours/${tourId}`, { schema: z.object({ tour: tourSchema }), signal }).then((r) => r.tour) });
}

/** Query options for a tour's caption tracks. */
export function tracksQueryOptions(tourId: number) {
  return queryOptions({ queryKey: spellingKeys.tracks(tourId), queryFn: ({ signal }) => api.get(`/api/tours/${tourId}/tracks`, { schema: tracksResponse, signal }).then((r) => r.items) });
}

/** Query options for one track's cues, always fresh (a fix may just have rewritten them). */
export function trackQueryOptions(trackId: number) {
  return queryOptions({ queryKey: spellingKeys.track(trackId), queryFn: ({ signal }) => api.get(`/api/tracks/${trackId}`, { schema: trackDetailSchema, signal }), staleTime: 0 });
}

/** The moderators' queue. */
export function useFixes(status: SpellingFixStatusName, page: number) {
  return useQuery(fixesQueryOptions(status, page));
}

/** One fix for the detail panel. */
export function useFix(id: number | null) {
  return useQuery({ ...fixQueryOptions(id ?? 0), enabled: id !== null });
}

/** A tour's title and state. */
export function useTour(tourId: number) {
  return useQuery(tourQueryOptions(tourId));
}

/** A tour's caption tracks. */
export function useTracks(tourId: number) {
  return useQuery(tracksQueryOptions(tourId));
}

/** One track's cues. */
export function useTrack(trackId: number | null) {
  return useQuery({ ...trackQueryOptions(trackId ?? 0), enabled: trackId !== null });
}

// The preview reads published tours a page at a time until it has found every tour the fix names.
const TOUR_PAGE = 100;
const TOUR_PAGES_MAX = 20;

/**
 * The captions an open fix would change, with before and after, for the moderator to check
 * before accepting. The queue names the affected tours (up to five titles); their caption tracks
 * are read and every cue is run through the same replacement the server's accept runs
 * (shared/names/replace.ts). Tours that are not published cannot be read here, so the preview
 * says how many of the server's occurrences it could show.
 */
export async function fetchOpenFixPreview(fix: SpellingFixRow, signal?: AbortSignal): Promise<CuePreview[]> {
  const wanted = new Set(fix.toursAffected.titles);
  const tours: { id: number; title: string }[] = [];
  for (let page = 1; page <= TOUR_PAGES_MAX && tours.length < wanted.size; page++) {
    const r = await api.get('/api/tours', { query: { page, pageSize: TOUR_PAGE }, schema: tourPage, signal });
    for (const t of r.items) if (wanted.has(t.title)) tours.push({ id: t.id, title: t.title });
    if (page * TOUR_PAGE >= r.total) break;
  }
  const out: CuePreview[] = [];
  for (const tour of tours) {
    const tracks = await api.get(`/api/tours/${tour.id}/tracks`, { schema: tracksResponse, signal });
    for (const track of tracks.items) {
      const detail = await api.get(`/api/tracks/${track.id}`, { schema: trackDetailSchema, signal });
      out.push(...previewsOfCues(detail.cues, fix, { tourId: tour.id, tourTitle: tour.title, trackId: track.id, trackLabel: track.label }));
    }
  }
  return out;
}

function previewsOfCues(cues: readonly StoredCue[], fix: SpellingFixRow, where: { tourId: number; tourTitle: string; trackId: number; trackLabel: string }): CuePreview[] {
  const out: CuePreview[] = [];
  for (const cue of cues) {
    const p = buildPreview(cue.text, fix.proposedText, fix.suggestion.epithet);
    if (p) out.push({ ...where, startMs: cue.startMs, ...p });
  }
  return out;
}

/** The preview of an open fix (only fetched while its detail is open). */
export function useOpenFixPreview(fix: SpellingFixRow | undefined) {
  return useQuery({
    queryKey: spellingKeys.preview(fix?.id ?? 0, fix?.proposedText ?? ''),
    queryFn: ({ signal }) => fetchOpenFixPreview(fix!, signal),
    enabled: fix !== undefined && fix.status === 'open',
    staleTime: 0,
  });
}

/** After a decision: the queue, the fix, and every caption this client has read are refreshed. */
function useFixChanged() {
  const queryClient = useQueryClient();
  return () => {
    void queryClient.invalidateQueries({ queryKey: spellingKeys.all });
    // Record pages show variants and where names are said; the glossary lists variants.
    void queryClient.invalidateQueries({ queryKey: ['cultivars'] });
    void queryClient.invalidateQueries({ queryKey: ['glossary'] });
  };
}

/** Flags a misspelt name. */
export function useProposeFix() {
  const changed = useFixChanged();
  return useMutation({ mutationFn: proposeFix, onSuccess: changed });
}

/** Accepts an open fix: every caption with the words is rewritten. */
export function useAcceptFix() {
  const changed = useFixChanged();
  return useMutation({ mutationFn: (id: number) => api.post(`/api/spelling-fixes/${id}/accept`, undefined, { schema: acceptFixResponseSchema }), onSuccess: changed });
}

/** Declines an open fix with a reason the proposer receives. */
export function useDeclineFix() {
  const changed = useFixChanged();
  return useMutation({ mutationFn: ({ id, reason }: { id: number; reason: string }) => api.post(`/api/spelling-fixes/${id}/decline`, { reason }, { schema: fixResponse }), onSuccess: changed });
}

/** Undoes an accepted fix (refused with undo_conflict when captions were edited since). */
export function useUndoFix() {
  const changed = useFixChanged();
  return useMutation({ mutationFn: (id: number) => api.post(`/api/spelling-fixes/${id}/undo`, undefined, { schema: undoFixResponseSchema }), onSuccess: changed });
}

/** Runs automatic detection over every caption; new fixes join the queue. */
export function useRunDetection() {
  const changed = useFixChanged();
  return useMutation({ mutationFn: () => api.post('/api/spelling-fixes/detect', {}, { schema: z.object({ report: detectionReportSchema }) }).then((r) => r.report), onSuccess: changed });
}

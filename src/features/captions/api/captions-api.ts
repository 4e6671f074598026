import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  importPreviewSchema,
  trackDetailSchema,
  trackSchema,
  transcriptSchema,
  type CreateTrackInput,
  type ImportPreview,
  type ImportTrackInput,
  type SaveCuesInput,
  type TrackDetail,
  type TrackDto,
  type Transcript,
} from '@shared/schemas/captions';
import { api, ApiError, apiErrorFrom, csrfHeader, forgetCsrfToken, withQuery } from '@/lib/api';
import { captionKeys } from './caption-keys';

const trackList = z.object({ items: z.array(trackSchema) });
const trackResponse = z.object({ track: trackSchema });

/** The caption tracks of a tour, in the order they were added. */
export function fetchTracks(tourId: number, signal?: AbortSignal): Promise<TrackDto[]> {
  return api.get(`/api/tours/${tourId}/tracks`, { schema: trackList, signal }).then((r) => r.items);
}

/** One track with its cues in playing order and the server's quality findings. */
export function fetchTrack(trackId: number, signal?: AbortSignal): Promise<TrackDetail> {
  return api.get(`/api/tracks/${trackId}`, { schema: trackDetailSchema, signal });
}

/** An empty track in a new language. */
export function createTrack(tourId: number, input: CreateTrackInput): Promise<TrackDto> {
  return api.post(`/api/tours/${tourId}/tracks`, input, { schema: trackResponse }).then((r) => r.track);
}

/** Stores the cues an author kept from a preview (409 track_exists unless `replace`). */
export function importTrack(tourId: number, input: ImportTrackInput): Promise<TrackDto> {
  return api.post(`/api/tours/${tourId}/tracks/import`, input, { schema: trackResponse }).then((r) => r.track);
}

/** The autosave: the whole list with the version it was based on (409 version_conflict when that moved on). */
export function saveCues(trackId: number, input: SaveCuesInput, signal?: AbortSignal): Promise<TrackDto> {
  return api.put(`/api/tracks/${trackId}/cues`, input, { schema: trackResponse, signal }).then((r) => r.track);
}

/** A new label for a track; its language stays. */
export function renameTrack(trackId: number, label: string): Promise<TrackDto> {
  return api.patch(`/api/tracks/${trackId}`, { label }, { schema: trackResponse }).then((r) => r.track);
}

/** Deletes a track and its cues. */
export function deleteTrack(trackId: number): Promise<void> {
  return api.delete<void>(`/api/tracks/${trackId}`);
}

/**
 * Sends a caption file to be read without storing anything. Multipart, so it goes around the JSON
 * helper, with the same CSRF header and error shape (and the same one retry with a fresh token).
 */
export async function previewCaptionFile(tourId: number, file: File, signal?: AbortSignal): Promise<ImportPreview> {
  const attempt = async (isRetry: boolean): Promise<ImportPreview> => {
    const body = new FormData();
    body.append('file', file, file.name);
    let res: Response;
    try {
      res = await fetch(`/api/tours/${tourId}/tracks/preview`, {
        method: 'POST',
        body,
        headers: { accept: 'application/json', ...(await csrfHeader()) },
        credentials: 'same-origin',
        signal,
      });
    } catch (error) {
      if (signal?.aborted) throw error;
      throw apiErrorFrom(0, '');
    }
    const text = await res.text();
    if (!res.ok) {
      const error = apiErrorFrom(res.status, text, res.headers.get('retry-after'));
      if (!isRetry && error.status === 403 && error.code === 'csrf_invalid') {
        forgetCsrfToken();
        return attempt(true);
      }
      throw error;
    }
    let parsed: unknown;
    try {
      parsed = JSON.parse(text);
    } catch {
      parsed = undefined;
    }
    const checked = importPreviewSchema.safeParse(parsed);
    if (!checked.success) throw new ApiError({ status: res.status, code: 'bad_response', message: 'The file was read, but the answer could not be shown. Try again.' });
    return checked.data;
  };
  return attempt(false);
}

/** The readable transcript of a tour; without `lang`, the first track. */
export function fetchTranscript(tourId: number, lang: string | null, signal?: AbortSignal): Promise<Transcript> {
  return api.get(`/api/tours/${tourId}/transcript`, { query: { lang }, schema: transcriptSchema, signal });
}

/** Where a track downloads as WebVTT or SRT (the server names the file). */
export function trackExportUrl(trackId: number, format: 'vtt' | 'srt'): string {
  return `/api/tracks/${trackId}/export.${format}`;
}

/** Where the stops of a tour download as a WebVTT chapters or metadata track. */
export function stopTrackUrl(tourId: number, kind: 'chapters' | 'metadata'): string {
  return `/api/tours/${tourId}/${kind}.vtt`;
}

/** The transcript page's own address, with a language when one is chosen. */
export function transcriptHref(tourId: number, lang?: string | null): string {
  return withQuery(`/tours/${tourId}/transcript`, { lang });
}

/** Query options for a tour's track list. */
export function tracksQueryOptions(tourId: number) {
  return queryOptions({ queryKey: captionKeys.tracks(tourId), queryFn: ({ signal }) => fetchTracks(tourId, signal) });
}

/**
 * Query options for one track in the editor. The editor copies the cues into its own state once,
 * so the cached copy is dropped as soon as nobody uses it and is never refetched behind its back.
 */
export function trackQueryOptions(trackId: number) {
  return queryOptions({
    queryKey: captionKeys.track(trackId),
    queryFn: ({ signal }) => fetchTrack(trackId, signal),
    gcTime: 0,
    staleTime: Infinity,
    refetchOnWindowFocus: false,
    refetchOnReconnect: false,
  });
}

/** Query options for a transcript in one language (null: the first track). */
export function transcriptQueryOptions(tourId: number, lang: string | null) {
  return queryOptions({ queryKey: captionKeys.transcript(tourId, lang), queryFn: ({ signal }) => fetchTranscript(tourId, lang, signal) });
}

/** The tracks of a tour. */
export function useTracks(tourId: number) {
  return useQuery(tracksQueryOptions(tourId));
}

/** One track for the editor. */
export function useTrack(trackId: number) {
  return useQuery(trackQueryOptions(trackId));
}

/** A transcript. */
export function useTranscript(tourId: number, lang: string | null) {
  return useQuery(transcriptQueryOptions(tourId, lang));
}

/** "New track". */
export function useCreateTrack(tourId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateTrackInput) => createTrack(tourId, input),
    onSuccess: () => void client.invalidateQueries({ queryKey: captionKeys.tracks(tourId) }),
  });
}

/** Import of a previewed file; the track list, the track and the transcripts change. */
export function useImportTrack(tourId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: ImportTrackInput) => importTrack(tourId, input),
    onSuccess: (track) => {
      void client.invalidateQueries({ queryKey: captionKeys.tracks(tourId) });
      client.removeQueries({ queryKey: captionKeys.track(track.id) });
      void client.invalidateQueries({ queryKey: captionKeys.transcripts(tourId) });
    },
  });
}

/** Renaming a track. */
export function useRenameTrack(tourId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ trackId, label }: { trackId: number; label: string }) => renameTrack(trackId, label),
    onSuccess: () => void client.invalidateQueries({ queryKey: captionKeys.tracks(tourId) }),
  });
}

/** Deleting a track. */
export function useDeleteTrack(tourId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (trackId: number) => deleteTrack(trackId),
    onSuccess: (_v, trackId) => {
      client.removeQueries({ queryKey: captionKeys.track(trackId) });
      void client.invalidateQueries({ queryKey: captionKeys.tracks(tourId) });
      void client.invalidateQueries({ queryKey: captionKeys.transcripts(tourId) });
    },
  });
}

import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  cultivarFullSchema,
  cultivarIndexPage,
  cultivarPhotoSchema,
  cultivarSummarySchema,
  mergeCultivarResponseSchema,
  type CultivarFull,
  type CultivarIndexQuery,
  type CultivarInput,
  type UpdateCultivarInput,
} from '@shared/schemas/cultivars';
import { api, apiErrorFrom, csrfHeader } from '@/lib/api';
import { cultivarKeys } from './cultivar-keys';

const fullResponse = z.object({ cultivar: cultivarFullSchema });
const lookalikesResponse = z.object({
  items: z.array(z.object({ cultivar: cultivarSummarySchema, distance: z.number() })),
});
/** Look-alike names of a record, nearest first. */
export type Lookalikes = z.infer<typeof lookalikesResponse>;

/** One page of the cultivar index table with the filters and order asked for. */
export function fetchCultivarIndex(q: Partial<CultivarIndexQuery>, signal?: AbortSignal) {
  return api.get('/api/cultivars', { query: { ...q }, schema: cultivarIndexPage, signal });
}

/** A record in full, by slug (or id). */
export function fetchCultivar(idOrSlug: string, signal?: AbortSignal): Promise<CultivarFull> {
  return api.get(`/api/cultivars/${encodeURIComponent(idOrSlug)}`, { schema: fullResponse, signal }).then((r) => r.cultivar);
}

/** The records most like this one by traits (approved records only; others answer 404). */
export function fetchLookalikes(idOrSlug: string, signal?: AbortSignal): Promise<Lookalikes> {
  return api.get(`/api/lookalikes/${encodeURIComponent(idOrSlug)}`, { schema: lookalikesResponse, signal });
}

/** Query options for an index page. */
export function cultivarIndexQueryOptions(q: Partial<CultivarIndexQuery>) {
  return queryOptions({ queryKey: cultivarKeys.list(q), queryFn: ({ signal }) => fetchCultivarIndex(q, signal), placeholderData: keepPreviousData });
}

/** Query options for one record. */
export function cultivarQueryOptions(idOrSlug: string) {
  return queryOptions({ queryKey: cultivarKeys.detail(idOrSlug), queryFn: ({ signal }) => fetchCultivar(idOrSlug, signal) });
}

/** Query options for a record's look-alikes. */
export function lookalikesQueryOptions(idOrSlug: string) {
  return queryOptions({ queryKey: cultivarKeys.lookalikes(idOrSlug), queryFn: ({ signal }) => fetchLookalikes(idOrSlug, signal), staleTime: 5 * 60_000 });
}

/** The index page for the filters in the address. */
export function useCultivarIndex(q: Partial<CultivarIndexQuery>) {
  return useQuery(cultivarIndexQueryOptions(q));
}

/** One record for its page. */
export function useCultivar(idOrSlug: string) {
  return useQuery(cultivarQueryOptions(idOrSlug));
}

/** Look-alikes, asked only for approved records (the server has none for the others). */
export function useLookalikes(idOrSlug: string, enabled: boolean) {
  return useQuery({ ...lookalikesQueryOptions(idOrSlug), enabled });
}

/**
 * After any change to a record: its page (under both slug and id keys), the index and every
 * look-alike list are refreshed; the new record is put in the cache at once under its slug.
 */
function useRecordChanged() {
  const queryClient = useQueryClient();
  return (record: CultivarFull | null) => {
    if (record) queryClient.setQueryData(cultivarKeys.detail(record.slug), record);
    void queryClient.invalidateQueries({ queryKey: cultivarKeys.all });
  };
}

/** An author's proposal (approved at once when a moderator adds it). */
export function useProposeCultivar() {
  const changed = useRecordChanged();
  return useMutation({
    mutationFn: (input: CultivarInput) => api.post('/api/cultivars', input, { schema: fullResponse }).then((r) => r.cultivar),
    onSuccess: (record) => changed(record),
  });
}

/** A moderator's edit of any fields. */
export function useUpdateCultivar(id: number) {
  const changed = useRecordChanged();
  return useMutation({
    mutationFn: (input: UpdateCultivarInput) => api.patch(`/api/cultivars/${id}`, input, { schema: fullResponse }).then((r) => r.cultivar),
    onSuccess: (record) => changed(record),
  });
}

/** Approve or retire (moderators). */
export function useRecordStatus(id: number) {
  const changed = useRecordChanged();
  return useMutation({
    mutationFn: (action: 'approve' | 'retire') => api.post(`/api/cultivars/${id}/${action}`, undefined, { schema: fullResponse }).then((r) => r.cultivar),
    onSuccess: (record) => changed(record),
  });
}

/** Merges this record into another that stays; stops, variants, photos and open fixes move there. */
export function useMergeCultivar(id: number) {
  const changed = useRecordChanged();
  return useMutation({
    mutationFn: (intoId: number) => api.post(`/api/cultivars/${id}/merge`, { intoId }, { schema: mergeCultivarResponseSchema }),
    onSuccess: (result) => changed(result.cultivar),
  });
}

/** Records a misspelling or mishearing of the name. */
export function useAddVariant(id: number) {
  const changed = useRecordChanged();
  return useMutation({
    mutationFn: (text: string) => api.post(`/api/cultivars/${id}/variants`, { text }),
    onSuccess: () => changed(null),
  });
}

/** Removes a recorded variant. */
export function useRemoveVariant(id: number) {
  const changed = useRecordChanged();
  return useMutation({
    mutationFn: (variantId: number) => api.delete(`/api/cultivars/${id}/variants/${variantId}`),
    onSuccess: () => changed(null),
  });
}

const photoResponse = z.object({ photo: cultivarPhotoSchema });

/**
 * Sends one photo as multipart form data (file field "photo", alt text beside it). Not through
 * apiRequest, which speaks JSON only; the CSRF header and the error shape are the same.
 */
export async function uploadCultivarPhoto(id: number, file: File, altText: string): Promise<z.infer<typeof photoResponse>['photo']> {
  const body = new FormData();
  body.set('altText', altText);
  body.set('photo', file);
  let res: Response;
  try {
    res = await fetch(`/api/cultivars/${id}/photos`, { method: 'POST', body, credentials: 'same-origin', headers: { accept: 'application/json', ...(await csrfHeader()) } });
  } catch {
    throw apiErrorFrom(0, '');
  }
  const text = await res.text();
  if (!res.ok) throw apiErrorFrom(res.status, text, res.headers.get('retry-after'));
  const parsed = photoResponse.safeParse(JSON.parse(text));
  if (!parsed.success) throw apiErrorFrom(500, '');
  return parsed.data.photo;
}

/** Adds a photo with its description. */
export function useUploadPhoto(id: number) {
  const changed = useRecordChanged();
  return useMutation({
    mutationFn: ({ file, altText }: { file: File; altText: string }) => uploadCultivarPhoto(id, file, altText),
    onSuccess: () => changed(null),
  });
}

/** Changes a photo's description. */
export function useUpdatePhoto(id: number) {
  const changed = useRecordChanged();
  return useMutation({
    mutationFn: ({ photoId, altText }: { photoId: number; altText: string }) => api.patch(`/api/cultivars/${id}/photos/${photoId}`, { altText }, { schema: photoResponse }),
    onSuccess: () => changed(null),
  });
}

/** Removes a photo. */
export function useRemovePhoto(id: number) {
  const changed = useRecordChanged();
  return useMutation({
    mutationFn: (photoId: number) => api.delete(`/api/cultivars/${id}/photos/${photoId}`),
    onSuccess: () => changed(null),
  });
}

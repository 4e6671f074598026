import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { COMPARE_TRAITS } from '@shared/finder/compare';
import { cultivarSummarySchema } from '@shared/schemas/cultivars';
import type { PairNoteInput } from '@shared/schemas/learning';
import type { TraitProfile } from '@shared/traits';
import { api } from '@/lib/api';
import { tourMomentLinkSchema } from '@/lib/tour-moment';
import { compareKeys } from './compare-keys';

const traitsSchema = z.custom<TraitProfile | null>((v) => v === null || (typeof v === 'object' && !Array.isArray(v)));

const noteSchema = z.object({ aId: z.number(), bId: z.number(), notesHtml: z.string(), updatedAt: z.string() });
/** A "how to tell them apart" note of one pair (stored lower id first). */
export type PairNote = z.infer<typeof noteSchema>;

const compareResponse = z.object({
  records: z.array(z.object({ cultivar: cultivarSummarySchema, traits: traitsSchema, clip: tourMomentLinkSchema.nullable() })),
  comparison: z.object({
    ids: z.array(z.string()),
    rows: z.array(
      z.object({
        trait: z.enum(COMPARE_TRAITS),
        label: z.string(),
        // Values are as stored on the records (an id, a list of ids, a range); the page formats them.
        values: z.array(z.unknown()),
        differs: z.boolean(),
        known: z.number(),
      }),
    ),
  }),
  notes: z.array(noteSchema),
});
/** Side by side as the server sends it. */
export type CompareResponse = z.infer<typeof compareResponse>;
/** One row of side by side. */
export type CompareRowDto = CompareResponse['comparison']['rows'][number];

/** Two or three records side by side. */
export function fetchCompare(ids: readonly number[], signal?: AbortSignal): Promise<CompareResponse> {
  return api.get('/api/compare', { query: { ids: ids.join(',') }, schema: compareResponse, signal });
}

/** Saves the note of a pair; authors and above only (the server checks). */
export function savePairNote(input: PairNoteInput): Promise<PairNote> {
  return api.put('/api/pair-notes', input, { schema: z.object({ note: noteSchema }) }).then((r) => r.note);
}

/** Query options for one comparison. */
export function compareQueryOptions(ids: readonly number[]) {
  return queryOptions({ queryKey: compareKeys.detail(ids), queryFn: ({ signal }) => fetchCompare(ids, signal) });
}

/** The comparison, fetched only for two or three ids. */
export function useCompare(ids: readonly number[]) {
  return useQuery({ ...compareQueryOptions(ids), enabled: ids.length >= 2 && ids.length <= 3 });
}

/** Saves a pair note and refreshes every comparison (a pair can appear in several). */
export function useSavePairNote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: savePairNote,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: compareKeys.details() }),
  });
}

import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { USDA_ZONES } from '@shared/hardiness';
import { FINDER_TRAITS, type FinderAnswers } from '@shared/finder/score';
import { FINDER_QUESTIONS } from '@shared/finder/next-question';
import { cultivarSummarySchema } from '@shared/schemas/cultivars';
import { SEASONS, type Season, type TraitProfile } from '@shared/traits';
import { api } from '@/lib/api';
import { tourMomentLinkSchema } from '@/lib/tour-moment';
import { finderKeys } from './finder-keys';

/** What the finder page sends: the answers plus the reader's context. */
export interface FinderRequestBody {
  answers: FinderAnswers;
  season?: Season;
  container: boolean;
  zone?: (typeof USDA_ZONES)[number];
  limit: number;
}

// Traits arrive as stored on the record; the page reads them defensively, so only the shape is checked.
const traitsSchema = z.custom<TraitProfile | null>((v) => v === null || (typeof v === 'object' && !Array.isArray(v)));
const traitName = z.enum(FINDER_TRAITS);

const candidateSchema = z.object({
  cultivar: cultivarSummarySchema,
  traits: traitsSchema,
  score: z.number(),
  weight: z.number(),
  matched: z.array(traitName),
  partial: z.array(traitName),
  conflicted: z.array(traitName),
  unknown: z.array(traitName),
  fit: z
    .object({ fits: z.enum(['yes', 'marginal', 'no', 'unknown']), reason: z.string(), caution: z.string().optional() })
    .nullable(),
  moments: z.array(tourMomentLinkSchema),
});
/** One ranked candidate as the page shows it. */
export type FinderCandidate = z.infer<typeof candidateSchema>;

const questionSchema = z.object({
  trait: z.enum(FINDER_QUESTIONS),
  gain: z.number(),
  coverage: z.number(),
  options: z.array(z.object({ value: z.union([z.string(), z.number()]), probability: z.number() })),
  season: z.enum(SEASONS).optional(),
});
/** A suggested question with its likely answers. */
export type FinderQuestionDto = z.infer<typeof questionSchema>;

const finderResponse = z.object({
  total: z.number(),
  zone: z.enum(USDA_ZONES).nullable(),
  candidates: z.array(candidateSchema),
  next: z.object({ mode: z.enum(['starter', 'gain']), entropy: z.number(), questions: z.array(questionSchema) }),
});
/** The finder's whole answer. */
export type FinderResponse = z.infer<typeof finderResponse>;

const lookalikeResponse = z.object({
  cultivar: cultivarSummarySchema,
  items: z.array(z.object({ cultivar: cultivarSummarySchema, distance: z.number(), shared: z.number() })),
});
/** Records that look most like one record, nearest first. */
export type LookalikeResponse = z.infer<typeof lookalikeResponse>;

/** Ranks the records for the answers given so far. */
export function fetchFinder(body: FinderRequestBody, signal?: AbortSignal): Promise<FinderResponse> {
  return api.post('/api/finder', body, { schema: finderResponse, signal });
}

/** Look-alikes of one record (by id). */
export function fetchLookalikes(id: number, signal?: AbortSignal): Promise<LookalikeResponse> {
  return api.get(`/api/lookalikes/${id}`, { schema: lookalikeResponse, signal });
}

/** Query options for a finder result; the previous ranking stays on screen while the next loads. */
export function finderQueryOptions(body: FinderRequestBody) {
  return queryOptions({
    queryKey: finderKeys.result(body),
    queryFn: ({ signal }) => fetchFinder(body, signal),
    placeholderData: keepPreviousData,
    staleTime: 60_000,
  });
}

/** Query options for a record's look-alikes. */
export function lookalikesQueryOptions(id: number) {
  return queryOptions({ queryKey: finderKeys.lookalikes(id), queryFn: ({ signal }) => fetchLookalikes(id, signal), staleTime: 5 * 60_000 });
}

/** The ranked candidates and next questions for the current answers. */
export function useFinder(body: FinderRequestBody) {
  return useQuery(finderQueryOptions(body));
}

/** Look-alikes, fetched only when `enabled` (the "Compare with…" list is open). */
export function useLookalikes(id: number, enabled: boolean) {
  return useQuery({ ...lookalikesQueryOptions(id), enabled });
}

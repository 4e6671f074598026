import { z } from 'zod';
import { nameSegmentsSchema } from './cultivars';

export const stopInput = z
  .object({
    startMs: z.number().int().min(0),
    endMs: z.number().int().min(1),
    title: z.string().trim().max(160).default(''),
    /** Null: an unidentified tree. */
    cultivarId: z.number().int().min(1).nullable(),
  })
  .refine((s) => s.endMs > s.startMs, { message: 'A stop must end after it starts.', path: ['endMs'] })
  .refine((s) => s.endMs - s.startMs >= 1000, { message: 'A stop lasts at least one second.', path: ['endMs'] });
export type StopInput = z.infer<typeof stopInput>;

export const stopCultivarSchema = z.object({ id: z.number(), acceptedName: z.string(), nameSegments: nameSegmentsSchema, slug: z.string(), fictional: z.boolean() });

export const stopSchema = z.object({
  id: z.number(),
  tourId: z.number(),
  startMs: z.number(),
  endMs: z.number(),
  title: z.string(),
  cultivar: stopCultivarSchema.nullable(),
});
export type StopDto = z.infer<typeof stopSchema>;

/** A stop Grovewalk proposes from a cultivar name heard in the captions. */
export const stopSuggestionSchema = z.object({
  startMs: z.number(),
  endMs: z.number(),
  cultivar: stopCultivarSchema,
  heard: z.string(),
  score: z.number(),
  /** How the matcher found the name: the accepted epithet, a recorded variant, or a close spelling. */
  kind: z.enum(['exact', 'variant', 'fuzzy']),
  cueStartMs: z.number(),
});
export type StopSuggestion = z.infer<typeof stopSuggestionSchema>;

/** Partial edit of a stop; the server merges it with the stored stop and checks the result with `stopInput`. */
export const updateStopInput = z.object({
  startMs: z.number().int().min(0).optional(),
  endMs: z.number().int().min(1).optional(),
  title: z.string().trim().max(160).optional(),
  cultivarId: z.number().int().min(1).nullable().optional(),
});
export type UpdateStopInput = z.infer<typeof updateStopInput>;

/** The JSON payload of each cue of a tour's metadata track (null fields: an unidentified tree). */
export const stopMetadataSchema = z.object({
  stopId: z.number(),
  cultivarId: z.number().nullable(),
  acceptedName: z.string().nullable(),
  slug: z.string().nullable(),
});
export type StopMetadata = z.infer<typeof stopMetadataSchema>;

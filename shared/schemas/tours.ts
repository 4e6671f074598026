import { z } from 'zod';
import { pageOf, pageQuerySchema } from './common';

/** draft: no finished video yet; processing: transcode queued or running; ready: playable, private; failed: transcode gave up; published: public. */
export const TOUR_STATES = ['draft', 'processing', 'ready', 'failed', 'published'] as const;
export const tourStateSchema = z.enum(TOUR_STATES);
export type TourState = z.infer<typeof tourStateSchema>;

/** Largest description we store, as HTML, after sanitising. */
export const DESCRIPTION_MAX = 20_000;

const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2026-05-14.')
  .refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().startsWith(s), 'That date does not exist.')
  .refine((s) => s >= '1900-01-01', 'That date is too early.')
  .refine((s) => Date.parse(`${s}T00:00:00Z`) <= Date.now() + 86_400_000, 'The filming date cannot be in the future.');

const titleField = z.string().trim().min(3, 'Use at least 3 characters.').max(160, 'Use at most 160 characters.');
const descriptionField = z.string().max(DESCRIPTION_MAX, 'The description is too long.');
const gardenField = z.string().trim().max(160, 'Use at most 160 characters.');

export const tourDetailsInput = z.object({
  title: titleField,
  descriptionHtml: descriptionField.default(''),
  garden: gardenField.default(''),
  filmedOn: isoDate.nullable().default(null),
});
export type TourDetailsInput = z.infer<typeof tourDetailsInput>;

/**
 * A PATCH changes only the fields it names. Built without defaults on purpose: zod 4 applies a
 * default even inside .partial(), so `tourDetailsInput.partial()` would turn a missing garden or
 * date into "" / null and wipe them whenever another field is saved.
 */
export const updateTourInput = z.object({
  title: titleField.optional(),
  descriptionHtml: descriptionField.optional(),
  garden: gardenField.optional(),
  filmedOn: isoDate.nullable().optional(),
});
export type UpdateTourInput = z.infer<typeof updateTourInput>;

export const renditionSchema = z.object({ height: z.number(), width: z.number(), url: z.string(), bytes: z.number(), label: z.string() });
export type Rendition = z.infer<typeof renditionSchema>;

export const jobSummarySchema = z.object({
  id: z.number(),
  state: z.enum(['queued', 'running', 'done', 'failed', 'cancelled']),
  progress: z.number(),
  etaSeconds: z.number().nullable(),
  attempts: z.number(),
  maxAttempts: z.number(),
  error: z.string().nullable(),
});
export type JobSummary = z.infer<typeof jobSummarySchema>;

export const tourSchema = z.object({
  id: z.number(),
  title: z.string(),
  descriptionHtml: z.string(),
  garden: z.string(),
  filmedOn: z.string().nullable(),
  state: tourStateSchema,
  publishedAt: z.string().nullable(),
  author: z.object({ id: z.number(), displayName: z.string() }),
  durationMs: z.number().nullable(),
  width: z.number().nullable(),
  height: z.number().nullable(),
  sourceName: z.string().nullable(),
  sourceCodecs: z.string().nullable(),
  posterUrl: z.string().nullable(),
  thumbStrip: z
    .object({
      everySec: z.number(),
      tileWidth: z.number(),
      tileHeight: z.number(),
      columns: z.number(),
      rows: z.number(),
      count: z.number(),
      sheets: z.array(z.object({ url: z.string(), width: z.number(), height: z.number() })),
    })
    .nullable(),
  renditions: z.array(renditionSchema),
  failureReason: z.string().nullable(),
  job: jobSummarySchema.nullable(),
  canEdit: z.boolean(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type TourDto = z.infer<typeof tourSchema>;

export const tourPage = pageOf(tourSchema);
export type TourPage = z.infer<typeof tourPage>;

export const listToursQuery = pageQuerySchema.extend({
  mine: z.enum(['1', '0']).optional(),
  author: z.coerce.number().int().min(1).optional(),
  /** Browse filters: part of the garden's name; a cultivar record (id or slug) or a cultivar Group shown at some stop. */
  garden: z.string().trim().min(1).max(160).optional(),
  cultivar: z.string().trim().min(1).max(160).optional(),
  group: z.string().trim().min(1).max(80).optional(),
});
export type ListToursQuery = z.infer<typeof listToursQuery>;

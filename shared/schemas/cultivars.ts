import { z } from 'zod';
import { traitProfileSchema } from '../traits';
import { pageOf, pageQuerySchema } from './common';

export const cultivarNameInput = z.object({
  genus: z.string().trim().min(2).max(60),
  species: z.string().trim().max(60).nullable().optional(),
  infraspecificRank: z.enum(['subsp.', 'var.', 'f.']).nullable().optional(),
  infraspecificEpithet: z.string().trim().max(60).nullable().optional(),
  groupName: z.string().trim().max(80).nullable().optional(),
  epithet: z.string().trim().min(1, 'Enter the cultivar epithet.').max(80),
});

export const cultivarInput = cultivarNameInput.extend({
  traits: traitProfileSchema.nullable().optional(),
  notesHtml: z.string().max(50_000).optional(),
  pronunciation: z.string().trim().max(200).nullable().optional(),
  meaning: z.string().trim().max(2000).nullable().optional(),
  /** Invented for the demo or for tests; shown as such wherever the record appears. */
  fictional: z.boolean().optional(),
});
export type CultivarInput = z.infer<typeof cultivarInput>;

export const cultivarSummarySchema = z.object({
  id: z.number(),
  slug: z.string(),
  acceptedName: z.string(),
  /** Segments with italics for display (botanical parts italic, epithet in quotes roman). */
  nameSegments: z.array(z.object({ text: z.string(), italic: z.boolean() })),
  genus: z.string(),
  species: z.string().nullable(),
  groupName: z.string().nullable(),
  epithet: z.string(),
  status: z.enum(['proposed', 'approved', 'retired']),
  fictional: z.boolean(),
});
export type CultivarSummary = z.infer<typeof cultivarSummarySchema>;
export const cultivarPage = pageOf(cultivarSummarySchema);

export const listCultivarsQuery = pageQuerySchema.extend({
  q: z.string().trim().max(100).default(''),
  status: z.enum(['proposed', 'approved', 'retired', 'any']).default('approved'),
});
export type ListCultivarsQuery = z.infer<typeof listCultivarsQuery>;

/** Moderator edit: any field of the input, plus retiring or reinstating a record. */
export const updateCultivarInput = cultivarInput.partial().extend({
  status: z.enum(['proposed', 'approved', 'retired']).optional(),
});
export type UpdateCultivarInput = z.infer<typeof updateCultivarInput>;

/** One record in full: the summary plus what the tree card and the record page show. */
export const cultivarDetailSchema = cultivarSummarySchema.extend({
  infraspecificRank: z.string().nullable(),
  infraspecificEpithet: z.string().nullable(),
  traits: traitProfileSchema.nullable(),
  notesHtml: z.string(),
  pronunciation: z.string().nullable(),
  meaning: z.string().nullable(),
  variants: z.array(z.object({ id: z.number(), text: z.string() })),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type CultivarDetail = z.infer<typeof cultivarDetailSchema>;

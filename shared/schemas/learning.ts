import { z } from 'zod';
import { finderAnswersSchema } from '../finder/score';
import { USDA_ZONES } from '../hardiness';
import { seasonSchema } from '../traits';

export const finderRequest = z.object({
  answers: finderAnswersSchema.default({}),
  /** The season the learner is looking at, so the colour question can be asked. */
  season: seasonSchema.optional(),
  /** Treat the reader's tree as in a container above ground for the zone fit. */
  container: z.boolean().default(false),
  /** The reader's zone when they are not signed in (signed-in readers' zone comes from their account). */
  zone: z.enum(USDA_ZONES).optional(),
  limit: z.number().int().min(1).max(50).default(12),
});
export type FinderRequest = z.infer<typeof finderRequest>;

export const compareQuery = z.object({
  ids: z
    .string()
    .trim()
    .regex(/^\d+(,\d+)*$/, 'Give two or three record ids separated by commas.')
    .transform((s) => [...new Set(s.split(',').map(Number))])
    .refine((ids) => ids.length >= 2, 'Pick at least two different records to compare.')
    .refine((ids) => ids.length <= 3, 'Side by side shows at most three records.'),
});

export const pairNoteInput = z
  .object({ aId: z.number().int().min(1), bId: z.number().int().min(1), notesHtml: z.string().max(20_000) })
  .refine((v) => v.aId !== v.bId, { message: 'A note needs two different records.', path: ['bId'] });
export type PairNoteInput = z.infer<typeof pairNoteInput>;

export const learnAnswerInput = z.object({ token: z.string().min(10).max(500), chosenId: z.number().int().min(1) });
export type LearnAnswerInput = z.infer<typeof learnAnswerInput>;

export const hardinessZoneSchema = z.enum(USDA_ZONES);

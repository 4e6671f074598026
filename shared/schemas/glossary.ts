import { z } from 'zod';
import { spokenMomentSchema } from './cultivars';

/** Search and letter filter of the glossary; both optional. "#" is the letter of names not starting A–Z. */
export const glossaryQuery = z.object({
  q: z.string().trim().max(100).default(''),
  letter: z
    .string()
    .trim()
    .regex(/^([A-Za-z]|#)$/, 'Choose a letter A–Z or #.')
    .transform((l) => l.toUpperCase())
    .optional(),
});
export type GlossaryQuery = z.infer<typeof glossaryQuery>;

/** One accepted name as the glossary prints it, with where it is spoken. */
export const glossaryEntrySchema = z.object({
  id: z.number(),
  slug: z.string(),
  /** A–Z heading letter: the first letter of the epithet, accents folded. */
  letter: z.string(),
  acceptedName: z.string(),
  nameSegments: z.array(z.object({ text: z.string(), italic: z.boolean() })),
  epithet: z.string(),
  respelling: z.string().nullable(),
  pronunciation: z.string().nullable(),
  meaning: z.string().nullable(),
  variants: z.array(z.string()),
  fictional: z.boolean(),
  spoken: z.object({
    /** Published tours where the name is heard, and cues in all. */
    tours: z.number(),
    cues: z.number(),
    first: spokenMomentSchema.nullable(),
  }),
  /** How a search found the entry (absent without a search). */
  match: z.object({ kind: z.enum(['prefix', 'exact', 'variant', 'fuzzy', 'phonetic']), score: z.number() }).optional(),
});
export type GlossaryEntry = z.infer<typeof glossaryEntrySchema>;

/** GET /api/glossary: the A–Z bar and the entries that pass the filters. */
export const glossaryResponseSchema = z.object({
  /** Every heading letter with its number of entries (ignores q and letter, for the A–Z bar). */
  letters: z.array(z.object({ letter: z.string(), count: z.number() })),
  items: z.array(glossaryEntrySchema),
});
export type GlossaryResponse = z.infer<typeof glossaryResponseSchema>;

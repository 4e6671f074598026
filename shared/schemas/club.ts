import { z } from 'zod';
import { roleSchema } from './common';

/** The garden club a Grovewalk site serves; the demo one is fictional and says so. */
export const clubSchema = z.object({
  name: z.string(),
  blurb: z.string(),
  fictional: z.boolean(),
  members: z.array(z.object({ id: z.number().int(), displayName: z.string(), role: roleSchema, garden: z.string().nullable() })),
});
export type Club = z.infer<typeof clubSchema>;
export const clubResponse = z.object({ club: clubSchema.nullable() });

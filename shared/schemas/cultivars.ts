import { z } from 'zod';
import { containerSuitabilitySchema, habitSchema, leafFormSchema, traitProfileSchema } from '../traits';
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

/** A printed name in segments with italics for display (botanical parts italic, epithet in quotes roman). */
export const nameSegmentsSchema = z.array(z.object({ text: z.string(), italic: z.boolean() }));

export const cultivarSummarySchema = z.object({
  id: z.number(),
  slug: z.string(),
  acceptedName: z.string(),
  nameSegments: nameSegmentsSchema,
  genus: z.string(),
  species: z.string().nullable(),
  groupName: z.string().nullable(),
  epithet: z.string(),
  status: z.enum(['proposed', 'approved', 'retired']),
  fictional: z.boolean(),
});
export type CultivarSummary = z.infer<typeof cultivarSummarySchema>;

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

// ---- Records in full (issue 5): index filters, detail extras, variants, merge, photos ----

/** Sort orders of the cultivar index. */
export const CULTIVAR_SORTS = ['name', 'updated'] as const;

/**
 * Filters and sorting of the cultivar index table, so a learner can narrow a long list by what
 * they see. `group` accepts "Dissectum" or "Dissectum Group"; `container` matches the recorded
 * container suitability exactly. Default order: name A–Z; "updated" newest first.
 */
export const cultivarIndexQuery = listCultivarsQuery.extend({
  group: z.string().trim().max(80).optional(),
  genus: z.string().trim().max(60).optional(),
  leafForm: leafFormSchema.optional(),
  habit: habitSchema.optional(),
  container: containerSuitabilitySchema.optional(),
  sort: z.enum(CULTIVAR_SORTS).default('name'),
  dir: z.enum(['asc', 'desc']).optional(),
});
export type CultivarIndexQuery = z.infer<typeof cultivarIndexQuery>;

/** A row of the cultivar index table: the summary, the traits the table shows and when it changed. */
export const cultivarIndexRowSchema = cultivarSummarySchema.extend({
  traits: traitProfileSchema.nullable(),
  updatedAt: z.string(),
});
export type CultivarIndexRow = z.infer<typeof cultivarIndexRowSchema>;
/** A page of the cultivar index as GET /api/cultivars returns it. */
export const cultivarIndexPage = pageOf(cultivarIndexRowSchema);

/** A name variant (misspelling or mishearing) to record; the moderator types it as heard. */
export const variantInput = z.object({ text: z.string().trim().min(1, 'Enter the misspelling or mishearing.').max(120) });
export type VariantInput = z.infer<typeof variantInput>;

/** Merging a duplicate into the record that stays. */
export const mergeCultivarInput = z.object({ intoId: z.number().int().min(1) });
export type MergeCultivarInput = z.infer<typeof mergeCultivarInput>;

/** Largest photo upload accepted (bytes). */
export const CULTIVAR_PHOTO_MAX_BYTES = 15 * 1024 * 1024;
/** Longest side of the stored display image and of its thumbnail, in pixels. */
export const CULTIVAR_PHOTO_MAX_SIDE = 1600;
export const CULTIVAR_PHOTO_THUMB_SIDE = 400;

/** The form fields sent with a photo file (multipart field "photo"). */
export const cultivarPhotoInput = z.object({
  altText: z.string().trim().min(3, 'Describe what the photo shows, for people who cannot see it.').max(300),
});
export type CultivarPhotoInput = z.infer<typeof cultivarPhotoInput>;

/** Changing a photo's description or place in the order. */
export const updateCultivarPhotoInput = z.object({
  altText: cultivarPhotoInput.shape.altText.optional(),
  position: z.number().int().min(0).max(10_000).optional(),
});
export type UpdateCultivarPhotoInput = z.infer<typeof updateCultivarPhotoInput>;

/** A photo as the client gets it: URLs through the media route, never disk paths. */
export const cultivarPhotoSchema = z.object({
  id: z.number(),
  url: z.string(),
  width: z.number(),
  height: z.number(),
  thumbUrl: z.string(),
  thumbWidth: z.number(),
  thumbHeight: z.number(),
  altText: z.string(),
  position: z.number(),
});
export type CultivarPhotoDto = z.infer<typeof cultivarPhotoSchema>;

/** Where a tour says the name: the first cue in one published tour where the matcher hears it. */
export const spokenMomentSchema = z.object({
  tourId: z.number(),
  tourTitle: z.string(),
  trackId: z.number(),
  lang: z.string(),
  startMs: z.number(),
  endMs: z.number(),
  /** The cue as viewers read it (tags removed); the client escapes it. */
  text: z.string(),
  /** The words the matcher heard as this name. */
  heard: z.string(),
  kind: z.enum(['exact', 'variant', 'fuzzy', 'phonetic']),
});
export type SpokenMoment = z.infer<typeof spokenMomentSchema>;

/** A stop of a published tour that shows this record, with the pictures the page can show. */
export const tourMomentSchema = z.object({
  tourId: z.number(),
  tourTitle: z.string(),
  stopId: z.number(),
  stopTitle: z.string(),
  startMs: z.number(),
  endMs: z.number(),
  posterUrl: z.string().nullable(),
  /** The scrubbing-preview tile at the stop's start: a sprite sheet and the tile's rectangle on it. */
  thumbnail: z.object({ url: z.string(), x: z.number(), y: z.number(), w: z.number(), h: z.number() }).nullable(),
});
export type TourMoment = z.infer<typeof tourMomentSchema>;

/** The record page and the tree card: the detail plus pronunciation, photos, moments and cautions. */
export const cultivarFullSchema = cultivarDetailSchema.extend({
  /** Generated plain-English guide for a romanised Japanese epithet; null for other epithets. */
  respelling: z.string().nullable(),
  /** The epithet's Hepburn syllables per word, or null when it is not Hepburn. */
  hepburnSyllables: z.array(z.array(z.string())).nullable(),
  mergedInto: z.object({ id: z.number(), slug: z.string(), acceptedName: z.string() }).nullable(),
  photos: z.array(cultivarPhotoSchema),
  spokenAt: z.array(spokenMomentSchema),
  tourMoments: z.array(tourMomentSchema),
  /** Set when the notes give care advice: the cautions that go with that advice. */
  careNote: z.string().nullable(),
  /** The short general caution the UI shows next to any growing advice. */
  careCaution: z.string(),
});
export type CultivarFull = z.infer<typeof cultivarFullSchema>;

/** POST /api/cultivars/:id/merge: the survivor in full, what became of the duplicate, and what moved. */
export const mergeCultivarResponseSchema = z.object({
  cultivar: cultivarFullSchema,
  merged: z.object({ id: z.number(), slug: z.string(), status: z.enum(['proposed', 'approved', 'retired']), mergedIntoId: z.number().nullable() }),
  movedStops: z.number(),
  movedVariants: z.number(),
});
export type MergeCultivarResponse = z.infer<typeof mergeCultivarResponseSchema>;

import { z } from 'zod';
import { usdaZoneSchema, seasonSchema } from '../traits';
import { pageQuerySchema } from './common';
import { cultivarSummarySchema } from './cultivars';
import { momentThumbnailSchema } from './search';
import { tourPage, tourSchema } from './tours';

const rangeM = z.object({ min: z.number(), max: z.number() });

/** The tree card: what the panel beside the player shows for the current stop's record. */
export const treeCardSchema = cultivarSummarySchema.extend({
  /** The moderator's guide, else a Hepburn respelling of a romanised epithet, else null. */
  pronunciation: z.object({ text: z.string(), source: z.enum(['record', 'hepburn']) }).nullable(),
  meaning: z.string().nullable(),
  keyTraits: z.array(z.object({ trait: z.string(), label: z.string(), values: z.array(z.object({ id: z.string(), label: z.string() })) })),
  colours: z.array(
    z.object({
      season: seasonSchema,
      swatches: z.array(z.object({ id: z.string(), label: z.string(), hex: z.string(), accentHex: z.string().nullable() })),
    }),
  ),
  /** Sizes in metres; the client converts to the reader's unit. */
  size: z.object({ heightM: rangeM.nullable(), spreadM: rangeM.nullable(), heightClass: z.string().nullable() }),
  /** USDA zones with the temperature band they span: coldest edge of `min`, warmest edge of `max`. */
  hardiness: z
    .object({ min: usdaZoneSchema, max: usdaZoneSchema, coldestF: z.number(), coldestC: z.number(), warmestF: z.number(), warmestC: z.number() })
    .nullable(),
  container: z.object({ suitability: z.enum(['good', 'fair', 'poor']), label: z.string(), caution: z.string() }).nullable(),
  /** The record page. */
  link: z.string(),
});
/** One tree card. */
export type TreeCard = z.infer<typeof treeCardSchema>;

/** A stop on the watch page: times, chapter title, preview picture and its tree card. */
export const watchStopSchema = z.object({
  id: z.number(),
  startMs: z.number(),
  endMs: z.number(),
  title: z.string(),
  /** What the chapters track calls this stop. */
  chapterTitle: z.string(),
  thumbnail: momentThumbnailSchema,
  cultivar: treeCardSchema.nullable(),
});
/** One stop of the watch page. */
export type WatchStop = z.infer<typeof watchStopSchema>;

/** A caption track the player can load, with its WebVTT and transcript addresses. */
export const watchTrackSchema = z.object({
  id: z.number(),
  lang: z.string(),
  label: z.string(),
  version: z.number(),
  /** WebVTT export of the track (the player's caption source). */
  vttUrl: z.string(),
  transcriptUrl: z.string(),
});

/** GET /api/tours/:id/watch: everything the tour page needs in one response. */
export const watchResponseSchema = z.object({
  tour: tourSchema,
  stops: z.array(watchStopSchema),
  captions: z.object({
    tracks: z.array(watchTrackSchema),
    /** The first track added, which the player shows by default. */
    defaultTrackId: z.number().nullable(),
    chaptersUrl: z.string(),
    metadataUrl: z.string(),
  }),
});
/** The watch page answer. */
export type WatchResponse = z.infer<typeof watchResponseSchema>;

/** Oldest first (default: the tree through the years) or newest first. */
export const whereToSeeQuery = pageQuerySchema.extend({ order: z.enum(['oldest', 'newest']).default('oldest') });
/** The parsed "where to see it" query. */
export type WhereToSeeQuery = z.infer<typeof whereToSeeQuery>;

/** One stop of a published tour that shows the record. */
export const seeItMomentSchema = z.object({
  tourId: z.number(),
  tourTitle: z.string(),
  garden: z.string(),
  filmedOn: z.string().nullable(),
  publishedAt: z.string().nullable(),
  author: z.object({ id: z.number(), displayName: z.string() }),
  stopId: z.number(),
  stopTitle: z.string(),
  startMs: z.number(),
  endMs: z.number(),
  thumbnail: momentThumbnailSchema,
  link: z.string(),
});
/** One "where to see it" moment. */
export type SeeItMoment = z.infer<typeof seeItMomentSchema>;

/** GET /api/cultivars/:idOrSlug/moments: "where to see it". */
export const whereToSeeResponseSchema = z.object({
  cultivar: cultivarSummarySchema,
  order: z.enum(['oldest', 'newest']),
  items: z.array(seeItMomentSchema),
  total: z.number(),
  page: z.number(),
  pageSize: z.number(),
});
/** The "where to see it" answer. */
export type WhereToSeeResponse = z.infer<typeof whereToSeeResponseSchema>;

/** GET /api/authors: everyone with a published tour, by name (the browse filter's choices). */
export const authorListSchema = z.object({
  items: z.array(z.object({ id: z.number(), displayName: z.string(), publishedTours: z.number() })),
});

/** GET /api/authors/:id: a public author page. */
export const authorPageSchema = z.object({
  author: z.object({
    id: z.number(),
    displayName: z.string(),
    garden: z.string().nullable(),
    publishedTours: z.number(),
    memberSince: z.string(),
  }),
  tours: tourPage,
});
/** The author page answer. */
export type AuthorPage = z.infer<typeof authorPageSchema>;

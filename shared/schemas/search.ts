import { z } from 'zod';
import { seasonSchema } from '../traits';
import { cultivarSummarySchema } from './cultivars';
import { stopCultivarSchema } from './stops';

/** Longest search the server reads; longer ones are refused rather than cut. */
export const SEARCH_QUERY_MAX = 200;
/** Results per page in each group. */
export const SEARCH_PAGE_SIZES = { cultivars: 10, tours: 10, moments: 20 } as const;

/** GET /api/search; the length rules are checked by the server with their own messages. */
export const searchQuery = z.object({
  q: z.string().default(''),
  page: z.coerce.number().int().min(1).max(1000).default(1),
});
/** The parsed search query. */
export type SearchQuery = z.infer<typeof searchQuery>;

/** A highlighted run of a text: UTF-16 offsets, end exclusive. The client marks these; no HTML is sent. */
export const textSpanSchema = z.object({ start: z.number().int(), end: z.number().int() });

/** A preview picture for a moment: a tile cropped from a thumbnail sheet, or the tour's poster. */
export const momentThumbnailSchema = z
  .discriminatedUnion('kind', [
    z.object({
      kind: z.literal('tile'),
      url: z.string(),
      sheetWidth: z.number(),
      sheetHeight: z.number(),
      x: z.number(),
      y: z.number(),
      w: z.number(),
      h: z.number(),
    }),
    z.object({ kind: z.literal('poster'), url: z.string() }),
  ])
  .nullable();
/** A moment's preview picture. */
export type MomentThumbnail = z.infer<typeof momentThumbnailSchema>;

/** How a name matched: the accepted name exactly, a recorded variant, the start of the name, part of it, a close spelling or a sound-alike. */
export const NAME_MATCH_HOWS = ['exact', 'variant', 'prefix', 'contains', 'fuzzy', 'phonetic'] as const;

/** Why a record matched by name: how, how closely, and which spelling. */
export const nameReasonSchema = z.object({
  kind: z.literal('name'),
  how: z.enum(NAME_MATCH_HOWS),
  score: z.number(),
  /** The record's spelling that matched (accepted epithet, accepted name or a variant). */
  matched: z.string(),
  /** The part of the search that matched it. */
  heard: z.string(),
});
/** Why a record matched a trait word, with the seasons and colours that did for colour words. */
export const traitReasonSchema = z.object({
  kind: z.literal('trait'),
  trait: z.string(),
  value: z.string(),
  label: z.string(),
  seasons: z.array(seasonSchema).optional(),
  colours: z.array(z.string()).optional(),
});
/** Any reason a record is in the results; a record lists all of its reasons. */
export const matchReasonSchema = z.discriminatedUnion('kind', [nameReasonSchema, traitReasonSchema]);
/** One reason, as the client shows it. */
export type MatchReason = z.infer<typeof matchReasonSchema>;

/** A cultivar record in the results, with its reasons and where to see it. */
export const cultivarHitSchema = z.object({
  cultivar: cultivarSummarySchema,
  score: z.number(),
  reasons: z.array(matchReasonSchema),
  /** "Where to see it" for this record. */
  momentsUrl: z.string(),
});
/** One cultivar result. */
export type CultivarHit = z.infer<typeof cultivarHitSchema>;

/** A published tour whose title or description matched, with marked words. */
export const tourHitSchema = z.object({
  id: z.number(),
  title: z.string(),
  titleHighlights: z.array(textSpanSchema),
  garden: z.string(),
  filmedOn: z.string().nullable(),
  publishedAt: z.string().nullable(),
  author: z.object({ id: z.number(), displayName: z.string() }),
  durationMs: z.number().nullable(),
  posterUrl: z.string().nullable(),
  /** Plain text around the first hit in the description (tags removed), or null when only the title matched. */
  snippet: z.object({ text: z.string(), highlights: z.array(textSpanSchema) }).nullable(),
  link: z.string(),
});
/** One tour result. */
export type TourHit = z.infer<typeof tourHitSchema>;

/** The stop covering a caption moment, so the result can show which tree is on screen. */
export const momentStopSchema = z.object({
  id: z.number(),
  title: z.string(),
  startMs: z.number(),
  endMs: z.number(),
  cultivar: stopCultivarSchema.nullable(),
});

/** A caption moment of a published tour: time, marked text, stop and preview picture. */
export const momentHitSchema = z.object({
  tourId: z.number(),
  tourTitle: z.string(),
  trackId: z.number(),
  lang: z.string(),
  startMs: z.number(),
  endMs: z.number(),
  /** The cue as a viewer reads it (tags removed); `highlights` index into it. */
  text: z.string(),
  highlights: z.array(textSpanSchema),
  /** The cue names a cultivar record the search matched by name. */
  nameHit: z.boolean(),
  cultivarIds: z.array(z.number()),
  /** Full-text relevance (0 for fallback and name-only hits). */
  score: z.number(),
  /** The stop covering the cue's start, if any. */
  stop: momentStopSchema.nullable(),
  thumbnail: momentThumbnailSchema,
  /** The tour page at this moment. */
  link: z.string(),
});
/** One moment result. */
export type MomentHit = z.infer<typeof momentHitSchema>;

/** GET /api/search: the three groups, each paged with the same `page`. */
export const searchResponseSchema = z.object({
  q: z.string(),
  /** The folded words of the search. */
  words: z.array(z.string()),
  /** Trait conditions read from the search. */
  traits: z.array(z.object({ trait: z.string(), value: z.string(), label: z.string() })),
  /** Words looked up through the FULLTEXT index, and those matched by the whole-word fallback. */
  fulltextWords: z.array(z.string()),
  fallbackWords: z.array(z.string()),
  page: z.number(),
  pageSizes: z.object({ cultivars: z.number(), tours: z.number(), moments: z.number() }),
  cultivars: z.object({ items: z.array(cultivarHitSchema), total: z.number() }),
  tours: z.object({ items: z.array(tourHitSchema), total: z.number() }),
  /** `capped`: more moments matched than the server ranks; refine the search to see the rest. */
  moments: z.object({ items: z.array(momentHitSchema), total: z.number(), capped: z.boolean() }),
});
/** The search answer as the client reads it. */
export type SearchResponse = z.infer<typeof searchResponseSchema>;

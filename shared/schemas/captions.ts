import { z } from 'zod';

/** Largest caption file accepted for import (a three-hour tour is far below this). */
export const CAPTION_FILE_MAX_BYTES = 2 * 1024 * 1024;
/** Most cues one track may hold. */
export const CUES_MAX = 20_000;

/** BCP 47 language tag (RFC 5646 well-formedness, simplified: language, optional script/region/variants). */
export const langTagSchema = z
  .string()
  .trim()
  .regex(/^[a-zA-Z]{2,3}(-[a-zA-Z]{4})?(-([a-zA-Z]{2}|\d{3}))?(-([a-zA-Z\d]{5,8}|\d[a-zA-Z\d]{3}))*$/, 'Use a language tag such as "en", "en-GB" or "ja".');

export const cueSchema = z
  .object({
    id: z.string().max(255).nullable().optional(),
    startMs: z.number().int().min(0).max(24 * 3600_000),
    endMs: z.number().int().min(0).max(24 * 3600_000),
    text: z.string().max(2000, 'A cue holds at most 2,000 characters.'),
    settings: z.string().max(255).optional(),
  })
  .refine((c) => !c.text.includes('-->'), { message: 'Cue text cannot contain "-->".', path: ['text'] });
export type CueInput = z.infer<typeof cueSchema>;

export const createTrackInput = z.object({
  lang: langTagSchema,
  label: z.string().trim().min(1, 'Give the track a label, e.g. "English".').max(80),
});
export type CreateTrackInput = z.infer<typeof createTrackInput>;

/** Storing an import the author has previewed: the cues they chose to keep. */
export const importTrackInput = createTrackInput.extend({
  cues: z.array(cueSchema).max(CUES_MAX),
  /** Replace the cues of the existing track in this language instead of refusing. */
  replace: z.boolean().default(false),
});
export type ImportTrackInput = z.infer<typeof importTrackInput>;

/** Autosave of the whole cue list; `version` must match the stored one or the save is refused. */
export const saveCuesInput = z.object({ version: z.number().int().min(1), cues: z.array(cueSchema).max(CUES_MAX) });
export type SaveCuesInput = z.infer<typeof saveCuesInput>;

export const trackSchema = z.object({
  id: z.number(),
  tourId: z.number(),
  lang: z.string(),
  label: z.string(),
  version: z.number(),
  cueCount: z.number(),
  updatedAt: z.string(),
});
export type TrackDto = z.infer<typeof trackSchema>;

export const storedCueSchema = z.object({
  id: z.string().nullable(),
  startMs: z.number(),
  endMs: z.number(),
  text: z.string(),
  settings: z.string(),
});
export type StoredCue = z.infer<typeof storedCueSchema>;

/** A problem found while reading a file; `line` is 1-based, and 0 means the whole file (e.g. a converted encoding). */
export const problemSchema = z.object({ line: z.number(), col: z.number().optional(), message: z.string(), severity: z.enum(['error', 'warning']) });

/** What the import preview returns: nothing is stored until the author confirms. */
export const importPreviewSchema = z.object({
  format: z.enum(['vtt', 'srt']),
  encoding: z.string(),
  cues: z.array(storedCueSchema),
  problems: z.array(problemSchema),
  /** Cues that start or end after the video's end. */
  pastEnd: z.array(z.number()),
});
export type ImportPreview = z.infer<typeof importPreviewSchema>;

/** Renaming a track; the language is fixed once a track exists (import into a new one instead). */
export const updateTrackInput = z.object({
  label: z.string().trim().min(1, 'Give the track a label, e.g. "English".').max(80).optional(),
});
export type UpdateTrackInput = z.infer<typeof updateTrackInput>;

/** One finding of the shared quality checks (shared/captions/quality.ts), as the server sends it. */
export const qualityIssueSchema = z.object({
  cueIndex: z.number(),
  kind: z.string(),
  severity: z.enum(['error', 'warning']),
  message: z.string(),
  value: z.number(),
  limit: z.number(),
});

/** A track opened in the editor: the cues in playing order and the quality findings on them. */
export const trackDetailSchema = z.object({
  track: trackSchema,
  cues: z.array(storedCueSchema),
  quality: z.array(qualityIssueSchema),
});
export type TrackDetail = z.infer<typeof trackDetailSchema>;

/** Which track a transcript or stop suggestions are built from; without `lang`, the first track. */
export const trackLangQuery = z.object({ lang: langTagSchema.optional() });
export type TrackLangQuery = z.infer<typeof trackLangQuery>;

/** A readable transcript: consecutive cues joined into paragraphs, each linking to its moment. */
export const transcriptSchema = z.object({
  lang: z.string(),
  paragraphs: z.array(z.object({ startMs: z.number(), endMs: z.number(), text: z.string() })),
});
export type Transcript = z.infer<typeof transcriptSchema>;

import { z } from 'zod';
import { pageOf, pageQuerySchema } from './common';

/** Where a fix stands: open in the queue, or decided (accepted, declined), or accepted then undone. */
export const SPELLING_FIX_STATUSES = ['open', 'accepted', 'declined', 'undone'] as const;
export type SpellingFixStatusName = (typeof SPELLING_FIX_STATUSES)[number];

/**
 * A viewer's flag: the words as the captions have them and the record they should name. Where it
 * was seen is optional; given as a stored cue id (from a fix or audit row) or, as the transcript
 * and player know it, a track and the start time of the cue.
 */
export const proposeFixInput = z
  .object({
    proposedText: z.string().trim().min(2, 'Select the misspelt words.').max(120, 'Select at most 120 characters.'),
    cultivarId: z.number().int().min(1),
    cueId: z.number().int().min(1).optional(),
    cue: z.object({ trackId: z.number().int().min(1), startMs: z.number().int().min(0) }).optional(),
  })
  .refine((v) => !(v.cueId !== undefined && v.cue !== undefined), { message: 'Give the cue once: either cueId or cue.', path: ['cue'] })
  .refine((v) => !/[<>]/.test(v.proposedText), { message: 'Select words only, without markup.', path: ['proposedText'] });
export type ProposeFixInput = z.infer<typeof proposeFixInput>;

/** The moderators' queue: one status at a time (open: oldest first; decided: newest first). */
export const listFixesQuery = pageQuerySchema.extend({
  status: z.enum(SPELLING_FIX_STATUSES).default('open'),
});
export type ListFixesQuery = z.infer<typeof listFixesQuery>;

/** A decline always carries a reason: the proposer receives it by e-mail. */
export const declineFixInput = z.object({
  reason: z.string().trim().min(3, 'Say briefly why, so the proposer learns from it.').max(500),
});
export type DeclineFixInput = z.infer<typeof declineFixInput>;

/** Detection over one track, or over every caption when no track is given. */
export const detectFixesInput = z.object({ trackId: z.number().int().min(1).optional() });
export type DetectFixesInput = z.infer<typeof detectFixesInput>;

/** The record a fix names, enough for a link. */
const fixCultivarSchema = z.object({ id: z.number(), slug: z.string(), epithet: z.string(), acceptedName: z.string() });

/** A row of the moderators' queue. */
export const spellingFixRowSchema = z.object({
  id: z.number(),
  proposedText: z.string(),
  /** The accepted epithet to write, and the record it belongs to. */
  suggestion: z.object({ epithet: z.string(), acceptedName: z.string(), cultivar: fixCultivarSchema }),
  /** Cues (all tours, all tracks) that accepting would change now; 0 once decided. */
  occurrences: z.number(),
  /** Cues the accept changed (its audit rows). */
  changedCues: z.number(),
  toursAffected: z.object({ count: z.number(), titles: z.array(z.string()) }),
  /** The proposer's display name, or "automatic" for detection. */
  proposer: z.string(),
  source: z.enum(['viewer', 'detection']),
  status: z.enum(SPELLING_FIX_STATUSES),
  declineReason: z.string().nullable(),
  decidedBy: z.string().nullable(),
  decidedAt: z.string().nullable(),
  createdAt: z.string(),
});
export type SpellingFixRow = z.infer<typeof spellingFixRowSchema>;
/** A page of the queue as GET /api/spelling-fixes returns it. */
export const spellingFixPage = pageOf(spellingFixRowSchema);

/** One rewritten cue of an accepted fix. */
export const spellingFixChangeSchema = z.object({
  id: z.number(),
  cueId: z.number(),
  trackId: z.number(),
  tourId: z.number().nullable(),
  tourTitle: z.string().nullable(),
  startMs: z.number(),
  endMs: z.number(),
  before: z.string(),
  after: z.string(),
  createdAt: z.string(),
});
export type SpellingFixChangeDto = z.infer<typeof spellingFixChangeSchema>;

/** A fix with its audit (the audit only for moderators). */
export const spellingFixDetailSchema = spellingFixRowSchema.extend({
  undoneBy: z.string().nullable(),
  undoneAt: z.string().nullable(),
  changes: z.array(spellingFixChangeSchema),
});
export type SpellingFixDetail = z.infer<typeof spellingFixDetailSchema>;

/** What detection did: how much it read and how many fixes it opened. */
export const detectionReportSchema = z.object({
  tracks: z.number(),
  cues: z.number(),
  /** Names heard written otherwise than the accepted epithet. */
  misspellings: z.number(),
  /** New open fixes. */
  proposed: z.number(),
  /** Misspellings already open, or declined or undone before (not proposed again). */
  known: z.number(),
});
export type DetectionReport = z.infer<typeof detectionReportSchema>;

/** A caption track whose version an accept or undo moved on (an open editor must reload it). */
export const touchedTrackSchema = z.object({ id: z.number(), tourId: z.number(), version: z.number() });

/** POST /api/spelling-fixes: the fix (new, or the open one with the same words) and whether it is new. */
export const proposeFixResponseSchema = z.object({ fix: spellingFixDetailSchema, created: z.boolean() });

/** POST /api/spelling-fixes/:id/accept. */
export const acceptFixResponseSchema = z.object({
  fix: spellingFixDetailSchema,
  changedCues: z.number(),
  changedTracks: z.number(),
  tracks: z.array(touchedTrackSchema),
});
export type AcceptFixResponse = z.infer<typeof acceptFixResponseSchema>;

/** POST /api/spelling-fixes/:id/undo. */
export const undoFixResponseSchema = z.object({
  fix: spellingFixDetailSchema,
  restoredCues: z.number(),
  changedTracks: z.number(),
  tracks: z.array(touchedTrackSchema),
});
export type UndoFixResponse = z.infer<typeof undoFixResponseSchema>;

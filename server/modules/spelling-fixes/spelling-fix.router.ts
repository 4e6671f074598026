import { Router } from 'express';
import rateLimit from 'express-rate-limit';
import {
  declineFixInput,
  detectFixesInput,
  listFixesQuery,
  proposeFixInput,
  type AcceptFixResponse,
  type UndoFixResponse,
} from '../../../shared/schemas/spelling-fixes';
import { HttpError } from '../../errors/http-error';
import { requireRole, requireUser } from '../../middleware/auth';
import { idParam, parsedQuery, validateBody, validateQuery } from '../../middleware/validate';
import type { NameDetection } from './name-detection';
import { presentFixDetail, presentFixRow } from './spelling-fix.presenter';
import type { SpellingFixService } from './spelling-fix.service';

/** Flags per person per window: plenty for a careful viewer, a brake on scripted floods. */
export const FLAG_LIMIT = 60;
const FLAG_WINDOW_MS = 15 * 60_000;

/**
 * /api/spelling-fixes: flag (any signed-in user, rate limited per person; a repeated flag returns
 * the open fix), the queue, one fix with its audit, accept, decline, undo and detection (moderators).
 */
export function spellingFixRouter(fixes: SpellingFixService, detection: NameDetection, opts: { flagLimit?: number } = {}): Router {
  const r = Router();
  const flagLimiter = rateLimit({
    windowMs: FLAG_WINDOW_MS,
    limit: opts.flagLimit ?? FLAG_LIMIT,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => `user:${req.user?.id ?? 0}`,
    handler: (_req, _res, next) => next(new HttpError(429, 'rate_limited', 'You have flagged many names in a short time. Wait a few minutes and try again.')),
  });

  r.post('/spelling-fixes', requireUser, flagLimiter, validateBody(proposeFixInput), async (req, res) => {
    const { fix, created } = await fixes.propose(req.user!, req.body);
    res.status(created ? 201 : 200).json({ fix: presentFixDetail(await fixes.summary(fix.id)), created });
  });

  r.get('/spelling-fixes', requireRole('moderator'), validateQuery(listFixesQuery), async (_req, res) => {
    const page = await fixes.list(parsedQuery(res, listFixesQuery));
    res.json({ ...page, items: page.items.map(presentFixRow) });
  });

  r.post('/spelling-fixes/detect', requireRole('moderator'), validateBody(detectFixesInput), async (req, res) => {
    res.json({ report: await detection.run(req.body) });
  });

  r.get('/spelling-fixes/:id', requireUser, async (req, res) => {
    res.json({ fix: presentFixDetail(await fixes.get(idParam.parse(req.params.id), req.user!)) });
  });

  r.post('/spelling-fixes/:id/accept', requireRole('moderator'), async (req, res) => {
    const id = idParam.parse(req.params.id);
    const result = await fixes.accept(id, req.user!);
    res.json({
      fix: presentFixDetail(await fixes.get(result.fix.id, req.user!)),
      changedCues: result.changedCues,
      changedTracks: result.tracks.length,
      tracks: result.tracks,
    } satisfies AcceptFixResponse);
  });

  r.post('/spelling-fixes/:id/decline', requireRole('moderator'), validateBody(declineFixInput), async (req, res) => {
    const fix = await fixes.decline(idParam.parse(req.params.id), req.user!, req.body.reason);
    res.json({ fix: presentFixDetail(await fixes.get(fix.id, req.user!)) });
  });

  r.post('/spelling-fixes/:id/undo', requireRole('moderator'), async (req, res) => {
    const result = await fixes.undo(idParam.parse(req.params.id), req.user!);
    res.json({
      fix: presentFixDetail(await fixes.get(result.fix.id, req.user!)),
      restoredCues: result.restoredCues,
      changedTracks: result.tracks.length,
      tracks: result.tracks,
    } satisfies UndoFixResponse);
  });

  return r;
}

import { Router } from 'express';
import { compareQuery, finderRequest, learnAnswerInput, pairNoteInput } from '../../../shared/schemas/learning';
import { requireRole, requireUser } from '../../middleware/auth';
import { parsedQuery, validateBody, validateQuery } from '../../middleware/validate';
import type { LearningService } from './learning.service';

/** /api/finder, /api/lookalikes, /api/compare, /api/pair-notes, /api/learn. */
export function learningRouter(learning: LearningService): Router {
  const r = Router();
  r.post('/finder', validateBody(finderRequest), async (req, res) => {
    res.json(await learning.find(req.body, req.user));
  });
  r.get('/lookalikes/:idOrSlug', async (req, res) => {
    res.json(await learning.lookalikes(String(req.params.idOrSlug)));
  });
  r.get('/compare', validateQuery(compareQuery), async (_req, res) => {
    res.json(await learning.compare(parsedQuery(res, compareQuery).ids));
  });
  r.put('/pair-notes', requireRole('author'), validateBody(pairNoteInput), async (req, res) => {
    res.json({ note: await learning.savePairNote(req.user!, req.body) });
  });
  r.get('/learn/question', async (_req, res) => {
    res.set('Cache-Control', 'no-store').json(await learning.question());
  });
  r.post('/learn/answer', validateBody(learnAnswerInput), async (req, res) => {
    res.json(await learning.answer(req.body.token, req.body.chosenId, req.user));
  });
  r.get('/learn/progress', requireUser, async (req, res) => {
    res.set('Cache-Control', 'no-store').json(await learning.progress(req.user!));
  });
  return r;
}

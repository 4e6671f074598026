import { Router } from 'express';
import { glossaryQuery } from '../../../shared/schemas/glossary';
import { parsedQuery, validateQuery } from '../../middleware/validate';
import type { GlossaryService } from './glossary.service';

/** GET /api/glossary?q=&letter= — public, like the approved records it lists. */
export function glossaryRouter(glossary: GlossaryService): Router {
  const r = Router();
  r.get('/glossary', validateQuery(glossaryQuery), async (_req, res) => {
    res.json(await glossary.list(parsedQuery(res, glossaryQuery)));
  });
  return r;
}

import { Router } from 'express';
import { z } from 'zod';
import { whereToSeeQuery } from '../../../shared/schemas/watch';
import { idParam, parsedQuery, validateQuery } from '../../middleware/validate';
import type { WatchService } from './watch.service';

const idOrSlugParam = z.string().trim().min(1).max(160);

/** GET /api/tours/:id/watch (the tour page in one response) and GET /api/cultivars/:idOrSlug/moments ("where to see it"). */
export function watchRouter(watch: WatchService): Router {
  const r = Router();

  r.get('/tours/:id/watch', async (req, res) => {
    res.set('Cache-Control', 'private, no-cache').json(await watch.watch(idParam.parse(req.params.id), req.user));
  });

  r.get('/cultivars/:idOrSlug/moments', validateQuery(whereToSeeQuery), async (req, res) => {
    res.json(await watch.whereToSee(idOrSlugParam.parse(req.params.idOrSlug), req.user, parsedQuery(res, whereToSeeQuery)));
  });

  return r;
}

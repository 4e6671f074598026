import { Router, type Response } from 'express';
import { trackLangQuery } from '../../../shared/schemas/captions';
import { stopInput, updateStopInput } from '../../../shared/schemas/stops';
import { requireRole } from '../../middleware/auth';
import { idParam, parsedQuery, validateBody, validateQuery } from '../../middleware/validate';
import { presentJob } from '../tours/tour.presenter';
import { presentStop } from './stop.presenter';
import type { StopService, TextTrack } from './stop.service';

/** Generated tracks are what the player loads: served as WebVTT, cached briefly only when public. */
function sendTextTrack(res: Response, track: TextTrack): void {
  res
    .set('Content-Type', 'text/vtt; charset=utf-8')
    .set('Cache-Control', track.published ? 'public, max-age=60' : 'private, no-cache')
    .send(track.body);
}

/**
 * Stops: /api/tours/:id/stops (list, add), /api/stops/:id (edit, remove), the generated
 * /api/tours/:id/chapters.vtt and metadata.vtt, /api/tours/:id/stop-suggestions and
 * /api/tours/:id/keyframes.
 */
export function stopRouter(stops: StopService): Router {
  const r = Router();

  r.get('/tours/:id/stops', async (req, res) => {
    const items = await stops.list(idParam.parse(req.params.id), req.user);
    res.json({ items: items.map(presentStop) });
  });

  r.post('/tours/:id/stops', requireRole('author'), validateBody(stopInput), async (req, res) => {
    const stop = await stops.create(idParam.parse(req.params.id), req.user!, req.body);
    res.status(201).json({ stop: presentStop(stop) });
  });

  r.patch('/stops/:id', requireRole('author'), validateBody(updateStopInput), async (req, res) => {
    const stop = await stops.update(idParam.parse(req.params.id), req.user!, req.body);
    res.json({ stop: presentStop(stop) });
  });

  r.delete('/stops/:id', requireRole('author'), async (req, res) => {
    await stops.remove(idParam.parse(req.params.id), req.user!);
    res.status(204).end();
  });

  r.get('/tours/:id/chapters.vtt', async (req, res) => {
    sendTextTrack(res, await stops.chapters(idParam.parse(req.params.id), req.user));
  });

  r.get('/tours/:id/metadata.vtt', async (req, res) => {
    sendTextTrack(res, await stops.metadata(idParam.parse(req.params.id), req.user));
  });

  r.get('/tours/:id/stop-suggestions', requireRole('author'), validateQuery(trackLangQuery), async (req, res) => {
    const items = await stops.suggestions(idParam.parse(req.params.id), req.user!, parsedQuery(res, trackLangQuery).lang);
    res.set('Cache-Control', 'no-store').json({ items });
  });

  r.post('/tours/:id/keyframes', requireRole('author'), async (req, res) => {
    const job = await stops.keyframes(idParam.parse(req.params.id), req.user!);
    res.status(202).json({ job: presentJob(job) });
  });

  return r;
}

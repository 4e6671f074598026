import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { randomBytes } from 'node:crypto';
import { z } from 'zod';
import { listToursQuery, tourDetailsInput, updateTourInput } from '../../../shared/schemas/tours';
import { BadRequest } from '../../errors/http-error';
import { requireRole } from '../../middleware/auth';
import { idParam, parsedQuery, validateBody, validateQuery } from '../../middleware/validate';
import type { MediaStorage } from '../../media/storage';
import { presentJob, presentTour } from './tour.presenter';
import type { TourService } from './tour.service';

const transcodeInput = z.object({ keyframeTimesSec: z.array(z.number().min(0).max(4 * 3600)).max(500).default([]) });

/** Multer to disk under media/tmp with the configured size limit; one file field named "video". */
function uploadMiddleware(storage: MediaStorage, limitBytes: number): RequestHandler {
  return multer({
    storage: multer.diskStorage({
      destination: storage.incomingDir,
      filename: (_req, _file, cb) => cb(null, `up-${Date.now()}-${randomBytes(6).toString('hex')}`),
    }),
    limits: { fileSize: limitBytes, files: 1, fields: 10, fieldSize: 64 * 1024 },
  }).single('video');
}

/** /api/tours: list, read, upload, edit, publish, transcode again, delete. */
export function tourRouter(tours: TourService, storage: MediaStorage, uploadLimitBytes: number): Router {
  const r = Router();
  const upload = uploadMiddleware(storage, uploadLimitBytes);

  r.get('/', validateQuery(listToursQuery), async (req, res) => {
    const page = await tours.list(parsedQuery(res, listToursQuery), req.user);
    const jobs = parsedQuery(res, listToursQuery).mine === '1' ? await tours.latestJobs(page.items.map((t) => t.id)) : new Map();
    res.json({ ...page, items: page.items.map((t) => presentTour(t, req.user, jobs.get(t.id))) });
  });

  r.get('/:id', async (req, res) => {
    const tour = await tours.getVisible(idParam.parse(req.params.id), req.user);
    res.json({ tour: presentTour(tour, req.user, await tours.latestJob(tour.id)) });
  });

  r.get('/:id/job', async (req, res) => {
    const tour = await tours.getEditable(idParam.parse(req.params.id), req.user);
    const job = await tours.latestJob(tour.id);
    res.set('Cache-Control', 'no-store').json({ state: tour.state, failureReason: tour.failureReason, job: presentJob(job) });
  });

  r.post('/', requireRole('author'), upload, async (req, res) => {
    if (!req.file) throw new BadRequest('no_file', 'Choose a video file to upload.', { video: 'Choose a video file.' });
    const details = tourDetailsInput.partial().safeParse(req.body ?? {});
    const { tour, job } = await tours.acceptUpload(req.user!, req.file, { details: details.success ? details.data : {} });
    tours.notifyWorker();
    const full = await tours.getVisible(tour.id, req.user);
    res.status(202).json({ tour: presentTour(full, req.user, job) });
  });

  r.post('/:id/video', requireRole('author'), upload, async (req, res) => {
    if (!req.file) throw new BadRequest('no_file', 'Choose a video file to upload.', { video: 'Choose a video file.' });
    const { tour, job } = await tours.acceptUpload(req.user!, req.file, { tourId: idParam.parse(req.params.id) });
    tours.notifyWorker();
    const full = await tours.getVisible(tour.id, req.user);
    res.status(202).json({ tour: presentTour(full, req.user, job) });
  });

  r.patch('/:id', requireRole('author'), validateBody(updateTourInput), async (req, res) => {
    const tour = await tours.update(idParam.parse(req.params.id), req.user!, req.body);
    res.json({ tour: presentTour(tour, req.user, await tours.latestJob(tour.id)) });
  });

  r.post('/:id/publish', requireRole('author'), async (req, res) => {
    const tour = await tours.publish(idParam.parse(req.params.id), req.user!, true);
    res.json({ tour: presentTour(tour, req.user, await tours.latestJob(tour.id)) });
  });

  r.post('/:id/unpublish', requireRole('author'), async (req, res) => {
    const tour = await tours.publish(idParam.parse(req.params.id), req.user!, false);
    res.json({ tour: presentTour(tour, req.user, await tours.latestJob(tour.id)) });
  });

  r.post('/:id/transcode', requireRole('author'), validateBody(transcodeInput), async (req, res) => {
    const job = await tours.retranscode(idParam.parse(req.params.id), req.user!, req.body.keyframeTimesSec);
    tours.notifyWorker();
    res.status(202).json({ job: presentJob(job) });
  });

  r.delete('/:id', requireRole('author'), async (req, res) => {
    await tours.remove(idParam.parse(req.params.id), req.user!);
    res.status(204).end();
  });

  return r;
}

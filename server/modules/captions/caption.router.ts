import { Router, type RequestHandler, type Response } from 'express';
import multer, { MulterError } from 'multer';
import { CAPTION_FILE_MAX_BYTES, createTrackInput, importTrackInput, saveCuesInput, trackLangQuery, updateTrackInput } from '../../../shared/schemas/captions';
import { BadRequest, HttpError } from '../../errors/http-error';
import { requireRole } from '../../middleware/auth';
import { idParam, parsedQuery, validateBody, validateQuery } from '../../middleware/validate';
import type { TourService } from '../tours/tour.service';
import { presentTrack } from './caption.presenter';
import type { CaptionService, ExportFile } from './caption.service';

const IMPORT_PATH = '/tours/:id/tracks/import';
const CUES_PATH = '/tracks/:trackId/cues';
/**
 * The two routes whose JSON body is a whole caption track (import, cue autosave): up to CUES_MAX
 * cues, so they get TRACK_BODY_LIMIT; every other JSON body keeps the app's smaller limit.
 */
export const TRACK_BODY_PATHS = [IMPORT_PATH, CUES_PATH];
export const TRACK_BODY_LIMIT = '8mb';

/** One caption file, kept in memory (it is small), under the shared size limit. */
function captionUpload(): RequestHandler {
  const single = multer({ storage: multer.memoryStorage(), limits: { fileSize: CAPTION_FILE_MAX_BYTES, files: 1, fields: 5 } }).single('file');
  const mb = CAPTION_FILE_MAX_BYTES / (1024 * 1024);
  return (req, res, next) => {
    single(req, res, (err?: unknown) => {
      if (err instanceof MulterError && err.code === 'LIMIT_FILE_SIZE') {
        return next(new HttpError(413, 'caption_file_too_large', `Caption files can be at most ${mb} MB and this one is larger. Check that it is a caption file, or split it.`));
      }
      next(err);
    });
  };
}

/** A download: Content-Disposition names the file (with an RFC 6266 UTF-8 form when needed). */
function sendDownload(res: Response, file: ExportFile): void {
  res.attachment(file.filename);
  res.set('Content-Type', file.contentType).set('Cache-Control', 'private, no-cache').send(file.body);
}

/**
 * Caption tracks: /api/tours/:id/tracks (list, create, preview a file, import), /api/tracks/:trackId
 * (read, autosave cues, rename, delete, export) and /api/tours/:id/transcript.
 */
export function captionRouter(captions: CaptionService, tours: TourService): Router {
  const r = Router();
  const upload = captionUpload();

  r.get('/tours/:id/tracks', async (req, res) => {
    const items = await captions.list(idParam.parse(req.params.id), req.user);
    res.json({ items: items.map((t) => presentTrack(t.track, t.cueCount)) });
  });

  r.post('/tours/:id/tracks', requireRole('author'), validateBody(createTrackInput), async (req, res) => {
    const t = await captions.create(idParam.parse(req.params.id), req.user!, req.body);
    res.status(201).json({ track: presentTrack(t.track, t.cueCount) });
  });

  // Rights are checked before the body is read, so a refused caller never uploads the file.
  const editableTour: RequestHandler = async (req, _res, next) => {
    await tours.getEditable(idParam.parse(req.params.id), req.user);
    next();
  };
  r.post('/tours/:id/tracks/preview', requireRole('author'), editableTour, upload, async (req, res) => {
    if (!req.file) throw new BadRequest('no_file', 'Choose a caption file (.vtt or .srt) to preview.', { file: 'Choose a caption file.' });
    res.json(await captions.preview(idParam.parse(req.params.id), req.user!, req.file.buffer));
  });

  r.post(IMPORT_PATH, requireRole('author'), validateBody(importTrackInput), async (req, res) => {
    const t = await captions.importTrack(idParam.parse(req.params.id), req.user!, req.body);
    res.status(201).json({ track: presentTrack(t.track, t.cueCount) });
  });

  r.get('/tours/:id/transcript', validateQuery(trackLangQuery), async (req, res) => {
    res.json(await captions.transcript(idParam.parse(req.params.id), req.user, parsedQuery(res, trackLangQuery).lang));
  });

  r.get('/tracks/:trackId', async (req, res) => {
    const d = await captions.detail(idParam.parse(req.params.trackId), req.user);
    res.set('Cache-Control', 'no-store').json({ track: presentTrack(d.track.track, d.track.cueCount), cues: d.cues, quality: d.quality });
  });

  r.put(CUES_PATH, requireRole('author'), validateBody(saveCuesInput), async (req, res) => {
    const t = await captions.saveCues(idParam.parse(req.params.trackId), req.user!, req.body);
    res.json({ track: presentTrack(t.track, t.cueCount) });
  });

  r.patch('/tracks/:trackId', requireRole('author'), validateBody(updateTrackInput), async (req, res) => {
    const t = await captions.update(idParam.parse(req.params.trackId), req.user!, req.body);
    res.json({ track: presentTrack(t.track, t.cueCount) });
  });

  r.delete('/tracks/:trackId', requireRole('author'), async (req, res) => {
    await captions.remove(idParam.parse(req.params.trackId), req.user!);
    res.status(204).end();
  });

  r.get('/tracks/:trackId/export.vtt', async (req, res) => {
    sendDownload(res, await captions.exportTrack(idParam.parse(req.params.trackId), req.user, 'vtt'));
  });

  r.get('/tracks/:trackId/export.srt', async (req, res) => {
    sendDownload(res, await captions.exportTrack(idParam.parse(req.params.trackId), req.user, 'srt'));
  });

  return r;
}

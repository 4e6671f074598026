import { Router } from 'express';
import path from 'node:path';
import { stat } from 'node:fs/promises';
import { NotFound } from '../../errors/http-error';
import type { MediaStorage } from '../../media/storage';
import { idParam } from '../../middleware/validate';
import type { TourService } from './tour.service';

const CONTENT_TYPES: Record<string, string> = { '.mp4': 'video/mp4', '.jpg': 'image/jpeg', '.jpeg': 'image/jpeg', '.webp': 'image/webp', '.vtt': 'text/vtt; charset=utf-8' };

/**
 * /media/tours/:id/:file — renditions, poster and thumbnails, with HTTP Range support (206/416
 * from Express's send), the tour's visibility rules, and only files the tour record names.
 */
export function mediaRouter(tours: TourService, storage: MediaStorage): Router {
  const r = Router();
  r.get('/tours/:id/:file', async (req, res) => {
    const tour = await tours.getVisible(idParam.parse(req.params.id), req.user);
    const file = String(req.params.file);
    const known = new Set<string>([
      ...(tour.renditions ?? []).map((x) => x.file),
      ...(tour.posterFile ? [tour.posterFile] : []),
      ...(tour.thumbStrip?.sheets ?? []).map((s) => s.file),
    ]);
    if (!tour.mediaDir || !known.has(file) || file.includes('/') || file.includes('\\')) throw new NotFound('No such media file.');
    const rel = path.relative(storage.root, storage.resolve(`${tour.mediaDir}/${file}`));
    const ext = file.slice(file.lastIndexOf('.')).toLowerCase();
    // Versioned URLs (?v=) change with every transcode, so published media can be cached.
    const cache = tour.state === 'published' ? 'public, max-age=86400' : 'private, no-cache';
    await new Promise<void>((resolve, reject) => {
      res.sendFile(
        rel,
        // `root` keeps the dotfile rule to the part below MEDIA_DIR (which may itself sit in a dot folder).
        { root: storage.root, headers: { 'Content-Type': CONTENT_TYPES[ext] ?? 'application/octet-stream', 'Cache-Control': cache, 'X-Content-Type-Options': 'nosniff' }, dotfiles: 'deny', cacheControl: false, acceptRanges: true },
        (err) => {
          if (!err) return resolve();
          const e = err as Error & { status?: number; statusCode?: number; code?: string };
          if (e.code === 'ENOENT') return reject(new NotFound('No such media file.'));
          if (res.headersSent) return resolve();
          if ((e.status ?? e.statusCode) === 416) {
            // RFC 9110 §15.5.17: say how long the representation is.
            return stat(path.join(storage.root, rel)).then((st) => {
              res.status(416).set('Content-Range', `bytes */${st.size}`).json({ error: { code: 'range_not_satisfiable', message: 'That byte range is outside the file.' } });
              resolve();
            }, reject);
          }
          reject(err);
        },
      );
    });
  });
  return r;
}

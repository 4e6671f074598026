import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { CULTIVAR_PHOTO_MAX_BYTES, cultivarPhotoInput, updateCultivarPhotoInput } from '../../../shared/schemas/cultivars';
import { NotFound } from '../../errors/http-error';
import { requireRole } from '../../middleware/auth';
import { idParam, validateBody } from '../../middleware/validate';
import type { CultivarPhotoService } from './cultivar-photo.service';
import { presentCultivarPhoto } from './cultivar.presenter';

/** One photo per request, kept in memory: sharp reads the buffer and only the resized files reach the disk. */
const photoUpload: RequestHandler = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: CULTIVAR_PHOTO_MAX_BYTES, files: 1, fields: 5, fieldSize: 4096 },
}).single('photo');

/**
 * /api/cultivars/:id/photos: upload (multipart: file "photo", field "altText"), edit alt text or
 * position, remove — moderators, and authors on their own proposals.
 */
export function cultivarPhotoRouter(photos: CultivarPhotoService): Router {
  const r = Router();

  r.post('/cultivars/:id/photos', requireRole('author'), photoUpload, async (req, res) => {
    const input = cultivarPhotoInput.parse(req.body ?? {});
    const photo = await photos.add(idParam.parse(req.params.id), req.user!, req.file?.buffer, input);
    res.status(201).json({ photo: presentCultivarPhoto(photo) });
  });

  r.patch('/cultivars/:id/photos/:photoId', requireRole('author'), validateBody(updateCultivarPhotoInput), async (req, res) => {
    const photo = await photos.update(idParam.parse(req.params.id), idParam.parse(req.params.photoId), req.user!, req.body);
    res.json({ photo: presentCultivarPhoto(photo) });
  });

  r.delete('/cultivars/:id/photos/:photoId', requireRole('author'), async (req, res) => {
    await photos.remove(idParam.parse(req.params.id), idParam.parse(req.params.photoId), req.user!);
    res.status(204).end();
  });

  return r;
}

/** /media/cultivars/:id/:file — photo files, public once the record is approved, sent as image/jpeg. */
export function cultivarMediaRouter(photos: CultivarPhotoService): Router {
  const r = Router();
  r.get('/:id/:file', async (req, res) => {
    const id = idParam.safeParse(req.params.id);
    if (!id.success) throw new NotFound('No such photo.');
    const f = await photos.file(id.data, String(req.params.file), req.user);
    await new Promise<void>((resolve, reject) => {
      res.sendFile(
        f.rel,
        { root: f.root, headers: { 'Content-Type': f.contentType, 'Cache-Control': f.cacheControl, 'X-Content-Type-Options': 'nosniff' }, dotfiles: 'deny', cacheControl: false },
        (err) => {
          if (!err) return resolve();
          if ((err as NodeJS.ErrnoException).code === 'ENOENT') return reject(new NotFound('No such photo.'));
          if (res.headersSent) return resolve();
          reject(err);
        },
      );
    });
  });
  return r;
}

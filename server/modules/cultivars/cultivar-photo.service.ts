import { randomBytes } from 'node:crypto';
import { mkdir, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import sharp from 'sharp';
import type { DataSource } from 'typeorm';
import { hasRole } from '../../../shared/schemas/common';
import {
  CULTIVAR_PHOTO_MAX_SIDE,
  CULTIVAR_PHOTO_THUMB_SIDE,
  type CultivarPhotoInput,
  type UpdateCultivarPhotoInput,
} from '../../../shared/schemas/cultivars';
import { Cultivar } from '../../db/entities/cultivar.entity';
import { CultivarPhoto } from '../../db/entities/cultivar-photo.entity';
import type { User } from '../../db/entities/user.entity';
import { BadRequest, Forbidden, HttpError, NotFound } from '../../errors/http-error';
import type { CultivarService } from './cultivar.service';

/** Image formats a photo may arrive in (decoded by sharp); SVG and other vector formats are refused. */
const ACCEPTED_FORMATS = new Set(['jpeg', 'png', 'webp', 'avif', 'heif', 'tiff', 'gif']);
/** Refuses decompression bombs: 60 megapixels is more than any phone camera writes (common practice). */
const MAX_INPUT_PIXELS = 60_000_000;
/** JPEG quality of stored photos and thumbnails (mozjpeg; common practice for photos on the web). */
const JPEG_QUALITY = 82;

/** A photo file that is not a usable image: 415 with the reason. */
export class PhotoRefused extends HttpError {
  constructor(code: string, message: string) {
    super(415, code, message, { photo: message });
  }
}

/** A file to send from the photo route. */
export interface PhotoFile {
  root: string;
  rel: string;
  contentType: string;
  cacheControl: string;
}

/** One resized JPEG with its size. */
interface Rendered {
  data: Buffer;
  width: number;
  height: number;
}

/**
 * Fits a picture within `side` × `side` pixels as a JPEG: turned upright from its EXIF
 * orientation, never enlarged, metadata (location included) dropped.
 */
export async function renderPhoto(input: Buffer, side: number): Promise<Rendered> {
  const { data, info } = await sharp(input, { limitInputPixels: MAX_INPUT_PIXELS, failOn: 'error' })
    .rotate()
    .resize({ width: side, height: side, fit: 'inside', withoutEnlargement: true })
    .flatten({ background: '#ffffff' })
    .jpeg({ quality: JPEG_QUALITY, mozjpeg: true })
    .toBuffer({ resolveWithObject: true });
  return { data, width: info.width, height: info.height };
}

/**
 * Photos of cultivar records: upload (resized with sharp to a display image and a thumbnail under
 * MEDIA_DIR/cultivars/<id>/), alt text and order, removal, and the files for the media route.
 */
export class CultivarPhotoService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly mediaRoot: string,
    private readonly cultivars: CultivarService,
  ) {}

  private async record(id: number): Promise<Cultivar> {
    const c = await this.dataSource.getRepository(Cultivar).findOneBy({ id });
    if (!c) throw new NotFound('No such cultivar record.');
    return c;
  }

  /** Moderators manage every record's photos; an author manages the photos of their own proposal. */
  private async manageable(id: number, user: User): Promise<Cultivar> {
    const c = await this.record(id);
    if (!this.cultivars.canSee(c, user)) throw new NotFound('No such cultivar record.');
    const own = c.createdById === user.id && c.status === 'proposed' && hasRole(user.role, 'author');
    if (!hasRole(user.role, 'moderator') && !own) throw new Forbidden('forbidden', 'Only moderators (or the proposer, while the record is a proposal) can change its photos.');
    return c;
  }

  private abs(rel: string): string {
    const abs = path.resolve(this.mediaRoot, rel);
    if (!abs.startsWith(this.mediaRoot + path.sep)) throw new Error(`path escapes media root: ${rel}`);
    return abs;
  }

  /** Stores a photo: checks it decodes as a raster image, writes both sizes, then the row. */
  async add(cultivarId: number, user: User, upload: Buffer | undefined, input: CultivarPhotoInput): Promise<CultivarPhoto> {
    const c = await this.manageable(cultivarId, user);
    if (!upload || upload.length === 0) throw new BadRequest('no_file', 'Choose a photo to upload.', { photo: 'Choose a photo.' });
    let format: string | undefined;
    try {
      format = (await sharp(upload, { limitInputPixels: MAX_INPUT_PIXELS }).metadata()).format;
    } catch (err) {
      const tooBig = err instanceof Error && /pixel limit/i.test(err.message);
      throw new PhotoRefused(tooBig ? 'photo_too_large' : 'photo_unreadable', tooBig ? 'The photo has more than 60 megapixels; make it smaller first.' : 'This file is not an image Grovewalk can read (JPEG, PNG, WebP, AVIF, HEIF, TIFF or GIF).');
    }
    if (!format || !ACCEPTED_FORMATS.has(format)) {
      throw new PhotoRefused('photo_format', `Photos must be JPEG, PNG, WebP, AVIF, HEIF, TIFF or GIF${format ? `, not ${format.toUpperCase()}` : ''}.`);
    }
    let full: Rendered;
    let thumb: Rendered;
    try {
      [full, thumb] = await Promise.all([renderPhoto(upload, CULTIVAR_PHOTO_MAX_SIDE), renderPhoto(upload, CULTIVAR_PHOTO_THUMB_SIDE)]);
    } catch {
      throw new PhotoRefused('photo_unreadable', 'The photo could not be decoded; it may be damaged. Export it again and retry.');
    }

    const token = randomBytes(9).toString('base64url');
    const dir = `cultivars/${c.id}`;
    const file = `${dir}/${token}.jpg`;
    const thumbFile = `${dir}/${token}-thumb.jpg`;
    await mkdir(this.abs(dir), { recursive: true });
    await writeFile(this.abs(file), full.data);
    await writeFile(this.abs(thumbFile), thumb.data);
    try {
      const repo = this.dataSource.getRepository(CultivarPhoto);
      const last: { max: number | null } | undefined = await repo.createQueryBuilder('p').select('MAX(p.position)', 'max').where('p.cultivarId = :id', { id: c.id }).getRawOne();
      const saved = await repo.save(
        repo.create({
          cultivarId: c.id,
          file,
          thumbFile,
          width: full.width,
          height: full.height,
          thumbWidth: thumb.width,
          thumbHeight: thumb.height,
          altText: input.altText,
          position: last?.max == null ? 0 : Number(last.max) + 1,
        }),
      );
      return repo.findOneByOrFail({ id: saved.id });
    } catch (err) {
      await Promise.all([rm(this.abs(file), { force: true }), rm(this.abs(thumbFile), { force: true })]);
      throw err;
    }
  }

  private async photoOf(cultivarId: number, photoId: number): Promise<CultivarPhoto> {
    const photo = await this.dataSource.getRepository(CultivarPhoto).findOneBy({ id: photoId, cultivarId });
    if (!photo) throw new NotFound('No such photo of this record.');
    return photo;
  }

  /** New alt text or position. */
  async update(cultivarId: number, photoId: number, user: User, input: UpdateCultivarPhotoInput): Promise<CultivarPhoto> {
    await this.manageable(cultivarId, user);
    const photo = await this.photoOf(cultivarId, photoId);
    const patch: Partial<CultivarPhoto> = {};
    if (input.altText !== undefined) patch.altText = input.altText;
    if (input.position !== undefined) patch.position = input.position;
    if (Object.keys(patch).length) await this.dataSource.getRepository(CultivarPhoto).update({ id: photo.id }, patch);
    return this.photoOf(cultivarId, photoId);
  }

  /** Deletes the row, then both files. */
  async remove(cultivarId: number, photoId: number, user: User): Promise<void> {
    await this.manageable(cultivarId, user);
    const photo = await this.photoOf(cultivarId, photoId);
    await this.dataSource.getRepository(CultivarPhoto).delete({ id: photo.id });
    await Promise.all([rm(this.abs(photo.file), { force: true }), rm(this.abs(photo.thumbFile), { force: true })]);
  }

  /** The file behind /media/cultivars/:id/:file, if the viewer may see the record's photos. */
  async file(cultivarId: number, name: string, viewer: User | undefined): Promise<PhotoFile> {
    if (!/^[A-Za-z0-9_-]+(-thumb)?\.jpg$/.test(name)) throw new NotFound('No such photo.');
    const c = await this.dataSource.getRepository(Cultivar).findOneBy({ id: cultivarId });
    if (!c || !this.cultivars.canSeePhotos(c, viewer)) throw new NotFound('No such photo.');
    const photos = await this.dataSource.getRepository(CultivarPhoto).findBy({ cultivarId });
    const rel = photos.flatMap((p) => [p.file, p.thumbFile]).find((f) => path.posix.basename(f) === name);
    if (!rel) throw new NotFound('No such photo.');
    this.abs(rel);
    return {
      root: this.mediaRoot,
      rel,
      contentType: 'image/jpeg',
      // File names change with every upload, so public photos can be cached for a day.
      cacheControl: c.status === 'approved' ? 'public, max-age=86400' : 'private, no-cache',
    };
  }
}

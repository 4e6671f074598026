import { mkdir, rm } from 'node:fs/promises';
import path from 'node:path';

/** Where each kind of media file lives under MEDIA_DIR; the database stores paths relative to it. */
export class MediaStorage {
  constructor(readonly root: string) {}

  /** Multer writes incoming uploads here first; they move once ffprobe accepts them. */
  get incomingDir(): string {
    return path.join(this.root, 'tmp');
  }

  uploadsDir(tourId: number): string {
    return path.join(this.root, 'uploads', String(tourId));
  }

  /** Each transcode writes a fresh folder, so a player never sees half-written files. */
  outputDir(tourId: number, jobId: number): string {
    return path.join(this.root, 'renditions', String(tourId), `j${jobId}`);
  }

  tourRenditionsRoot(tourId: number): string {
    return path.join(this.root, 'renditions', String(tourId));
  }

  relative(abs: string): string {
    return path.relative(this.root, abs);
  }

  /** Resolves a stored relative path, refusing anything that escapes MEDIA_DIR. */
  resolve(rel: string): string {
    const abs = path.resolve(this.root, rel);
    if (abs !== this.root && !abs.startsWith(this.root + path.sep)) throw new Error(`path escapes media root: ${rel}`);
    return abs;
  }

  async ensure(): Promise<void> {
    await mkdir(this.incomingDir, { recursive: true });
    await mkdir(path.join(this.root, 'uploads'), { recursive: true });
    await mkdir(path.join(this.root, 'renditions'), { recursive: true });
  }

  /** Removes everything a tour owns on disk. */
  async removeTour(tourId: number): Promise<void> {
    await rm(this.uploadsDir(tourId), { recursive: true, force: true });
    await rm(this.tourRenditionsRoot(tourId), { recursive: true, force: true });
  }
}

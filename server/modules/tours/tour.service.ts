import { rename, rm, mkdir } from 'node:fs/promises';
import path from 'node:path';
import { In, type DataSource, type EntityManager, type SelectQueryBuilder } from 'typeorm';
import { hasRole } from '../../../shared/schemas/common';
import type { ListToursQuery, TourDetailsInput, UpdateTourInput } from '../../../shared/schemas/tours';
import { Job } from '../../db/entities/job.entity';
import { Tour } from '../../db/entities/tour.entity';
import { likeContains } from '../../db/like';
import type { User } from '../../db/entities/user.entity';
import { Conflict, Forbidden, HttpError, NotFound } from '../../errors/http-error';
import { JobQueue } from '../../jobs/queue';
import { inspectUpload } from '../../media/probe';
import type { MediaStorage } from '../../media/storage';
import { canEditTour, canViewTour } from './tour.policy';
import { sanitizeRichText } from './sanitize';

export const TRANSCODE_JOB = 'transcode';

/**
 * Browse filters of the tours list: garden (part of its name, wildcards escaped), cultivar (a stop
 * linked to that record, by id or slug) and Group (a stop whose record is in that cultivar Group;
 * "Dissectum" and "Dissectum Group" both work). The column collation ignores case.
 */
export function applyBrowseFilters(qb: SelectQueryBuilder<Tour>, q: Pick<ListToursQuery, 'garden' | 'cultivar' | 'group'>): void {
  if (q.garden) qb.andWhere('t.garden LIKE :garden', { garden: likeContains(q.garden) });
  if (q.cultivar) {
    const byId = /^\d+$/.test(q.cultivar);
    qb.andWhere(
      `EXISTS (SELECT 1 FROM stops bs JOIN cultivars bc ON bc.id = bs.cultivar_id WHERE bs.tour_id = t.id AND ${byId ? 'bc.id = :browseCultivarId' : 'bc.slug = :browseCultivarSlug'})`,
      byId ? { browseCultivarId: Number(q.cultivar) } : { browseCultivarSlug: q.cultivar.toLowerCase() },
    );
  }
  if (q.group) {
    const base = q.group.replace(/\s+group$/i, '').trim();
    qb.andWhere(
      'EXISTS (SELECT 1 FROM stops gs JOIN cultivars gc ON gc.id = gs.cultivar_id WHERE gs.tour_id = t.id AND (gc.group_name = :groupBase OR gc.group_name = :groupFull))',
      { groupBase: base, groupFull: `${base} Group` },
    );
  }
}

/** An uploaded file as multer leaves it on disk. */
export interface IncomingFile {
  path: string;
  originalname: string;
  size: number;
}

/** A refused upload: 422 with the media problem as the code. */
export class UploadRefused extends HttpError {
  constructor(code: string, message: string) {
    super(422, `upload_${code}`, message);
  }
}

/** Tours: details, upload → transcode job, publish, delete; ownership and visibility rules. */
export class TourService {
  private readonly queue: JobQueue;

  constructor(
    private readonly dataSource: DataSource,
    private readonly storage: MediaStorage,
    private readonly onEnqueued: () => void = () => undefined,
  ) {
    this.queue = new JobQueue(dataSource);
  }

  private repo(m: EntityManager = this.dataSource.manager) {
    return m.getRepository(Tour);
  }

  /** A tour the viewer may see, or 404 (drafts of others do not exist as far as they know). */
  async getVisible(id: number, viewer: User | undefined): Promise<Tour> {
    const tour = await this.repo().findOne({ where: { id }, relations: { author: true } });
    if (!tour || !canViewTour(viewer, tour)) throw new NotFound('No such tour.');
    return tour;
  }

  async getEditable(id: number, user: User | undefined): Promise<Tour> {
    const tour = await this.getVisible(id, user);
    if (!canEditTour(user, tour)) throw new Forbidden('forbidden', 'Only the tour’s author, moderators and admins can change it.');
    return tour;
  }

  latestJob(tourId: number) {
    return this.queue.latestFor('tour', tourId);
  }

  /** Newest jobs of several tours at once (one query for a whole page). */
  async latestJobs(tourIds: number[]): Promise<Map<number, Job>> {
    const map = new Map<number, Job>();
    if (!tourIds.length) return map;
    const jobs = await this.dataSource.getRepository(Job).find({ where: { subjectType: 'tour', subjectId: In(tourIds) }, order: { id: 'ASC' } });
    for (const j of jobs) map.set(j.subjectId, j);
    return map;
  }

  /** Public list (published, newest first) or the signed-in author's own tours in every state. */
  async list(q: ListToursQuery, viewer: User | undefined) {
    const qb = this.repo().createQueryBuilder('t').leftJoinAndSelect('t.author', 'a');
    if (q.mine === '1') {
      if (!viewer) throw new HttpError(401, 'unauthenticated', 'Please sign in first.');
      qb.where('t.authorId = :me', { me: viewer.id }).orderBy('t.updatedAt', 'DESC');
    } else {
      qb.where("t.state = 'published'").orderBy('t.publishedAt', 'DESC');
      if (q.author) qb.andWhere('t.authorId = :author', { author: q.author });
    }
    applyBrowseFilters(qb, q);
    qb.addOrderBy('t.id', 'DESC').skip((q.page - 1) * q.pageSize).take(q.pageSize);
    const [items, total] = await qb.getManyAndCount();
    return { items, total, page: q.page, pageSize: q.pageSize };
  }

  /**
   * Checks an upload with ffprobe and, only when it is a usable video, creates the tour (or
   * replaces the video of an existing one) and queues the transcode. A refused file is deleted
   * and nothing is written to the database.
   */
  async acceptUpload(user: User, file: IncomingFile, opts: { tourId?: number; details?: Partial<TourDetailsInput> } = {}): Promise<{ tour: Tour; job: Job }> {
    try {
      if (!hasRole(user.role, 'author')) throw new Forbidden('forbidden', 'Only authors can upload tours.');
      const existing = opts.tourId ? await this.getEditable(opts.tourId, user) : null;
      const check = await inspectUpload(file.path);
      if (!check.ok) throw new UploadRefused(check.error.code, check.error.message);
      const probe = check.probe;
      const ext = (path.extname(file.originalname).toLowerCase().match(/^\.[a-z0-9]{1,5}$/)?.[0]) ?? '.bin';
      return await this.dataSource.transaction(async (m) => {
        let tour: Tour;
        if (existing) {
          tour = existing;
          await this.queue.cancelFor('tour', tour.id, m);
        } else {
          tour = this.repo(m).create({
            authorId: user.id,
            title: opts.details?.title?.trim() || path.basename(file.originalname, path.extname(file.originalname)).slice(0, 160).trim() || 'Untitled tour',
            descriptionHtml: sanitizeRichText(opts.details?.descriptionHtml ?? ''),
            garden: opts.details?.garden ?? '',
            filmedOn: opts.details?.filmedOn ?? null,
            state: 'processing',
          });
          tour = await this.repo(m).save(tour);
        }
        const dir = this.storage.uploadsDir(tour.id);
        await mkdir(dir, { recursive: true });
        const dest = path.join(dir, `source-${Date.now()}${ext}`);
        await rename(file.path, dest);
        const previousSource = tour.sourceFile;
        Object.assign(tour, {
          sourceFile: this.storage.relative(dest),
          sourceName: file.originalname.slice(0, 255),
          sourceBytes: file.size,
          durationMs: probe.durationSec != null ? Math.round(probe.durationSec * 1000) : null,
          width: probe.video?.width ?? null,
          height: probe.video?.height ?? null,
          sourceCodecs: [probe.video?.codec, probe.audio?.codec].filter(Boolean).join(' + ') || null,
          failureReason: null,
          state: existing && (existing.state === 'published' || existing.state === 'ready') ? existing.state : 'processing',
        });
        try {
          // The job first: saving a published tour locks the search revision (a database trigger),
          // and taking that lock last keeps two uploads from waiting on each other.
          const job = await this.queue.enqueue({ kind: TRANSCODE_JOB, subjectType: 'tour', subjectId: tour.id, payload: { source: tour.sourceFile } }, m);
          tour = await this.repo(m).save(tour);
          if (previousSource) await rm(this.storage.resolve(previousSource), { force: true });
          return { tour, job };
        } catch (err) {
          await rm(dest, { force: true });
          throw err;
        }
      });
    } finally {
      await rm(file.path, { force: true });
    }
  }

  /** Queues the transcode again: after a failure, or to place keyframes at new stop starts. */
  async retranscode(id: number, user: User, keyframeTimesSec: number[] = []): Promise<Job> {
    const tour = await this.getEditable(id, user);
    if (!tour.sourceFile) throw new Conflict('no_video', 'This tour has no video yet. Upload one first.');
    return this.dataSource.transaction(async (m) => {
      await this.queue.cancelFor('tour', tour.id, m);
      const job = await this.queue.enqueue({ kind: TRANSCODE_JOB, subjectType: 'tour', subjectId: tour.id, payload: { source: tour.sourceFile, keyframeTimesSec } }, m);
      if (tour.state === 'failed' || tour.state === 'draft') await this.repo(m).update({ id: tour.id }, { state: 'processing', failureReason: null });
      return job;
    });
  }

  async update(id: number, user: User, input: UpdateTourInput): Promise<Tour> {
    const tour = await this.getEditable(id, user);
    if (input.title !== undefined) tour.title = input.title;
    if (input.garden !== undefined) tour.garden = input.garden;
    if (input.filmedOn !== undefined) tour.filmedOn = input.filmedOn;
    if (input.descriptionHtml !== undefined) tour.descriptionHtml = sanitizeRichText(input.descriptionHtml);
    await this.repo().save(tour);
    return this.getVisible(id, user);
  }

  async publish(id: number, user: User, publish: boolean): Promise<Tour> {
    const tour = await this.getEditable(id, user);
    if (publish) {
      if (tour.state !== 'ready' && tour.state !== 'published') {
        throw new Conflict('not_ready', tour.state === 'processing' ? 'The video is still being prepared; publish when it is ready.' : 'This tour has no playable video yet.');
      }
      await this.repo().update({ id }, { state: 'published', publishedAt: tour.publishedAt ?? new Date() });
    } else if (tour.state === 'published') {
      await this.repo().update({ id }, { state: 'ready' });
    }
    return this.getVisible(id, user);
  }

  /** Deletes the tour, its jobs and every file it owns. */
  async remove(id: number, user: User): Promise<void> {
    const tour = await this.getEditable(id, user);
    await this.dataSource.transaction(async (m) => {
      await this.queue.cancelFor('tour', tour.id, m);
      await m.getRepository(Job).delete({ subjectType: 'tour', subjectId: tour.id, state: In(['done', 'failed', 'cancelled']) });
      await this.repo(m).delete({ id: tour.id });
    });
    await this.storage.removeTour(tour.id);
  }

  notifyWorker() {
    this.onEnqueued();
  }
}

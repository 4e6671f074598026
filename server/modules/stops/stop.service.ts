import type { DataSource, EntityManager } from 'typeorm';
import { chaptersVtt, metadataVtt } from '../../../shared/captions/tracks';
import { buildNameIndex } from '../../../shared/names/matcher';
import { stopInput, type StopInput, type StopMetadata, type StopSuggestion, type UpdateStopInput } from '../../../shared/schemas/stops';
import type { Job } from '../../db/entities/job.entity';
import { Stop } from '../../db/entities/stop.entity';
import { Tour } from '../../db/entities/tour.entity';
import type { User } from '../../db/entities/user.entity';
import { BadRequest, Conflict, NotFound } from '../../errors/http-error';
import type { CaptionService } from '../captions/caption.service';
import type { CultivarService } from '../cultivars/cultivar.service';
import type { TourService } from '../tours/tour.service';
import { chapterTitle, presentStopCultivar } from './stop.presenter';
import { heardNames, proposeStops } from './stop-suggestions';

/** A moment as people read it: m:ss, h:mm:ss past an hour, with milliseconds when not whole. */
export function clock(ms: number): string {
  const h = Math.floor(ms / 3_600_000);
  const m = Math.floor((ms % 3_600_000) / 60_000);
  const s = Math.floor((ms % 60_000) / 1000);
  const frac = ms % 1000 ? `.${String(ms % 1000).padStart(3, '0')}` : '';
  const ss = `${String(s).padStart(2, '0')}${frac}`;
  return h ? `${h}:${String(m).padStart(2, '0')}:${ss}` : `${m}:${ss}`;
}

/** A generated text track and whether its tour is public (for caching). */
export interface TextTrack {
  body: string;
  published: boolean;
}

/**
 * Stops of a tour: list, add, edit, remove with the no-overlap, within-the-video and approved-record
 * rules; the chapters and metadata tracks built from them; suggestions from names heard in the
 * captions; and the re-transcode that puts keyframes at stop starts.
 */
export class StopService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly tours: TourService,
    private readonly cultivars: CultivarService,
    private readonly captions: CaptionService,
  ) {}

  private stopsOf(tourId: number, m: EntityManager = this.dataSource.manager): Promise<Stop[]> {
    return m.getRepository(Stop).find({ where: { tourId }, relations: { cultivar: true }, order: { startMs: 'ASC', id: 'ASC' } });
  }

  /** The stops of a tour the viewer may see, in time order. */
  async list(tourId: number, viewer: User | undefined): Promise<Stop[]> {
    await this.tours.getVisible(tourId, viewer);
    return this.stopsOf(tourId);
  }

  /** The tour row, locked until the transaction ends, so two stop edits of one tour take turns. */
  private async lockTour(m: EntityManager, tourId: number): Promise<Tour> {
    const tour = await m.getRepository(Tour).findOne({ where: { id: tourId }, lock: { mode: 'pessimistic_write' } });
    if (!tour) throw new NotFound('No such tour.');
    return tour;
  }

  /**
   * The stop rules. The record link is checked when it is set or changed, so a stop whose record a
   * moderator has since retired can still be retimed or retitled.
   */
  private async checkRules(m: EntityManager, tour: Tour, s: StopInput, current?: Stop): Promise<void> {
    const selfId = current?.id;
    if (tour.durationMs == null) throw new Conflict('no_video', 'This tour has no video yet; add stops once it is uploaded.');
    if (s.endMs > tour.durationMs) {
      throw new BadRequest('stop_past_end', `The stop ends at ${clock(s.endMs)}, after the end of the video (${clock(tour.durationMs)}).`, {
        endMs: `End the stop by ${clock(tour.durationMs)}.`,
      });
    }
    const linkChanged = !current || current.cultivarId !== s.cultivarId;
    if (s.cultivarId != null && linkChanged && !(await this.cultivars.approvedById(s.cultivarId, m))) {
      throw new BadRequest('cultivar_missing', 'That cultivar record does not exist or is not approved yet. Pick another record, or mark the tree as unidentified.', {
        cultivarId: 'Pick an approved cultivar record.',
      });
    }
    const qb = m
      .getRepository(Stop)
      .createQueryBuilder('s')
      .where('s.tourId = :tourId', { tourId: tour.id })
      .andWhere('s.startMs < :end AND s.endMs > :start', { start: s.startMs, end: s.endMs })
      .orderBy('s.startMs', 'ASC');
    if (selfId) qb.andWhere('s.id <> :selfId', { selfId });
    const other = await qb.getOne();
    if (other) {
      const name = other.title ? ` ("${other.title}")` : '';
      throw new Conflict('stop_overlap', `This stop overlaps the stop from ${clock(other.startMs)} to ${clock(other.endMs)}${name}. Stops of a tour may not overlap.`, {
        startMs: `Overlaps the stop at ${clock(other.startMs)}–${clock(other.endMs)}.`,
      });
    }
  }

  private async reload(m: EntityManager, id: number): Promise<Stop> {
    return m.getRepository(Stop).findOneOrFail({ where: { id }, relations: { cultivar: true } });
  }

  /** Adds a stop after checking the rules against the tour as it is at that moment. */
  async create(tourId: number, user: User, input: StopInput): Promise<Stop> {
    await this.tours.getEditable(tourId, user);
    return this.dataSource.transaction(async (m) => {
      const tour = await this.lockTour(m, tourId);
      await this.checkRules(m, tour, input);
      const repo = m.getRepository(Stop);
      const saved = await repo.save(repo.create({ tourId, startMs: input.startMs, endMs: input.endMs, title: input.title, cultivarId: input.cultivarId }));
      return this.reload(m, saved.id);
    });
  }

  private async editableStop(stopId: number, user: User): Promise<Stop> {
    const stop = await this.dataSource.getRepository(Stop).findOneBy({ id: stopId });
    if (!stop) throw new NotFound('No such stop.');
    try {
      await this.tours.getEditable(stop.tourId, user);
    } catch (err) {
      if (err instanceof NotFound) throw new NotFound('No such stop.');
      throw err;
    }
    return stop;
  }

  /** Changes some fields of a stop; the merged stop must pass the same checks as a new one. */
  async update(stopId: number, user: User, patch: UpdateStopInput): Promise<Stop> {
    const current = await this.editableStop(stopId, user);
    return this.dataSource.transaction(async (m) => {
      const tour = await this.lockTour(m, current.tourId);
      const stop = await m.getRepository(Stop).findOneBy({ id: stopId });
      if (!stop) throw new NotFound('No such stop.');
      const merged = stopInput.parse({
        startMs: patch.startMs ?? stop.startMs,
        endMs: patch.endMs ?? stop.endMs,
        title: patch.title ?? stop.title,
        cultivarId: patch.cultivarId === undefined ? stop.cultivarId : patch.cultivarId,
      });
      await this.checkRules(m, tour, merged, stop);
      await m.getRepository(Stop).update({ id: stop.id }, merged);
      return this.reload(m, stop.id);
    });
  }

  async remove(stopId: number, user: User): Promise<void> {
    const stop = await this.editableStop(stopId, user);
    await this.dataSource.getRepository(Stop).delete({ id: stop.id });
  }

  /** The stops as a WebVTT chapters track (one chapter per stop, ids "stop-<id>"). */
  async chapters(tourId: number, viewer: User | undefined): Promise<TextTrack> {
    const tour = await this.tours.getVisible(tourId, viewer);
    const stops = await this.stopsOf(tourId);
    const body = chaptersVtt(stops.map((s) => ({ startMs: s.startMs, endMs: s.endMs, title: chapterTitle(s), id: `stop-${s.id}` })));
    return { body, published: tour.state === 'published' };
  }

  /** The stops as a WebVTT metadata track whose cues name the linked record (JSON). */
  async metadata(tourId: number, viewer: User | undefined): Promise<TextTrack> {
    const tour = await this.tours.getVisible(tourId, viewer);
    const stops = await this.stopsOf(tourId);
    const body = metadataVtt(
      stops.map((s) => {
        const payload: StopMetadata = {
          stopId: s.id,
          cultivarId: s.cultivar?.id ?? null,
          acceptedName: s.cultivar?.acceptedName ?? null,
          slug: s.cultivar?.slug ?? null,
        };
        return { startMs: s.startMs, endMs: s.endMs, payload, id: `stop-${s.id}` };
      }),
    );
    return { body, published: tour.state === 'published' };
  }

  /** Stops proposed from approved cultivar names heard in a caption track (for the tour's editors). */
  async suggestions(tourId: number, user: User, lang: string | undefined): Promise<StopSuggestion[]> {
    const tour = await this.tours.getEditable(tourId, user);
    const track = await this.captions.trackForLang(tourId, lang);
    const [cues, { records, byId }, stops] = await Promise.all([this.captions.cues(track.id), this.cultivars.approvedNameRecords(), this.stopsOf(tourId)]);
    if (!records.length) return [];
    const names = heardNames(cues, buildNameIndex(records));
    return proposeStops(names, { durationMs: tour.durationMs, stops }).flatMap(({ startMs, endMs, name }) => {
      const cultivar = byId.get(name.cultivarId);
      if (!cultivar) return [];
      return [{ startMs, endMs, cultivar: presentStopCultivar(cultivar), heard: name.heard, score: name.score, kind: name.kind, cueStartMs: name.cueStartMs }];
    });
  }

  /** Queues a new transcode with a keyframe at every stop start, so a jump to a stop lands exactly. */
  async keyframes(tourId: number, user: User): Promise<Job> {
    await this.tours.getEditable(tourId, user);
    const stops = await this.stopsOf(tourId);
    const job = await this.tours.retranscode(tourId, user, stops.map((s) => s.startMs / 1000));
    this.tours.notifyWorker();
    return job;
  }
}

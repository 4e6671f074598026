import type { DataSource } from 'typeorm';
import type { WatchResponse, WhereToSeeQuery, WhereToSeeResponse } from '../../../shared/schemas/watch';
import { CaptionTrack } from '../../db/entities/caption-track.entity';
import { Cultivar } from '../../db/entities/cultivar.entity';
import { Stop } from '../../db/entities/stop.entity';
import { Tour } from '../../db/entities/tour.entity';
import type { User } from '../../db/entities/user.entity';
import { NotFound } from '../../errors/http-error';
import { presentCultivarSummary } from '../cultivars/cultivar.presenter';
import { canSeeCultivar, cultivarByIdOrSlug } from '../cultivars/cultivar.service';
import { chapterTitle } from '../stops/stop.presenter';
import { canViewTour } from '../tours/tour.policy';
import { presentTour } from '../tours/tour.presenter';
import { publishedMoments } from './published-moments';
import { momentLink, momentThumbnail } from './thumbnail.presenter';
import { TreeCardCache } from './tree-card.presenter';

/**
 * The tour page in one response, and "where to see it" for a record. Both run a fixed number of
 * queries whatever the number of stops or moments: the tour with its author, its stops with their
 * records and its caption tracks, side by side.
 */
export class WatchService {
  private readonly cards = new TreeCardCache();

  constructor(private readonly dataSource: DataSource) {}

  /** Everything the watch page needs; visibility is the tour's (drafts only to their editors). */
  async watch(tourId: number, viewer: User | undefined): Promise<WatchResponse> {
    // Three queries side by side; the tour is one query (a findOne with a relation would add a
    // DISTINCT pre-query). Nothing is sent before the visibility check below, same rule as TourService.getVisible.
    const [tour, stops, tracks] = await Promise.all([
      this.dataSource.getRepository(Tour).createQueryBuilder('t').leftJoinAndSelect('t.author', 'a').where('t.id = :tourId', { tourId }).getOne(),
      this.dataSource.getRepository(Stop).find({ where: { tourId }, relations: { cultivar: true }, order: { startMs: 'ASC', id: 'ASC' } }),
      this.dataSource.getRepository(CaptionTrack).find({ where: { tourId }, order: { id: 'ASC' } }),
    ]);
    if (!tour || !canViewTour(viewer, tour)) throw new NotFound('No such tour.');
    return {
      tour: presentTour(tour, viewer, null),
      stops: stops.map((s) => ({
        id: s.id,
        startMs: s.startMs,
        endMs: s.endMs,
        title: s.title,
        chapterTitle: chapterTitle(s),
        thumbnail: momentThumbnail(tour, s.startMs),
        cultivar: s.cultivar ? this.cards.card(s.cultivar) : null,
      })),
      captions: {
        tracks: tracks.map((t) => ({
          id: t.id,
          lang: t.lang,
          label: t.label,
          version: t.version,
          vttUrl: `/api/tracks/${t.id}/export.vtt`,
          transcriptUrl: `/api/tours/${tourId}/transcript?lang=${encodeURIComponent(t.lang)}`,
        })),
        defaultTrackId: tracks[0]?.id ?? null,
        chaptersUrl: `/api/tours/${tourId}/chapters.vtt`,
        metadataUrl: `/api/tours/${tourId}/metadata.vtt`,
      },
    };
  }

  /** A record by id or slug as the viewer may see it: proposals only to their proposer and moderators. */
  private async visibleCultivar(idOrSlug: string, viewer: User | undefined): Promise<Cultivar> {
    const c = await this.dataSource.getRepository(Cultivar).findOneBy(cultivarByIdOrSlug(idOrSlug));
    if (!c || !canSeeCultivar(c, viewer)) throw new NotFound('No such cultivar record.');
    return c;
  }

  /**
   * Every stop of a published tour linked to the record, in order of tour date: when it was filmed,
   * else when it was published; oldest first by default (the tree through the years), or newest.
   */
  async whereToSee(idOrSlug: string, viewer: User | undefined, q: WhereToSeeQuery): Promise<WhereToSeeResponse> {
    const cultivar = await this.visibleCultivar(idOrSlug, viewer);
    const { moments, total } = await publishedMoments(this.dataSource, [cultivar.id], {
      order: q.order,
      page: { offset: (q.page - 1) * q.pageSize, limit: q.pageSize },
    });
    return {
      cultivar: presentCultivarSummary(cultivar),
      order: q.order,
      total,
      page: q.page,
      pageSize: q.pageSize,
      items: moments.map((s) => {
        const t = s.tour;
        return {
          tourId: t.id,
          tourTitle: t.title,
          garden: t.garden,
          filmedOn: t.filmedOn,
          publishedAt: t.publishedAt?.toISOString() ?? null,
          author: { id: t.authorId, displayName: t.author?.displayName ?? '' },
          stopId: s.id,
          stopTitle: s.title.trim() || cultivar.acceptedName,
          startMs: s.startMs,
          endMs: s.endMs,
          thumbnail: momentThumbnail(t, s.startMs),
          link: momentLink(t.id, s.startMs),
        };
      }),
    };
  }
}

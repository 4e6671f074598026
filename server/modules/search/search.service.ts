import { In, type DataSource } from 'typeorm';
import { SEARCH_PAGE_SIZES, SEARCH_QUERY_MAX, type MomentHit, type SearchResponse } from '../../../shared/schemas/search';
import { searchWords } from '../../../shared/search/text-fold';
import { Stop } from '../../db/entities/stop.entity';
import { Tour } from '../../db/entities/tour.entity';
import { BadRequest } from '../../errors/http-error';
import { presentCultivarSummary } from '../cultivars/cultivar.presenter';
import { presentStopCultivar } from '../stops/stop.presenter';
import { posterUrl } from '../tours/tour.presenter';
import { momentLink, momentThumbnail } from '../watch/thumbnail.presenter';
import { CaptionSearch, MOMENT_CAP, momentSpans, plainCueText, rankMoments, type CueHit, type NameTarget } from './caption-search';
import { CultivarCatalogue } from './cultivar-catalogue';
import { searchCultivars } from './cultivar-search';
import { markPlan, type WordPlan } from './fulltext';
import { searchTours, tourHitText } from './tour-search';

/** Most words of one search that are looked up (a 200-character search rarely has more). */
export const SEARCH_WORDS_MAX = 16;
/** Records whose spellings are looked for in captions when the search names them. */
const NAME_TARGETS_MAX = 5;

function pageOf<T>(items: readonly T[], page: number, size: number): T[] {
  return items.slice((page - 1) * size, page * size);
}

/**
 * One search box across the site: cultivar records (names, misspellings through the name matcher,
 * trait words), published tours (title and description) and caption moments of published tours.
 * Drafts and private tours are never searched, whoever asks: search results are public pages.
 */
export class SearchService {
  readonly catalogue: CultivarCatalogue;
  readonly captions: CaptionSearch;

  constructor(private readonly dataSource: DataSource) {
    this.catalogue = new CultivarCatalogue(dataSource);
    this.captions = new CaptionSearch(dataSource);
  }

  /** Refuses an empty or over-long search with a message a person can act on. */
  static check(q: string): string {
    const t = q.trim();
    if (!t) throw new BadRequest('search_empty', 'Type a cultivar name, a trait such as "weeping" or a word from a tour to search for.', { q: 'Type something to search for.' });
    if (t.length > SEARCH_QUERY_MAX) {
      throw new BadRequest('search_too_long', `Searches can be at most ${SEARCH_QUERY_MAX} characters; this one has ${t.length}.`, { q: `Use at most ${SEARCH_QUERY_MAX} characters.` });
    }
    return t;
  }

  async search(rawQ: string, page: number): Promise<SearchResponse> {
    const q = SearchService.check(rawQ);
    const words = searchWords(q).slice(0, SEARCH_WORDS_MAX);
    const plan = await this.captions.plan(words);
    const markable = markPlan(plan);
    // Tours and caption words do not depend on the cultivar records: start them first.
    const early = Promise.all([searchTours(this.dataSource, markable), this.captions.byWords(plan)]);
    early.catch(() => undefined); // awaited below; this only keeps an early failure from going unhandled

    const catalogue = await this.catalogue.get();
    const cultivars = searchCultivars(catalogue, q);
    const targets: NameTarget[] = cultivars.matches
      .filter((m) => m.nameHow !== null && m.nameHow !== 'contains')
      .slice(0, NAME_TARGETS_MAX)
      .map((m) => ({ id: m.record.cultivar.id, spellings: [m.record.cultivar.epithet, ...m.record.variants.map((v) => v.text)] }));

    const [[tours, wordHits], nameHits] = await Promise.all([early, this.captions.byNames(targets, catalogue.index)]);
    const capped = wordHits.length > MOMENT_CAP || nameHits.length > MOMENT_CAP;
    const ranked = rankMoments(nameHits.slice(0, MOMENT_CAP), wordHits.slice(0, MOMENT_CAP));
    const moments = await this.presentMoments(pageOf(ranked, page, SEARCH_PAGE_SIZES.moments), plan);

    return {
      q,
      words,
      traits: cultivars.terms.map((t) => ({ trait: t.trait, value: t.value, label: t.label })),
      fulltextWords: plan.indexed,
      fallbackWords: plan.fallback,
      page,
      pageSizes: { ...SEARCH_PAGE_SIZES },
      cultivars: {
        total: cultivars.matches.length,
        items: pageOf(cultivars.matches, page, SEARCH_PAGE_SIZES.cultivars).map((m) => ({
          cultivar: presentCultivarSummary(m.record.cultivar),
          score: m.score,
          reasons: m.reasons,
          momentsUrl: `/api/cultivars/${m.record.cultivar.slug}/moments`,
        })),
      },
      tours: {
        total: tours.matches.length,
        items: pageOf(tours.matches, page, SEARCH_PAGE_SIZES.tours).map((m) => ({ tour: m.tour, ...tourHitText(m, markable) })).map(({ tour, titleSpans, snippet }) => ({
          id: tour.id,
          title: tour.title,
          titleHighlights: titleSpans,
          garden: tour.garden,
          filmedOn: tour.filmedOn,
          publishedAt: tour.publishedAt?.toISOString() ?? null,
          author: { id: tour.authorId, displayName: tour.author?.displayName ?? '' },
          durationMs: tour.durationMs,
          posterUrl: posterUrl(tour),
          snippet,
          link: `/tours/${tour.id}`,
        })),
      },
      moments: { items: moments, total: ranked.length, capped },
    };
  }

  /** Tour details, the covering stop and the thumbnail for one page of moments (two queries). */
  private async presentMoments(hits: readonly CueHit[], plan: WordPlan): Promise<MomentHit[]> {
    if (!hits.length) return [];
    const tourIds = [...new Set(hits.map((h) => h.tourId))];
    const [, tours, stops] = await Promise.all([
      this.captions.loadTexts(hits),
      this.dataSource.getRepository(Tour).find({
        where: { id: In(tourIds) },
        select: { id: true, title: true, mediaDir: true, posterFile: true, thumbStrip: true },
      }),
      this.dataSource
        .getRepository(Stop)
        .createQueryBuilder('s')
        .leftJoin('s.cultivar', 'c')
        .select(['s.id', 's.tourId', 's.startMs', 's.endMs', 's.title', 'c.id', 'c.acceptedName', 'c.slug', 'c.fictional'])
        .where('s.tourId IN (:...tourIds)', { tourIds })
        .orderBy('s.startMs', 'ASC')
        .getMany(),
    ]);
    const tourById = new Map(tours.map((t) => [t.id, t]));
    return hits.flatMap((h) => {
      const tour = tourById.get(h.tourId);
      if (!tour) return [];
      const plain = plainCueText(h.rawText ?? '');
      // The stop covering the cue's start; else one the cue runs into (a name said just before the stop begins).
      const stop =
        stops.find((s) => s.tourId === h.tourId && s.startMs <= h.startMs && h.startMs < s.endMs) ??
        stops.find((s) => s.tourId === h.tourId && s.startMs < h.endMs && h.startMs < s.endMs) ??
        null;
      return [
        {
          tourId: h.tourId,
          tourTitle: tour.title,
          trackId: h.trackId,
          lang: h.lang,
          startMs: h.startMs,
          endMs: h.endMs,
          text: plain,
          highlights: momentSpans(plain, h, plan),
          nameHit: h.nameHit,
          cultivarIds: h.cultivarIds,
          score: Math.round(h.score * 1000) / 1000,
          stop: stop
            ? { id: stop.id, title: stop.title, startMs: stop.startMs, endMs: stop.endMs, cultivar: stop.cultivar ? presentStopCultivar(stop.cultivar) : null }
            : null,
          thumbnail: momentThumbnail(tour, h.startMs),
          link: momentLink(h.tourId, h.startMs),
        },
      ];
    });
  }
}

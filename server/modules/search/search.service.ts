import type { DataSource } from 'typeorm';
import { SEARCH_PAGE_SIZES, SEARCH_QUERY_MAX, type MomentHit, type SearchResponse } from '../../../shared/schemas/search';
import { searchWords } from '../../../shared/search/text-fold';
import type { Cultivar } from '../../db/entities/cultivar.entity';
import type { ThumbStripRecord, Tour } from '../../db/entities/tour.entity';
import { BadRequest } from '../../errors/http-error';
import { presentCultivarSummary } from '../cultivars/cultivar.presenter';
import { presentStopCultivar } from '../stops/stop.presenter';
import { posterUrl } from '../tours/tour.presenter';
import { momentLink, momentThumbnail } from '../watch/thumbnail.presenter';
import { CaptionSearch, MOMENT_CAP, momentSpans, plainCueText, rankMoments, type CueHit, type NameTarget } from './caption-search';
import { CultivarCatalogue } from './cultivar-catalogue';
import { searchCultivars } from './cultivar-search';
import { markPlan, type WordPlan } from './fulltext';
import { readRevisions } from './search-revisions';
import { PublishedTours, searchTours, tourHitText } from './tour-search';

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
  readonly tours: PublishedTours;
  readonly captions: CaptionSearch;

  constructor(private readonly dataSource: DataSource) {
    this.catalogue = new CultivarCatalogue(dataSource);
    this.tours = new PublishedTours(dataSource);
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
    // Caption words and tours do not depend on the cultivar records: start them first.
    const revisions = readRevisions(this.dataSource);
    const early = Promise.all([revisions.then((r) => this.tours.get(r.tours)).then((tours) => searchTours(tours, markable)), this.captions.byWords(plan)]);
    early.catch(() => undefined); // awaited below; this only keeps an early failure from going unhandled

    const catalogue = await this.catalogue.get((await revisions).catalogue);
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

  /**
   * The text, the tour, the covering stop and the thumbnail of one page of moments, in one
   * statement. A tour withdrawn since the lookup drops its moments (search shows published tours only).
   */
  private async presentMoments(hits: readonly CueHit[], plan: WordPlan): Promise<MomentHit[]> {
    if (!hits.length) return [];
    const details = await momentDetails(this.dataSource, hits);
    return hits.flatMap((h) => {
      const d = details.get(h.cueId);
      if (!d) return [];
      // The text the lookup saw when it has it (a name hit's marks were made on it), else as stored now.
      const plain = plainCueText(h.rawText ?? d.text);
      // The stop covering the cue's start; else one the cue runs into (a name said just before the stop begins).
      const stop = d.stops.find((s) => s.startMs <= h.startMs && h.startMs < s.endMs) ?? d.stops.find((s) => s.startMs < h.endMs && h.startMs < s.endMs) ?? null;
      return [
        {
          tourId: h.tourId,
          tourTitle: d.tour.title,
          trackId: h.trackId,
          lang: h.lang,
          startMs: h.startMs,
          endMs: h.endMs,
          text: plain,
          highlights: momentSpans(plain, h, plan),
          nameHit: h.nameHit,
          cultivarIds: h.cultivarIds,
          score: Math.round(h.score * 1000) / 1000,
          stop,
          thumbnail: momentThumbnail(d.tour, h.startMs),
          link: momentLink(h.tourId, h.startMs),
        },
      ];
    });
  }
}

interface MomentDetails {
  text: string;
  tour: Pick<Tour, 'id' | 'title' | 'mediaDir' | 'posterFile' | 'thumbStrip'>;
  /** Stops of the tour that overlap the cue or cover its start, earliest first. */
  stops: NonNullable<MomentHit['stop']>[];
}

interface MomentRow {
  cueId: number | string;
  text: string;
  tourId: number | string;
  tourTitle: string;
  mediaDir: string | null;
  posterFile: string | null;
  thumbStrip: string | ThumbStripRecord | null;
  stopId: number | string | null;
  stopTitle: string | null;
  stopStart: number | string | null;
  stopEnd: number | string | null;
  cultivarId: number | string | null;
  acceptedName: string | null;
  slug: string | null;
  fictional: number | string | boolean | null;
  genus: string | null;
  species: string | null;
  infraspecificRank: Cultivar['infraspecificRank'];
  infraspecificEpithet: string | null;
  groupName: string | null;
  epithet: string | null;
}

/**
 * Cue text, tour and the stops near each cue of published tours, by cue id: one statement (the
 * stops by the tour-and-start index, only those a moment can show), read as raw rows.
 */
export async function momentDetails(dataSource: DataSource, hits: readonly CueHit[]): Promise<Map<number, MomentDetails>> {
  const ids = [...new Set(hits.map((h) => h.cueId))];
  const out = new Map<number, MomentDetails>();
  if (!ids.length) return out;
  const rows = (await dataSource.query(
    `SELECT c.id AS cueId, c.text AS text, t.id AS tourId, t.title AS tourTitle, t.media_dir AS mediaDir, t.poster_file AS posterFile,
            t.thumb_strip AS thumbStrip, s.id AS stopId, s.title AS stopTitle, s.start_ms AS stopStart, s.end_ms AS stopEnd,
            cv.id AS cultivarId, cv.accepted_name AS acceptedName, cv.slug AS slug, cv.fictional AS fictional, cv.genus AS genus, cv.species AS species,
            cv.infraspecific_rank AS infraspecificRank, cv.infraspecific_epithet AS infraspecificEpithet, cv.group_name AS groupName, cv.epithet AS epithet
     FROM cues c
       JOIN caption_tracks ct ON ct.id = c.track_id
       JOIN tours t ON t.id = ct.tour_id AND t.state = 'published'
       LEFT JOIN stops s ON s.tour_id = t.id AND (s.start_ms <= c.start_ms OR s.start_ms < c.end_ms) AND c.start_ms < s.end_ms
       LEFT JOIN cultivars cv ON cv.id = s.cultivar_id
     WHERE c.id IN (${ids.map(() => '?').join(', ')})
     ORDER BY c.id, s.start_ms, s.id`,
    ids,
  )) as MomentRow[];
  for (const r of rows) {
    const cueId = Number(r.cueId);
    let d = out.get(cueId);
    if (!d) {
      const strip = typeof r.thumbStrip === 'string' ? (JSON.parse(r.thumbStrip) as ThumbStripRecord) : r.thumbStrip;
      d = { text: r.text, tour: { id: Number(r.tourId), title: r.tourTitle, mediaDir: r.mediaDir, posterFile: r.posterFile, thumbStrip: strip }, stops: [] };
      out.set(cueId, d);
    }
    if (r.stopId == null) continue;
    d.stops.push({
      id: Number(r.stopId),
      title: r.stopTitle ?? '',
      startMs: Number(r.stopStart),
      endMs: Number(r.stopEnd),
      cultivar:
        r.cultivarId == null
          ? null
          : presentStopCultivar({
              id: Number(r.cultivarId),
              acceptedName: r.acceptedName ?? '',
              slug: r.slug ?? '',
              fictional: Boolean(Number(r.fictional)),
              genus: r.genus ?? '',
              species: r.species,
              infraspecificRank: r.infraspecificRank,
              infraspecificEpithet: r.infraspecificEpithet,
              groupName: r.groupName,
              epithet: r.epithet ?? '',
            }),
    });
  }
  return out;
}

import type { DataSource } from 'typeorm';
import { foldText, markWords, snippetAround, type MarkWord, type TextSpan } from '../../../shared/search/text-fold';
import { Tour } from '../../db/entities/tour.entity';
import { htmlToText } from './html-text';
import { RevisionCache } from './search-revisions';

/** Most tours one search looks at (a club site has far fewer published tours). */
export const TOUR_CAP = 200;

/** A published tour whose title or description holds every word of the search. */
export interface TourMatch {
  tour: Tour;
  /** The description as plain text. */
  plain: string;
  inTitle: boolean;
}

/** A test per word on folded text: at the start of a word, and for whole words also at its end. */
function wordTests(words: readonly MarkWord[]): ((folded: string) => boolean)[] {
  // Words are letters and digits only (see searchWords), so they need no escaping here.
  return words.map((w) => {
    const re = new RegExp(`(^|[^\\p{L}\\p{N}])${w.word}${w.prefix ? '' : '(?![\\p{L}\\p{N}])'}`, 'u');
    return (folded: string) => re.test(folded);
  });
}

/** A published tour as search keeps it: its plain description and both texts in comparison form. */
export interface TourText {
  tour: Tour;
  plain: string;
  titleFold: string;
  textFold: string;
}

/**
 * Every published tour's searchable text, kept in memory while the tours revision stands (see
 * search-revisions.ts): a club's tours fit easily, and matching them here costs less than asking
 * the database to scan every description with LIKE on each search.
 */
export class PublishedTours {
  private readonly cache: RevisionCache<TourText[]>;

  constructor(private readonly dataSource: DataSource) {
    this.cache = new RevisionCache(() => this.load());
  }

  get(revision: string): Promise<TourText[]> {
    return this.cache.get(revision);
  }

  private async load(): Promise<TourText[]> {
    // Only what a hit shows, with the author's name (many-to-one, so one query).
    const tours = await this.dataSource
      .getRepository(Tour)
      .createQueryBuilder('t')
      .leftJoin('t.author', 'a')
      .select(['t.id', 't.title', 't.descriptionHtml', 't.garden', 't.filmedOn', 't.publishedAt', 't.authorId', 't.durationMs', 't.posterFile', 't.mediaDir', 'a.id', 'a.displayName'])
      .where("t.state = 'published'")
      .getMany();
    return tours.map((tour) => {
      const plain = htmlToText(tour.descriptionHtml);
      return { tour, plain, titleFold: foldText(tour.title), textFold: foldText(plain) };
    });
  }
}

/**
 * Published tours whose title or description (tags stripped) has every word of the search at the
 * start of a word (whole words unless marked as a prefix), compared in folded form, so markup such
 * as a link's address never makes a match. Title matches come first, then the newest tours; at
 * most TOUR_CAP. Marks and snippets are made only for the page shown (see `tourHitText`).
 */
export function searchTours(tours: readonly TourText[], words: readonly MarkWord[]): { matches: TourMatch[]; capped: boolean } {
  if (!words.length) return { matches: [], capped: false };
  const tests = wordTests(words);
  const matches: TourMatch[] = [];
  for (const t of tours) {
    let inTitle = true;
    let every = true;
    for (const test of tests) {
      if (test(t.titleFold)) continue;
      inTitle = false;
      if (!test(t.textFold)) {
        every = false;
        break;
      }
    }
    if (every) matches.push({ tour: t.tour, plain: t.plain, inTitle });
  }
  matches.sort((a, b) => Number(b.inTitle) - Number(a.inTitle) || tourDate(b.tour).localeCompare(tourDate(a.tour)) || b.tour.id - a.tour.id);
  return { matches: matches.slice(0, TOUR_CAP), capped: matches.length > TOUR_CAP };
}

/** The marked title and the description snippet of one hit (null when only the title matched). */
export function tourHitText(m: TourMatch, words: readonly MarkWord[]): { titleSpans: TextSpan[]; snippet: { text: string; highlights: TextSpan[] } | null } {
  const textSpans = markWords(m.plain, words);
  return { titleSpans: markWords(m.tour.title, words), snippet: textSpans.length ? snippetAround(m.plain, textSpans) : null };
}

/** The date a tour is ordered by: when it was filmed, else when it was published. */
export function tourDate(t: Pick<Tour, 'filmedOn' | 'publishedAt'>): string {
  return t.filmedOn ?? t.publishedAt?.toISOString().slice(0, 10) ?? '';
}

import type { DataSource } from 'typeorm';
import { foldText, markWords, snippetAround, type MarkWord, type TextSpan } from '../../../shared/search/text-fold';
import { Tour } from '../../db/entities/tour.entity';
import { likeContains } from '../../db/like';
import { htmlToText } from './html-text';

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

/**
 * Published tours whose title or description (tags stripped) has every word of the search at the
 * start of a word. LIKE with escaped wildcards narrows the rows in the database (there is no
 * full-text index on tours); the words are then checked on the plain text, so markup such as a
 * link's address never makes a match. Title matches come first, then the newest tours. Marks and
 * snippets are made only for the page shown (see `tourHitText`).
 */
export async function searchTours(dataSource: DataSource, words: readonly MarkWord[]): Promise<{ matches: TourMatch[]; capped: boolean }> {
  if (!words.length) return { matches: [], capped: false };
  // Only what a hit shows; limit (not take) keeps it one query, as the author join is many-to-one.
  const qb = dataSource
    .getRepository(Tour)
    .createQueryBuilder('t')
    .leftJoin('t.author', 'a')
    .select(['t.id', 't.title', 't.descriptionHtml', 't.garden', 't.filmedOn', 't.publishedAt', 't.authorId', 't.durationMs', 't.posterFile', 't.mediaDir', 'a.id', 'a.displayName'])
    .where("t.state = 'published'");
  words.forEach((w, i) => {
    qb.andWhere(`(t.title LIKE :w${i} OR t.descriptionHtml LIKE :w${i})`, { [`w${i}`]: likeContains(w.word) });
  });
  const rows = await qb.orderBy('t.publishedAt', 'DESC').addOrderBy('t.id', 'DESC').limit(TOUR_CAP + 1).getMany();
  const tests = wordTests(words);
  const matches: TourMatch[] = [];
  for (const tour of rows.slice(0, TOUR_CAP)) {
    const plain = htmlToText(tour.descriptionHtml);
    const title = foldText(tour.title);
    const text = foldText(plain);
    const inTitleEach = tests.map((t) => t(title));
    if (!tests.every((t, i) => inTitleEach[i] || t(text))) continue;
    matches.push({ tour, plain, inTitle: inTitleEach.every(Boolean) });
  }
  matches.sort((a, b) => Number(b.inTitle) - Number(a.inTitle) || tourDate(b.tour).localeCompare(tourDate(a.tour)) || b.tour.id - a.tour.id);
  return { matches, capped: rows.length > TOUR_CAP };
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

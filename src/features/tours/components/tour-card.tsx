import { Link } from 'react-router';
import type { TourDto } from '@shared/schemas/tours';
import { clockText } from '@/lib/tour-moment';
import { durationInWords, formatDay } from '../lib/media-format';
import { TourPoster } from './tour-poster';

/**
 * One published tour in a grid: poster with its length, title (the link, covering the whole card),
 * garden, author (a link of its own to their page, above the card's link) and filming date.
 */
export function TourCard({ tour, showAuthor = true, headingLevel = 2 }: { tour: TourDto; showAuthor?: boolean; headingLevel?: 2 | 3 }) {
  const ms = tour.durationMs;
  const filmed = formatDay(tour.filmedOn);
  const Heading = headingLevel === 2 ? 'h2' : 'h3';
  return (
    <li className="group relative overflow-hidden rounded-lg border border-rule bg-card shadow-leaf transition-shadow focus-within:shadow-none hover:border-edge">
      <div className="relative">
        <TourPoster url={tour.posterUrl} />
        {ms != null && (
          <span className="absolute right-2 bottom-2 rounded bg-ink/85 px-1.5 py-0.5 font-ui text-xs font-semibold text-card tabular-nums">
            <span aria-hidden="true">{clockText(ms)}</span>
            <span className="sr-only">{durationInWords(ms / 1000)}</span>
          </span>
        )}
      </div>
      <div className="p-4">
        <Heading className="text-lg leading-snug">
          {/* The link covers the whole card, so the card is one click target with one name. */}
          <Link to={`/tours/${tour.id}`} className="text-ink no-underline after:absolute after:inset-0 hover:text-moss-deep group-hover:underline">
            {tour.title}
          </Link>
        </Heading>
        {tour.garden && <p className="mt-1 text-sm text-bark">{tour.garden}</p>}
        <p className="mt-1 text-sm text-ink-soft">
          {showAuthor && (
            <>
              by{' '}
              <Link to={`/authors/${tour.author.id}`} className="relative z-10">
                {tour.author.displayName}
              </Link>
            </>
          )}
          {filmed && (
            <>
              {showAuthor ? ' · ' : ''}filmed {filmed}
            </>
          )}
        </p>
      </div>
    </li>
  );
}

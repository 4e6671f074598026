import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { TourDto } from '@shared/schemas/tours';
import { clockText } from '@/lib/tour-moment';
import { durationInWords, formatDay } from '../lib/media-format';

/** Garden, author (linked to their page), date filmed and length on one line, leaving out what the author has not given. */
export function TourMeta({ tour, showAuthor = true, className = '' }: { tour: TourDto; showAuthor?: boolean; className?: string }) {
  const filmed = formatDay(tour.filmedOn);
  const ms = tour.durationMs;
  const parts: { key: string; node: ReactNode }[] = [];
  if (tour.garden) parts.push({ key: 'garden', node: tour.garden });
  if (showAuthor && tour.author.displayName) {
    parts.push({
      key: 'author',
      node: (
        <>
          by <Link to={`/authors/${tour.author.id}`}>{tour.author.displayName}</Link>
        </>
      ),
    });
  }
  if (filmed) parts.push({ key: 'filmed', node: <>filmed {filmed}</> });
  if (ms != null)
    parts.push({
      key: 'length',
      node: (
        <>
          <span aria-hidden="true" className="font-ui tabular-nums">
            {clockText(ms)}
          </span>
          <span className="sr-only">{durationInWords(ms / 1000)}</span>
        </>
      ),
    });
  if (parts.length === 0) return null;
  return (
    <p className={`flex flex-wrap gap-x-2 text-ink-soft ${className}`}>
      {parts.map((part, i) => (
        <span key={part.key}>
          {i > 0 && (
            <span aria-hidden="true" className="mr-2">
              ·
            </span>
          )}
          {part.node}
        </span>
      ))}
    </p>
  );
}

import { Link } from 'react-router';
import type { TourMoment } from '@shared/schemas/cultivars';
import { clockText, tourMomentHref } from '@/lib/tour-moment';
import { spriteStyle } from '../lib/sprite';

/** The picture of a moment: its sprite tile when the tour has one, else the poster, else a plain box. */
function MomentPicture({ moment }: { moment: TourMoment }) {
  if (moment.thumbnail) {
    return (
      <div className="flex aspect-video w-full items-center justify-center overflow-hidden rounded-t-lg bg-ink">
        <div role="img" aria-label={`Frame from ${moment.tourTitle} at ${clockText(moment.startMs)}`} style={spriteStyle(moment.thumbnail)} />
      </div>
    );
  }
  if (moment.posterUrl) return <img src={moment.posterUrl} alt="" className="aspect-video w-full rounded-t-lg bg-ink object-cover" loading="lazy" />;
  return <div className="aspect-video w-full rounded-t-lg bg-bark-wash" aria-hidden="true" />;
}

/** "Where to see it": every stop of a published tour linked to this record, opening at the stop. */
export function TourMoments({ moments }: { moments: readonly TourMoment[] }) {
  if (moments.length === 0) return <p className="text-ink-soft">No published tour shows this tree yet.</p>;
  return (
    <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
      {moments.map((m) => (
        <li key={m.stopId} className="relative overflow-hidden rounded-lg border border-rule bg-card shadow-leaf hover:border-edge">
          <MomentPicture moment={m} />
          <div className="p-3">
            <Link to={tourMomentHref(m.tourId, m.startMs)} className="font-bold after:absolute after:inset-0">
              {m.tourTitle}
            </Link>
            <p className="text-sm text-ink-soft">
              Stop “{m.stopTitle}” <span className="tabular-nums">at {clockText(m.startMs)}</span>
            </p>
          </div>
        </li>
      ))}
    </ul>
  );
}

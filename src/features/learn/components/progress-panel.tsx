import { Link } from 'react-router';
import { ErrorState } from '@/components/error-state';
import { Loading } from '@/components/spinner';
import { useLearnProgress, type LearnProgress } from '../api/learn-api';
import { CHART_DAYS, dayBars, localDay, progressSummary, recentDays, shortDay } from '../lib/progress';

const BOX = { width: 280, height: 90, gap: 4 };

function DayChart({ days: given }: { days: LearnProgress['days'] }) {
  const days = recentDays(given, CHART_DAYS, localDay(new Date()));
  // Days without answers keep their slot on the time line but draw nothing.
  const drawn = dayBars(days, BOX).filter((b) => b.total > 0);
  if (!drawn.length) return null;
  const first = days[0];
  const last = days[days.length - 1];
  return (
    <figure className="mt-4">
      <figcaption className="text-sm font-bold">Answers per day, last {CHART_DAYS} days</figcaption>
      <svg viewBox={`0 0 ${BOX.width} ${BOX.height + 1}`} className="mt-2 h-28 w-full" role="img" aria-label="Bar chart of answers per day; the table after it gives the figures">
        <line x1="0" x2={BOX.width} y1={BOX.height + 0.5} y2={BOX.height + 0.5} stroke="var(--color-edge)" strokeWidth="1" />
        {drawn.map((b) => (
          <g key={b.day}>
            <rect x={b.x} y={b.totalY} width={b.width} height={b.totalHeight} fill="var(--color-moss-wash)" stroke="var(--color-edge)" strokeWidth="1" />
            <rect x={b.x} y={b.correctY} width={b.width} height={b.correctHeight} fill="var(--color-moss)" />
          </g>
        ))}
      </svg>
      <div className="flex justify-between font-ui text-xs text-ink-soft" aria-hidden="true">
        <span>{first ? shortDay(first.day) : ''}</span>
        <span>{last && last !== first ? shortDay(last.day) : ''}</span>
      </div>
      <p className="mt-2 flex flex-wrap gap-x-4 gap-y-1 font-ui text-xs text-ink-soft" aria-hidden="true">
        <span className="inline-flex items-center gap-1.5">
          <span className="inline-block size-3 bg-moss" /> right
        </span>
        <span className="inline-flex items-center gap-1.5">
          <span className="inline-block size-3 border border-edge bg-moss-wash" /> answered
        </span>
      </p>
      <table className="sr-only">
        <caption>Answers per day</caption>
        <thead>
          <tr>
            <th scope="col">Day</th>
            <th scope="col">Answered</th>
            <th scope="col">Right</th>
          </tr>
        </thead>
        <tbody>
          {drawn.map((d) => (
            <tr key={d.day}>
              <th scope="row">{shortDay(d.day)}</th>
              <td>{d.total}</td>
              <td>{d.correct}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </figure>
  );
}

/** The learner's scores for signed-in learners, or a note that signing in keeps them. */
export function ProgressPanel({ signedIn }: { signedIn: boolean }) {
  const progress = useLearnProgress(signedIn);
  if (!signedIn) {
    return (
      <section aria-labelledby="progress-h" className="rounded-lg border border-rule bg-card p-4 shadow-leaf">
        <h2 id="progress-h" className="text-lg">
          Your progress
        </h2>
        <p className="mt-1 text-ink-soft">
          Scores are kept for signed-in learners, so you can watch them grow over the weeks. <Link to="/sign-in?next=%2Flearn">Sign in</Link> or{' '}
          <Link to="/sign-up">create an account</Link>; until then, play as much as you like.
        </p>
      </section>
    );
  }
  let body;
  if (progress.isPending) body = <Loading label="Loading your scores…" />;
  else if (progress.isError) body = <ErrorState title="Your scores could not be loaded" error={progress.error} onRetry={() => void progress.refetch()} />;
  else {
    const s = progressSummary(progress.data);
    body = (
      <>
        <dl className="mt-2 grid grid-cols-2 gap-3">
          <div className="rounded-md bg-paper p-3">
            <dt className="text-sm text-ink-soft">Answered</dt>
            <dd className="text-2xl font-bold text-moss-deep tabular-nums">
              {s.total}
            </dd>
          </div>
          <div className="rounded-md bg-paper p-3">
            <dt className="text-sm text-ink-soft">Right</dt>
            <dd className="text-2xl font-bold text-moss-deep tabular-nums">{s.percent === null ? '—' : `${s.percent}%`}</dd>
          </div>
        </dl>
        {s.total === 0 ? <p className="mt-3 text-ink-soft">Answer a clip to start your record.</p> : <DayChart days={progress.data.days} />}
      </>
    );
  }
  return (
    <section aria-labelledby="progress-h" className="rounded-lg border border-rule bg-card p-4 shadow-leaf">
      <h2 id="progress-h" className="text-lg">
        Your progress
      </h2>
      {body}
    </section>
  );
}

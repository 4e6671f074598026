import type { TourDto } from '@shared/schemas/tours';
import { Button } from '@/components/button';
import { FormError } from '@/components/form-error';
import { errorMessage } from '@/lib/api';
import { clockText } from '@/lib/tour-moment';
import { isBusy, useRetranscode } from '../api/tours-api';
import { durationInWords, formatBytes, timeLeftText } from '../lib/media-format';
import { ProgressBar } from './progress-bar';

function Versions({ tour }: { tour: TourDto }) {
  if (tour.renditions.length === 0) return null;
  return (
    <div className="mt-3">
      <p className="text-sm font-bold">Versions for viewers</p>
      <ul className="mt-1 space-y-0.5 font-ui text-sm text-ink-soft">
        {tour.renditions.map((r) => (
          <li key={r.url}>
            {r.label} · {r.width}×{r.height} · {formatBytes(r.bytes)}
          </li>
        ))}
      </ul>
    </div>
  );
}

/**
 * Where the tour's video stands: progress with time left and attempt while it is prepared, the
 * reason in plain words and "Try again" when it failed, the versions made once it is ready.
 */
export function TranscodePanel({ tour }: { tour: TourDto }) {
  const retry = useRetranscode();
  const job = tour.job;
  const busy = isBusy(tour.state, job);
  const durationMs = tour.durationMs;

  let body;
  if (busy) {
    const queued = !job || job.state === 'queued';
    const percent = queued ? 0 : Math.floor(job.progress);
    const words = queued ? 'Waiting for its turn' : `${percent} % · ${timeLeftText(job.etaSeconds)}`;
    body = (
      <>
        <h2 className="text-lg">Preparing the video</h2>
        <p className="mt-1 text-sm text-ink-soft">
          Grovewalk is making versions for phones and large screens, a cover picture and previews. You can keep editing the details or
          leave this page; the work goes on.
        </p>
        <div className="mt-4 space-y-2">
          <ProgressBar label="Video preparation" value={percent} valueText={words} tone="ochre" />
          <p className="flex flex-wrap justify-between gap-2 font-ui text-sm tabular-nums">
            <span>{words}</span>
            {job && job.attempts > 0 && (
              <span className="text-ink-soft">
                Attempt {job.attempts} of {job.maxAttempts}
              </span>
            )}
          </p>
        </div>
        {tour.failureReason && (
          <p className="mt-3 rounded-md border-l-4 border-ochre bg-ochre-wash px-3 py-2 text-sm">{tour.failureReason}</p>
        )}
      </>
    );
  } else if (tour.state === 'failed') {
    body = (
      <>
        <h2 className="text-lg text-maple">The video could not be prepared</h2>
        <p className="mt-2">{tour.failureReason ?? job?.error ?? 'The conversion stopped without giving a reason.'}</p>
        {job && (
          <p className="mt-1 font-ui text-sm text-ink-soft">
            Tried {job.attempts} of {job.maxAttempts} times.
          </p>
        )}
        <p className="mt-2 text-sm text-ink-soft">Try again, or upload the video once more (for example exported again from your camera or phone).</p>
        <Button className="mt-4" busy={retry.isPending} onClick={() => retry.mutate(tour.id)}>
          Try again
        </Button>
        <div className="mt-3">
          <FormError message={retry.isError ? errorMessage(retry.error) : null} />
        </div>
      </>
    );
  } else if (tour.renditions.length > 0) {
    body = (
      <>
        <h2 className="text-lg">Video ready</h2>
        <p className="mt-1">
          {durationMs != null && (
            <>
              Length <span className="font-ui tabular-nums">{clockText(durationMs)}</span>
              <span className="sr-only"> ({durationInWords(durationMs / 1000)})</span>.{' '}
            </>
          )}
          {tour.state === 'published' ? 'Viewers can watch it now.' : 'Publish the tour when its details are in order.'}
        </p>
        <Versions tour={tour} />
      </>
    );
  } else {
    body = (
      <>
        <h2 className="text-lg">No video yet</h2>
        <p className="mt-1">Upload a video below to start.</p>
      </>
    );
  }

  return (
    <section aria-label="Video status" className="rounded-lg border border-rule bg-card p-5 shadow-leaf">
      {/* Announces changes of state only; the percentage is on the progress bar for anyone who asks. */}
      <p role="status" className="sr-only">
        {busy ? 'Preparing the video.' : tour.state === 'failed' ? 'The video could not be prepared.' : tour.renditions.length > 0 ? 'Video ready.' : ''}
      </p>
      {tour.posterUrl && !busy && <img src={tour.posterUrl} alt="" className="mb-4 aspect-video w-full rounded-md bg-bark-wash object-cover" />}
      {body}
    </section>
  );
}

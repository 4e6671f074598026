import { useRef, useState } from 'react';
import { Link } from 'react-router';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { Page } from '@/components/page';
import { Loading } from '@/components/spinner';
import { isApiError } from '@/lib/api';
import { clockText, tourMomentHref } from '@/lib/tour-moment';
import { useTour, useTrack, useTracks } from '../api/spelling-api';
import { FlagNameDialog, type FlaggedCue } from './flag-name-dialog';

/** The text selected on the page right now, if any. */
function currentSelection(): string {
  return typeof window === 'undefined' ? '' : (window.getSelection()?.toString() ?? '');
}

function CueList({ tourId, trackId }: { tourId: number; trackId: number }) {
  const track = useTrack(trackId);
  const [flagging, setFlagging] = useState<FlaggedCue | null>(null);
  const selection = useRef('');
  if (track.isPending) return <Loading label="Loading the captions…" />;
  if (track.isError) return <ErrorState title="The captions could not be loaded" error={track.error} onRetry={() => void track.refetch()} />;
  if (track.data.cues.length === 0) return <EmptyState title="This track has no captions yet." />;
  return (
    <>
      <ol className="divide-y divide-rule rounded-lg border border-rule bg-card shadow-leaf">
        {track.data.cues.map((cue) => (
          <li key={`${cue.startMs}-${cue.endMs}`} className="flex flex-wrap items-start gap-x-4 gap-y-2 px-4 py-3 sm:flex-nowrap">
            <Link to={tourMomentHref(tourId, cue.startMs)} className="w-14 shrink-0 font-ui text-sm font-bold tabular-nums" aria-label={`Play from ${clockText(cue.startMs)}`}>
              {clockText(cue.startMs)}
            </Link>
            <p className="min-w-0 flex-1 basis-56 whitespace-pre-line">{cue.text}</p>
            <button
              type="button"
              // Read the selection before the click can move focus and clear it.
              onPointerDown={() => (selection.current = currentSelection())}
              onKeyDown={() => (selection.current = currentSelection())}
              onClick={() => setFlagging({ trackId, startMs: cue.startMs, text: cue.text })}
              aria-label={`Flag a misspelt name in the caption at ${clockText(cue.startMs)}`}
              className="inline-flex min-h-9 shrink-0 items-center gap-1.5 rounded-md border border-edge px-3 py-1 font-ui text-sm font-bold text-ink hover:bg-maple-wash"
            >
              <svg viewBox="0 0 20 20" className="size-4 text-maple" aria-hidden="true">
                <path d="M5 17V3m0 1h9l-2 3.5L14 11H5" fill="none" stroke="currentColor" strokeWidth="1.8" strokeLinejoin="round" strokeLinecap="round" />
              </svg>
              Flag a misspelt name
            </button>
          </li>
        ))}
      </ol>
      <FlagNameDialog cue={flagging} selection={selection.current} onClose={() => setFlagging(null)} />
    </>
  );
}

/**
 * /tours/:tourId/names — every caption of a tour with a "Flag a misspelt name" action on each, so readers
 * can report a misspelt cultivar name (select the words first to have them filled in).
 */
export function TourNamesPage({ tourId }: { tourId: number }) {
  const tour = useTour(tourId);
  const tracks = useTracks(tourId);
  const [chosen, setChosen] = useState<number | null>(null);

  if (tour.isPending || tracks.isPending) {
    return (
      <div className="mx-auto max-w-3xl px-4 sm:px-6">
        <Loading label="Loading the tour…" />
      </div>
    );
  }
  if (tour.isError || tracks.isError) {
    const error = tour.error ?? tracks.error;
    if (isApiError(error) && error.status === 404) {
      return (
        <Page title="No such tour">
          <p>There is no published tour at this address.</p>
          <p className="mt-4">
            <Link to="/tours">See the tours</Link>
          </p>
        </Page>
      );
    }
    return (
      <div className="mx-auto max-w-3xl px-4 sm:px-6">
        <ErrorState title="The tour could not be loaded" error={error} onRetry={() => void Promise.all([tour.refetch(), tracks.refetch()])} />
      </div>
    );
  }

  const trackId = chosen ?? tracks.data[0]?.id ?? null;
  return (
    <Page
      title={`Names said in “${tour.data.title}”`}
      width="medium"
      intro="Every caption of the tour. Spotted a cultivar name spelt wrong? Select the words and press “Flag a misspelt name”: a moderator checks it and corrects it in every tour at once."
    >
      <p className="-mt-4 mb-6">
        <Link to={`/tours/${tourId}`}>Back to the tour</Link>
      </p>
      {tracks.data.length > 1 && (
        <label className="mb-4 block max-w-xs font-bold">
          Caption track
          <select value={trackId ?? ''} onChange={(e) => setChosen(Number(e.target.value))} className="mt-1 block w-full rounded-md border border-edge bg-card px-3 py-2 font-normal">
            {tracks.data.map((t) => (
              <option key={t.id} value={t.id}>
                {t.label} ({t.lang})
              </option>
            ))}
          </select>
        </label>
      )}
      {trackId === null ? <EmptyState title="This tour has no captions yet." /> : <CueList key={trackId} tourId={tourId} trackId={trackId} />}
    </Page>
  );
}

import { lazy, Suspense, useCallback, useEffect, useMemo, useRef, useState, type KeyboardEvent as ReactKeyboardEvent, type ReactNode } from 'react';
import { Link, useSearchParams } from 'react-router';
import type { TourDto } from '@shared/schemas/tours';
import type { WatchResponse, WatchStop } from '@shared/schemas/watch';
import { Button, buttonClasses } from '@/components/button';
import { useDocumentTitle } from '@/components/page';
import { Loading } from '@/components/spinner';
import { useHeadMeta } from '@/lib/head-meta';
import { clockText } from '@/lib/tour-moment';
import { isBusy } from '../api/tours-api';
import { useWatch } from '../api/watch-api';
import type { PlayerController } from '../lib/player-controller';
import { playerActionForKey } from '../lib/player-keys';
import { createPlayheadClock } from '../lib/playhead-clock';
import { richTextClasses } from '@/lib/rich-text';
import { parseStartTime } from '../lib/start-time';
import { stepStop, stopIndexAt } from '../lib/stop-timeline';
import { absoluteUrl, momentPath, stopName, stopPath, watchDescription, watchTitle } from '../lib/watch-links';
import { Fold } from './fold';
import { KeyboardHelp } from './keyboard-help';
import { StopsList } from './stops-list';
import { TourMeta } from './tour-meta';
import { TourLoadState } from './tour-load-state';
import { Trail } from './trail';
import { TranscriptPanel } from './transcript-panel';
import { TreeCardPanel } from './tree-card';

const TourPlayer = lazy(() => import('./tour-player'));

function PlayerPlaceholder({ tour, children }: { tour: TourDto; children?: ReactNode }) {
  return (
    <div className="relative aspect-video overflow-hidden rounded-lg bg-ink">
      {tour.posterUrl && <img src={tour.posterUrl} alt="" className="absolute inset-0 size-full object-contain opacity-60" />}
      <div className="absolute inset-0 grid place-items-center p-6 text-center text-card">{children}</div>
    </div>
  );
}

function PrivateBanner({ tour }: { tour: TourDto }) {
  return (
    <div role="note" className="mb-6 flex flex-wrap items-center justify-between gap-3 rounded-md border-l-4 border-ochre bg-ochre-wash px-4 py-3">
      <p>
        <strong>Not published.</strong> Only you, moderators and admins can see this tour until it is published.
      </p>
      {tour.canEdit && (
        <Link to={`/tours/${tour.id}/edit`} className={buttonClasses('secondary', 'sm')}>
          Edit and publish
        </Link>
      )}
    </div>
  );
}

function naming(stops: readonly WatchStop[], index: number) {
  const s = stops[index];
  return s ? { number: index + 1, name: s.cultivar?.acceptedName ?? null, title: s.title, startMs: s.startMs } : null;
}

type Copied = { url: string; ok: boolean; what: 'moment' | 'stop'; label: string };

function CopiedNote({ copied }: { copied: Copied | null }) {
  if (!copied) return <div role="status" />;
  return (
    <div role="status" className="rounded-md border-l-4 border-moss bg-moss-wash px-4 py-2 text-sm">
      {copied.ok ? (
        <p>
          Link copied. It opens {copied.label}: <span className="font-mono text-xs break-all" data-copied-link>{copied.url}</span>
        </p>
      ) : (
        <label className="block">
          <span className="block">Copy this link by hand; it opens {copied.label}:</span>
          <input readOnly value={copied.url} data-copied-link onFocus={(e) => e.currentTarget.select()} className="mt-1 w-full rounded border border-edge bg-card px-2 py-1 font-mono text-xs" />
        </label>
      )}
    </div>
  );
}

/** The playing tour with its trail, tree card, transcript and stops. */
function WatchView({ data, stopId }: { data: WatchResponse; stopId: number | null }) {
  const { tour, stops, captions } = data;
  const [params] = useSearchParams();
  const t = parseStartTime(params.get('t'));
  const routeStopIndex = stopId != null ? stops.findIndex((s) => s.id === stopId) : -1;
  const missingStop = stopId != null && routeStopIndex < 0;
  // A stop's own address opens at the stop; a ?t= on it (a search hit) opens at that moment instead.
  const startAt = t ?? (routeStopIndex >= 0 ? stops[routeStopIndex]!.startMs / 1000 : null);

  const idAt = useCallback((ms: number) => stops[stopIndexAt(stops, ms)]?.id ?? null, [stops]);
  const openingStop = routeStopIndex >= 0 ? stops[routeStopIndex]!.id : idAt((startAt ?? 0) * 1000);
  const [currentId, setCurrentId] = useState<number | null>(openingStop);
  // Another moment of the same tour (a new address) shows its stop at once; cue changes follow from there.
  const opened = useRef({ startAt, stopId });
  useEffect(() => {
    if (opened.current.startAt === startAt && opened.current.stopId === stopId) return;
    opened.current = { startAt, stopId };
    setCurrentId(openingStop);
  }, [startAt, stopId, openingStop]);

  const currentIndex = stops.findIndex((s) => s.id === currentId);
  const clock = useMemo(() => createPlayheadClock((startAt ?? 0) * 1000), []);
  const [controller, setController] = useState<PlayerController | null>(null);
  const [helpOpen, setHelpOpen] = useState(false);
  const [copied, setCopied] = useState<Copied | null>(null);
  const [said, setSaid] = useState('');
  const durationMs = tour.durationMs ?? Math.max(1, ...stops.map((s) => s.endMs));

  const now = naming(stops, currentIndex);
  useDocumentTitle(watchTitle(tour.title, now));
  useHeadMeta({
    title: watchTitle(tour.title, now),
    description: watchDescription({ tourTitle: tour.title, garden: tour.garden, author: tour.author.displayName, stop: now, stopCount: stops.length }),
    type: 'video.other',
    image: tour.posterUrl,
  });

  const go = useCallback(
    (index: number) => {
      const stop = stops[index];
      if (!stop) return;
      if (controller) controller.seek(stop.startMs / 1000);
      // Without a player (the video is not ready) the card still shows the chosen tree.
      else setCurrentId(stop.id);
    },
    [stops, controller],
  );

  const step = useCallback(
    (dir: 1 | -1) => {
      const to = stepStop(stops, currentIndex >= 0 ? currentIndex : null, clock.get(), dir);
      if (to == null) setSaid(dir > 0 ? 'This is the last stop.' : 'This is the first stop.');
      else go(to);
    },
    [stops, currentIndex, clock, go],
  );

  // Says which tree is on screen when the stop changes (politely, once per stop, not per cue).
  useEffect(() => {
    if (now) setSaid(`Stop ${now.number}: ${stopName(now)}`);
    else if (stops.length > 0) setSaid('Between stops');
  }, [currentId]);

  // The player's keys also work from the trail, the card and the transcript (not from fields).
  const onAreaKey = (event: ReactKeyboardEvent<HTMLElement>) => {
    const target = event.target as HTMLElement;
    const action = playerActionForKey({
      key: event.key,
      ctrlKey: event.ctrlKey,
      metaKey: event.metaKey,
      altKey: event.altKey,
      shiftKey: event.shiftKey,
      targetTag: target.tagName,
      targetRole: target.getAttribute('role'),
    });
    if (!action) return;
    if (action.kind === 'help') setHelpOpen(true);
    else if (action.kind === 'stop') step(action.step);
    else if (controller) controller.run(action);
    else return;
    event.preventDefault();
  };

  const copy = async (what: 'moment' | 'stop') => {
    let url: string;
    let label: string;
    if (what === 'stop') {
      const stop = stops[currentIndex];
      if (!stop || !now) return;
      url = absoluteUrl(window.location.origin, stopPath(tour.id, stop.id));
      label = `stop ${now.number}, ${stopName(now)}`;
    } else {
      const at = controller?.currentTime() ?? clock.get() / 1000;
      url = absoluteUrl(window.location.origin, momentPath(tour.id, at));
      label = `the tour at ${clockText(Math.floor(at) * 1000)}`;
    }
    try {
      await navigator.clipboard.writeText(url);
      setCopied({ url, ok: true, what, label });
    } catch {
      // No clipboard access (older browsers, plain http): the link is shown to copy by hand.
      setCopied({ url, ok: false, what, label });
    }
  };

  const nextIndex = currentIndex >= 0 ? null : stepStop(stops, null, clock.get(), 1);
  const hasVideo = tour.renditions.length > 0;

  const toolbar = (
    <div className="flex w-full flex-wrap items-center gap-2 border-t border-rule pt-3">
      <Button variant="secondary" size="sm" onClick={() => step(-1)} disabled={stops.length === 0} aria-keyshortcuts="Shift+ArrowLeft P">
        <span aria-hidden="true">←</span> Previous stop
      </Button>
      <Button variant="secondary" size="sm" onClick={() => step(1)} disabled={stops.length === 0} aria-keyshortcuts="Shift+ArrowRight N">
        Next stop <span aria-hidden="true">→</span>
      </Button>
      <span className="mx-1 hidden h-6 w-px bg-rule sm:block" aria-hidden="true" />
      <Button variant="quiet" size="sm" onClick={() => void copy('moment')}>
        Copy link at this moment
      </Button>
      <Button variant="quiet" size="sm" onClick={() => void copy('stop')} disabled={currentIndex < 0}>
        Copy link to this stop
      </Button>
      <Button variant="quiet" size="sm" onClick={() => setHelpOpen(true)} aria-keyshortcuts="?">
        Keyboard shortcuts <kbd className="rounded border border-edge px-1 font-mono text-xs">?</kbd>
      </Button>
    </div>
  );

  let player: ReactNode;
  if (!hasVideo) {
    const busy = isBusy(tour.state, tour.job);
    player = (
      <PlayerPlaceholder tour={tour}>
        <div className="max-w-sm space-y-3">
          <p className="text-lg font-bold">{busy ? 'The video is still being prepared.' : tour.state === 'failed' ? 'The video could not be prepared.' : 'This tour has no video yet.'}</p>
          {tour.canEdit && (
            <Link to={`/tours/${tour.id}/edit`} className={buttonClasses('secondary', 'sm')}>
              {busy ? 'See the progress' : 'Edit the tour'}
            </Link>
          )}
        </div>
      </PlayerPlaceholder>
    );
  } else {
    player = (
      <Suspense
        fallback={
          <PlayerPlaceholder tour={tour}>
            <Loading label="Loading the player…" />
          </PlayerPlaceholder>
        }
      >
        <TourPlayer
          title={tour.title}
          renditions={tour.renditions}
          posterUrl={tour.posterUrl}
          thumbStrip={tour.thumbStrip}
          startAt={startAt}
          captions={captions}
          stops={stops}
          durationMs={tour.durationMs}
          onStopCue={setCurrentId}
          onTime={(s) => clock.set(s * 1000)}
          onReady={setController}
          onStopStep={step}
          onHelp={() => setHelpOpen(true)}
          toolbar={toolbar}
        />
      </Suspense>
    );
  }

  const nowStop = stops[currentIndex];
  const cardSummary = nowStop
    ? `Stop ${currentIndex + 1}: ${nowStop.cultivar ? `‘${nowStop.cultivar.epithet}’` : 'unidentified tree'}`
    : stops.length
      ? 'Between stops'
      : 'No stops yet';

  return (
    <>
      <article onKeyDown={onAreaKey} className="mx-auto w-full max-w-6xl px-4 py-6 sm:px-6 sm:py-10">
        {tour.state !== 'published' && <PrivateBanner tour={tour} />}
        {missingStop && (
          <p role="note" className="mb-4 rounded-md border-l-4 border-bark bg-bark-wash px-4 py-3">
            That stop is no longer part of this tour, so the tour starts {t != null ? 'at the time in the link' : 'at the beginning'}.
          </p>
        )}
        <header className="mb-5 flex flex-wrap items-start justify-between gap-x-6 gap-y-2">
          <div className="min-w-0">
            <h1 className="text-2xl text-moss-deep sm:text-3xl">{tour.title}</h1>
            <TourMeta tour={tour} className="mt-1" />
          </div>
          {tour.canEdit && (
            <Link to={`/tours/${tour.id}/edit`} className={buttonClasses('quiet', 'sm')}>
              Edit tour
            </Link>
          )}
        </header>
        <p role="status" className="sr-only">
          {said}
        </p>

        <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_21rem] lg:grid-rows-[auto_auto_auto_1fr] lg:[grid-template-areas:'video_side'_'trail_side'_'transcript_side'_'about_side']">
          <section aria-label="Video" className="min-w-0 space-y-3 lg:[grid-area:video]">
            {/* key: a different tour gets a fresh player rather than a reused one. */}
            <div key={tour.id}>{player}</div>
            {!hasVideo && stops.length > 0 && toolbar}
            <CopiedNote copied={copied} />
          </section>

          <section aria-labelledby="trail-heading" className="min-w-0 rounded-lg border border-rule bg-card p-4 lg:[grid-area:trail]">
            <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
              <h2 id="trail-heading" className="text-lg text-moss-deep">
                Trail
              </h2>
              <p className="font-ui text-sm text-ink-soft">
                {stops.length === 0 ? 'No stops marked yet' : `${stops.length} stop${stops.length === 1 ? '' : 's'} · ${currentIndex >= 0 ? `stop ${currentIndex + 1} playing` : 'between stops'}`}
              </p>
            </div>
            {stops.length > 0 ? (
              <Trail stops={stops} durationMs={durationMs} currentIndex={currentIndex} onGo={go} />
            ) : (
              <p className="text-ink-soft">The trail of stops appears here once the author marks the trees in the video.</p>
            )}
          </section>

          <div className="min-w-0 space-y-6 self-start lg:[grid-area:side]">
            <aside aria-labelledby="tree-card-heading" className="rounded-lg border border-rule bg-card p-5 shadow-leaf" data-tree-card>
              <Fold headingId="tree-card-heading" title="Tree card" summary={cardSummary} headingClassName="text-lg text-bark">
                <TreeCardPanel stops={stops} currentIndex={currentIndex} nextIndex={nextIndex} onGo={go} />
              </Fold>
            </aside>

            <section aria-labelledby="stops-heading">
              <h2 id="stops-heading" className="text-lg text-moss-deep">
                Jump to a tree
              </h2>
              <StopsList stops={stops} currentIndex={currentIndex} onGo={go} />
            </section>
          </div>

          <section aria-labelledby="transcript-heading" className="min-w-0 rounded-lg border border-rule bg-card p-4 lg:[grid-area:transcript]">
            <Fold headingId="transcript-heading" title="Transcript" summary={captions.tracks.length ? 'Pick a line to play from there' : 'No captions yet'}>
              <TranscriptPanel tourId={tour.id} captions={captions} clock={clock} onSeek={(s) => controller?.seek(s)} />
            </Fold>
          </section>

          <section aria-labelledby="about-heading" className="min-w-0 lg:[grid-area:about]">
            <h2 id="about-heading" className="text-xl text-moss-deep">
              About this tour
            </h2>
            {tour.descriptionHtml ? (
              // Sanitised by the server with its allow-list (structure, emphasis and http(s)/mail links only).
              <div className={`mt-3 ${richTextClasses}`} dangerouslySetInnerHTML={{ __html: tour.descriptionHtml }} />
            ) : (
              <p className="mt-3 text-ink-soft">The author has not written a description yet.</p>
            )}
            <p className="mt-4 text-sm text-ink-soft">
              Tours can show pruning, ladders, heavy pots or digging. Follow local codes and product labels, check for buried cables and
              pipes before you dig, and ask a licensed arborist about large trees.
            </p>
          </section>
        </div>
      </article>
      <KeyboardHelp
        open={helpOpen}
        onClose={() => {
          setHelpOpen(false);
        }}
      />
    </>
  );
}

/**
 * The tour page, on one request (GET /api/tours/:id/watch): the player with its captions and
 * chapters, the trail, the tree card that follows the metadata track's cue changes, the synced
 * transcript, the stops list and the details. `stopId` comes from a stop's own address.
 */
export function WatchPage({ tourId, stopId = null }: { tourId: number; stopId?: number | null }) {
  const watch = useWatch(tourId);
  if (!watch.isSuccess) return <TourLoadState query={watch} width="max-w-6xl" />;
  return <WatchView data={watch.data} stopId={stopId} />;
}

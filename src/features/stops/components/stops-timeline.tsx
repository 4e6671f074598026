import { memo, useRef, type KeyboardEvent, type PointerEvent } from 'react';
import type { StopDto } from '@shared/schemas/stops';
import { formatTimeInput } from '@/lib/time-input';
import { clockText } from '@/lib/tour-moment';
import { useStops } from '../api/stops-api';
import { stopIndexAt } from '../lib/stop-draft';
import { msAtFraction, percentAt, scaleMarks } from '../lib/timeline-scale';

type Range = { startMs: number; endMs: number };

/** Props of StopsTimeline. */
export interface StopsTimelineProps {
  tourId: number;
  durationMs: number | null;
  playheadMs: number;
  /** Cues of the open caption track, drawn as ticks. */
  cues: readonly Range[];
  seek: (ms: number) => void;
}

function stopName(stop: StopDto): string {
  return stop.title.trim() || stop.cultivar?.acceptedName || 'Unidentified tree';
}

// Cue ticks change only when the cues do, not with every frame of the playhead.
const CueTicks = memo(function CueTicks({ cues, durationMs }: { cues: readonly Range[]; durationMs: number }) {
  return (
    <>
      {cues.map((c, i) => {
        const left = percentAt(c.startMs, durationMs);
        const width = Math.max(0, percentAt(c.endMs, durationMs) - left);
        return <span key={i} aria-hidden="true" className="absolute top-1/4 h-1/2 min-w-[2px] rounded-[1px] bg-ink-soft/70" style={{ left: `${left}%`, width: `${width}%` }} />;
      })}
    </>
  );
});

/**
 * The strip under the editor's video: the tour's length as a scale, each stop as a numbered,
 * labelled band (a button that goes to it), the open track's cues as thin ticks, and the playhead.
 * The band of ticks is a slider for the playhead: click or drag it, or use the arrow keys.
 */
export function StopsTimeline({ tourId, durationMs, playheadMs, cues, seek }: StopsTimelineProps) {
  const stops = useStops(tourId);
  const track = useRef<HTMLDivElement>(null);
  const dragging = useRef(false);

  if (durationMs == null || durationMs <= 0) {
    return <p className="rounded-md border border-dashed border-edge bg-card px-3 py-2 text-sm text-ink-soft">The timeline appears once the video’s length is known.</p>;
  }
  const items = stops.data ?? [];
  const current = stopIndexAt(items, playheadMs);

  const seekAtPointer = (event: PointerEvent<HTMLDivElement>) => {
    const box = track.current?.getBoundingClientRect();
    if (!box || box.width === 0) return;
    seek(msAtFraction((event.clientX - box.left) / box.width, durationMs));
  };
  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    const steps: Record<string, number> = { ArrowLeft: -1000, ArrowRight: 1000, ArrowDown: -1000, ArrowUp: 1000, PageDown: -10_000, PageUp: 10_000 };
    if (event.key in steps) {
      event.preventDefault();
      seek(playheadMs + steps[event.key]!);
    } else if (event.key === 'Home') {
      event.preventDefault();
      seek(0);
    } else if (event.key === 'End') {
      event.preventDefault();
      seek(durationMs);
    }
  };

  return (
    <section aria-labelledby="timeline-heading" className="rounded-lg border border-rule bg-card p-3 shadow-leaf">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="timeline-heading" className="font-ui text-sm font-bold">
          Timeline
        </h2>
        <p className="font-ui text-xs text-ink-soft">
          {items.length} stop{items.length === 1 ? '' : 's'} · {cues.length} cue{cues.length === 1 ? '' : 's'}
        </p>
      </div>
      <ol aria-label="Stops on the timeline" className="relative mt-2 h-9">
        {items.length === 0 && stops.isSuccess && (
          <li className="absolute inset-0 grid place-items-center rounded-md border border-dashed border-rule font-ui text-xs text-ink-soft">No stops yet</li>
        )}
        {items.map((stop, i) => {
          const left = percentAt(stop.startMs, durationMs);
          const width = Math.max(0, percentAt(stop.endMs, durationMs) - left);
          const here = i === current;
          return (
            <li key={stop.id} className="absolute inset-y-0" style={{ left: `${left}%`, width: `${width}%` }}>
              <button
                type="button"
                onClick={() => seek(stop.startMs)}
                title={`${i + 1}. ${stopName(stop)} (${formatTimeInput(stop.startMs)}–${formatTimeInput(stop.endMs)})`}
                aria-current={here ? 'true' : undefined}
                className={`flex h-full w-full min-w-6 items-center gap-1 overflow-hidden rounded-md border px-1.5 text-left font-ui text-xs font-bold ${
                  stop.cultivar ? 'border-solid' : 'border-dashed'
                } ${here ? 'border-moss bg-moss-wash text-moss-deep' : 'border-bark bg-bark-wash text-bark'}`}
              >
                <span className="shrink-0 tabular-nums">{i + 1}</span>
                <span className="truncate">
                  <span className="sr-only">Go to stop {i + 1}: </span>
                  {stopName(stop)}
                </span>
              </button>
            </li>
          );
        })}
      </ol>
      <div
        ref={track}
        role="slider"
        tabIndex={0}
        aria-label="Playhead"
        aria-valuemin={0}
        aria-valuemax={Math.round(durationMs / 1000)}
        aria-valuenow={Math.round(playheadMs / 1000)}
        aria-valuetext={`${formatTimeInput(playheadMs)} of ${formatTimeInput(durationMs)}`}
        onKeyDown={onKeyDown}
        onPointerDown={(e) => {
          dragging.current = true;
          e.currentTarget.setPointerCapture(e.pointerId);
          seekAtPointer(e);
        }}
        onPointerMove={(e) => dragging.current && seekAtPointer(e)}
        onPointerUp={() => (dragging.current = false)}
        onPointerCancel={() => (dragging.current = false)}
        className="relative mt-1 h-8 cursor-pointer touch-none rounded-md border border-edge bg-paper"
      >
        <CueTicks cues={cues} durationMs={durationMs} />
        <span aria-hidden="true" className="pointer-events-none absolute -inset-y-1 w-0.5 -translate-x-1/2 bg-maple" style={{ left: `${percentAt(playheadMs, durationMs)}%` }} />
      </div>
      <div aria-hidden="true" className="relative mt-1 h-4 font-ui text-[0.7rem] text-ink-soft tabular-nums">
        {scaleMarks(durationMs).map((ms, i, all) => (
          <span
            key={ms}
            className={`absolute ${i === 0 ? '' : i === all.length - 1 && percentAt(ms, durationMs) > 92 ? '-translate-x-full' : '-translate-x-1/2'}`}
            style={{ left: `${percentAt(ms, durationMs)}%` }}
          >
            {clockText(ms)}
          </span>
        ))}
      </div>
      {stops.isError && <p className="mt-1 text-sm font-bold text-maple">The stops could not be loaded for the timeline.</p>}
    </section>
  );
}

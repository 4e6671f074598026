import { useEffect, useMemo, useRef, useState } from 'react';
import type { WatchStop } from '@shared/schemas/watch';
import { CultivarName } from '@/components/cultivar-name';
import { MomentThumb } from '@/components/moment-thumb';
import { clockText } from '@/lib/tour-moment';
import { durationInWords } from '../lib/media-format';
import { trailLayout, walkedPath } from '../lib/trail-layout';
import { stopName } from '../lib/watch-links';

const TRAIL_HEIGHT = 92;
const STONE = 32;

/** Props of Trail: the stops in time order, the tour's length, the stop playing now and how to go to one. */
export interface TrailProps {
  stops: readonly WatchStop[];
  durationMs: number;
  currentIndex: number;
  onGo: (index: number) => void;
}

function namingOf(stop: WatchStop, index: number) {
  return { number: index + 1, name: stop.cultivar?.acceptedName ?? null, title: stop.title };
}

/** The signpost beside the trail: the stop under the pointer or keyboard focus, else the one playing. */
function Signpost({ stop, index, mode }: { stop: WatchStop | null; index: number; mode: 'preview' | 'now' | 'between' }) {
  return (
    <div className="flex w-full gap-3 sm:w-44 sm:shrink-0 sm:flex-col sm:gap-2" aria-hidden="true">
      <div className="w-32 shrink-0 overflow-hidden rounded-md border border-rule sm:w-full">
        <MomentThumb thumbnail={stop?.thumbnail ?? null} />
      </div>
      <div className="min-w-0 text-sm">
        <p className="font-ui text-xs font-bold tracking-wide text-bark uppercase">
          {mode === 'preview' ? 'Preview' : mode === 'now' ? 'Here now' : 'Between stops'}
        </p>
        {stop ? (
          <>
            <p className="font-bold">
              <span className="font-ui">Stop {index + 1}</span> · {stop.cultivar ? <CultivarName record={stop.cultivar} /> : stopName(namingOf(stop, index))}
            </p>
            <p className="font-ui text-ink-soft tabular-nums">
              {clockText(stop.startMs)}–{clockText(stop.endMs)}
            </p>
          </>
        ) : (
          <p className="text-ink-soft">Pick a stop on the trail to jump to that tree.</p>
        )}
      </div>
    </div>
  );
}

/**
 * The trail: a winding path with a numbered stepping stone per stop, placed by start time; the
 * part already walked is drawn darker, the stone playing now is lit. Each stone is a button that
 * jumps to its stop; hovering or focusing one shows its picture and name in the signpost (which
 * stays put, so it never covers the trail, and disappears with Escape or when the pointer leaves).
 */
export function Trail({ stops, durationMs, currentIndex, onGo }: TrailProps) {
  const box = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(640);
  const [peek, setPeek] = useState<number | null>(null);

  useEffect(() => {
    const el = box.current;
    if (!el || typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(([entry]) => {
      if (entry) setWidth(Math.max(200, Math.floor(entry.contentRect.width)));
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, []);

  const layout = useMemo(
    () => trailLayout(stops.map((s) => s.startMs), durationMs, { width, height: TRAIL_HEIGHT, pad: STONE / 2 + 6 }),
    [stops, durationMs, width],
  );
  const current = currentIndex >= 0 ? layout.markers[currentIndex] : undefined;
  // Between stops the walked part ends where the last passed stone stands.
  const walked = current ? walkedPath(layout, current.x) : null;

  // Keep the lit stone in view when the trail is wider than the screen.
  useEffect(() => {
    const el = box.current;
    if (!el || !current || el.scrollWidth <= el.clientWidth) return;
    if (current.x < el.scrollLeft + STONE || current.x > el.scrollLeft + el.clientWidth - STONE) el.scrollLeft = Math.max(0, current.x - el.clientWidth / 2);
  }, [current]);

  const shown = peek ?? (currentIndex >= 0 ? currentIndex : null);
  const mode = peek != null ? 'preview' : currentIndex >= 0 ? 'now' : 'between';

  return (
    <div className="flex flex-col gap-4 sm:flex-row sm:items-start" onKeyDown={(e) => e.key === 'Escape' && setPeek(null)}>
      <Signpost stop={shown != null ? (stops[shown] ?? null) : null} index={shown ?? 0} mode={mode} />
      <div ref={box} className="min-w-0 flex-1 overflow-x-auto overflow-y-hidden rounded-md bg-moss-wash/60" onPointerLeave={() => setPeek(null)}>
        <div className="relative" style={{ width: layout.width, height: layout.height }}>
          <svg width={layout.width} height={layout.height} viewBox={`0 0 ${layout.width} ${layout.height}`} className="absolute inset-0" aria-hidden="true" focusable="false">
            <path d={layout.path} fill="none" stroke="var(--color-bark-wash)" strokeWidth="18" strokeLinecap="round" strokeLinejoin="round" />
            <path d={layout.path} fill="none" stroke="var(--color-edge)" strokeWidth="1.5" strokeDasharray="1 7" strokeLinecap="round" />
            {walked && <path d={walked} fill="none" stroke="var(--color-moss)" strokeWidth="5" strokeLinecap="round" strokeLinejoin="round" opacity="0.85" />}
          </svg>
          <ol className="absolute inset-0">
            {stops.map((stop, i) => {
              const m = layout.markers[i]!;
              const isCurrent = i === currentIndex;
              const passed = currentIndex >= 0 && i < currentIndex;
              const seconds = stop.startMs / 1000;
              return (
                <li key={stop.id} className="absolute" style={{ left: m.x - STONE / 2, top: m.y - STONE / 2 }}>
                  <button
                    type="button"
                    onClick={() => onGo(i)}
                    onPointerEnter={() => setPeek(i)}
                    onFocus={() => setPeek(i)}
                    onBlur={() => setPeek(null)}
                    aria-current={isCurrent ? 'step' : undefined}
                    aria-label={`Stop ${i + 1}: ${stopName(namingOf(stop, i))}, at ${durationInWords(seconds)}`}
                    className={`grid size-8 place-items-center rounded-full border-2 font-ui text-sm font-bold tabular-nums shadow-leaf transition-transform hover:scale-110 motion-reduce:transition-none motion-reduce:hover:scale-100 ${
                      isCurrent
                        ? 'scale-110 border-card bg-moss-deep text-card ring-4 ring-ochre-wash'
                        : passed
                          ? 'border-moss bg-moss-wash text-moss-deep'
                          : 'border-bark bg-card text-bark'
                    }`}
                  >
                    {i + 1}
                  </button>
                </li>
              );
            })}
          </ol>
        </div>
      </div>
    </div>
  );
}

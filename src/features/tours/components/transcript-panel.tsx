import { useCallback, useEffect, useId, useMemo, useRef, useState, useSyncExternalStore, type KeyboardEvent } from 'react';
import { Link } from 'react-router';
import type { WatchResponse } from '@shared/schemas/watch';
import { Button } from '@/components/button';
import { MarkedText } from '@/components/marked-text';
import { Loading } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { clockText } from '@/lib/tour-moment';
import { useTrackCues } from '../api/watch-api';
import { REDUCED_MOTION, useMediaQuery } from '../hooks/use-media-query';
import { durationInWords } from '../lib/media-format';
import type { PlayheadClock } from '../lib/playhead-clock';
import { activeCueIndex, findInLines, stepMatch, transcriptLine, type TranscriptMatch } from '../lib/transcript';

/** Props of TranscriptPanel: the tour's caption tracks, the playhead, and how to seek. */
export interface TranscriptPanelProps {
  tourId: number;
  captions: WatchResponse['captions'];
  clock: PlayheadClock;
  onSeek: (seconds: number) => void;
}

/** Scrolls `line` into the middle third of the list without moving the page itself. */
function scrollWithin(list: HTMLElement, line: HTMLElement, smooth: boolean) {
  const top = line.offsetTop;
  const bottom = top + line.offsetHeight;
  if (top >= list.scrollTop && bottom <= list.scrollTop + list.clientHeight) return;
  list.scrollTo({ top: Math.max(0, top - list.clientHeight / 3), behavior: smooth ? 'smooth' : 'auto' });
}

/**
 * The synced transcript: every cue of a caption track as a line that seeks the video when chosen,
 * the line being spoken highlighted and kept in view (smoothly unless the viewer asked for reduced
 * motion, and only while "Follow the video" is on), and a find box with previous/next match.
 */
export function TranscriptPanel({ tourId, captions, clock, onSeek }: TranscriptPanelProps) {
  const [trackId, setTrackId] = useState(captions.defaultTrackId ?? captions.tracks[0]?.id ?? null);
  const track = captions.tracks.find((t) => t.id === trackId) ?? null;
  const query = useTrackCues(track);
  const lines = useMemo(() => (query.data?.cues ?? []).map((c) => ({ startMs: c.startMs, endMs: c.endMs, text: transcriptLine(c.text) })), [query.data]);
  const texts = useMemo(() => lines.map((l) => l.text), [lines]);

  const readActive = useCallback(() => activeCueIndex(lines, clock.get()), [lines, clock]);
  const active = useSyncExternalStore(clock.subscribe, readActive, readActive);

  const [find, setFind] = useState('');
  const matches = useMemo(() => findInLines(texts, find), [texts, find]);
  const [matchAt, setMatchAt] = useState(-1);
  const [follow, setFollow] = useState(true);
  // One tab stop for the whole list (roving tabindex): ↑ ↓ Home End move between lines.
  const [focusLine, setFocusLine] = useState(-1);
  const reduced = useMediaQuery(REDUCED_MOTION);
  const list = useRef<HTMLOListElement>(null);
  const ids = { find: useId(), status: useId(), follow: useId(), lang: useId() };

  // A new find text starts from its first match.
  useEffect(() => setMatchAt(matches.length ? 0 : -1), [matches]);

  const lineEl = (i: number) => list.current?.querySelector<HTMLElement>(`[data-line="${i}"]`) ?? null;

  useEffect(() => {
    if (!follow || active < 0 || !list.current) return;
    const el = lineEl(active);
    if (el) scrollWithin(list.current, el, !reduced);
  }, [active, follow, reduced]);

  useEffect(() => {
    const m = matches[matchAt];
    if (!m || !list.current) return;
    const el = lineEl(m.line);
    if (el) scrollWithin(list.current, el, !reduced);
  }, [matchAt, matches, reduced]);

  const byLine = useMemo(() => {
    const map = new Map<number, { m: TranscriptMatch; index: number }[]>();
    matches.forEach((m, index) => map.set(m.line, [...(map.get(m.line) ?? []), { m, index }]));
    return map;
  }, [matches]);

  if (captions.tracks.length === 0) {
    return <p className="mt-2 text-ink-soft">This tour has no captions yet, so there is no transcript.</p>;
  }

  const tabbable = focusLine >= 0 && focusLine < lines.length ? focusLine : active >= 0 ? active : 0;
  const moveTo = (i: number) => {
    const to = Math.max(0, Math.min(lines.length - 1, i));
    setFocusLine(to);
    lineEl(to)?.querySelector('button')?.focus();
  };
  const onLineKey = (e: KeyboardEvent, i: number) => {
    const to = e.key === 'ArrowDown' ? i + 1 : e.key === 'ArrowUp' ? i - 1 : e.key === 'Home' ? 0 : e.key === 'End' ? lines.length - 1 : null;
    if (to == null || e.altKey || e.ctrlKey || e.metaKey) return;
    e.preventDefault();
    e.stopPropagation();
    moveTo(to);
  };

  const status = !find.trim() ? 'Type a word to find it in the transcript.' : matches.length === 0 ? `No line says “${find.trim()}”.` : `Match ${matchAt + 1} of ${matches.length}`;

  return (
    <div className="mt-2">
      <div className="flex flex-wrap items-end gap-3 font-ui text-sm">
        <div className="min-w-48 flex-1">
          <label htmlFor={ids.find} className="block font-bold">
            Find in the transcript
          </label>
          <input
            id={ids.find}
            type="search"
            value={find}
            onChange={(e) => setFind(e.target.value)}
            onKeyDown={(e) => {
              if (e.key === 'Enter') {
                e.preventDefault();
                setMatchAt((at) => stepMatch(matches.length, at, e.shiftKey ? -1 : 1));
              }
            }}
            aria-describedby={ids.status}
            autoComplete="off"
            className="mt-1 block w-full rounded-md border border-edge bg-card px-3 py-1.5 text-base"
          />
        </div>
        <div className="flex gap-2">
          <Button variant="secondary" size="sm" disabled={matches.length === 0} onClick={() => setMatchAt((at) => stepMatch(matches.length, at, -1))}>
            Previous match
          </Button>
          <Button variant="secondary" size="sm" disabled={matches.length === 0} onClick={() => setMatchAt((at) => stepMatch(matches.length, at, 1))}>
            Next match
          </Button>
        </div>
      </div>
      <div className="mt-2 flex flex-wrap items-center justify-between gap-3 font-ui text-sm">
        <p id={ids.status} role="status" className="text-ink-soft">
          {status}
        </p>
        <div className="flex flex-wrap items-center gap-4">
          {captions.tracks.length > 1 && (
            <label htmlFor={ids.lang} className="flex items-center gap-2">
              <span className="font-bold">Language</span>
              <select id={ids.lang} value={trackId ?? ''} onChange={(e) => setTrackId(Number(e.target.value))} className="min-h-9 rounded-md border border-edge bg-card px-2">
                {captions.tracks.map((t) => (
                  <option key={t.id} value={t.id}>
                    {t.label}
                  </option>
                ))}
              </select>
            </label>
          )}
          <label htmlFor={ids.follow} className="flex min-h-9 items-center gap-2">
            <input id={ids.follow} type="checkbox" checked={follow} onChange={(e) => setFollow(e.target.checked)} className="size-4 accent-moss" />
            Follow the video
          </label>
        </div>
      </div>

      {query.isPending ? (
        <Loading label="Loading the transcript…" />
      ) : query.isError ? (
        <p role="alert" className="mt-3 text-maple">
          The transcript could not be loaded: {errorMessage(query.error)}
        </p>
      ) : lines.length === 0 ? (
        <p className="mt-3 text-ink-soft">This caption track has no lines yet.</p>
      ) : (
        <ol ref={list} aria-label={`Transcript, ${track?.label ?? 'captions'}; up and down arrows move between lines`} className="relative mt-3 max-h-[22rem] space-y-0.5 overflow-y-auto rounded-md border border-rule bg-card p-1">
          {lines.map((line, i) => {
            const current = i === active;
            const marks = byLine.get(i) ?? [];
            const focused = marks.some((x) => x.index === matchAt);
            return (
              <li key={i} data-line={i}>
                <button
                  type="button"
                  tabIndex={i === tabbable ? 0 : -1}
                  onFocus={() => setFocusLine(i)}
                  onKeyDown={(e) => onLineKey(e, i)}
                  onClick={() => onSeek(line.startMs / 1000)}
                  aria-current={current ? 'true' : undefined}
                  className={`flex w-full gap-3 rounded px-2 py-1.5 text-left hover:bg-bark-wash ${current ? 'bg-moss-wash font-bold text-moss-deep shadow-[inset_3px_0_0_var(--color-moss)]' : ''} ${focused ? 'outline-2 outline-ochre' : ''}`}
                >
                  <span className="w-12 shrink-0 pt-0.5 font-ui text-xs text-ink-soft tabular-nums">
                    <span aria-hidden="true">{clockText(line.startMs)}</span>
                    <span className="sr-only">At {durationInWords(line.startMs / 1000)}: </span>
                  </span>
                  <span>
                    <MarkedText text={line.text} spans={marks.map((x) => x.m)} bridgeSpaces={false} markClassName={`rounded-sm px-0.5 text-ink ${marks.some((x) => x.index === matchAt) ? 'bg-ochre-wash ring-2 ring-ochre' : 'bg-ochre-wash'}`} />
                  </span>
                </button>
              </li>
            );
          })}
        </ol>
      )}
      <p className="mt-2 font-ui text-sm">
        <Link to={`/tours/${tourId}/transcript`}>Read the whole transcript on its own page</Link>
      </p>
    </div>
  );
}

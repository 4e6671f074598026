import videojs from 'video.js';
import 'video.js/dist/video-js.css';
import './tour-player.css';
import { useEffect, useId, useRef, useState, type KeyboardEvent as ReactKeyboardEvent, type ReactNode } from 'react';
import { createPortal } from 'react-dom';
import type { Rendition } from '@shared/schemas/tours';
import type { WatchResponse } from '@shared/schemas/watch';
import { sheetTileStyle } from '@/lib/thumb-style';
import { clockText } from '@/lib/tour-moment';
import type { PlayerController } from '../lib/player-controller';
import { nextSpeed, PLAYBACK_SPEEDS, playerActionForKey, seekTarget, speedLabel, type PlayerAction } from '../lib/player-keys';
import { pickRendition } from '../lib/renditions';
import { clampStart } from '../lib/start-time';
import { stopIdFromActiveCues, stopIndexAt, type TimedStop } from '../lib/stop-timeline';
import { thumbTileAt, type ThumbStrip, type ThumbTile } from '../lib/thumb-tiles';
import { readCaptionsOn, writeCaptionsOn } from '../lib/watch-links';

type Player = ReturnType<typeof videojs>;

/** Props of TourPlayer: the tour's media as the API describes it, where to start, and what the page listens to. */
export interface TourPlayerProps {
  title: string;
  renditions: Rendition[];
  posterUrl: string | null;
  thumbStrip: ThumbStrip | null;
  /** Seconds from a ?t= link or a stop's own address; null starts at the beginning. */
  startAt: number | null;
  /** Caption tracks (WebVTT), the chapters track and the metadata track the tree card follows. */
  captions?: WatchResponse['captions'] | null;
  /** The stops, drawn as marks on the progress bar. */
  stops?: readonly TimedStop[];
  /** The tour's length from the server, until the video reports its own. */
  durationMs?: number | null;
  /** A cue change on the metadata track: the stop now playing, or null between stops. */
  onStopCue?: (stopId: number | null) => void;
  /** The playhead moved (playing, seeking); seconds. */
  onTime?: (seconds: number) => void;
  /** The player is ready (a handle), or gone (null). */
  onReady?: (controller: PlayerController | null) => void;
  /** The next- or previous-stop key was pressed on the video. */
  onStopStep?: (step: 1 | -1) => void;
  /** The "?" key was pressed on the video. */
  onHelp?: () => void;
  /** Names the keyboard help for screen readers (the video's description). */
  helpHint?: string;
  /** The page's own buttons, shown in the row under the video after Quality and Speed. */
  toolbar?: ReactNode;
}

type MediaTextTrack = TextTrack & { addEventListener(type: 'cuechange', fn: () => void): void; removeEventListener(type: 'cuechange', fn: () => void): void };

function textTracksOf(player: Player): MediaTextTrack[] {
  return Array.from(player.textTracks() as unknown as ArrayLike<MediaTextTrack>);
}

function captionTracksOf(player: Player): MediaTextTrack[] {
  return textTracksOf(player).filter((t) => t.kind === 'captions' || t.kind === 'subtitles');
}

/** The stops as small marks on the video's progress bar, placed by start time; decorative (the trail and the stops list name them). */
function StopMarks({ stops, durationSec }: { stops: readonly TimedStop[]; durationSec: number }) {
  if (!(durationSec > 0)) return null;
  return (
    <div className="gw-stop-marks" aria-hidden="true">
      {stops.map((s) => (
        <span key={s.id} className="gw-stop-mark" style={{ left: `${Math.min(100, (s.startMs / 1000 / durationSec) * 100)}%` }} />
      ))}
    </div>
  );
}

const PREVIEW_WIDTH = 176;

interface Preview {
  tile: ThumbTile;
  seconds: number;
  left: number;
}

function ThumbPreview({ preview }: { preview: Preview }) {
  const { tile } = preview;
  const scale = Math.min(1, PREVIEW_WIDTH / tile.w);
  const w = Math.round(tile.w * scale);
  const h = Math.round(tile.h * scale);
  return (
    <div
      className="gw-thumb-preview"
      aria-hidden="true"
      // The tile fills the whole box, its edge under the frame's border.
      style={{ ...sheetTileStyle(tile), backgroundOrigin: 'border-box', left: preview.left - w / 2, width: w, height: h }}
    >
      <span>{clockText(preview.seconds * 1000)}</span>
    </div>
  );
}

function safeStorage(): Storage | null {
  try {
    return window.localStorage;
  } catch {
    return null;
  }
}

function useThumbPreview(player: Player | null, strip: ThumbStrip | null) {
  const [preview, setPreview] = useState<Preview | null>(null);
  useEffect(() => {
    if (!player || !strip) return;
    const root = player.el() as HTMLElement;
    const progress = root.querySelector<HTMLElement>('.vjs-progress-control');
    const holder = root.querySelector<HTMLElement>('.vjs-progress-holder');
    if (!progress || !holder) return;
    root.classList.add('gw-has-thumbs');
    const onMove = (event: MouseEvent) => {
      const duration = player.duration();
      if (!duration || !Number.isFinite(duration)) return;
      const bar = holder.getBoundingClientRect();
      const box = root.getBoundingClientRect();
      const fraction = Math.min(1, Math.max(0, (event.clientX - bar.left) / bar.width));
      const seconds = fraction * duration;
      const tile = thumbTileAt(strip, seconds);
      if (!tile) return setPreview(null);
      const half = Math.min(PREVIEW_WIDTH, tile.w) / 2 + 4;
      const left = Math.min(box.width - half, Math.max(half, event.clientX - box.left));
      setPreview({ tile, seconds, left });
    };
    const onLeave = () => setPreview(null);
    progress.addEventListener('mousemove', onMove);
    progress.addEventListener('mouseleave', onLeave);
    return () => {
      progress.removeEventListener('mousemove', onMove);
      progress.removeEventListener('mouseleave', onLeave);
      root.classList.remove('gw-has-thumbs');
    };
  }, [player, strip]);
  return preview;
}

/**
 * The tour's video with video.js and Grovewalk's own controls beside it: version ("Quality") and
 * speed. It adds the caption tracks (on by default, the viewer's choice remembered), the chapters
 * track, the stops as marks on the progress bar, and the hidden metadata track whose cue changes
 * tell the page which stop is playing. video.js and its styles live only in this module, which
 * the tour page loads lazily, so they are a chunk of their own.
 */
export function TourPlayer({
  title,
  renditions,
  posterUrl,
  thumbStrip,
  startAt,
  captions = null,
  stops = [],
  durationMs = null,
  onStopCue,
  onTime,
  onReady,
  onStopStep,
  onHelp,
  helpHint = 'Press the question mark key for the list of keyboard keys.',
  toolbar,
}: TourPlayerProps) {
  const holder = useRef<HTMLDivElement>(null);
  const [player, setPlayer] = useState<Player | null>(null);
  const [source, setSource] = useState<string>('');
  const [speed, setSpeed] = useState(1);
  const [message, setMessage] = useState('');
  const [durationSec, setDurationSec] = useState(durationMs != null ? durationMs / 1000 : 0);
  const [progressHolder, setProgressHolder] = useState<HTMLElement | null>(null);
  const helpId = useId();
  const qualityId = useId();
  const speedId = useId();
  const preview = useThumbPreview(player, thumbStrip);
  // The page's callbacks change on every render; the player's listeners read the latest through this.
  const listeners = useRef({ onStopCue, onTime, onStopStep, onHelp, stops });
  listeners.current = { onStopCue, onTime, onStopStep, onHelp, stops };

  // One player per mount; video.js owns the element it is given, so React never renders it.
  useEffect(() => {
    const box = holder.current;
    if (!box) return;
    const el = document.createElement('video-js');
    el.className = 'vjs-grovewalk vjs-big-play-centered';
    box.appendChild(el);
    const first = pickRendition(renditions, box.clientWidth, window.devicePixelRatio || 1);
    const p = videojs(el, {
      controls: true,
      preload: 'metadata',
      fluid: true,
      aspectRatio: '16:9',
      playsinline: true,
      poster: posterUrl ?? undefined,
      sources: first ? [{ src: first.url, type: 'video/mp4' }] : [],
      userActions: { hotkeys: false },
    });
    const root = p.el() as HTMLElement;
    root.tabIndex = 0;
    root.setAttribute('aria-label', `Video: ${title}`);
    root.setAttribute('aria-describedby', helpId);
    setSource(first?.url ?? '');
    p.on('ratechange', () => setSpeed(p.playbackRate() ?? 1));
    p.on('loadedmetadata', () => {
      const d = p.duration();
      if (d && Number.isFinite(d)) setDurationSec(d);
    });
    if (startAt != null && startAt > 0) {
      p.one('loadedmetadata', () => {
        const at = clampStart(startAt, p.duration());
        if (at > 0) {
          p.currentTime(at);
          // Show the frame at that moment, not the cover picture, even before play is pressed.
          p.hasStarted(true);
        }
      });
    }

    // The tree card follows the metadata track's cue changes, not the clock. Should that track be
    // unusable (no cues loaded), the stop is worked out from the playhead instead.
    let metaTrack: MediaTextTrack | null = null;
    let lastStop: number | null | undefined;
    const tellStop = (id: number | null) => {
      if (id === lastStop) return;
      lastStop = id;
      listeners.current.onStopCue?.(id);
    };
    const onCueChange = () => tellStop(stopIdFromActiveCues(metaTrack?.activeCues as unknown as ArrayLike<{ startTime: number; text: string }>));

    // Tracks can be added once the playback technology is loaded (a moment after the player).
    p.ready(() => {
      // Captions: on unless the viewer turned them off last time; the choice is remembered below.
      const captionsOn = readCaptionsOn(safeStorage());
      for (const t of captions?.tracks ?? []) {
        const shown = captionsOn && t.id === captions?.defaultTrackId;
        p.addRemoteTextTrack({ kind: 'captions', src: t.vttUrl, srclang: t.lang, label: t.label, mode: shown ? 'showing' : 'disabled', default: shown }, false);
      }
      if (captions && stops.length > 0) {
        p.addRemoteTextTrack({ kind: 'chapters', src: captions.chaptersUrl, srclang: 'en', label: 'Stops', default: true }, false);
        const el = p.addRemoteTextTrack({ kind: 'metadata', src: captions.metadataUrl, label: 'Tree cards', mode: 'hidden' }, false) as unknown as { track: MediaTextTrack } | undefined;
        if (el) {
          metaTrack = el.track;
          metaTrack.mode = 'hidden';
          metaTrack.addEventListener('cuechange', onCueChange);
        }
      }
      const tracks = p.textTracks() as unknown as { on(type: string, fn: () => void): void };
      tracks.on('change', () => {
        const list = captionTracksOf(p);
        if (list.length > 0) writeCaptionsOn(safeStorage(), list.some((t) => t.mode === 'showing'));
      });
    });
    const onTimeUpdate = () => {
      const now = p.currentTime() ?? 0;
      listeners.current.onTime?.(now);
      const cues = metaTrack?.cues;
      if (listeners.current.stops.length > 0 && (!cues || cues.length === 0)) {
        const i = stopIndexAt(listeners.current.stops, now * 1000);
        tellStop(i >= 0 ? listeners.current.stops[i]!.id : null);
      }
    };
    p.on('timeupdate', onTimeUpdate);
    p.on('seeked', onTimeUpdate);

    setPlayer(p);
    setProgressHolder(root.querySelector<HTMLElement>('.vjs-progress-holder'));
    return () => {
      metaTrack?.removeEventListener('cuechange', onCueChange);
      setPlayer(null);
      setProgressHolder(null);
      p.dispose();
    };
    // The tour page remounts this component for another tour, so the first props are the only ones.
  }, []);

  // A new ?t= on the same tour (a link to another moment) moves the playhead without a new player.
  const appliedStart = useRef(startAt);
  useEffect(() => {
    if (!player || startAt === appliedStart.current) return;
    appliedStart.current = startAt;
    if (startAt != null) player.currentTime(clampStart(startAt, player.duration()));
  }, [player, startAt]);

  const say = (text: string) => setMessage(text);

  const switchSource = (url: string) => {
    if (!player || url === source) return;
    const at = player.currentTime() ?? 0;
    const wasPaused = player.paused();
    const rate = player.playbackRate() ?? 1;
    setSource(url);
    player.src({ src: url, type: 'video/mp4' });
    player.one('loadedmetadata', () => {
      if (at > 0) {
        player.currentTime(at);
        // A paused switch would otherwise show the cover picture again instead of the frame.
        player.hasStarted(true);
      }
      player.playbackRate(rate);
      if (!wasPaused) void player.play()?.catch(() => undefined);
    });
    const label = renditions.find((r) => r.url === url)?.label ?? '';
    say(`Quality ${label}`);
  };

  const run = (action: PlayerAction) => {
    if (!player) return;
    switch (action.kind) {
      case 'toggle-play':
        if (player.paused()) void player.play()?.catch(() => undefined);
        else player.pause();
        break;
      case 'seek': {
        const to = seekTarget(player.currentTime() ?? 0, action.by, player.duration());
        player.currentTime(to);
        say(`${action.by < 0 ? 'Back' : 'Forward'} to ${clockText(to * 1000)}`);
        break;
      }
      case 'jump': {
        const to = action.to === 'start' ? 0 : Math.max(0, (player.duration() ?? 0) - 0.1);
        player.currentTime(to);
        say(action.to === 'start' ? 'Start of the tour' : 'End of the tour');
        break;
      }
      case 'toggle-mute':
        player.muted(!player.muted());
        say(player.muted() ? 'Sound off' : 'Sound on');
        break;
      case 'toggle-fullscreen':
        if (player.isFullscreen()) void player.exitFullscreen();
        else void player.requestFullscreen();
        break;
      case 'speed': {
        const next = nextSpeed(player.playbackRate() ?? 1, action.step);
        player.playbackRate(next);
        say(`Speed ${speedLabel(next)}`);
        break;
      }
      case 'toggle-captions': {
        const tracks = captionTracksOf(player);
        if (tracks.length === 0) {
          say('This tour has no captions yet');
          break;
        }
        const on = tracks.some((t) => t.mode === 'showing');
        const preferred = Math.max(0, captions?.tracks.findIndex((t) => t.id === captions.defaultTrackId) ?? 0);
        tracks.forEach((t, i) => (t.mode = !on && i === Math.min(preferred, tracks.length - 1) ? 'showing' : 'disabled'));
        say(on ? 'Captions off' : 'Captions on');
        break;
      }
      case 'stop':
        listeners.current.onStopStep?.(action.step);
        break;
      case 'help':
        listeners.current.onHelp?.();
        break;
    }
  };

  // The page's handle on this player; `run` is rebuilt each render, so the handle reads it through a ref.
  const runRef = useRef(run);
  runRef.current = run;
  useEffect(() => {
    if (!player) return;
    const controller: PlayerController = {
      seek: (seconds) => {
        player.currentTime(Math.max(0, seconds));
        if (seconds > 0) player.hasStarted(true);
      },
      currentTime: () => player.currentTime() ?? 0,
      run: (action) => runRef.current(action),
      focus: () => (player.el() as HTMLElement).focus(),
    };
    onReady?.(controller);
    return () => onReady?.(null);
    // onReady is the page's state setter; only a new player means a new handle.
  }, [player]);

  const onKeyDown = (event: ReactKeyboardEvent<HTMLDivElement>) => {
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
    event.preventDefault();
    event.stopPropagation();
    run(action);
  };

  return (
    <div className="space-y-3">
      <div ref={holder} onKeyDown={onKeyDown} className="overflow-hidden rounded-lg bg-ink shadow-leaf" />
      {player && preview && createPortal(<ThumbPreview preview={preview} />, player.el())}
      {progressHolder && stops.length > 0 && createPortal(<StopMarks stops={stops} durationSec={durationSec} />, progressHolder)}
      <p id={helpId} className="sr-only">
        {helpHint}
      </p>
      <p role="status" className="sr-only">
        {message}
      </p>

      <div className="flex flex-wrap items-end gap-x-5 gap-y-3 rounded-lg border border-rule bg-card px-4 py-3 font-ui text-sm">
        <div>
          <label htmlFor={qualityId} className="block font-bold">
            Quality
          </label>
          <select
            id={qualityId}
            value={source}
            onChange={(e) => switchSource(e.target.value)}
            disabled={!player || renditions.length < 2}
            className="mt-1 min-h-9 rounded-md border border-edge bg-card px-2 py-1"
          >
            {renditions.map((r) => (
              <option key={r.url} value={r.url}>
                {r.label}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor={speedId} className="block font-bold">
            Speed
          </label>
          <select
            id={speedId}
            value={String(speed)}
            onChange={(e) => player?.playbackRate(Number(e.target.value))}
            disabled={!player}
            className="mt-1 min-h-9 rounded-md border border-edge bg-card px-2 py-1"
          >
            {PLAYBACK_SPEEDS.map((s) => (
              <option key={s} value={String(s)}>
                {speedLabel(s)}
              </option>
            ))}
            {!(PLAYBACK_SPEEDS as readonly number[]).includes(speed) && <option value={String(speed)}>{speedLabel(speed)}</option>}
          </select>
        </div>
        {toolbar}
      </div>
    </div>
  );
}

export default TourPlayer;

import videojs from 'video.js';
import 'video.js/dist/video-js.css';
import './tour-player.css';
import { useEffect, useId, useRef, useState, type KeyboardEvent as ReactKeyboardEvent } from 'react';
import { createPortal } from 'react-dom';
import type { Rendition } from '@shared/schemas/tours';
import { Button } from '@/components/button';
import { formatClock } from '../lib/media-format';
import { nextSpeed, PLAYBACK_SPEEDS, playerActionForKey, seekTarget, SHORTCUT_HELP, speedLabel, type PlayerAction } from '../lib/player-keys';
import { pickRendition } from '../lib/renditions';
import { clampStart, linkAtMoment } from '../lib/start-time';
import { thumbTileAt, type ThumbStrip, type ThumbTile } from '../lib/thumb-tiles';

type Player = ReturnType<typeof videojs>;

/** Props of TourPlayer: the tour's media as the API describes it, and where to start. */
export interface TourPlayerProps {
  title: string;
  renditions: Rendition[];
  posterUrl: string | null;
  thumbStrip: ThumbStrip | null;
  /** Seconds from a ?t= link; null starts at the beginning. */
  startAt: number | null;
}

const PREVIEW_WIDTH = 176;

interface Preview {
  tile: ThumbTile;
  seconds: number;
  left: number;
}

function ThumbPreview({ preview }: { preview: Preview }) {
  const { tile } = preview;
  const scale = Math.min(1, PREVIEW_WIDTH / tile.width);
  const w = Math.round(tile.width * scale);
  const h = Math.round(tile.height * scale);
  return (
    <div
      className="gw-thumb-preview"
      aria-hidden="true"
      style={{
        left: preview.left - w / 2,
        width: w,
        height: h,
        backgroundImage: `url("${tile.sheetUrl}")`,
        backgroundSize: `${tile.sheetWidth * scale}px ${tile.sheetHeight * scale}px`,
        backgroundPosition: `${-tile.x * scale}px ${-tile.y * scale}px`,
      }}
    >
      <span>{formatClock(preview.seconds)}</span>
    </div>
  );
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
      const half = Math.min(PREVIEW_WIDTH, tile.width) / 2 + 4;
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
 * The tour's video with video.js, plus Grovewalk's own controls beside it: version ("Quality"),
 * speed, "Copy link at this moment" and the keyboard map. video.js and its styles live only in
 * this module, which the tour page loads lazily, so they are a chunk of their own.
 */
export function TourPlayer({ title, renditions, posterUrl, thumbStrip, startAt }: TourPlayerProps) {
  const holder = useRef<HTMLDivElement>(null);
  const [player, setPlayer] = useState<Player | null>(null);
  const [source, setSource] = useState<string>('');
  const [speed, setSpeed] = useState(1);
  const [message, setMessage] = useState('');
  const [copied, setCopied] = useState<{ url: string; ok: boolean; at: number } | null>(null);
  const helpId = useId();
  const qualityId = useId();
  const speedId = useId();
  const preview = useThumbPreview(player, thumbStrip);

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
    if (startAt != null && startAt > 0) {
      p.one('loadedmetadata', () => {
        const at = clampStart(startAt, p.duration());
        if (at > 0) p.currentTime(at);
      });
    }
    setPlayer(p);
    return () => {
      setPlayer(null);
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
        say(`${action.by < 0 ? 'Back' : 'Forward'} to ${formatClock(to)}`);
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
        const tracks = Array.from(player.textTracks() as unknown as ArrayLike<TextTrack>).filter((t) => t.kind === 'captions' || t.kind === 'subtitles');
        if (tracks.length === 0) {
          say('This tour has no captions yet');
          break;
        }
        const on = tracks.some((t) => t.mode === 'showing');
        tracks.forEach((t, i) => (t.mode = !on && i === 0 ? 'showing' : 'disabled'));
        say(on ? 'Captions off' : 'Captions on');
        break;
      }
    }
  };

  const onKeyDown = (event: ReactKeyboardEvent<HTMLDivElement>) => {
    const target = event.target as HTMLElement;
    const action = playerActionForKey({
      key: event.key,
      ctrlKey: event.ctrlKey,
      metaKey: event.metaKey,
      altKey: event.altKey,
      targetTag: target.tagName,
      targetRole: target.getAttribute('role'),
    });
    if (!action) return;
    event.preventDefault();
    event.stopPropagation();
    run(action);
  };

  const copyLink = async () => {
    if (!player) return;
    const at = player.currentTime() ?? 0;
    const url = linkAtMoment(window.location.href, at);
    try {
      await navigator.clipboard.writeText(url);
      setCopied({ url, ok: true, at });
    } catch {
      // No clipboard access (older browsers, plain http): show the link to copy by hand.
      setCopied({ url, ok: false, at });
    }
  };

  return (
    <div className="space-y-3">
      <div ref={holder} onKeyDown={onKeyDown} className="overflow-hidden rounded-lg bg-ink shadow-leaf" />
      {player && preview && createPortal(<ThumbPreview preview={preview} />, player.el())}
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
        <Button variant="secondary" size="sm" onClick={() => void copyLink()} disabled={!player}>
          Copy link at this moment
        </Button>
      </div>

      {copied && (
        <div role="status" className="rounded-md border-l-4 border-moss bg-moss-wash px-4 py-2 text-sm">
          {copied.ok ? (
            <p>
              Link copied. It opens the tour at <span className="font-ui tabular-nums">{formatClock(copied.at)}</span>.
            </p>
          ) : (
            <label className="block">
              <span className="block">Copy this link; it opens the tour at {formatClock(copied.at)}:</span>
              <input readOnly value={copied.url} onFocus={(e) => e.currentTarget.select()} className="mt-1 w-full rounded border border-edge bg-card px-2 py-1 font-mono text-xs" />
            </label>
          )}
        </div>
      )}

      <details className="rounded-lg border border-rule bg-card px-4 py-2 text-sm">
        <summary className="cursor-pointer font-bold">Keyboard</summary>
        <p id={helpId} className="mt-2 text-ink-soft">
          Select the video (click it or move to it with Tab), then use these keys.
        </p>
        <table className="mt-2 mb-2 w-full max-w-md text-left">
          <caption className="sr-only">Keyboard shortcuts for the video</caption>
          <thead>
            <tr>
              <th scope="col" className="py-1 pr-4 font-bold">
                Keys
              </th>
              <th scope="col" className="py-1 font-bold">
                What they do
              </th>
            </tr>
          </thead>
          <tbody>
            {SHORTCUT_HELP.map((row) => (
              <tr key={row.does} className="border-t border-rule">
                <td className="py-1 pr-4 whitespace-nowrap">
                  {row.keys.map((k, i) => (
                    <span key={k}>
                      {i > 0 && ' or '}
                      <kbd className="rounded border border-edge bg-paper px-1.5 py-0.5 font-mono text-xs">{k}</kbd>
                    </span>
                  ))}
                </td>
                <td className="py-1">{row.does}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </details>
    </div>
  );
}

export default TourPlayer;

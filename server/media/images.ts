import { mkdir, stat } from 'node:fs/promises';
import path from 'node:path';
import { even } from './ladder';
import { formatSeconds, runFfmpeg } from './media-tools';
import { probeMedia, type MediaProbe } from './probe';

/** A still written to disk, with the moment it shows. */
export interface FrameImage {
  path: string;
  atSec: number;
  width: number;
  height: number;
}

/** Options shared by posters and stop thumbnails. */
export interface FrameImageOptions {
  /** Output width in pixels; height follows the picture's aspect. */
  width?: number;
  /** mjpeg quality scale, 2 (best) to 31; default 3. */
  quality?: number;
  /** A probe already made for this file, to skip running ffprobe again. */
  probe?: MediaProbe;
  signal?: AbortSignal;
}

async function probeFor(src: string, given?: MediaProbe): Promise<MediaProbe> {
  const probe = given ?? (await probeMedia(src, { tailCheck: false }));
  if (!probe.video) throw new Error(`${src} has no video stream`);
  return probe;
}

function sizeFor(probe: MediaProbe, width: number): { width: number; height: number } {
  const v = probe.video!;
  const w = even(Math.min(width, v.displayWidth));
  return { width: w, height: even((w * v.displayHeight) / v.displayWidth) };
}

/** Latest moment that still has a frame: two frame periods before the end, never negative. */
function clampTime(probe: MediaProbe, atSec: number): number {
  const duration = probe.durationSec ?? 0;
  const frame = 1 / (probe.video?.fps || 30);
  return Math.max(0, Math.min(atSec, duration - 2 * frame));
}

/**
 * When a poster is taken if the author picks no moment: 10 % into the clip, but not before 1 s
 * (the first second of a hand-held clip is often the camera settling; common practice).
 */
export function defaultPosterTime(durationSec: number): number {
  if (durationSec <= 1) return durationSec / 2;
  return Math.max(1, durationSec * 0.1);
}

/** One JPEG frame at a moment; input seeking before `-i` is frame-accurate when decoding. */
export async function makeFrameImage(
  src: string,
  out: string,
  atSec: number,
  options: FrameImageOptions = {},
): Promise<FrameImage> {
  const probe = await probeFor(src, options.probe);
  const { width, height } = sizeFor(probe, options.width ?? 320);
  const t = clampTime(probe, atSec);
  await mkdir(path.dirname(out), { recursive: true });
  await runFfmpeg(
    [
      '-hide_banner', '-nostdin', '-v', 'error',
      '-ss', formatSeconds(t),
      '-i', src,
      '-map', `0:${probe.video!.index}`,
      '-frames:v', '1',
      '-vf', `scale=${width}:${height},setsar=1`,
      '-q:v', String(options.quality ?? 3),
      '-f', 'image2', '-update', '1',
      '-y', out,
    ],
    options.signal,
  );
  // ffmpeg exits cleanly with no frame when the seek lands past the last one.
  const written = await stat(out).catch(() => undefined);
  if (!written || written.size === 0) throw new Error(`no frame at ${t} s in ${src}`);
  return { path: out, atSec: t, width, height };
}

/**
 * The tour's poster: a JPEG at `atSec`, or at defaultPosterTime when the author picked none, at
 * the picture's own width up to 1280 px.
 */
export async function makePoster(
  src: string,
  out: string,
  atSec?: number,
  options: FrameImageOptions = {},
): Promise<FrameImage> {
  const probe = await probeFor(src, options.probe);
  const t = atSec ?? defaultPosterTime(probe.durationSec ?? 0);
  return makeFrameImage(src, out, t, { ...options, probe, width: options.width ?? 1280 });
}

/** The small picture a stop shows on the trail and in search results: the frame at the stop's start. */
export function makeThumbnailAt(
  src: string,
  out: string,
  atSec: number,
  options: FrameImageOptions = {},
): Promise<FrameImage> {
  return makeFrameImage(src, out, atSec, { ...options, width: options.width ?? 320 });
}

/** Where one preview picture sits in a sprite sheet. */
export interface ThumbnailEntry {
  index: number;
  /** The picture shows the first frame at or after this time. */
  timeSec: number;
  /** Index into ThumbnailStrip.sheets. */
  sheet: number;
  x: number;
  y: number;
  w: number;
  h: number;
}

/** Sprite sheets plus the index a player needs to show a preview while the viewer scrubs. */
export interface ThumbnailStrip {
  everySec: number;
  tileWidth: number;
  tileHeight: number;
  columns: number;
  rows: number;
  sheets: { file: string; path: string; width: number; height: number }[];
  entries: ThumbnailEntry[];
}

/** Options for the scrubbing previews. */
export interface ThumbnailStripOptions {
  everySec: number;
  /** Width of one preview picture. */
  width: number;
  /** Pictures per row; default 10. */
  columns?: number;
  /** Rows per sheet before a new sheet starts; default 10 (100 pictures a sheet). */
  rowsPerSheet?: number;
  /** Sheets are named `<baseName>-001.jpg`, …; default "thumbs". */
  baseName?: string;
  quality?: number;
  probe?: MediaProbe;
  signal?: AbortSignal;
}

/**
 * Renders one preview every `everySec` seconds into sprite sheets in a single ffmpeg pass
 * (`select` keeps the first frame of each interval, `tile` lays them out) and returns the index:
 * picture i shows time i × everySec at (x, y, w, h) on its sheet. Sheets are capped so a three-hour
 * tour does not produce one enormous image.
 */
export async function makeThumbnailStrip(
  src: string,
  outDir: string,
  options: ThumbnailStripOptions,
): Promise<ThumbnailStrip> {
  const { everySec, columns = 10, rowsPerSheet = 10, baseName = 'thumbs' } = options;
  if (!(everySec > 0)) throw new RangeError('everySec must be positive');
  const probe = await probeFor(src, options.probe);
  const { width: w, height: h } = sizeFor(probe, options.width);
  const duration = probe.durationSec ?? 0;
  const halfFrame = 0.5 / (probe.video!.fps || 30);
  const count = Math.max(1, Math.floor(Math.max(0, duration - halfFrame) / everySec) + 1);
  const perSheetMax = columns * rowsPerSheet;
  const gridCols = Math.min(columns, count);
  const gridRows = count <= perSheetMax ? Math.ceil(count / gridCols) : rowsPerSheet;
  const perSheet = gridCols * gridRows;
  const sheetCount = Math.ceil(count / perSheet);

  await mkdir(outDir, { recursive: true });
  const pattern = path.join(outDir, `${baseName}-%03d.jpg`);
  const e = String(everySec);
  // First frame of each everySec-long interval; a bucket index keeps the choice free of drift.
  const select = `select='isnan(prev_selected_t)+gte(floor(t/${e})-floor(prev_selected_t/${e})\\,1)'`;
  await runFfmpeg(
    [
      '-hide_banner', '-nostdin', '-v', 'error',
      '-i', src,
      '-map', `0:${probe.video!.index}`,
      '-vf', `${select},scale=${w}:${h},setsar=1,tile=${gridCols}x${gridRows}`,
      '-fps_mode', 'vfr',
      '-q:v', String(options.quality ?? 4),
      '-f', 'image2', '-start_number', '1',
      '-y', pattern,
    ],
    options.signal,
  );

  const sheets = [];
  for (let s = 0; s < sheetCount; s++) {
    const file = `${baseName}-${String(s + 1).padStart(3, '0')}.jpg`;
    const full = path.join(outDir, file);
    const st = await stat(full).catch(() => undefined);
    if (!st || st.size === 0) throw new Error(`thumbnail sheet ${file} was not written`);
    sheets.push({ file, path: full, width: gridCols * w, height: gridRows * h });
  }
  const entries: ThumbnailEntry[] = [];
  for (let i = 0; i < count; i++) {
    const pos = i % perSheet;
    entries.push({
      index: i,
      timeSec: Math.round(i * everySec * 1000) / 1000,
      sheet: Math.floor(i / perSheet),
      x: (pos % gridCols) * w,
      y: Math.floor(pos / gridCols) * h,
      w,
      h,
    });
  }
  return { everySec, tileWidth: w, tileHeight: h, columns: gridCols, rows: gridRows, sheets, entries };
}

/** The preview to show while the viewer hovers at `timeSec`: the last picture taken at or before it. */
export function thumbnailForTime(strip: ThumbnailStrip, timeSec: number): ThumbnailEntry | undefined {
  if (strip.entries.length === 0) return undefined;
  const i = Math.min(strip.entries.length - 1, Math.max(0, Math.floor(timeSec / strip.everySec + 1e-9)));
  return strip.entries[i];
}

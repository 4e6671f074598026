import { mkdir, rename, rm, stat } from 'node:fs/promises';
import path from 'node:path';
import ffmpeg from 'fluent-ffmpeg';
import type { Rendition } from './ladder';
import { abortError, ffmpegPath, formatSeconds, lastLines } from './media-tools';
import { isWebReady, type MediaProbe } from './probe';

/** x264 speed/size trade-offs we allow; slower presets give smaller files at the same quality. */
export type X264Preset = 'ultrafast' | 'superfast' | 'veryfast' | 'faster' | 'fast' | 'medium' | 'slow';

/** Choices a caller can make about a transcode; everything else follows from the probe. */
export interface TranscodePlanOptions {
  /** Folder the renditions are written to. */
  outDir: string;
  /** File names become `<baseName>-<rendition>.mp4`. Default "rendition". */
  baseName?: string;
  /** Stop starts: every rendition gets a keyframe exactly there, so a jump lands on that frame. */
  keyframeTimesSec?: number[];
  /**
   * Default "veryfast" (common practice for servers without spare cores: most of medium's
   * compression at a fraction of its time; the CRF/peak-rate caps keep quality steady).
   */
  preset?: X264Preset;
  /** Regular keyframe spacing in seconds, so seeking anywhere stays quick. Default 2 (common practice). */
  gopSec?: number;
  /** Set false to re-encode the top rendition even when a stream copy would do (benchmarks, repairs). */
  allowCopy?: boolean;
}

/** One file the run writes, and whether it is re-encoded or stream-copied. */
export interface PlannedOutput {
  rendition: Rendition;
  mode: 'copy' | 'encode';
  /** Where the finished file ends up. */
  path: string;
  /** Where ffmpeg writes it; renamed to `path` only when the whole run succeeds. */
  partPath: string;
  /** This output's ffmpeg options, in order, without the file name. */
  options: string[];
}

/** The exact ffmpeg invocation for a source: one run writing every rendition. */
export interface TranscodePlan {
  input: string;
  durationSec: number;
  inputOptions: string[];
  outputs: PlannedOutput[];
  /** Full argument list after the program name: what runTranscode and a shell would both run. */
  args: string[];
  /** Sorted, de-duplicated, inside the clip. */
  keyframeTimesSec: number[];
  audio: 'aac' | 'none';
  /** Why the top rendition is or is not a stream copy, for logs and the job record. */
  copyDecision: string;
}

/**
 * Decides whether the top rendition can be the source's own streams, remuxed. Rules:
 * - the source must be web-ready (H.264 yuv420p in a browser profile, AAC-LC or no sound, MP4/MOV);
 * - the top rendition must be the source's displayed size (no scaling) and frame rate (no cap),
 *   and the source progressive (browsers show interlaced fields as combing);
 * - no keyframe times may be requested: a copy keeps the source's own keyframes, so a jump to a
 *   stop start would land on the previous keyframe instead of the stop's first frame.
 */
export function copyDecisionFor(
  probe: MediaProbe,
  top: Rendition | undefined,
  keyframeTimesSec: readonly number[],
): { copy: boolean; reason: string } {
  if (!top || !probe.video) return { copy: false, reason: 'no video to copy' };
  if (!isWebReady(probe)) return { copy: false, reason: 'source is not web-ready' };
  if (top.width !== probe.video.displayWidth || top.height !== probe.video.displayHeight) {
    return { copy: false, reason: `top rendition ${top.width}x${top.height} differs from the source size` };
  }
  if (top.fps !== undefined) return { copy: false, reason: 'source frame rate is above the cap' };
  if (probe.video.interlaced) return { copy: false, reason: 'source is interlaced' };
  if (keyframeTimesSec.length > 0) {
    return { copy: false, reason: 'keyframes requested at stop starts; a copy would keep the source keyframes' };
  }
  return { copy: true, reason: 'source is web-ready at the top rendition size' };
}

function cleanKeyframeTimes(times: readonly number[] | undefined, durationSec: number): number[] {
  const ms = new Set<number>();
  for (const t of times ?? []) {
    if (!Number.isFinite(t)) continue;
    const rounded = Math.round(t * 1000);
    // A keyframe at 0 exists anyway; one at or past the end has no frame to land on.
    if (rounded > 0 && rounded < Math.round(durationSec * 1000)) ms.add(rounded);
  }
  return [...ms].sort((a, b) => a - b).map((m) => m / 1000);
}

/**
 * Builds the single ffmpeg run that writes every rendition: the picture is decoded once and fanned
 * out with `split` to one scaler and one libx264 encoder per rung, while a web-ready top rung is a
 * plain stream copy in the same run. Sound: AAC-LC (ffmpeg's `aac`, whose default profile is LC),
 * 128 kbit/s, at most two channels, 44.1/48 kHz kept and anything else resampled to 48 kHz. A
 * source without sound yields renditions without sound (no silent track: it would cost bytes and
 * encoding time and players handle picture-only MP4 fine). Metadata and chapters are dropped so
 * camera details such as GPS positions never reach viewers; rotation survives as stream side data
 * on a copy and is applied to the pixels on an encode.
 */
export function buildTranscodePlan(
  probe: MediaProbe,
  renditions: readonly Rendition[],
  options: TranscodePlanOptions,
): TranscodePlan {
  const v = probe.video;
  if (!v) throw new Error('buildTranscodePlan needs a video stream');
  if (renditions.length === 0) throw new Error('buildTranscodePlan needs at least one rendition');
  const durationSec = probe.durationSec ?? v.durationSec ?? 0;
  const { outDir, baseName = 'rendition', preset = 'veryfast', gopSec = 2 } = options;
  const keyframes = cleanKeyframeTimes(options.keyframeTimesSec, durationSec);
  const sorted = [...renditions].sort((a, b) => b.width * b.height - a.width * a.height);
  const decision =
    options.allowCopy === false ? { copy: false, reason: 'stream copy switched off by the caller' } : copyDecisionFor(probe, sorted[0], keyframes);
  const a = probe.audio;

  const names = new Set(sorted.map((r) => r.name));
  if (names.size !== sorted.length) throw new Error('two renditions share a name (and so a file name)');

  const common = ['-map_metadata', '-1', '-map_chapters', '-1', '-movflags', '+faststart', '-f', 'mp4'];
  const audioEncode = (r: Rendition) =>
    a
      ? [
          '-map', `0:${a.index}`,
          '-c:a', 'aac',
          '-b:a', `${r.audioBitrateKbps}k`,
          '-ac', String(Math.min(Math.max(a.channels, 1), 2)),
          '-ar', String(a.sampleRate === 44100 || a.sampleRate === 48000 ? a.sampleRate : 48000),
        ]
      : [];

  const encodes = sorted.filter((_, i) => !(i === 0 && decision.copy));
  // Interlaced footage (camcorders, broadcast captures) is deinterlaced frame for frame first.
  const deinterlace = v.interlaced ? 'bwdif=mode=send_frame,' : '';
  const fpsFilter = sorted[0].fps !== undefined ? `fps=${sorted[0].fps},` : '';
  const pre = deinterlace + fpsFilter;
  let graph = '';
  if (encodes.length === 1) {
    graph = `[0:${v.index}]${pre}scale=${encodes[0].width}:${encodes[0].height},setsar=1,format=yuv420p[v0]`;
  } else if (encodes.length > 1) {
    const taps = encodes.map((_, i) => `[s${i}]`).join('');
    const chains = encodes.map((r, i) => `[s${i}]scale=${r.width}:${r.height},setsar=1,format=yuv420p[v${i}]`);
    graph = [`[0:${v.index}]${pre}split=${encodes.length}${taps}`, ...chains].join(';');
  }

  const outFps = sorted[0].fps ?? v.fps ?? 30;
  const gop = String(Math.max(1, Math.round(outFps * gopSec)));
  const forced = keyframes.length > 0 ? ['-force_key_frames', keyframes.map(formatSeconds).join(',')] : [];

  const outputs: PlannedOutput[] = sorted.map((r, i) => {
    const file = path.join(outDir, `${baseName}-${r.name}.mp4`);
    const partPath = `${file}.part`;
    if (i === 0 && decision.copy) {
      const maps = ['-map', `0:${v.index}`, ...(a ? ['-map', `0:${a.index}`] : [])];
      return { rendition: r, mode: 'copy', path: file, partPath, options: [...maps, '-c', 'copy', ...common] };
    }
    const k = encodes.indexOf(r);
    const opts = [
      ...(k === 0 && graph ? ['-filter_complex', graph] : []),
      '-map', `[v${k}]`,
      '-c:v', 'libx264',
      '-preset', preset,
      '-crf', String(r.crf),
      '-maxrate', `${r.maxrateKbps}k`,
      '-bufsize', `${r.bufsizeKbps}k`,
      '-profile:v', r.profile,
      '-level:v', r.level,
      '-pix_fmt', 'yuv420p',
      '-g', gop,
      ...forced,
      ...audioEncode(r),
      ...common,
    ];
    return { rendition: r, mode: 'encode', path: file, partPath, options: opts };
  });

  const inputOptions = ['-hide_banner', '-nostdin'];
  return {
    input: probe.path,
    durationSec,
    inputOptions,
    outputs,
    // fluent-ffmpeg places inputs first, then "-y", then each output's options and file name.
    args: [...inputOptions, '-i', probe.path, '-y', ...outputs.flatMap((o) => [...o.options, o.partPath])],
    keyframeTimesSec: keyframes,
    audio: a ? 'aac' : 'none',
    copyDecision: decision.reason,
  };
}

/** Callbacks and cancellation for a running transcode. */
export interface TranscodeRunOptions {
  /** Percent 0–100 of the source's duration processed, and the estimated seconds left. */
  onProgress?: (percent: number, etaSec: number | undefined) => void;
  /** Aborting kills ffmpeg (SIGKILL) and removes the half-written files. */
  signal?: AbortSignal;
  /** Called once ffmpeg is running, with its command line and process id. */
  onStart?: (commandLine: string, pid: number | undefined) => void;
}

/** A finished rendition on disk. */
export interface TranscodedFile {
  rendition: Rendition;
  mode: 'copy' | 'encode';
  path: string;
  bytes: number;
}

/** What a successful run produced. */
export interface TranscodeResult {
  files: TranscodedFile[];
  elapsedSec: number;
}

const TIME_RE = /time=\s*(-?\d+):(\d{2}):(\d{2}(?:\.\d+)?)/;

/** Reads the processed media time from an ffmpeg stats line ("... time=00:01:02.50 ..."), in seconds. */
export function parseStatsTime(line: string): number | undefined {
  const m = TIME_RE.exec(line);
  if (!m) return undefined;
  // ffmpeg prints a negative time (e.g. "-00:00:00.04") before the first frame is out.
  if (m[1].startsWith('-')) return 0;
  return Number(m[1]) * 3600 + Number(m[2]) * 60 + Number(m[3]);
}

/**
 * The fluent-ffmpeg command for a plan. Its argument list is exactly `plan.args` (checked by the
 * unit tests), which is what lets the benchmark compare our run with the bare CLI fairly.
 */
export function fluentCommandFor(plan: TranscodePlan): ffmpeg.FfmpegCommand {
  const cmd = ffmpeg({ stdoutLines: 200 }).setFfmpegPath(ffmpegPath());
  cmd.input(plan.input).inputOptions(...plan.inputOptions);
  for (const o of plan.outputs) {
    if (o.options.length < 2) throw new Error('each output needs at least two options');
    // Several arguments at once stop fluent-ffmpeg from splitting values that contain a space.
    cmd.output(o.partPath).outputOptions(...o.options);
  }
  return cmd;
}

async function removeQuietly(paths: readonly string[]): Promise<void> {
  await Promise.all(paths.map((p) => rm(p, { force: true })));
}

/**
 * Runs a plan through fluent-ffmpeg over the system ffmpeg. Progress comes from ffmpeg's own stats
 * lines against the duration the plan already knows, so no extra ffprobe run is needed. Outputs
 * are written as `.part` files and renamed only when every rendition finished, so a crash or a
 * cancel never leaves a file that looks complete.
 */
export async function runTranscode(plan: TranscodePlan, options: TranscodeRunOptions = {}): Promise<TranscodeResult> {
  const { onProgress, signal, onStart } = options;
  const parts = plan.outputs.map((o) => o.partPath);
  if (signal?.aborted) throw abortError(signal);
  for (const dir of new Set(plan.outputs.map((o) => path.dirname(o.path)))) await mkdir(dir, { recursive: true });
  return new Promise<TranscodeResult>((resolve, reject) => {
    if (signal?.aborted) return reject(abortError(signal));
    const started = performance.now();
    const cmd = fluentCommandFor(plan);

    let killed = false;
    const kill = () => {
      killed = true;
      const proc = (cmd as unknown as { ffmpegProc?: { kill(sig: string): void } }).ffmpegProc;
      if (proc) cmd.kill('SIGKILL');
    };
    signal?.addEventListener('abort', kill, { once: true });
    let lastPercent = -1;

    cmd.on('start', (commandLine: string) => {
      const pid = (cmd as unknown as { ffmpegProc?: { pid?: number } }).ffmpegProc?.pid;
      onStart?.(commandLine, pid);
      // An abort that arrived while fluent-ffmpeg was still preparing.
      if (killed || signal?.aborted) kill();
    });
    cmd.on('stderr', (line: string) => {
      if (!onProgress) return;
      const t = parseStatsTime(line);
      if (t === undefined || plan.durationSec <= 0) return;
      const percent = Math.min(99.9, Math.max(0, (t / plan.durationSec) * 100));
      if (percent <= lastPercent) return;
      lastPercent = percent;
      const elapsed = (performance.now() - started) / 1000;
      const eta = t > 0 ? Math.max(0, ((plan.durationSec - t) * elapsed) / t) : undefined;
      onProgress(Math.round(percent * 10) / 10, eta === undefined ? undefined : Math.round(eta * 10) / 10);
    });
    cmd.on('error', (err: Error, _stdout: string | null, stderr: string | null) => {
      signal?.removeEventListener('abort', kill);
      void removeQuietly(parts).finally(() => {
        if (signal?.aborted || killed) reject(abortError(signal));
        else reject(new Error(`transcode failed: ${err.message}${stderr ? ` | ${lastLines(stderr, 3)}` : ''}`));
      });
    });
    cmd.on('end', () => {
      signal?.removeEventListener('abort', kill);
      void (async () => {
        const files: TranscodedFile[] = [];
        for (const o of plan.outputs) {
          const { size } = await stat(o.partPath);
          if (size === 0) throw new Error(`ffmpeg wrote an empty ${path.basename(o.path)}`);
          files.push({ rendition: o.rendition, mode: o.mode, path: o.path, bytes: size });
        }
        for (const o of plan.outputs) await rename(o.partPath, o.path);
        onProgress?.(100, 0);
        return { files, elapsedSec: (performance.now() - started) / 1000 };
      })().then(resolve, async (err: unknown) => {
        await removeQuietly(parts);
        reject(err instanceof Error ? err : new Error(String(err)));
      });
    });
    cmd.run();
  });
}

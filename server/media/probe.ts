import { open, stat } from 'node:fs/promises';
import { ffprobePath, lastLines, runTool, formatSeconds } from './media-tools';
import { readTopLevelBoxes } from './mp4-boxes';

/** What the first bytes of a file look like, used to explain files that ffprobe cannot open. */
export type HeadKind =
  | 'empty'
  | 'text'
  | 'iso-bmff'
  | 'ebml'
  | 'riff'
  | 'ogg'
  | 'flv'
  | 'mpeg-ps'
  | 'mpeg-ts'
  | 'asf'
  | 'image'
  | 'unknown';

/** The picture stream the pipeline will convert (attached cover art is never chosen). */
export interface VideoStreamInfo {
  index: number;
  codec: string;
  profile?: string;
  /** H.264 level as ffprobe reports it (41 for 4.1). */
  level?: number;
  pixFmt?: string;
  /** Stored (coded) size. */
  width: number;
  height: number;
  /** Size as a viewer sees it: sample aspect ratio applied, then rotation. */
  displayWidth: number;
  displayHeight: number;
  /** Clockwise display rotation in degrees, 0, 90, 180 or 270. */
  rotation: number;
  fps?: number;
  /** Stored as interlaced fields (ffprobe field_order tt, bb, tb or bt). */
  interlaced: boolean;
  frameCount?: number;
  bitRateKbps?: number;
  durationSec?: number;
}

/** The sound stream the pipeline will convert. */
export interface AudioStreamInfo {
  index: number;
  codec: string;
  profile?: string;
  channels: number;
  sampleRate: number;
  bitRateKbps?: number;
}

/** Outcome of the cheap end-of-file check that catches uploads cut short. */
export interface TailCheck {
  ok: boolean;
  method: 'mp4-boxes' | 'last-second-packets';
  detail: string;
}

/** Everything later steps need to know about an upload, read once with ffprobe. */
export interface MediaProbe {
  path: string;
  fileSize: number;
  head: HeadKind;
  /** ffprobe's format_name, e.g. "mov,mp4,m4a,3gp,3g2,mj2" or "matroska,webm". */
  container: string;
  majorBrand?: string;
  startSec: number;
  durationSec?: number;
  bitRateKbps?: number;
  streamCount: number;
  video?: VideoStreamInfo;
  audio?: AudioStreamInfo;
  /** Absent when the check was switched off. */
  tail?: TailCheck;
}

/** ffprobe could not open the file; carries what the first bytes looked like so the message can be specific. */
export class ProbeFailure extends Error {
  constructor(
    readonly path: string,
    readonly fileSize: number,
    readonly head: HeadKind,
    readonly stderr: string,
  ) {
    super(`ffprobe could not read ${path}: ${lastLines(stderr, 2) || 'no output'}`);
  }
}

// ---------------------------------------------------------------------------------------------
// First-bytes sniffing

const HEAD_BYTES = 4096;

function isIsoBmffType(t: string): boolean {
  return ['ftyp', 'moov', 'mdat', 'free', 'skip', 'wide', 'pnot', 'uuid'].includes(t);
}

function looksLikeText(bytes: Uint8Array): boolean {
  // A cut multi-byte character at the end of the sample is not a reason to call it binary.
  let end = bytes.length;
  if (end === HEAD_BYTES) {
    let back = 0;
    while (back < 3 && end > 0 && (bytes[end - 1] & 0xc0) === 0x80) {
      end--;
      back++;
    }
    if (end > 0 && bytes[end - 1] >= 0xc0) end--;
  }
  const sample = bytes.subarray(0, end);
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(sample);
  } catch {
    return false;
  }
  for (const b of sample) {
    const control = b < 0x20 && b !== 0x09 && b !== 0x0a && b !== 0x0d && b !== 0x0c;
    if (control || b === 0x7f) return false;
  }
  return sample.length > 0;
}

/**
 * Classifies the first bytes of a file. Signatures (common practice, from memory): ISO BMFF
 * boxes per ISO/IEC 14496-12, EBML 1A 45 DF A3 (Matroska/WebM), "RIFF", "OggS", "FLV",
 * MPEG-PS pack start 00 00 01 BA, MPEG-TS sync byte 0x47 every 188 bytes, the ASF header GUID.
 */
export function sniffHead(bytes: Uint8Array): HeadKind {
  if (bytes.length === 0) return 'empty';
  const ascii = (from: number, to: number) => String.fromCharCode(...bytes.subarray(from, to));
  if (bytes.length >= 8 && isIsoBmffType(ascii(4, 8))) return 'iso-bmff';
  if (bytes[0] === 0x1a && bytes[1] === 0x45 && bytes[2] === 0xdf && bytes[3] === 0xa3) return 'ebml';
  if (ascii(0, 4) === 'RIFF') return 'riff';
  if (ascii(0, 4) === 'OggS') return 'ogg';
  if (ascii(0, 3) === 'FLV') return 'flv';
  if (bytes[0] === 0 && bytes[1] === 0 && bytes[2] === 1 && bytes[3] === 0xba) return 'mpeg-ps';
  if (bytes[0] === 0x47 && (bytes.length < 189 || bytes[188] === 0x47)) return 'mpeg-ts';
  if (bytes[0] === 0x30 && bytes[1] === 0x26 && bytes[2] === 0xb2 && bytes[3] === 0x75) return 'asf';
  if (bytes[0] === 0x89 && ascii(1, 4) === 'PNG') return 'image';
  if (bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return 'image';
  if (looksLikeText(bytes)) return 'text';
  return 'unknown';
}

async function readHead(path: string): Promise<Uint8Array> {
  const fh = await open(path, 'r');
  try {
    const buf = Buffer.alloc(HEAD_BYTES);
    const { bytesRead } = await fh.read(buf, 0, HEAD_BYTES, 0);
    return buf.subarray(0, bytesRead);
  } finally {
    await fh.close();
  }
}

// ---------------------------------------------------------------------------------------------
// ffprobe JSON → MediaProbe

interface RawStream {
  index: number;
  codec_type?: string;
  codec_name?: string;
  profile?: string;
  level?: number;
  pix_fmt?: string;
  field_order?: string;
  width?: number;
  height?: number;
  sample_aspect_ratio?: string;
  avg_frame_rate?: string;
  r_frame_rate?: string;
  nb_frames?: string;
  bit_rate?: string;
  duration?: string;
  channels?: number;
  sample_rate?: string;
  disposition?: { attached_pic?: number };
  tags?: Record<string, string>;
  side_data_list?: { side_data_type?: string; rotation?: number }[];
}
interface RawFormat {
  format_name?: string;
  duration?: string;
  start_time?: string;
  bit_rate?: string;
  nb_streams?: number;
  tags?: Record<string, string>;
}

function num(value: string | number | undefined): number | undefined {
  if (value === undefined || value === 'N/A') return undefined;
  const n = typeof value === 'number' ? value : Number(value);
  return Number.isFinite(n) ? n : undefined;
}

function ratio(value: string | undefined): number | undefined {
  if (!value) return undefined;
  const [a, b] = value.split(/[/:]/).map(Number);
  if (!Number.isFinite(a) || !Number.isFinite(b) || a <= 0 || b <= 0) return undefined;
  return a / b;
}

function rotationOf(s: RawStream): number {
  const fromSide = s.side_data_list?.find((d) => typeof d.rotation === 'number')?.rotation;
  const raw = fromSide ?? num(s.tags?.rotate) ?? 0;
  // ffprobe reports the display matrix angle counter-clockwise (-90 = turn a quarter clockwise).
  const clockwise = fromSide !== undefined ? -raw : raw;
  return (((Math.round(clockwise / 90) * 90) % 360) + 360) % 360;
}

function kbps(value: string | undefined): number | undefined {
  const n = num(value);
  return n === undefined ? undefined : Math.round(n / 1000);
}

function toVideo(s: RawStream): VideoStreamInfo {
  const width = s.width ?? 0;
  const height = s.height ?? 0;
  const sar = ratio(s.sample_aspect_ratio) ?? 1;
  const rotation = rotationOf(s);
  const shownWidth = Math.round(width * sar);
  const quarter = rotation === 90 || rotation === 270;
  const fps = ratio(s.avg_frame_rate) ?? ratio(s.r_frame_rate);
  return {
    index: s.index,
    codec: s.codec_name ?? 'unknown',
    profile: s.profile,
    level: s.level !== undefined && s.level > 0 ? s.level : undefined,
    pixFmt: s.pix_fmt,
    width,
    height,
    displayWidth: quarter ? height : shownWidth,
    displayHeight: quarter ? shownWidth : height,
    rotation,
    fps: fps === undefined ? undefined : Math.round(fps * 1000) / 1000,
    interlaced: ['tt', 'bb', 'tb', 'bt'].includes(s.field_order ?? ''),
    frameCount: num(s.nb_frames),
    bitRateKbps: kbps(s.bit_rate),
    durationSec: num(s.duration),
  };
}

function toAudio(s: RawStream): AudioStreamInfo {
  return {
    index: s.index,
    codec: s.codec_name ?? 'unknown',
    profile: s.profile,
    channels: s.channels ?? 0,
    sampleRate: num(s.sample_rate) ?? 0,
    bitRateKbps: kbps(s.bit_rate),
  };
}

/** Turns ffprobe's JSON into our probe shape; exported so tests can feed recorded output. */
export function parseProbeJson(json: string, path: string, fileSize: number, head: HeadKind): MediaProbe {
  const data = JSON.parse(json) as { streams?: RawStream[]; format?: RawFormat };
  const streams = data.streams ?? [];
  const format = data.format ?? {};
  const video = streams.find((s) => s.codec_type === 'video' && !s.disposition?.attached_pic);
  const audio = streams.find((s) => s.codec_type === 'audio');
  const duration = num(format.duration) ?? (video ? num(video.duration) : undefined);
  return {
    path,
    fileSize,
    head,
    container: format.format_name ?? 'unknown',
    majorBrand: format.tags?.major_brand,
    startSec: num(format.start_time) ?? 0,
    durationSec: duration,
    bitRateKbps: kbps(format.bit_rate),
    streamCount: streams.length,
    video: video ? toVideo(video) : undefined,
    audio: audio ? toAudio(audio) : undefined,
  };
}

// ---------------------------------------------------------------------------------------------
// Truncation check

/** True for the ISO base media family that the mov demuxer reads (MP4, MOV, M4A, 3GP). */
export function isMovFamily(container: string): boolean {
  return container.split(',').some((n) => n === 'mov' || n === 'mp4');
}

/**
 * Detects a file cut short without decoding it all. ffprobe trusts the header, so a faststart MP4
 * truncated after its moov box still reports the full duration. Two cheap steps:
 * 1. MP4/MOV: walk the top-level boxes; a box whose declared size runs past the end of the file
 *    (usually mdat) means the end is missing.
 * 2. Any container: ask ffprobe for the packets of the last second only (`-read_intervals`, which
 *    seeks, so the cost does not grow with the length) and check that their timestamps reach the
 *    reported end. Packets are demuxed, not decoded, which keeps this well under a second even for
 *    1080p; `-count_packets` or a full decode would read the whole file.
 */
export async function checkTail(probe: MediaProbe, signal?: AbortSignal): Promise<TailCheck> {
  if (isMovFamily(probe.container)) {
    const boxes = await readTopLevelBoxes(probe.path);
    const cut = boxes.find((b) => b.truncated);
    if (cut) {
      const remaining = probe.fileSize - cut.offset;
      return {
        ok: false,
        method: 'mp4-boxes',
        detail: `the '${cut.type}' box declares ${cut.size} bytes but only ${remaining} remain`,
      };
    }
    if (!boxes.some((b) => b.type === 'moov')) {
      return { ok: false, method: 'mp4-boxes', detail: 'no moov box' };
    }
  }
  const duration = probe.durationSec;
  if (duration === undefined || duration <= 0) {
    return { ok: false, method: 'last-second-packets', detail: 'no duration to check against' };
  }
  const end = probe.startSec + duration;
  const from = Math.max(probe.startSec, end - 1);
  const result = await runTool(
    ffprobePath(),
    [
      '-v', 'error',
      '-read_intervals', `${formatSeconds(from)}%`,
      '-show_entries', 'packet=pts_time,duration_time',
      '-of', 'csv=p=0',
      probe.path,
    ],
    { signal },
  );
  let reached = -Infinity;
  for (const line of result.stdout.split('\n')) {
    const [pts, dur] = line.split(',');
    const p = num(pts);
    if (p === undefined) continue;
    reached = Math.max(reached, p + (num(dur) ?? 0));
  }
  const cutShort = /partial file|ended prematurely|truncat/i.exec(result.stderr);
  const frame = probe.video?.fps ? 1 / probe.video.fps : 0.05;
  const tolerance = Math.max(0.5, 3 * frame);
  if (cutShort || result.code !== 0) {
    return { ok: false, method: 'last-second-packets', detail: lastLines(result.stderr, 2) || `ffprobe exit ${result.code}` };
  }
  if (!(reached >= end - tolerance)) {
    const got = Number.isFinite(reached) ? `${reached.toFixed(2)} s` : 'nothing';
    return { ok: false, method: 'last-second-packets', detail: `packets stop at ${got}, the file claims ${end.toFixed(2)} s` };
  }
  return { ok: true, method: 'last-second-packets', detail: `packets reach ${reached.toFixed(2)} s of ${end.toFixed(2)} s` };
}

/**
 * Reads container, duration and the first picture and sound streams with ffprobe's JSON output,
 * then (unless switched off) runs the cut-short check. Throws ProbeFailure when ffprobe cannot
 * open the file at all.
 */
export async function probeMedia(
  path: string,
  options: { tailCheck?: boolean; signal?: AbortSignal } = {},
): Promise<MediaProbe> {
  const { tailCheck = true, signal } = options;
  const { size } = await stat(path);
  const head = sniffHead(await readHead(path));
  if (size === 0) throw new ProbeFailure(path, size, 'empty', 'zero-byte file');
  const result = await runTool(
    ffprobePath(),
    ['-v', 'error', '-print_format', 'json', '-show_format', '-show_streams', path],
    { signal },
  );
  if (result.code !== 0) throw new ProbeFailure(path, size, head, result.stderr);
  let probe: MediaProbe;
  try {
    probe = parseProbeJson(result.stdout, path, size, head);
  } catch {
    throw new ProbeFailure(path, size, head, result.stderr || 'unreadable ffprobe output');
  }
  if (tailCheck && probe.streamCount > 0 && !isStillImage(probe)) probe.tail = await checkTail(probe, signal);
  return probe;
}

// ---------------------------------------------------------------------------------------------
// Upload validation

/** Why an upload was refused; stable codes for the client, plain English for people. */
export type MediaProblem =
  | 'empty_file'
  | 'not_media'
  | 'unknown_format'
  | 'unsupported_container'
  | 'truncated'
  | 'audio_only'
  | 'no_streams'
  | 'still_image'
  | 'bad_dimensions'
  | 'too_short'
  | 'too_long'
  | 'unsupported_codec';

/** A refused upload: the code is for programs, the message is for the author who uploaded it. */
export class MediaValidationError extends Error {
  constructor(
    readonly code: MediaProblem,
    message: string,
  ) {
    super(message);
    this.name = 'MediaValidationError';
  }
}

/** Bounds an upload must fit; the defaults suit a garden tour, the job may tighten them. */
export interface UploadLimits {
  minDurationSec: number;
  maxDurationSec: number;
  minSidePx: number;
  maxSidePx: number;
}

/** 1 s to 3 h; 64 to 8192 px a side (8192 is a common decoder ceiling, common practice). */
export const DEFAULT_UPLOAD_LIMITS: UploadLimits = {
  minDurationSec: 1,
  maxDurationSec: 3 * 3600,
  minSidePx: 64,
  maxSidePx: 8192,
};

/** Containers accepted for conversion: families ffmpeg reads reliably and cameras actually write. */
const ACCEPTED_CONTAINERS = ['mov', 'mp4', 'matroska', 'webm', 'avi', 'mpegts', 'mpeg', 'flv', 'asf', 'ogg'];

const STILL_CODECS = ['png', 'mjpeg', 'bmp', 'tiff', 'webp', 'jpegls', 'jpeg2000', 'gif', 'qoi'];

/** A single picture rather than moving video: image demuxers, one frame, or no running time. */
export function isStillImage(probe: MediaProbe): boolean {
  const names = probe.container.split(',');
  if (names.some((n) => n === 'image2' || n.endsWith('_pipe'))) return true;
  const v = probe.video;
  if (!v) return false;
  if (v.frameCount === 1) return true;
  // Image codecs without a running time; motion JPEG in AVI/MKV has a duration and stays video.
  if (STILL_CODECS.includes(v.codec) && probe.durationSec === undefined) return true;
  return probe.durationSec === 0;
}

/** "2 h 05 min", "12.4 s": durations the way an author reads them. */
export function describeDuration(sec: number): string {
  if (sec < 60) return `${Number(sec.toFixed(1))} s`;
  const total = Math.round(sec);
  const h = Math.floor(total / 3600);
  const m = Math.floor((total % 3600) / 60);
  const s = total % 60;
  if (h > 0) return `${h} h ${String(m).padStart(2, '0')} min`;
  return `${m} min ${String(s).padStart(2, '0')} s`;
}

const ACCEPTED_HINT = 'MP4, MOV, WebM, MKV, AVI or MPEG-TS';

function refuse(code: MediaProblem, message: string): UploadCheck {
  return { ok: false, error: new MediaValidationError(code, message) };
}

/** The verdict on an upload: a usable probe, or the one problem to tell the author about. */
export type UploadCheck = { ok: true; probe: MediaProbe } | { ok: false; error: MediaValidationError };

/**
 * Decides whether an upload can become a tour, from its probe (or the error probing raised) and
 * its size on disk. Checks run from the most basic problem to the most specific, so the author
 * hears about the real cause: an empty file is not reported as "unknown format".
 */
export function validateUpload(
  input: MediaProbe | Error,
  fileSize: number,
  limits: Partial<UploadLimits> = {},
): UploadCheck {
  const lim = { ...DEFAULT_UPLOAD_LIMITS, ...limits };
  if (fileSize === 0 || (input instanceof ProbeFailure && input.head === 'empty')) {
    return refuse('empty_file', 'The file is empty (0 bytes). The upload may have failed; please choose the video again.');
  }
  const head = input instanceof ProbeFailure ? input.head : input instanceof Error ? 'unknown' : input.head;
  if (head === 'text') {
    return refuse('not_media', `This is a text file, not a video. Please upload the video itself (${ACCEPTED_HINT}).`);
  }
  if (input instanceof Error) {
    if (head === 'unknown') {
      return refuse(
        'unknown_format',
        `We could not recognise this file as a video: its contents match no format we know. Please upload ${ACCEPTED_HINT}.`,
      );
    }
    if (head === 'image') {
      return refuse('still_image', 'This is a still picture, not a video. A tour needs moving video.');
    }
    return refuse(
      'truncated',
      'This video file is damaged or incomplete (it may have been cut off while copying or uploading). Please upload it again.',
    );
  }
  const probe = input;
  if (isStillImage(probe)) {
    return refuse('still_image', 'This is a still picture, not a video. A tour needs moving video.');
  }
  const names = probe.container.split(',');
  if (!names.some((n) => ACCEPTED_CONTAINERS.includes(n))) {
    return refuse(
      'unsupported_container',
      `This file is in a format we do not accept (${probe.container}). Please upload ${ACCEPTED_HINT}.`,
    );
  }
  if (!probe.video) {
    if (probe.audio) {
      return refuse('audio_only', 'This file has sound but no picture. A tour needs video; please upload the video recording.');
    }
    return refuse('no_streams', 'This file holds neither picture nor sound. Please upload the video recording.');
  }
  if (probe.tail && !probe.tail.ok) {
    return refuse(
      'truncated',
      'This video file is incomplete: it stops before the end its header promises (the upload or copy was probably cut off). Please upload it again.',
    );
  }
  if (probe.durationSec === undefined) {
    return refuse('truncated', 'We could not read how long this video is; the file is probably damaged. Please upload it again.');
  }
  const { displayWidth: w, displayHeight: h } = probe.video;
  if (Math.min(w, h) < lim.minSidePx || Math.max(w, h) > lim.maxSidePx) {
    return refuse(
      'bad_dimensions',
      `The picture is ${w} × ${h} pixels; tours need between ${lim.minSidePx} and ${lim.maxSidePx} pixels on each side.`,
    );
  }
  if (probe.durationSec < lim.minDurationSec) {
    return refuse(
      'too_short',
      `The video lasts ${describeDuration(probe.durationSec)}; a tour must be at least ${describeDuration(lim.minDurationSec)} long.`,
    );
  }
  if (probe.durationSec > lim.maxDurationSec) {
    return refuse(
      'too_long',
      `The video lasts ${describeDuration(probe.durationSec)}; the longest tour we accept is ${describeDuration(lim.maxDurationSec)}. Please trim or split it.`,
    );
  }
  if (probe.video.codec === 'unknown' || probe.video.codec === 'none') {
    return refuse('unsupported_codec', 'The picture in this file uses an encoding (codec) we cannot convert. Export it again as MP4 from your camera or phone and upload that.');
  }
  return { ok: true, probe };
}

/** Probe + validate in one call, for the upload job: never throws for a bad file, only for I/O trouble. */
export async function inspectUpload(
  path: string,
  limits: Partial<UploadLimits> = {},
  signal?: AbortSignal,
): Promise<UploadCheck> {
  const { size } = await stat(path);
  try {
    return validateUpload(await probeMedia(path, { signal }), size, limits);
  } catch (err) {
    if (err instanceof ProbeFailure) return validateUpload(err, size, limits);
    throw err;
  }
}

// ---------------------------------------------------------------------------------------------
// Web-ready check

/** H.264 profiles every current browser decodes (8-bit 4:2:0 only; High 10/4:2:2/4:4:4 are not). */
const WEB_H264_PROFILES = ['Constrained Baseline', 'Baseline', 'Main', 'High'];

/**
 * Lists what keeps a file from playing as-is in browsers: H.264 in 8-bit yuv420p, AAC-LC sound
 * (or none), MP4/MOV family. Source: ffmpeg documentation (libx264 notes on yuv420p; `aac`
 * encoder default profile aac_low). An empty list means web-ready.
 */
export function webReadyIssues(probe: MediaProbe): string[] {
  const issues: string[] = [];
  if (!isMovFamily(probe.container)) issues.push(`container ${probe.container} is not MP4/MOV`);
  const v = probe.video;
  if (!v) issues.push('no video stream');
  else {
    if (v.codec !== 'h264') issues.push(`video codec ${v.codec} is not H.264`);
    else if (!v.profile || !WEB_H264_PROFILES.includes(v.profile)) issues.push(`H.264 profile ${v.profile ?? 'unknown'} is not web-safe`);
    if (v.pixFmt !== 'yuv420p') issues.push(`pixel format ${v.pixFmt ?? 'unknown'} is not yuv420p`);
  }
  const a = probe.audio;
  if (a) {
    if (a.codec !== 'aac') issues.push(`audio codec ${a.codec} is not AAC`);
    else if (a.profile !== 'LC') issues.push(`AAC profile ${a.profile ?? 'unknown'} is not LC`);
  }
  return issues;
}

/** True when the file can be streamed without re-encoding (a remux to faststart MP4 at most). */
export function isWebReady(probe: MediaProbe): boolean {
  return webReadyIssues(probe).length === 0;
}

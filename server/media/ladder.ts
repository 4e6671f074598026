import type { MediaProbe } from './probe';

/** One web-ready output the transcode job produces, sized and rate-controlled for streaming. */
export interface Rendition {
  /** Short-side label, e.g. "720p" (also for portrait clips: 720 × 1280 is "720p"). */
  name: string;
  width: number;
  height: number;
  /** x264 constant rate factor; lower is better quality. */
  crf: number;
  /** Peak video rate, so CRF cannot blow past what a connection of that class carries. */
  maxrateKbps: number;
  /** VBV buffer: two seconds of the peak rate. */
  bufsizeKbps: number;
  profile: 'high';
  /** H.264 level, e.g. "3.1", the lowest that fits (see h264LevelFor). */
  level: string;
  /** Output frame-rate cap, set only when the source runs faster than MAX_FPS. */
  fps?: number;
  audioBitrateKbps: number;
}

/**
 * Rungs by the short side of the picture. Rates are our own choice (common practice: capped CRF
 * with the peak near typical published streaming ladders, from memory): CRF keeps quiet shots
 * small, the cap bounds busy ones (wind in foliage is the worst case for a garden tour).
 */
export const LADDER = [
  { shortSide: 1080, crf: 21, maxrateKbps: 6000 },
  { shortSide: 720, crf: 21, maxrateKbps: 3500 },
  { shortSide: 480, crf: 22, maxrateKbps: 1600 },
  { shortSide: 360, crf: 23, maxrateKbps: 900 },
] as const;

/** Frame rates above this are reduced: 60 fps is the most browsers' H.264 levels and screens use. */
export const MAX_FPS = 60;

/** Higher frame rates carry more motion per second; 1.5 × the peak rate above 30 fps (common practice). */
const HIGH_FPS_RATE_FACTOR = 1.5;

const AUDIO_KBPS = 128;

/**
 * H.264 level limits, ITU-T Rec. H.264 Annex A, Table A-1: MaxMBPS (macroblocks/s), MaxFS
 * (macroblocks per frame), MaxBR and MaxCPB (kbit/s and kbit, Baseline/Main values; High profile
 * allows 1.25 × these per Table A-2's cpbBrVclFactor).
 */
export const H264_LEVELS = [
  { level: '1', maxMbps: 1485, maxFs: 99, maxBr: 64, maxCpb: 175 },
  { level: '1.1', maxMbps: 3000, maxFs: 396, maxBr: 192, maxCpb: 500 },
  { level: '1.2', maxMbps: 6000, maxFs: 396, maxBr: 384, maxCpb: 1000 },
  { level: '1.3', maxMbps: 11880, maxFs: 396, maxBr: 768, maxCpb: 2000 },
  { level: '2', maxMbps: 11880, maxFs: 396, maxBr: 2000, maxCpb: 2000 },
  { level: '2.1', maxMbps: 19800, maxFs: 792, maxBr: 4000, maxCpb: 4000 },
  { level: '2.2', maxMbps: 20250, maxFs: 1620, maxBr: 4000, maxCpb: 4000 },
  { level: '3', maxMbps: 40500, maxFs: 1620, maxBr: 10000, maxCpb: 10000 },
  { level: '3.1', maxMbps: 108000, maxFs: 3600, maxBr: 14000, maxCpb: 14000 },
  { level: '3.2', maxMbps: 216000, maxFs: 5120, maxBr: 20000, maxCpb: 20000 },
  { level: '4', maxMbps: 245760, maxFs: 8192, maxBr: 20000, maxCpb: 25000 },
  { level: '4.1', maxMbps: 245760, maxFs: 8192, maxBr: 50000, maxCpb: 62500 },
  { level: '4.2', maxMbps: 522240, maxFs: 8704, maxBr: 50000, maxCpb: 62500 },
  { level: '5', maxMbps: 589824, maxFs: 22080, maxBr: 135000, maxCpb: 135000 },
  { level: '5.1', maxMbps: 983040, maxFs: 36864, maxBr: 240000, maxCpb: 240000 },
  { level: '5.2', maxMbps: 2073600, maxFs: 36864, maxBr: 240000, maxCpb: 240000 },
] as const;

const HIGH_PROFILE_FACTOR = 1.25;

/**
 * The lowest H.264 level (never below `floor`) whose Table A-1 limits admit this frame size, rate
 * and VBV settings for High profile. Signalling the true level, rather than one fixed value, lets
 * a player's capability check pass for every rung; ≤ 1080p30 stays within 4.0/4.1, which every
 * current browser decodes (common practice).
 */
export function h264LevelFor(
  width: number,
  height: number,
  fps: number,
  maxrateKbps: number,
  bufsizeKbps: number,
  floor = '3',
): string {
  const mbW = Math.ceil(width / 16);
  const mbH = Math.ceil(height / 16);
  const fs = mbW * mbH;
  const mbps = fs * fps;
  const start = H264_LEVELS.findIndex((l) => l.level === floor);
  for (const l of H264_LEVELS.slice(Math.max(0, start))) {
    // Annex A also bounds each side: at most sqrt(8 × MaxFS) macroblocks.
    const side = Math.sqrt(8 * l.maxFs);
    if (
      fs <= l.maxFs &&
      mbW <= side &&
      mbH <= side &&
      mbps <= l.maxMbps &&
      maxrateKbps <= l.maxBr * HIGH_PROFILE_FACTOR &&
      bufsizeKbps <= l.maxCpb * HIGH_PROFILE_FACTOR
    ) {
      return l.level;
    }
  }
  throw new RangeError(`no H.264 level fits ${width}x${height}@${fps}`);
}

/** Nearest even number, at least 2: 4:2:0 chroma needs even sides. */
export function even(n: number): number {
  return Math.max(2, Math.round(n / 2) * 2);
}

function evenDown(n: number): number {
  return Math.max(2, Math.floor(n / 2) * 2);
}

/**
 * Picks the renditions for a source: the ladder rungs whose short side the source reaches (never
 * upscaled), sized from the displayed picture (rotation and pixel aspect applied) keeping its
 * aspect ratio with even sides. A source smaller than the lowest rung gets one rendition at its
 * own (even) size. Portrait clips use the short side too, so a 1080 × 1920 phone clip gets
 * 1080 × 1920, 720 × 1280, 480 × 854 and 360 × 640.
 */
export function chooseRenditions(probe: Pick<MediaProbe, 'video'>): Rendition[] {
  const v = probe.video;
  if (!v) throw new Error('chooseRenditions needs a video stream');
  const portrait = v.displayHeight > v.displayWidth;
  const srcShort = portrait ? v.displayWidth : v.displayHeight;
  const srcLong = portrait ? v.displayHeight : v.displayWidth;
  const srcFps = v.fps && v.fps > 0 ? v.fps : 30;
  const capped = srcFps > MAX_FPS;
  const outFps = Math.min(srcFps, MAX_FPS);
  const rateFactor = outFps > 31 ? HIGH_FPS_RATE_FACTOR : 1;

  const make = (shortSide: number, longSide: number, crf: number, peakKbps: number): Rendition => {
    const width = portrait ? shortSide : longSide;
    const height = portrait ? longSide : shortSide;
    const maxrateKbps = Math.round(peakKbps * rateFactor);
    const bufsizeKbps = maxrateKbps * 2;
    return {
      name: `${shortSide}p`,
      width,
      height,
      crf,
      maxrateKbps,
      bufsizeKbps,
      profile: 'high',
      level: h264LevelFor(width, height, outFps, maxrateKbps, bufsizeKbps),
      fps: capped ? MAX_FPS : undefined,
      audioBitrateKbps: AUDIO_KBPS,
    };
  };

  const rungs = LADDER.filter((r) => r.shortSide <= srcShort);
  if (rungs.length === 0) {
    // Below the lowest rung: keep the source size; scale the peak rate by picture area.
    const low = LADDER[LADDER.length - 1];
    const shortSide = evenDown(srcShort);
    const longSide = evenDown(srcLong);
    const area = (shortSide * longSide) / (low.shortSide * ((low.shortSide * 16) / 9));
    return [make(shortSide, longSide, low.crf, Math.max(300, Math.round(low.maxrateKbps * area)))];
  }
  return rungs.map((r) => {
    // Same short side as the source: keep its exact long side (this is what makes a copy possible).
    const longSide = r.shortSide === srcShort ? evenDown(srcLong) : Math.min(evenDown(srcLong), even((r.shortSide * srcLong) / srcShort));
    return make(r.shortSide, longSide, r.crf, r.maxrateKbps);
  });
}

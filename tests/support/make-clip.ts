import { spawn } from 'node:child_process';
import { copyFile, mkdir, readFile, rm, stat, writeFile } from 'node:fs/promises';
import path from 'node:path';

/** Test clip settings; everything has a small, fast default so tests stay cheap on two cores. */
export interface ClipOptions {
  seconds: number;
  width: number;
  height: number;
  fps?: number;
  /** A 440 Hz tone (stereo) alongside the picture. */
  audio: boolean;
  /** Pixel format handed to the encoder; leave out to let the encoder choose (the RGB negative case). */
  pixFmt?: string | null;
  /** Video encoder: libx264 (default), libx264rgb, mpeg4, libvpx-vp9, png… */
  codec?: string;
  /** Container, from the file extension when not given: mp4, mov, mkv, webm, avi. */
  container?: 'mp4' | 'mov' | 'mkv' | 'webm' | 'avi';
  /** Audio encoder; defaults to aac (mp4/mov), libopus (webm/mkv) or libmp3lame (avi). */
  audioCodec?: string;
  /** Write moov before mdat (mp4/mov only). Default true. */
  faststart?: boolean;
  /** Text drawn on the picture (letters, digits, spaces, . and - only). */
  label?: string;
  /** x264 preset for the test source itself; default ultrafast. */
  preset?: string;
  sampleRate?: number;
  /** Extra encoder options placed before the container options (e.g. interlaced coding flags). */
  extraArgs?: string[];
}

const MUXER: Record<string, string> = { mp4: 'mp4', mov: 'mov', mkv: 'matroska', webm: 'webm', avi: 'avi' };

function run(args: string[]): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.env.FFMPEG_PATH || 'ffmpeg', args, { stdio: ['ignore', 'ignore', 'pipe'] });
    let err = '';
    child.stderr.on('data', (b: Buffer) => (err += b.toString()));
    child.on('error', reject);
    child.on('close', (code) => (code === 0 ? resolve() : reject(new Error(`ffmpeg ${args.join(' ')}\n${err}`))));
  });
}

/**
 * Writes a synthetic clip from ffmpeg's lavfi sources (testsrc2 picture, sine tone): no downloaded
 * media, and every property a test cares about is chosen here.
 */
export async function generateClip(out: string, options: ClipOptions): Promise<string> {
  const { seconds, width, height, fps = 30, audio, codec = 'libx264', preset = 'ultrafast', sampleRate = 48000 } = options;
  const container = options.container ?? path.extname(out).slice(1);
  if (!MUXER[container]) throw new Error(`unknown container for ${out}`);
  const pixFmt = options.pixFmt === undefined ? 'yuv420p' : options.pixFmt;
  const audioCodec =
    options.audioCodec ?? (container === 'webm' || container === 'mkv' ? 'libopus' : container === 'avi' ? 'libmp3lame' : 'aac');
  const iso = container === 'mp4' || container === 'mov';
  let vf = '';
  if (options.label) {
    if (!/^[A-Za-z0-9 .-]+$/.test(options.label)) throw new Error('label: letters, digits, spaces, . and - only');
    vf = `drawtext=text='${options.label}':fontsize=${Math.max(12, Math.round(height / 12))}:fontcolor=white:box=1:boxcolor=black@0.5:x=10:y=10`;
  }
  const args = [
    '-hide_banner', '-nostdin', '-v', 'error', '-y',
    '-f', 'lavfi', '-i', `testsrc2=size=${width}x${height}:rate=${fps}:duration=${seconds}`,
    ...(audio ? ['-f', 'lavfi', '-i', `sine=frequency=440:sample_rate=${sampleRate}:duration=${seconds}`] : []),
    ...(vf ? ['-vf', vf] : []),
    '-c:v', codec,
    ...(codec.startsWith('libx264') ? ['-preset', preset] : []),
    ...(codec === 'libvpx-vp9' ? ['-deadline', 'realtime', '-cpu-used', '8', '-b:v', '500k'] : []),
    ...(pixFmt ? ['-pix_fmt', pixFmt] : []),
    ...(options.extraArgs ?? []),
    ...(audio ? ['-c:a', audioCodec, '-ac', '2'] : []),
    ...(iso && options.faststart !== false ? ['-movflags', '+faststart'] : []),
    '-f', MUXER[container],
    out,
  ];
  await mkdir(path.dirname(out), { recursive: true });
  await run(args);
  return out;
}

/**
 * Marks the first track of an MP4 as displayed rotated a quarter turn clockwise, as phones do for
 * portrait clips stored sideways: rewrites the tkhd transformation matrix (ISO/IEC 14496-12 §8.3.2,
 * 16.16 fixed point {a b u; c d v; x y w}) to a = 0, b = 1, c = −1, d = 0. ffmpeg 5.1 has no
 * command-line option to write this, hence the byte patch.
 */
export async function rotateFirstTrack(file: string): Promise<void> {
  const bytes = Buffer.from(await readFile(file));
  const at = bytes.indexOf('tkhd', 0, 'latin1');
  if (at < 4) throw new Error(`no tkhd box in ${file}`);
  const box = at - 4;
  if (bytes[box + 8] !== 0) throw new Error('only version 0 tkhd boxes are handled');
  // version/flags 4, times and ids 20, reserved 8, layer/group/volume/reserved 8 → matrix at +40.
  const matrix = box + 8 + 40;
  const values = [0, 0x00010000, 0, 0xffff0000, 0, 0, 0, 0, 0x40000000];
  values.forEach((v, i) => bytes.writeUInt32BE(v, matrix + 4 * i));
  await writeFile(file, bytes);
}

/** The kinds of broken upload generateBadFiles writes. */
export type BadFileKind =
  | 'text'
  | 'empty'
  | 'truncated'
  | 'truncatedFaststart'
  | 'truncatedMkv'
  | 'audioOnly'
  | 'stillPng'
  | 'randomBytes';

/** Deterministic bytes (32-bit LCG, Numerical Recipes constants) so a failure can be reproduced. */
function pseudoRandomBytes(length: number, seed: number): Buffer {
  const buf = Buffer.alloc(length);
  let s = seed >>> 0;
  for (let i = 0; i < length; i++) {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    buf[i] = s >>> 24;
  }
  // A first byte that opens no known signature (not 0x47 "G", 0x1A, 0x00…).
  buf[0] = 0xa5;
  return buf;
}

async function keepFirst(src: string, out: string, fraction: number): Promise<void> {
  const bytes = await readFile(src);
  await writeFile(out, bytes.subarray(0, Math.floor(bytes.length * fraction)));
}

/**
 * Writes one file per way an upload goes wrong, each named .mp4 as an author's browser might send
 * it: a text note, a zero-byte file, MP4s cut to 40 % (moov at the end, so it is lost; and
 * faststart, so the header survives but the media does not), a cut Matroska file, sound only
 * (an .m4a), a still PNG, and random bytes in no known format.
 */
export async function generateBadFiles(dir: string): Promise<Record<BadFileKind, string>> {
  await mkdir(dir, { recursive: true });
  const p = (name: string) => path.join(dir, name);
  const scratch = p('scratch');
  await mkdir(scratch, { recursive: true });

  // Invented content for a fictional garden club.
  await writeFile(p('text.mp4'), 'Notes for the Fernhollow Maple Circle tour (fictional club, invented test data):\n- the maple by the gate\n- the pond corner\n');
  await writeFile(p('empty.mp4'), '');

  const plain = await generateClip(path.join(scratch, 'plain.mp4'), { seconds: 3, width: 320, height: 180, audio: true, faststart: false });
  await keepFirst(plain, p('truncated.mp4'), 0.4);
  const fast = await generateClip(path.join(scratch, 'fast.mp4'), { seconds: 3, width: 320, height: 180, audio: true });
  await keepFirst(fast, p('truncated-faststart.mp4'), 0.4);
  const mkv = await generateClip(path.join(scratch, 'cut.mkv'), { seconds: 3, width: 320, height: 180, audio: true });
  await keepFirst(mkv, p('truncated.mkv'), 0.4);

  const m4a = path.join(scratch, 'tone.m4a');
  await run(['-hide_banner', '-nostdin', '-v', 'error', '-y', '-f', 'lavfi', '-i', 'sine=frequency=330:duration=3', '-c:a', 'aac', '-f', 'ipod', m4a]);
  await copyFile(m4a, p('audio-only.mp4'));

  const png = path.join(scratch, 'still.png');
  await run(['-hide_banner', '-nostdin', '-v', 'error', '-y', '-f', 'lavfi', '-i', 'testsrc2=size=320x180', '-frames:v', '1', '-f', 'image2', '-update', '1', png]);
  await copyFile(png, p('still.mp4'));

  await writeFile(p('random.mp4'), pseudoRandomBytes(64 * 1024, 20240601));
  await rm(scratch, { recursive: true, force: true });

  const files: Record<BadFileKind, string> = {
    text: p('text.mp4'),
    empty: p('empty.mp4'),
    truncated: p('truncated.mp4'),
    truncatedFaststart: p('truncated-faststart.mp4'),
    truncatedMkv: p('truncated.mkv'),
    audioOnly: p('audio-only.mp4'),
    stillPng: p('still.mp4'),
    randomBytes: p('random.mp4'),
  };
  for (const f of Object.values(files)) await stat(f);
  return files;
}

import { execFile } from 'node:child_process';
import { promisify } from 'node:util';

const run = promisify(execFile);

/** Runs ffprobe directly (not through the code under test) and returns its stdout. */
export async function ffprobeRaw(args: string[]): Promise<{ stdout: string; stderr: string }> {
  return run(process.env.FFPROBE_PATH || 'ffprobe', args, { maxBuffer: 64 * 1024 * 1024 });
}

/** The check domain.md names: `-show_entries stream=codec_name,profile,level,pix_fmt:format=format_name`, plus sizes. */
export async function ffprobeStreams(file: string): Promise<{
  format: string;
  streams: { codec_type: string; codec_name: string; profile?: string; level?: number; pix_fmt?: string; width?: number; height?: number; sample_rate?: string; channels?: number }[];
}> {
  const { stdout } = await ffprobeRaw([
    '-v', 'error', '-print_format', 'json',
    '-show_entries', 'stream=codec_type,codec_name,profile,level,pix_fmt,width,height,sample_rate,channels:format=format_name',
    file,
  ]);
  const data = JSON.parse(stdout) as { format: { format_name: string }; streams: Awaited<ReturnType<typeof ffprobeStreams>>['streams'] };
  return { format: data.format.format_name, streams: data.streams };
}

/** Presentation times of the keyframes of the first video stream (`-skip_frame nokey`). */
export async function keyframeTimes(file: string): Promise<number[]> {
  const { stdout } = await ffprobeRaw([
    '-v', 'error', '-select_streams', 'v:0', '-skip_frame', 'nokey',
    '-show_entries', 'frame=pts_time', '-of', 'csv=p=0', file,
  ]);
  return stdout.split('\n').map((l) => l.trim()).filter(Boolean).map(Number).sort((a, b) => a - b);
}

/** Packets of one stream as "pts,dts,size,flags" lines, for comparing a stream copy with its source. */
export async function packetList(file: string, stream: string): Promise<string[]> {
  const { stdout } = await ffprobeRaw([
    '-v', 'error', '-select_streams', stream, '-show_entries', 'packet=pts,dts,size,flags', '-of', 'csv=p=0', file,
  ]);
  return stdout.split('\n').map((l) => l.trim()).filter(Boolean);
}

/**
 * Top-level atoms as ffmpeg's own mov demuxer reports them at trace level. Line shape
 * (libavformat/mov.c): `type:'moov' parent:'root' sz: <size> <position after the header> <file size>`;
 * for a 64-bit largesize header ffmpeg prints the size less the 8 extra header bytes.
 */
export async function traceTopLevelAtoms(file: string): Promise<{ type: string; sz: number; afterHeader: number }[]> {
  const { stderr } = await ffprobeRaw(['-v', 'trace', '-show_entries', 'format=duration', '-of', 'csv=p=0', file]);
  const atoms: { type: string; sz: number; afterHeader: number }[] = [];
  for (const m of stderr.matchAll(/type:'(.{4})' parent:'root' sz: (\d+) (\d+) \d+/g)) {
    atoms.push({ type: m[1], sz: Number(m[2]), afterHeader: Number(m[3]) });
  }
  return atoms;
}

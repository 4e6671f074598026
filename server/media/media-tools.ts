import { spawn } from 'node:child_process';

/** ffmpeg binary: the system one unless FFMPEG_PATH points elsewhere (tests and the worker share it). */
export function ffmpegPath(): string {
  return process.env.FFMPEG_PATH || 'ffmpeg';
}

/** ffprobe binary: the system one unless FFPROBE_PATH points elsewhere. */
export function ffprobePath(): string {
  return process.env.FFPROBE_PATH || 'ffprobe';
}

/** What a finished tool run left behind; callers decide whether a non-zero code is an error. */
export interface ToolResult {
  code: number | null;
  signal: NodeJS.Signals | null;
  stdout: string;
  stderr: string;
}

/** Raised when a tool exits badly; keeps the tail of stderr so the cause is readable in logs. */
export class ToolError extends Error {
  constructor(
    readonly tool: string,
    readonly result: ToolResult,
  ) {
    super(`${tool} failed (${result.signal ?? `exit ${result.code}`}): ${lastLines(result.stderr, 4)}`);
  }
}

/** Keeps only the last lines of a long log, so errors stay short. */
export function lastLines(text: string, count: number): string {
  return text.trim().split(/\r?\n|\r/).slice(-count).join(' | ');
}

/** The error a cancelled run rejects with, whatever the signal's reason was. */
export function abortError(signal?: AbortSignal): Error {
  const reason: unknown = signal?.reason;
  if (reason instanceof Error && reason.name === 'AbortError') return reason;
  const err = new Error(typeof reason === 'string' ? reason : 'The media task was cancelled.');
  err.name = 'AbortError';
  return err;
}

/**
 * Runs a short media tool (ffprobe, a poster grab) to completion. Long transcodes go through
 * runTranscode instead, which reports progress.
 */
export function runTool(
  bin: string,
  args: readonly string[],
  options: { signal?: AbortSignal; maxOutputBytes?: number } = {},
): Promise<ToolResult> {
  const { signal, maxOutputBytes = 64 * 1024 * 1024 } = options;
  return new Promise((resolve, reject) => {
    if (signal?.aborted) return reject(abortError(signal));
    const child = spawn(bin, args, { stdio: ['ignore', 'pipe', 'pipe'], windowsHide: true });
    const out: Buffer[] = [];
    const err: Buffer[] = [];
    let outBytes = 0;
    child.stdout.on('data', (b: Buffer) => {
      outBytes += b.length;
      if (outBytes <= maxOutputBytes) out.push(b);
      else child.kill('SIGKILL');
    });
    child.stderr.on('data', (b: Buffer) => err.push(b));
    const onAbort = () => child.kill('SIGKILL');
    signal?.addEventListener('abort', onAbort, { once: true });
    child.on('error', (e) => {
      signal?.removeEventListener('abort', onAbort);
      reject(e);
    });
    child.on('close', (code, sig) => {
      signal?.removeEventListener('abort', onAbort);
      if (signal?.aborted) return reject(abortError(signal));
      if (outBytes > maxOutputBytes) return reject(new Error(`${bin} wrote more than ${maxOutputBytes} bytes`));
      resolve({
        code,
        signal: sig,
        stdout: Buffer.concat(out).toString('utf8'),
        stderr: Buffer.concat(err).toString('utf8'),
      });
    });
  });
}

/** Runs ffmpeg and fails with its own last words when it does not exit cleanly. */
export async function runFfmpeg(args: readonly string[], signal?: AbortSignal): Promise<ToolResult> {
  const result = await runTool(ffmpegPath(), args, { signal });
  if (result.code !== 0) throw new ToolError('ffmpeg', result);
  return result;
}

/** Seconds as ffmpeg reads them: plain decimal with millisecond precision, never exponent form. */
export function formatSeconds(sec: number): string {
  return (Math.round(sec * 1000) / 1000).toFixed(3);
}

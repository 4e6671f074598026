// Telling WebVTT from SRT, so an author can import either without saying which it is.
import { parseSrt } from './srt';
import type { CaptionFormat, ParseResult } from './types';
import { parseVtt } from './webvtt';

const VTT_SIGNATURE = /^\uFEFF?WEBVTT([ \t]|$)/;
const SRT_TIMING = /^\s*\d+:\d{2}:\d{2}[,.]\d{3}\s*-->\s*\d+:\d{2}:\d{2}[,.]\d{3}/;
const SRT_NUMBER = /^\s*\d+\s*$/;

/**
 * Guesses the format from the first lines: the WebVTT signature (the spec requires it on the
 * first line), or an SRT block start (a sequence number then an HH:MM:SS,mmm timing line, or the
 * timing line straight away). Anything else is 'unknown'.
 */
export function detectFormat(text: string): CaptionFormat | 'unknown' {
  const lines = text.split(/\r\n|\r|\n/, 50);
  if (VTT_SIGNATURE.test(lines[0] ?? '')) return 'vtt';
  const first = lines.findIndex((line) => line.replace(/^\uFEFF/, '').trim() !== '');
  if (first === -1) return 'unknown';
  const head = (lines[first] as string).replace(/^\uFEFF/, '');
  if (SRT_TIMING.test(head)) return 'srt';
  if (SRT_NUMBER.test(head) && SRT_TIMING.test(lines[first + 1] ?? '')) return 'srt';
  return 'unknown';
}

/**
 * Parses caption text as the given format, or as the detected one. Text that is neither is read
 * as WebVTT, which reports the missing signature, so the author always gets a reason.
 */
export function parseCaptions(text: string, hint?: CaptionFormat): ParseResult {
  const format = hint ?? detectFormat(text);
  return format === 'srt' ? parseSrt(text) : parseVtt(text);
}

// WebVTT import and export (W3C "WebVTT: The Web Video Text Tracks Format").
//
// Reading uses webvtt-parser for the file structure, cue text and conformance messages. That
// library keeps no source text for cue settings and sorts its cues, so the timing lines are also
// read here (spec "collect WebVTT cue timings and settings") and matched back to the library's cues
// to recover each cue's settings as written; see cue-settings.ts for how settings are cleaned.
import type { Cue as LibraryCue, VTTData } from 'webvtt-parser';
import { cleanCueSettings } from './cue-settings';
import { sortCues } from './cue-order';
import { collectVttTimestamp, formatVttTimestamp } from './timestamps';
import type { Cue, ParseProblem, ParseResult } from './types';
import { WebVTTCueTimingsAndSettingsParser, WebVTTParser, vttEntities } from './vtt-engine';

/** Track kinds change how cue text is checked (chapter titles may not hold tags; metadata is not checked). */
export type VttTrackKind = 'subtitles' | 'captions' | 'chapters' | 'metadata';

/** Options for {@link parseVtt}. */
export interface ParseVttOptions {
  kind?: VttTrackKind;
}

/** Options for {@link serializeVtt}. */
export interface SerializeVttOptions {
  /** Text after "WEBVTT " on the first line (one line; "-->" is not allowed there and is altered). */
  header?: string;
}

const LINE_BREAK = /\r\n|\r|\n/;
// HTML "skip whitespace" within a line: tab, form feed and space (line breaks are already split off).
const INLINE_WHITESPACE = /[\t\f ]/;

function skipWhitespace(line: string, pos: number): number {
  let p = pos;
  while (p < line.length && INLINE_WHITESPACE.test(line[p] as string)) p++;
  return p;
}

/**
 * Splits a cue timing line into start, end and the settings text after the end time, the way
 * the spec's "collect WebVTT cue timings and settings" does; null when the line is not one.
 */
export function parseVttTimingLine(line: string): { startMs: number; endMs: number; settings: string } | null {
  let pos = skipWhitespace(line, 0);
  const start = collectVttTimestamp(line, pos);
  if (!start) return null;
  pos = skipWhitespace(line, start.next);
  if (line.slice(pos, pos + 3) !== '-->') return null;
  pos = skipWhitespace(line, pos + 3);
  const end = collectVttTimestamp(line, pos);
  if (!end) return null;
  return { startMs: start.ms, endMs: end.ms, settings: line.slice(end.next) };
}

// webvtt-parser 2.2.0 messages, grouped by what they mean for the author.
const SIGNATURE_MESSAGE = 'No valid signature.';
const TIMING_FAILURES = new Set([
  'No timestamp found.',
  'Timestamp must start with a character in the range 0-9.',
  'No time unit separator found.',
  'Must be exactly two digits.',
  'No seconds found or minutes is greater than 59.',
  'No decimal separator (".") found.',
  'Milliseconds must be given in three digits.',
  'You cannot have more than 59 minutes.',
  'You cannot have more than 59 seconds.',
  'No valid timestamp separator found.',
]);
const BLOCK_DROPPED = new Set(['Cue identifier cannot be standalone.', 'Cue identifier needs to be followed by timestamp.']);
// Settings messages are replaced by our own (cue-settings.ts differs from the library in places).
const SETTINGS_MESSAGES = new Set([
  'Duplicate setting.',
  'No value for setting defined.',
  "Writing direction can only be set to 'rl' or 'rl'.",
  'Line position takes a number or percentage.',
  "Line position can only have '-' at the start.",
  "Line position can only have '%' at the end.",
  'Line position cannot be a negative percentage.',
  'Line position cannot be >100%.',
  'Line position needs to be a number',
  'Line alignment needs to be one of start, center or end',
  'Text position must be a percentage.',
  'Text position needs to be between 0 and 100%.',
  'Position alignment needs to be one of line-left, center or line-right',
  'Size must be a percentage.',
  'Size cannot be >100%.',
  'Size needs to be a number',
  'Size needs to be between 0 and 100%.',
  'Invalid setting.',
]);

function isSettingsMessage(message: string): boolean {
  return SETTINGS_MESSAGES.has(message) || message.startsWith('Alignment can only be set to one of');
}

interface TimingLine {
  lineNo: number;
  startMs: number;
  endMs: number;
  settings: string;
  libraryKey: string;
  used: boolean;
}

function libraryLayoutKey(cue: Pick<LibraryCue, 'direction' | 'linePosition' | 'snapToLines' | 'lineAlign' | 'textPosition' | 'positionAlign' | 'size' | 'alignment'>): string {
  return [
    cue.direction,
    cue.linePosition,
    cue.snapToLines,
    cue.lineAlign,
    cue.textPosition,
    cue.positionAlign,
    cue.size,
    cue.alignment,
  ].join('|');
}

function blankLibraryCue(): LibraryCue {
  return {
    id: '',
    startTime: 0,
    endTime: 0,
    pauseOnExit: false,
    direction: 'horizontal',
    snapToLines: true,
    linePosition: 'auto',
    lineAlign: 'start',
    textPosition: 'auto',
    positionAlign: 'auto',
    size: 100,
    alignment: 'center',
    text: '',
    tree: { children: [] },
  };
}

/** Timing lines in file order, queued by key; taking one marks it used in every queue. */
class TimingLineQueues {
  private readonly queues = new Map<string, { items: TimingLine[]; head: number }>();

  add(key: string, item: TimingLine): void {
    const queue = this.queues.get(key) ?? { items: [], head: 0 };
    queue.items.push(item);
    this.queues.set(key, queue);
  }

  take(key: string): TimingLine | undefined {
    const queue = this.queues.get(key);
    if (!queue) return undefined;
    while (queue.head < queue.items.length && (queue.items[queue.head] as TimingLine).used) queue.head++;
    const item = queue.items[queue.head];
    if (item) item.used = true;
    return item;
  }
}

function collectTimingLines(lines: readonly string[]): TimingLineQueues {
  const queues = new TimingLineQueues();
  lines.forEach((line, index) => {
    if (!line.includes('-->')) return;
    const timing = parseVttTimingLine(line);
    if (!timing) return;
    const probe = blankLibraryCue();
    if (!new WebVTTCueTimingsAndSettingsParser(line, () => {}).parse(probe, 0)) return;
    const item: TimingLine = { lineNo: index + 1, ...timing, libraryKey: libraryLayoutKey(probe), used: false };
    const times = `${timing.startMs}|${timing.endMs}`;
    // Matching on the library's reading of the settings as well skips timing lines that sit in
    // comment blocks (the library sorts its cues but keeps file order among equal times).
    queues.add(`${times}|${item.libraryKey}`, item);
    queues.add(times, item);
  });
  return queues;
}

function toMs(seconds: number): number {
  return Math.round(seconds * 1000);
}

// A timestamp message is about a dropped cue only when its line is a timing line that does not
// read; the same messages also come from timestamp tags inside cue text.
function isDroppedCue(message: string, line: string | undefined): boolean {
  return TIMING_FAILURES.has(message) && line !== undefined && line.includes('-->') && parseVttTimingLine(line) === null;
}

function describeLibraryProblem(message: string, line: string | undefined): ParseProblem['severity'] {
  return isDroppedCue(message, line) ? 'error' : 'warning';
}

function problemMessage(message: string, line: string | undefined): string {
  if (isDroppedCue(message, line)) {
    return `The cue timing line could not be read (${message}) so this cue was skipped.`;
  }
  if (message === 'End timestamp is not greater than start timestamp.') {
    return 'The cue ends before or when it starts; it was kept as written.';
  }
  return message;
}

/**
 * For each line, the index of the first line of the block (run of non-empty lines) it belongs
 * to; an empty line belongs to the block before it. -1 before the first block.
 */
function blockStarts(lines: readonly string[]): number[] {
  const starts: number[] = [];
  let current = -1;
  lines.forEach((line, i) => {
    if (line !== '' && (i === 0 || lines[i - 1] === '')) current = i;
    starts.push(current);
  });
  return starts;
}

const REGION_BLOCK = /^REGION[ \t]*$/;

/**
 * Reads a WebVTT file. Never throws: a file without the "WEBVTT" signature gives no cues and one
 * error (the spec rejects such files); a bad timing line drops only its cue; an end time before
 * the start time is kept as written, with a warning.
 */
export function parseVtt(text: string, options: ParseVttOptions = {}): ParseResult {
  const { cues, problems } = parseVttWithLines(text, options);
  return { cues, problems, format: 'vtt' };
}

/**
 * {@link parseVtt}, plus the 1-based line number of each cue's timing line (0 when unknown), for
 * readers that report problems about a cue's content.
 */
export function parseVttWithLines(
  text: string,
  options: ParseVttOptions = {},
): ParseResult & { cueLines: number[] } {
  let data: VTTData;
  try {
    data = new WebVTTParser(vttEntities).parse(text, options.kind);
  } catch {
    return {
      cues: [],
      cueLines: [],
      problems: [{ line: 1, message: 'The file could not be read as WebVTT.', severity: 'error' }],
      format: 'vtt',
    };
  }
  if (data.errors.some((e) => e.message.startsWith(SIGNATURE_MESSAGE))) {
    return {
      cues: [],
      cueLines: [],
      problems: [
        {
          line: 1,
          message: 'The file does not start with "WEBVTT", so it is not a WebVTT file and nothing was read.',
          severity: 'error',
        },
      ],
      format: 'vtt',
    };
  }

  const lines = text.replace(/\0/g, '\uFFFD').split(LINE_BREAK);
  const timingLines = collectTimingLines(lines);
  const problems: ParseProblem[] = [];
  const cues: Cue[] = [];
  const cueLines: number[] = [];

  for (const libraryCue of data.cues) {
    const startMs = toMs(libraryCue.startTime);
    const endMs = toMs(libraryCue.endTime);
    if (!Number.isSafeInteger(startMs) || !Number.isSafeInteger(endMs)) {
      problems.push({ line: 1, message: 'A cue time is too large to be used; that cue was skipped.', severity: 'error' });
      continue;
    }
    const times = `${startMs}|${endMs}`;
    const source = timingLines.take(`${times}|${libraryLayoutKey(libraryCue)}`) ?? timingLines.take(times);
    const cue: Cue = { startMs, endMs, text: libraryCue.text };
    if (libraryCue.id !== '') cue.id = libraryCue.id;
    if (source) {
      const cleaned = cleanCueSettings(source.settings);
      if (cleaned.settings !== '') cue.settings = cleaned.settings;
      for (const item of cleaned.ignored) {
        problems.push({
          line: source.lineNo,
          message: `Cue setting "${item.token}": ${item.reason}.`,
          severity: 'warning',
        });
      }
    }
    cues.push(cue);
    cueLines.push(source?.lineNo ?? 0);
  }

  // Blocks the library could not use as cues are reported once each, at their first line.
  const starts = blockStarts(lines);
  const reportedBlocks = new Set<number>();
  for (const error of data.errors) {
    if (isSettingsMessage(error.message)) continue;
    const start = starts[error.line - 1] ?? -1;
    const firstLine = start >= 0 ? (lines[start] as string) : '';
    if (start >= 0 && (REGION_BLOCK.test(firstLine) || BLOCK_DROPPED.has(error.message))) {
      if (reportedBlocks.has(start)) continue;
      reportedBlocks.add(start);
      problems.push({
        line: start + 1,
        message: REGION_BLOCK.test(firstLine)
          ? 'WebVTT regions are not supported; this REGION block was ignored.'
          : 'This block has no cue timing line, so it is not a cue and was ignored.',
        severity: 'warning',
      });
      continue;
    }
    const sourceLine = lines[error.line - 1];
    const severity = describeLibraryProblem(error.message, sourceLine);
    const problem: ParseProblem = {
      line: error.line,
      message: problemMessage(error.message, sourceLine),
      severity,
    };
    if (typeof error.col === 'number') problem.col = error.col;
    problems.push(problem);
  }
  problems.sort((a, b) => a.line - b.line || (a.col ?? 0) - (b.col ?? 0));
  return { cues, cueLines, problems, format: 'vtt' };
}

// Blocks that webvtt-parser (unlike the spec) reads as a comment or style sheet whatever follows.
const RESERVED_ID = /^(NOTE|STYLE)($|[ \t])/;

function safeId(id: string | null | undefined): string | null {
  if (id === null || id === undefined) return null;
  const oneLine = id.replace(/\0/g, '\uFFFD').replace(/\r\n|\r|\n/g, ' ').replace(/-->/g, '->');
  if (oneLine === '' || RESERVED_ID.test(oneLine)) return null;
  return oneLine;
}

function safeText(text: string): string {
  return text
    .replace(/\0/g, '\uFFFD')
    .split(LINE_BREAK)
    .filter((line) => line !== '') // an empty line would end the cue early
    .join('\n')
    .replace(/-->/g, '--&gt;'); // "-->" would start a new cue; "&gt;" shows the same character
}

function safeHeader(header: string | undefined): string {
  if (!header) return '';
  const oneLine = header.replace(/[\r\n]+/g, ' ').replace(/-->/g, '->').replace(/\0/g, '\uFFFD').trim();
  return oneLine === '' ? '' : ` ${oneLine}`;
}

/**
 * Writes a WebVTT file that any conforming reader (and parseVtt) reads back to the same cues:
 * cues sorted by start time, times as hh:mm:ss.ttt, ids and valid settings kept, and text made
 * safe (no blank lines, no "-->"). Ids that would be read as a NOTE or STYLE block are left out.
 */
export function serializeVtt(cues: readonly Cue[], options: SerializeVttOptions = {}): string {
  let out = `WEBVTT${safeHeader(options.header)}\n\n`;
  for (const cue of sortCues(cues)) {
    const id = safeId(cue.id);
    const settings = cleanCueSettings(cue.settings).settings;
    if (id !== null) out += `${id}\n`;
    out += `${formatVttTimestamp(cue.startMs)} --> ${formatVttTimestamp(cue.endMs)}`;
    if (settings !== '') out += ` ${settings}`;
    out += '\n';
    const text = safeText(cue.text);
    if (text !== '') out += `${text}\n`;
    out += '\n';
  }
  return out;
}

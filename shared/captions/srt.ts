// SRT (.srt) caption import and export.
//
// SRT has no formal specification. The block layout follows the Matroska specification's
// "SRT Subtitles" description: a sequence number, the timing line
// (HH:MM:SS,mmm --> HH:MM:SS,mmm), the text lines, then a blank line.
// Common practice for SRT files (no formal source): display
// coordinates may follow the timing ("X1:100 X2:600 Y1:050 Y2:100"), and the text may use
// <b>, <i>, <u> and <font color=...>. We keep b/i/u (WebVTT has the same tags), drop <font> and
// the coordinates, and turn the sequence number into the cue id.
import { sortCues } from './cue-order';
import { escapeCueText, parseCueText, type CueTextNode } from './cue-text';
import { formatSrtTimestamp } from './timestamps';
import type { Cue, ParseProblem, ParseResult } from './types';

/** Options for {@link serializeSrt}. */
export interface SerializeSrtOptions {
  /** Use CRLF line endings, which older players on Windows expect. Default: LF. */
  crlf?: boolean;
}

const TIME = String.raw`(\d+):(\d{2}):(\d{2})([,.])(\d{3})`;
const TIMING_LINE = new RegExp(String.raw`^\s*${TIME}\s*-->\s*${TIME}(.*)$`);
const COORDINATES = /^\s*X1:\s*-?\d+\s+X2:\s*-?\d+\s+Y1:\s*-?\d+\s+Y2:\s*-?\d+\s*$/i;
const SEQUENCE_NUMBER = /^\s*(\d+)\s*$/;
// Any HTML-like tag: a letter after "<" or "</", then anything up to ">".
const TAG = /<(\/?)([A-Za-z][A-Za-z0-9]*)\b[^<>]*>/g;
const KEPT_TAGS = new Set(['b', 'i', 'u']);
// Override codes written in braces, e.g. {\an8}, which some SRT writers add for positioning.
const BRACE_CODES = /\{\\[^{}]*\}/g;

interface TimingParts {
  startMs: number;
  endMs: number;
  usesPeriod: boolean;
  rest: string;
}

function readTiming(line: string): TimingParts | 'bad-range' | null {
  const m = TIMING_LINE.exec(line);
  if (!m) return null;
  const num = (i: number) => Number(m[i]);
  if (num(2) > 59 || num(3) > 59 || num(7) > 59 || num(8) > 59) return 'bad-range';
  const startMs = num(1) * 3_600_000 + num(2) * 60_000 + num(3) * 1000 + num(5);
  const endMs = num(6) * 3_600_000 + num(7) * 60_000 + num(8) * 1000 + num(10);
  if (!Number.isSafeInteger(startMs) || !Number.isSafeInteger(endMs)) return 'bad-range';
  return { startMs, endMs, usesPeriod: m[4] === '.' || m[9] === '.', rest: m[11] ?? '' };
}

/** Converts one line of SRT text into WebVTT cue text, reporting anything that was dropped. */
function convertTextLine(line: string, report: (message: string) => void): string {
  let converted = '';
  let last = 0;
  let droppedOther = false;
  const withoutCodes = line.replace(BRACE_CODES, () => {
    report('Formatting codes in braces (such as {\\an8}) are not supported and were removed.');
    return '';
  });
  for (const match of withoutCodes.matchAll(TAG)) {
    const [whole, slash, rawName] = match as unknown as [string, string, string];
    const name = rawName.toLowerCase();
    converted += escapeCueText(withoutCodes.slice(last, match.index));
    last = (match.index ?? 0) + whole.length;
    if (KEPT_TAGS.has(name)) converted += `<${slash}${name}>`;
    else if (name !== 'font') droppedOther = true;
  }
  converted += escapeCueText(withoutCodes.slice(last));
  if (droppedOther) report('Tags other than <b>, <i>, <u> and <font> are not supported and were removed.');
  return converted;
}

/**
 * Splits the file into blocks at blank lines, and also where a timing line appears inside a
 * block's text (a missing blank line, a frequent hand-editing slip): the new block then starts at
 * that timing line, or at the sequence number just above it.
 */
function splitBlocks(lines: readonly string[], problems: ParseProblem[]): { start: number; lines: string[] }[] {
  const blocks: { start: number; lines: string[] }[] = [];
  let i = 0;
  while (i < lines.length) {
    if ((lines[i] as string).trim() === '') {
      i++;
      continue;
    }
    let start = i;
    while (i < lines.length && (lines[i] as string).trim() !== '') i++;
    const end = i;
    const isTiming = (k: number) => readTiming(lines[k] as string) !== null;
    const isNumber = (k: number) => SEQUENCE_NUMBER.test(lines[k] as string);
    let timingAt = isTiming(start) ? start : isNumber(start) && start + 1 < end && isTiming(start + 1) ? start + 1 : -1;
    for (let k = (timingAt === -1 ? start : timingAt) + 1; k < end; k++) {
      if (!isTiming(k)) continue;
      const cut = k - 1 > Math.max(start, timingAt) && isNumber(k - 1) ? k - 1 : k;
      blocks.push({ start, lines: lines.slice(start, cut) });
      problems.push({ line: cut + 1, message: 'A blank line is missing before this cue; it was read as a new cue.', severity: 'warning' });
      start = cut;
      timingAt = k;
    }
    blocks.push({ start, lines: lines.slice(start, end) });
  }
  return blocks;
}

/**
 * Reads an SRT file (LF or CRLF). Never throws: a block that cannot be read is reported with its
 * line number and skipped, and reading continues with the next block. Cues come back sorted by
 * start time, with the sequence number as id.
 */
export function parseSrt(text: string): ParseResult {
  const lines = text.replace(/^\uFEFF/, '').replace(/\0/g, '\uFFFD').split(/\r\n|\r|\n/);
  const problems: ParseProblem[] = [];
  const cues: Cue[] = [];
  let previousNumber: number | null = null;
  let outOfOrder = false;

  for (const { start: blockStart, lines: block } of splitBlocks(lines, problems)) {
    const lineNo = (offset: number) => blockStart + offset + 1;

    let timingOffset = 0;
    let id: string | undefined;
    const numberMatch = SEQUENCE_NUMBER.exec(block[0] as string);
    if (numberMatch) {
      id = numberMatch[1] as string;
      timingOffset = 1;
      const n = Number(id);
      if (previousNumber !== null && n !== previousNumber + 1) {
        problems.push({
          line: lineNo(0),
          message: `Sequence number ${id} does not follow ${previousNumber}; cues are numbered again on export.`,
          severity: 'warning',
        });
      }
      previousNumber = n;
    } else if (readTiming(block[0] as string) !== null) {
      problems.push({ line: lineNo(0), message: 'This block has no sequence number.', severity: 'warning' });
    } else {
      problems.push({
        line: lineNo(0),
        message: 'Expected a sequence number or a timing line (00:00:00,000 --> 00:00:00,000); this block was skipped.',
        severity: 'error',
      });
      continue;
    }

    const timingLine = block[timingOffset];
    const timing = timingLine === undefined ? null : readTiming(timingLine);
    if (timing === null || timing === 'bad-range') {
      problems.push({
        line: lineNo(timingOffset),
        message:
          timing === 'bad-range'
            ? 'Minutes and seconds in a timing must be 00 to 59; this block was skipped.'
            : 'Expected a timing line such as "00:02:17,440 --> 00:02:20,375"; this block was skipped.',
        severity: 'error',
      });
      continue;
    }
    if (timing.usesPeriod) {
      problems.push({
        line: lineNo(timingOffset),
        message: 'SRT times use a comma before the milliseconds; a full stop was accepted.',
        severity: 'warning',
      });
    }
    if (timing.rest.trim() !== '' && !COORDINATES.test(timing.rest)) {
      problems.push({
        line: lineNo(timingOffset),
        message: `Text after the timing ("${timing.rest.trim()}") was ignored.`,
        severity: 'warning',
      });
    }
    if (timing.endMs <= timing.startMs) {
      problems.push({
        line: lineNo(timingOffset),
        message: 'The cue ends before or when it starts; it was kept as written.',
        severity: 'warning',
      });
    }

    const textLines = block.slice(timingOffset + 1).map((line, k) =>
      convertTextLine(line, (message) =>
        problems.push({ line: lineNo(timingOffset + 1 + k), message, severity: 'warning' }),
      ),
    );
    const cue: Cue = { startMs: timing.startMs, endMs: timing.endMs, text: textLines.join('\n') };
    if (id !== undefined) cue.id = id;
    if (cues.length > 0 && timing.startMs < (cues[cues.length - 1] as Cue).startMs) outOfOrder = true;
    cues.push(cue);
  }

  if (outOfOrder) {
    problems.push({ line: 1, message: 'Cues were not in time order; they have been sorted.', severity: 'warning' });
  }
  problems.sort((a, b) => a.line - b.line);
  return { cues: sortCues(cues), problems, format: 'srt' };
}

function toSrtText(nodes: readonly CueTextNode[]): string {
  let out = '';
  for (const node of nodes) {
    if (node.type === 'text') out += node.value;
    else if (node.type === 'object') {
      if (node.name === 'rt') continue; // ruby annotations have no SRT form
      const inner = toSrtText(node.children);
      out += KEPT_TAGS.has(node.name) ? `<${node.name}>${inner}</${node.name}>` : inner;
    }
  }
  return out;
}

/**
 * Writes an SRT file: cues sorted by start time and numbered again from 1; ids and settings are
 * dropped (SRT cannot carry them); WebVTT tags other than b/i/u are removed and escapes decoded.
 */
export function serializeSrt(cues: readonly Cue[], options: SerializeSrtOptions = {}): string {
  const eol = options.crlf ? '\r\n' : '\n';
  return sortCues(cues)
    .map((cue, index) => {
      const lines = toSrtText(parseCueText(cue.text))
        .split(/\r\n|\r|\n/)
        .filter((line) => line.trim() !== '') // a blank line would end the block early
        .map((line) => line.replace(/-->/g, '->')); // keep text lines from looking like timings
      return [String(index + 1), `${formatSrtTimestamp(cue.startMs)} --> ${formatSrtTimestamp(cue.endMs)}`, ...lines]
        .join(eol)
        .concat(eol);
    })
    .join(eol);
}

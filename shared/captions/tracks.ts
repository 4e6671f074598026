// Tracks generated from a tour's stops: a WebVTT chapters track (one chapter per stop, for the
// player's chapter menu and the trail) and a WebVTT metadata track (one JSON object per stop, for
// the tree card), plus readers for both so the server can check what it serves.
import type { ZodType } from 'zod';
import { cuePlainText, escapeCueText } from './cue-text';
import { sortCues } from './cue-order';
import type { Cue, ParseProblem } from './types';
import { parseVtt, parseVttWithLines, serializeVtt } from './webvtt';

/** A stop as the chapters track needs it. */
export interface ChapterStop {
  startMs: number;
  endMs: number;
  title: string;
  /** Optional cue id, e.g. "stop-3", so a deep link can name the chapter. */
  id?: string;
}

/** A stop as the metadata track needs it; `payload` must be JSON-serialisable. */
export interface MetadataStop {
  startMs: number;
  endMs: number;
  payload: object;
  id?: string;
}

/** A chapter read back from a chapters track. */
export interface Chapter {
  startMs: number;
  endMs: number;
  title: string;
  id?: string;
}

/** A metadata cue read back, with its decoded JSON payload. */
export interface MetadataEntry<T = unknown> {
  startMs: number;
  endMs: number;
  payload: T;
  id?: string;
}

function checkTimes(stop: { startMs: number; endMs: number }, index: number): void {
  const { startMs, endMs } = stop;
  if (!Number.isFinite(startMs) || !Number.isFinite(endMs) || startMs < 0 || endMs <= startMs) {
    throw new RangeError(`Stop ${index + 1} needs 0 <= start < end (got ${startMs} to ${endMs} ms)`);
  }
}

function withId(cue: Cue, id: string | undefined): Cue {
  if (id !== undefined && id !== '') cue.id = id;
  return cue;
}

/**
 * Builds a WebVTT chapters track. Titles become plain one-line chapter title text (escaped, no
 * tags, as the spec's chapter title text requires); stops are written in time order.
 */
export function chaptersVtt(stops: readonly ChapterStop[], header = 'Chapters'): string {
  const cues = stops.map((stop, index) => {
    checkTimes(stop, index);
    const title = stop.title.replace(/\s+/g, ' ').trim();
    return withId({ startMs: stop.startMs, endMs: stop.endMs, text: escapeCueText(title) }, stop.id);
  });
  return serializeVtt(cues, { header });
}

/**
 * Builds a WebVTT metadata track whose cue text is one line of JSON per stop. ">" is written as
 * the JSON escape \u003e so no payload can form "-->"; JSON.parse restores it unchanged.
 */
export function metadataVtt(stops: readonly MetadataStop[], header = 'Metadata'): string {
  const cues = stops.map((stop, index) => {
    checkTimes(stop, index);
    const json = JSON.stringify(stop.payload);
    if (json === undefined) throw new TypeError(`Stop ${index + 1} has a payload that is not JSON`);
    return withId({ startMs: stop.startMs, endMs: stop.endMs, text: json.replace(/>/g, '\\u003e') }, stop.id);
  });
  return serializeVtt(cues, { header });
}

/** Reads a chapters track back into titled time ranges (titles as plain text). */
export function readChaptersVtt(text: string): { chapters: Chapter[]; problems: ParseProblem[] } {
  const { cues, problems } = parseVtt(text, { kind: 'chapters' });
  const chapters = sortCues(cues).map((cue) => {
    const chapter: Chapter = { startMs: cue.startMs, endMs: cue.endMs, title: cuePlainText(cue.text) };
    if (cue.id) chapter.id = cue.id;
    return chapter;
  });
  return { chapters, problems };
}

/**
 * Reads a metadata track back, decoding each cue's JSON. A cue whose text is not JSON, or that
 * fails the optional zod schema, is reported and left out.
 */
export function readMetadataVtt<T = unknown>(
  text: string,
  schema?: ZodType<T>,
): { entries: MetadataEntry<T>[]; problems: ParseProblem[] } {
  const { cues, cueLines, problems } = parseVttWithLines(text, { kind: 'metadata' });
  const entries: MetadataEntry<T>[] = [];
  cues.forEach((cue, index) => {
    const line = cueLines[index] || 1;
    let value: unknown;
    try {
      value = JSON.parse(cue.text);
    } catch {
      problems.push({ line, message: `Metadata cue ${index + 1} does not hold JSON; it was left out.`, severity: 'error' });
      return;
    }
    let payload = value as T;
    if (schema) {
      const checked = schema.safeParse(value);
      if (!checked.success) {
        problems.push({
          line,
          message: `Metadata cue ${index + 1} does not match the expected shape; it was left out.`,
          severity: 'error',
        });
        return;
      }
      payload = checked.data;
    }
    const entry: MetadataEntry<T> = { startMs: cue.startMs, endMs: cue.endMs, payload };
    if (cue.id) entry.id = cue.id;
    entries.push(entry);
  });
  return { entries, problems };
}

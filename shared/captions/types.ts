/**
 * One timed caption. Times are integer milliseconds so that equality and arithmetic stay exact
 * across parse → edit → serialise; `text` is WebVTT cue text (tags such as `<i>` and escapes such
 * as `&amp;` kept as written) because that is what both the player and the editor consume.
 */
export interface Cue {
  /** Optional WebVTT cue identifier (for SRT input: the block's sequence number). */
  id?: string | null;
  startMs: number;
  endMs: number;
  text: string;
  /**
   * WebVTT cue settings in their written form, e.g. "align:start line:90%". After parsing this
   * holds only the settings that are valid, the last one of each name, in their original order.
   */
  settings?: string;
}

/** Severity of a parse problem: `error` means something in the file was not understood and was dropped. */
export type ProblemSeverity = 'error' | 'warning';

/** Where and why an import did not go cleanly, so the editor can point the author at the line. */
export interface ParseProblem {
  /** 1-based line number in the source text. */
  line: number;
  /** 1-based column, when known. */
  col?: number;
  message: string;
  severity: ProblemSeverity;
}

/** The caption file formats Grovewalk reads and writes. */
export type CaptionFormat = 'vtt' | 'srt';

/** Parsers never throw on bad input: they return what they could read plus the problems found. */
export interface ParseResult {
  cues: Cue[];
  problems: ParseProblem[];
  format: CaptionFormat;
}

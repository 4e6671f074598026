import { cuePlainText } from '../../../shared/captions/cue-text';

/** A silence at least this long starts a new paragraph (common practice for readable transcripts, no source). */
export const PARAGRAPH_GAP_MS = 2000;
/** A paragraph that holds this many cues ends at the next sentence end… */
export const PARAGRAPH_SOFT_CUES = 5;
/** …and at this many whatever the punctuation, so a run-on speaker still gets paragraphs. */
export const PARAGRAPH_HARD_CUES = 8;

const SENTENCE_END = /[.!?…]["'’”)\]]*$/u;

/** A run of cues read as one paragraph; `startMs` is where its link jumps to. */
export interface TranscriptParagraph {
  startMs: number;
  endMs: number;
  text: string;
}

/**
 * Joins cues (in playing order) into paragraphs of plain text: tags stripped and escapes decoded,
 * line breaks inside a cue read as spaces. A paragraph ends at a pause of
 * {@link PARAGRAPH_GAP_MS} or more, after {@link PARAGRAPH_SOFT_CUES} cues once a sentence ends,
 * or after {@link PARAGRAPH_HARD_CUES} cues. Cues with no readable text are left out.
 */
export function buildTranscript(cues: readonly { startMs: number; endMs: number; text: string }[]): TranscriptParagraph[] {
  const paragraphs: TranscriptParagraph[] = [];
  let current: { startMs: number; endMs: number; parts: string[] } | null = null;
  const flush = () => {
    if (current) paragraphs.push({ startMs: current.startMs, endMs: current.endMs, text: current.parts.join(' ') });
    current = null;
  };
  for (const cue of cues) {
    const text = cuePlainText(cue.text).replace(/\s+/g, ' ').trim();
    if (!text) continue;
    if (current) {
      const c: { startMs: number; endMs: number; parts: string[] } = current;
      const last = c.parts[c.parts.length - 1] ?? '';
      const pause = cue.startMs - c.endMs >= PARAGRAPH_GAP_MS;
      const full = c.parts.length >= PARAGRAPH_HARD_CUES || (c.parts.length >= PARAGRAPH_SOFT_CUES && SENTENCE_END.test(last));
      if (pause || full) flush();
    }
    if (!current) current = { startMs: cue.startMs, endMs: cue.endMs, parts: [] };
    const c: { startMs: number; endMs: number; parts: string[] } = current;
    c.parts.push(text);
    c.endMs = Math.max(c.endMs, cue.endMs);
  }
  flush();
  return paragraphs;
}

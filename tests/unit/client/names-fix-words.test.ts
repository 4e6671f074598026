import { describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api';
import { acceptSummary, ageText, cueForSelection, prefillText, textOfWords, undoConflictLines, wordSpans } from '@/features/spelling/lib/fix-words';

describe('queue wording (common practice, no source)', () => {
  const now = new Date('2026-05-20T12:00:00Z');
  it('says how long a fix has waited in round units', () => {
    expect(ageText('2026-05-20T08:00:00Z', now)).toBe('today');
    expect(ageText('2026-05-19T11:00:00Z', now)).toBe('1 day');
    expect(ageText('2026-05-08T12:00:00Z', now)).toBe('12 days');
    expect(ageText('2026-04-29T12:00:00Z', now)).toBe('3 weeks');
    expect(ageText('2026-01-20T12:00:00Z', now)).toBe('4 months');
    expect(ageText('not a date', now)).toBe('');
  });

  it('counts tours from the touched tracks: two tracks of one tour are one tour', () => {
    expect(acceptSummary(3, [{ tourId: 7 }, { tourId: 7 }, { tourId: 9 }])).toBe('3 captions changed in 2 tours.');
    expect(acceptSummary(1, [{ tourId: 7 }])).toBe('1 caption changed in 1 tour.');
  });
});

describe('undo conflicts', () => {
  it('lists the captions named in a 409 undo_conflict answer, and nothing for other errors', () => {
    const conflict = new ApiError({
      status: 409,
      code: 'undo_conflict',
      message: 'Nothing was undone…',
      fields: { 'cue-12': 'Autumn colour on the terrace at 0:19: now reads “x”.', 'cue-40': 'Spring walk at 0:05: this caption was removed.' },
    });
    expect(undoConflictLines(conflict)).toEqual(['Autumn colour on the terrace at 0:19: now reads “x”.', 'Spring walk at 0:05: this caption was removed.']);
    expect(undoConflictLines(new ApiError({ status: 409, code: 'fix_not_accepted', message: 'no', fields: { 'cue-1': 'x' } }))).toEqual([]);
    expect(undoConflictLines(new Error('boom'))).toEqual([]);
  });
});

describe('choosing the misheard words (fictional demo captions)', () => {
  const cue = 'And back to Sora no hani, now scarlet.';
  it('splits a caption into words with their offsets, keeping hyphenated and apostrophised words whole', () => {
    expect(wordSpans(cue).map((w) => w.text)).toEqual(['And', 'back', 'to', 'Sora', 'no', 'hani', 'now', 'scarlet']);
    expect(wordSpans("Ada's Sora-no-hane").map((w) => w.text)).toEqual(["Ada's", 'Sora-no-hane']);
  });

  it('takes the text from one tapped word to another, in either order, as written between them', () => {
    const words = wordSpans(cue);
    expect(textOfWords(cue, words, 3, 5)).toBe('Sora no hani');
    expect(textOfWords(cue, words, 5, 3)).toBe('Sora no hani');
    expect(textOfWords(cue, words, 9, 3)).toBe('');
  });

  it('prefills with a selection inside the caption, otherwise the caption, at most 120 characters', () => {
    expect(prefillText('  Sora no\nhani ', cue)).toBe('Sora no hani');
    expect(prefillText('something elsewhere on the page', cue)).toBe(cue);
    expect(prefillText(null, 'x'.repeat(200))).toHaveLength(120);
  });
});

describe('finding the caption behind a transcript selection (fictional demo captions)', () => {
  const cues = [
    { startMs: 2200, text: 'The big round leaves here are Kumo-tsubasa.' },
    { startMs: 10200, text: 'And back to Sora no hani,\nnow scarlet.' },
    { startMs: 14200, text: 'Same tree as in the spring walk.' },
  ];
  it('finds the cue that holds the selected words, line breaks and spaces tidied', () => {
    expect(cueForSelection(cues, 'Sora no hani')?.startMs).toBe(10200);
    expect(cueForSelection(cues, 'hani, now  scarlet')?.startMs).toBe(10200);
  });
  it('finds none for an empty selection or one that runs across two captions', () => {
    expect(cueForSelection(cues, '  ')).toBeNull();
    expect(cueForSelection(cues, 'now scarlet. Same tree')).toBeNull();
  });
});

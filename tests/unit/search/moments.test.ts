// Ranking of caption moments (issue 6: cultivar-name hits first, then relevance, then tour date,
// newest first; a product rule, no outside source) and the plain text of a cue as a viewer reads it
// (W3C WebVTT cue text: tags are not shown, "&amp;" is "&", "&lt;" is "<").
import { describe, expect, it } from 'vitest';
import { momentSpans, plainCueText, rankMoments, type CueHit } from '../../../server/modules/search/caption-search';

const hit = (cueId: number, patch: Partial<CueHit> = {}): CueHit => ({
  cueId,
  trackId: 1,
  tourId: 1,
  lang: 'en',
  startMs: 0,
  endMs: 1000,
  rawText: null,
  score: 0,
  tourDate: '2025-01-01',
  nameHit: false,
  cultivarIds: [],
  nameSpans: [],
  ...patch,
});

describe('rankMoments', () => {
  it('puts name hits first, then higher relevance, then the newer tour, then the earlier time', () => {
    const ranked = rankMoments(
      [hit(1, { nameHit: true, score: 0.1, tourDate: '2020-01-01' })],
      [
        hit(2, { score: 0.9, tourDate: '2021-01-01' }),
        hit(3, { score: 0.5, tourDate: '2025-05-05', tourId: 3 }),
        hit(4, { score: 0.5, tourDate: '2024-05-05', tourId: 4 }),
        hit(5, { score: 0.5, tourDate: '2025-05-05', tourId: 3, startMs: 500 }),
        hit(6, { score: 0.5, tourDate: null, tourId: 9 }),
      ],
    );
    expect(ranked.map((h) => h.cueId)).toEqual([1, 2, 3, 5, 4, 6]);
  });
  it('counts a cue found both ways once, as a name hit with the better score', () => {
    const ranked = rankMoments([hit(7, { nameHit: true, score: 0.2 })], [hit(7, { score: 0.8 }), hit(8, { score: 0.9 })]);
    expect(ranked.map((h) => [h.cueId, h.nameHit, h.score])).toEqual([
      [7, true, 0.8],
      [8, false, 0.9],
    ]);
  });
});

describe('plainCueText and momentSpans', () => {
  it('shows cue text without tags and with escapes decoded (W3C WebVTT)', () => {
    expect(plainCueText('<v Ada>Here is <i>Quillmere Lace</i> &amp; more &lt;3</v>')).toBe('Here is Quillmere Lace & more <3');
    expect(plainCueText('No markup at all')).toBe('No markup at all');
  });
  it('merges the names heard with the words of the search', () => {
    const plain = 'Here is Brindlewick Flame by the gate';
    const spans = momentSpans(plain, hit(1, { nameSpans: [{ start: 8, end: 25 }] }), { indexed: ['gate'], fallback: ['by'] });
    expect(spans.map((s) => plain.slice(s.start, s.end))).toEqual(['Brindlewick Flame', 'by', 'gate']);
  });
});

// Pure helpers of the names server (records, detection, glossary). Records, tours and caption lines
// are INVENTED (fictional Fernhollow Garden Club).
import { describe, expect, it } from 'vitest';
import { buildNameIndex } from '../../../shared/names/matcher';
import { CARE_CAUTION, careNoteFor } from '../../../server/modules/cultivars/care-note';
import { hepburnSyllables } from '../../../server/modules/cultivars/cultivar.presenter';
import { spokenByRecord } from '../../../server/modules/cultivars/spoken-names';
import { headingLetter } from '../../../server/modules/glossary/glossary.service';
import { longestWord, wouldChange } from '../../../server/modules/spelling-fixes/cue-search';
import { misspellingsIn } from '../../../server/modules/spelling-fixes/name-detection';

const records = [
  { id: 1, acceptedEpithet: 'Sora-no-hane', variants: ['Sora no hani'] },
  { id: 2, acceptedEpithet: 'Brindlewick Flame' },
];
const byId = new Map([
  [1, { epithet: 'Sora-no-hane' }],
  [2, { epithet: 'Brindlewick Flame' }],
]);

describe('misspellingsIn: which heard names become detection fixes', () => {
  const index = buildNameIndex(records);
  const found = (text: string) => misspellingsIn(index, byId, { id: 7, trackId: 3, text }).map((m) => [m.text, m.cultivarId]);

  it('skips names written exactly as the accepted epithet', () => {
    expect(found('Here is Sora-no-hane and the Brindlewick Flame.')).toEqual([]);
  });

  it('reports recorded variants, close spellings and other spacing or capitals', () => {
    expect(found('Here is Sora no hani.')).toEqual([['Sora no hani', 1]]);
    expect(found('The Brindlewik Flame glows.')).toEqual([['Brindlewik Flame', 2]]);
    expect(found('sora no hane, all lower case.')).toEqual([['sora no hane', 1]]);
  });

  it('leaves out a match that runs across caption markup (it could not be rewritten as one text)', () => {
    expect(found('<i>Sora</i> no hani')).toEqual([]);
  });

  it('keys a misspelling by its normalised form, so capitals and hyphens collapse into one fix', () => {
    const [a] = misspellingsIn(index, byId, { id: 1, trackId: 1, text: 'SORA NO HANI' });
    const [b] = misspellingsIn(index, byId, { id: 2, trackId: 1, text: 'sora-no-hani' });
    expect(a!.key).toBe(b!.key);
  });
});

describe('cue search helpers', () => {
  it('pre-filters on the longest word of the proposed text', () => {
    expect(longestWord('Sora  no-hanie')).toBe('hanie');
    expect(longestWord('Sora no hani')).toBe('Sora'); // first of equal lengths
    expect(longestWord('Brindlewik Flame')).toBe('Brindlewik');
  });

  it('counts a cue only when the fix would change it: whole words, not text already correct', () => {
    expect(wouldChange('Sora no hani by the gate', 'Sora no hani', 'Sora-no-hane')).toBe(true);
    expect(wouldChange('Sora no hanitest', 'Sora no hani', 'Sora-no-hane')).toBe(false);
    expect(wouldChange('Sora-no-hane already', 'sora no hane', 'Sora-no-hane')).toBe(false);
  });
});

describe('spokenByRecord: where published tours say each name', () => {
  const row = (id: number, tourId: number, startMs: number, text: string, publishedAt: string) => ({
    id, trackId: tourId * 10, tourId, tourTitle: `Walk ${tourId} (fictional)`, publishedAt, lang: 'en', startMs, endMs: startMs + 3000, text,
  });

  it('keeps the first cue per tour, counts every cue, and lists the newest tour first', () => {
    const spoken = spokenByRecord(records, [
      row(1, 1, 1000, 'Sora-no-hane first.', '2026-03-01T00:00:00Z'),
      row(2, 1, 9000, 'Sora no hani later.', '2026-03-01T00:00:00Z'),
      row(3, 2, 4000, 'In the second walk, <b>Sora-no-hane</b>.', '2026-06-01T00:00:00Z'),
      row(4, 2, 8000, 'No names here.', '2026-06-01T00:00:00Z'),
    ]);
    const sora = spoken.get(1)!;
    expect(sora.cues).toBe(3);
    expect(sora.moments.map((m) => [m.tourId, m.startMs, m.text])).toEqual([
      [2, 4000, 'In the second walk, Sora-no-hane.'],
      [1, 1000, 'Sora-no-hane first.'],
    ]);
    expect(spoken.has(2)).toBe(false);
  });
});

describe('record page helpers', () => {
  it('splits each word of a romanised epithet into Hepburn syllables (tsu and shi are single syllables in the Hepburn table, ISO 3602)', () => {
    expect(hepburnSyllables('Kumo tsubasa')).toEqual([['ku', 'mo'], ['tsu', 'ba', 'sa']]);
    expect(hepburnSyllables('Hoshi-kagura')).toEqual([['ho', 'shi', 'ka', 'gu', 'ra']]);
    expect(hepburnSyllables('Brindlewick Flame')).toBeNull();
  });

  it('files an epithet under its first letter with accents folded, or # (common practice for indexes)', () => {
    expect(headingLetter('Ōkagami')).toBe('O');
    expect(headingLetter('ember Quill')).toBe('E');
    expect(headingLetter('3 Stars')).toBe('#');
  });

  it('gives a care note only for notes that give care advice, with the general caution (common practice, no source)', () => {
    expect(careNoteFor('<p>Leaves open pink.</p>')).toBeNull();
    expect(careNoteFor('')).toBeNull();
    const note = careNoteFor('<p>Dig a wide planting hole and <strong>prune</strong> lightly.</p>')!;
    expect(note).toContain('Digging:');
    expect(note).toContain('Pruning:');
    expect(note.endsWith(CARE_CAUTION)).toBe(true);
  });
});

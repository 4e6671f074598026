import { describe, expect, it } from 'vitest';
import {
  countEpithetCharacters,
  EPITHET_MAX_CHARACTERS,
  formatAcceptedName,
  formatNameParts,
  normaliseEpithetInput,
  validateNameParts,
  type NameParts,
} from '../../../shared/names/cultivar-name';

// Epithets are INVENTED for the fictional Larkspur Lane Maple Circle; genus, species and
// botanical variety names are real botanical names.
const codes = (parts: NameParts) => validateNameParts(parts).map((p) => p.code);

describe('ICNCP writing conventions (RHS "Recommended style for printing plant names", as summarised in docs/domain.md)', () => {
  it("correct: Acer palmatum 'Lantern Hollow' — epithet roman in single quotes, botanical name italic", () => {
    const parts = { genus: 'Acer', species: 'palmatum', epithet: 'Lantern Hollow' };
    expect(formatAcceptedName(parts)).toBe("Acer palmatum 'Lantern Hollow'");
    expect(formatNameParts(parts)).toEqual([
      { text: 'Acer palmatum', italic: true },
      { text: " 'Lantern Hollow'", italic: false },
    ]);
    expect(validateNameParts(parts)).toEqual([]);
  });

  it("correct: Acer 'Lantern Hollow' — genus and epithet only", () => {
    const parts = { genus: 'Acer', epithet: 'Lantern Hollow' };
    expect(formatAcceptedName(parts)).toBe("Acer 'Lantern Hollow'");
    expect(formatNameParts(parts)).toEqual([
      { text: 'Acer', italic: true },
      { text: " 'Lantern Hollow'", italic: false },
    ]);
    expect(validateNameParts(parts)).toEqual([]);
  });

  it("correct: Acer palmatum (Dissectum Group) 'Lantern Hollow' — Group roman, in brackets before the epithet", () => {
    const parts = { genus: 'Acer', species: 'palmatum', group: 'Dissectum Group', epithet: 'Lantern Hollow' };
    expect(formatAcceptedName(parts)).toBe("Acer palmatum (Dissectum Group) 'Lantern Hollow'");
    expect(formatNameParts(parts)).toEqual([
      { text: 'Acer palmatum', italic: true },
      { text: " (Dissectum Group) 'Lantern Hollow'", italic: false },
    ]);
    expect(validateNameParts(parts)).toEqual([]);
  });

  it('a Group without an epithet stands without brackets', () => {
    expect(formatAcceptedName({ genus: 'Acer', species: 'palmatum', group: 'Dissectum Group' })).toBe('Acer palmatum Dissectum Group');
  });

  it('rank abbreviation roman, infraspecific epithet italic (RHS summary: subsp., var. and f. in roman)', () => {
    const parts = { genus: 'Acer', species: 'palmatum', infraspecificRank: 'var.', infraspecificEpithet: 'amoenum', epithet: 'Ember Wick' };
    expect(formatNameParts(parts)).toEqual([
      { text: 'Acer palmatum', italic: true },
      { text: ' var. ', italic: false },
      { text: 'amoenum', italic: true },
      { text: " 'Ember Wick'", italic: false },
    ]);
    expect(validateNameParts(parts)).toEqual([]);
  });

  it('incorrect: the epithet in double quotes', () => {
    const problems = validateNameParts({ genus: 'Acer', epithet: '"Lantern Hollow"' });
    expect(problems.map((p) => p.code)).toEqual(['double-quotes']);
    expect(problems[0]!.field).toBe('epithet');
    expect(problems[0]!.message).toMatch(/single quotation marks, never double/);
  });

  it("incorrect: cv. 'Lantern Hollow' (cv. used together with quotes)", () => {
    expect(codes({ genus: 'Acer', epithet: "cv. 'Lantern Hollow'" })).toEqual(['cv-with-quotes']);
    expect(codes({ genus: 'Acer', epithet: 'cv. Lantern Hollow' })).toEqual(['cv-prefix']);
  });

  it("incorrect: 'lantern hollow' (words not capitalised)", () => {
    const problems = validateNameParts({ genus: 'Acer', epithet: 'lantern hollow' });
    expect(problems.map((p) => p.code)).toEqual(['lower-case-word']);
    expect(problems[0]!.message).toContain('"lantern", "hollow"');
  });

  it('incorrect: the epithet in italics (markup in the field)', () => {
    expect(codes({ genus: 'Acer', epithet: '*Lantern Hollow*' })).toEqual(['markup']);
    expect(codes({ genus: 'Acer', epithet: '<i>Lantern Hollow</i>' })).toEqual(['markup']);
  });

  it('incorrect: "acer Palmatum"', () => {
    expect(codes({ genus: 'acer', species: 'Palmatum' })).toEqual(['genus-not-capitalised', 'species-not-lower-case']);
  });

  it('incorrect: "dissectum group" (Group name not capitalised)', () => {
    const problems = validateNameParts({ genus: 'Acer', species: 'palmatum', group: 'dissectum group' });
    expect(problems.map((p) => p.code)).toEqual(['group-not-capitalised']);
    expect(problems[0]!.message).toContain('"dissectum", "group"');
  });

  it('a Group name must end in "Group" and is not quoted', () => {
    expect(codes({ genus: 'Acer', group: 'Dissectum' })).toEqual(['group-without-suffix']);
    expect(codes({ genus: 'Acer', group: "'Dissectum Group'" })).toEqual(['group-quoted']);
  });

  it('quotes typed into the epithet field are flagged: Grovewalk adds them', () => {
    expect(codes({ genus: 'Acer', epithet: "'Lantern Hollow'" })).toEqual(['quotes-in-field']);
    // An apostrophe inside a word is part of the epithet.
    expect(codes({ genus: 'Acer', epithet: "Odile's Lantern" })).toEqual([]);
  });
});

describe('capitals inside an epithet (ICNCP per the FAO/International Poplar Commission synthesis; ALA-LC Japanese table)', () => {
  it('a word after a hyphen may stay lower-case: the romanised Word-word convention (docs/domain.md)', () => {
    expect(codes({ genus: 'Acer', epithet: 'Hoshi-kagura' })).toEqual([]);
    expect(codes({ genus: 'Acer', epithet: 'Kumo-no-yado' })).toEqual([]);
  });

  it('conjunctions, prepositions and the Japanese particle "no" may stay lower-case after the first word', () => {
    expect(codes({ genus: 'Acer', epithet: 'Tsukiyo no Niwa' })).toEqual([]);
    expect(codes({ genus: 'Acer', epithet: 'Lantern of the Marsh' })).toEqual([]);
    expect(codes({ genus: 'Acer', epithet: 'Rookery and Gold' })).toEqual([]);
  });

  it('but the first word is always capitalised, particle or not', () => {
    expect(codes({ genus: 'Acer', epithet: 'no Niwa' })).toEqual(['lower-case-word']);
  });
});

describe('epithet length: at most 30 characters, spaces and demarcating quotes not counted (ICNCP 2016 Art. 21.13, per the International Poplar Commission synthesis "How to name a new cultivar", FAO)', () => {
  it('counts letters and punctuation but not spaces or quotation marks', () => {
    expect(countEpithetCharacters("Odile's Lantern")).toBe(14);
    expect(countEpithetCharacters('Hoshi-kagura')).toBe(12);
    expect(countEpithetCharacters('A B')).toBe(2);
  });

  it('30 counted characters pass, 31 fail; spaces never push an epithet over', () => {
    const thirty = 'Abcdefghij Abcdefghij Abcdefghij'; // 30 letters, 2 spaces (invented)
    expect(countEpithetCharacters(thirty)).toBe(EPITHET_MAX_CHARACTERS);
    expect(codes({ genus: 'Acer', epithet: thirty })).toEqual([]);
    const problems = validateNameParts({ genus: 'Acer', epithet: `${thirty}k` });
    expect(problems.map((p) => p.code)).toEqual(['too-long']);
    expect(problems[0]!.message).toContain('31 characters');
  });

  it('a hyphen counts (only spaces and demarcation signs are excluded)', () => {
    const epithet = 'Abcdefghij-abcdefghij-abcdefgh'; // 28 letters + 2 hyphens = 30
    expect(codes({ genus: 'Acer', epithet })).toEqual([]);
    expect(codes({ genus: 'Acer', epithet: `${epithet}i` })).toEqual(['too-long']);
  });
});

describe('punctuation and words not allowed in an epithet (ICNCP 2016 Art. 21.18 per the FAO synthesis; words per the 2017 ICNCP summary for orchid hybrids)', () => {
  it('allows apostrophe, comma, hyphen, full stop, slash and up to two exclamation marks', () => {
    expect(codes({ genus: 'Acer', epithet: 'A.B. Lantern, Too!!' })).toEqual([]);
    expect(codes({ genus: 'Acer', epithet: 'Ember/Wick' })).toEqual([]);
  });

  it('rejects other marks and a third exclamation mark', () => {
    expect(codes({ genus: 'Acer', epithet: 'Ember & Wick' })).toEqual(['punctuation-not-allowed']);
    expect(codes({ genus: 'Acer', epithet: 'Ember Wick!!!' })).toEqual(['too-many-exclamation-marks']);
  });

  it('rejects words such as Group, Hybrid, Selection inside the epithet', () => {
    const problems = validateNameParts({ genus: 'Acer', epithet: 'Ember Group' });
    expect(problems.map((p) => p.code)).toEqual(['forbidden-word']);
    expect(problems[0]!.message).toContain('Group field');
    expect(codes({ genus: 'Acer', epithet: 'Copper Hybrid' })).toEqual(['forbidden-word']);
  });
});

describe('botanical parts (ICN)', () => {
  it('Art. 20.1: the genus name starts with a capital letter', () => {
    expect(codes({ genus: 'Acer' })).toEqual([]);
    const problems = validateNameParts({ genus: 'acer' });
    expect(problems.map((p) => p.code)).toEqual(['genus-not-capitalised']);
    expect(problems[0]!.message).toContain('Acer, not acer');
    expect(codes({ genus: '' })).toEqual(['required']);
    expect(codes({ genus: 'Acer palmatum' })).toEqual(['genus-not-one-word']);
  });

  it('Rec. 60F.1: the species epithet starts lower-case, even from a person or a noun', () => {
    expect(codes({ genus: 'Acer', species: 'palmatum' })).toEqual([]);
    const problems = validateNameParts({ genus: 'Acer', species: 'Palmatum' });
    expect(problems.map((p) => p.code)).toEqual(['species-not-lower-case']);
    expect(problems[0]!.message).toContain('palmatum, not Palmatum');
  });

  it('infraspecific epithets follow the species rule; ranks are subsp., var. or f. (RHS summary prefers subsp. to ssp.)', () => {
    expect(codes({ genus: 'Acer', species: 'palmatum', infraspecificRank: 'var.', infraspecificEpithet: 'Amoenum' })).toEqual([
      'infraspecific-not-lower-case',
    ]);
    const ssp = validateNameParts({ genus: 'Acer', species: 'palmatum', infraspecificRank: 'ssp.', infraspecificEpithet: 'amoenum' });
    expect(ssp.map((p) => p.code)).toEqual(['rank-unknown']);
    expect(ssp[0]!.message).toContain('subsp.');
    expect(codes({ genus: 'Acer', species: 'palmatum', infraspecificRank: 'var.' })).toEqual(['rank-without-epithet']);
    expect(codes({ genus: 'Acer', species: 'palmatum', infraspecificEpithet: 'amoenum' })).toEqual(['epithet-without-rank']);
  });

  it('markup in botanical fields is flagged too', () => {
    expect(codes({ genus: '<i>Acer</i>', species: '*palmatum*' })).toEqual(['markup', 'markup']);
  });
});

describe('normaliseEpithetInput', () => {
  it.each([
    ['"lantern hollow"', 'Lantern Hollow'],
    ["cv. 'lantern hollow'", 'Lantern Hollow'],
    ['‘Lantern Hollow’', 'Lantern Hollow'],
    ['*Ember Wick*', 'Ember Wick'],
    ['<i>ember wick</i>', 'Ember Wick'],
    ['  copper    wren ', 'Copper Wren'],
    ['lantern of the marsh', 'Lantern of the Marsh'],
    ["odile's lantern", "Odile's Lantern"],
  ])('%s → %s (quotes, cv. and markup removed; words capitalised)', (input, expected) => {
    expect(normaliseEpithetInput(input)).toBe(expected);
  });

  it.each([
    ['hoshi-KAGURA', 'Hoshi-kagura'],
    ['HOSHI KAGURA', 'Hoshi Kagura'],
    ['beni - suzume', 'Beni-suzume'],
    ['tsukiyo No niwa', 'Tsukiyo no Niwa'],
  ])('romanised Japanese %s → %s (Word-word convention, docs/domain.md; particle no lower-case, ALA-LC)', (input, expected) => {
    expect(normaliseEpithetInput(input)).toBe(expected);
  });

  it('keeps the typed case after a hyphen in non-Japanese words', () => {
    expect(normaliseEpithetInput('harrow-Gate blush')).toBe('Harrow-Gate Blush');
  });

  it('its output passes the checks it can fix', () => {
    for (const input of ['"lantern hollow"', "cv. 'kumo-no-YADO'", '<em>copper wren</em>', 'tsukiyo NO niwa']) {
      expect(validateNameParts({ genus: 'Acer', epithet: normaliseEpithetInput(input) })).toEqual([]);
    }
  });
});

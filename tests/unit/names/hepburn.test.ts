import { describe, expect, it } from 'vitest';
import { isHepburn, respell, splitHepburn } from '../../../shared/names/hepburn';

/**
 * The modified Hepburn syllable table: gojūon, dakuon and handakuon rows, then the yōon
 * (palatal) rows. Source: Library of Congress, ALA-LC Romanization Tables, "Japanese" (based on
 * Kenkyusha's New Japanese-English Dictionary table and ANSI Z39.11-1972). ぢ/づ romanise as
 * ji/zu, so those cells repeat; を is written o.
 */
const GOJUON = [
  'a i u e o',
  'ka ki ku ke ko',
  'sa shi su se so',
  'ta chi tsu te to',
  'na ni nu ne no',
  'ha hi fu he ho',
  'ma mi mu me mo',
  'ya yu yo',
  'ra ri ru re ro',
  'wa o',
  'ga gi gu ge go',
  'za ji zu ze zo',
  'da ji zu de do',
  'ba bi bu be bo',
  'pa pi pu pe po',
].flatMap((row) => row.split(' '));

const YOON = [
  'kya kyu kyo',
  'sha shu sho',
  'cha chu cho',
  'nya nyu nyo',
  'hya hyu hyo',
  'mya myu myo',
  'rya ryu ryo',
  'gya gyu gyo',
  'ja ju jo',
  'bya byu byo',
  'pya pyu pyo',
].flatMap((row) => row.split(' '));

function syllables(word: string): string[] {
  const r = splitHepburn(word);
  if (!r.ok) throw new Error(`${word}: ${r.problems.join('; ')}`);
  return r.syllables;
}

describe('splitHepburn against the Hepburn syllable table (ALA-LC Japanese table; ANSI Z39.11)', () => {
  it.each(GOJUON)('gojūon syllable %s is one syllable', (s) => {
    expect(syllables(s)).toEqual([s]);
  });

  it.each(YOON)('yōon syllable %s is one syllable', (s) => {
    expect(syllables(s)).toEqual([s]);
  });

  it('splits every table syllable followed by every other one at the boundary', () => {
    const all = [...new Set([...GOJUON, ...YOON])];
    for (const x of all) {
      for (const y of all) {
        // A doubled vowel or "o" + "u" is a long vowel (tested below), not two syllables.
        const last = x[x.length - 1]!;
        if (y === last || (last === 'o' && y === 'u')) continue;
        expect(syllables(x + y)).toEqual([x, y]);
      }
    }
  });

  it('the moraic n stands alone before a consonant and at the end of a word (ALA-LC table)', () => {
    expect(syllables('shinkin')).toEqual(['shi', 'n', 'ki', 'n']);
    expect(syllables('hon')).toEqual(['ho', 'n']);
    expect(syllables('konnichiwa')).toEqual(['ko', 'n', 'ni', 'chi', 'wa']);
  });

  it("n' marks the moraic n before a vowel or y: kan'ō, kin'yū (modified Hepburn test values, Kenkyusha 3rd ed. map 'hepburn-1954' in interscript)", () => {
    expect(syllables("kan'ō")).toEqual(['ka', 'n', 'ō']);
    expect(syllables('kin’yū')).toEqual(['ki', 'n', 'yū']);
    // Without the apostrophe the n starts the next syllable.
    expect(syllables('kanō')).toEqual(['ka', 'nō']);
  });

  it('accepts traditional Hepburn m for the moraic n before b, m, p (modified Hepburn writes n)', () => {
    expect(syllables('shimbashi')).toEqual(['shi', 'm', 'ba', 'shi']);
    expect(syllables('sampo')).toEqual(['sa', 'm', 'po']);
  });

  it('keeps long vowels in one syllable: tōkyō (interscript hepburn-1954 test value), ou, oo, uu, and circumflexes', () => {
    expect(syllables('tōkyō')).toEqual(['tō', 'kyō']);
    expect(syllables('toukyou')).toEqual(['tou', 'kyou']);
    expect(syllables('oosaka')).toEqual(['oo', 'sa', 'ka']);
    expect(syllables('Ōsaka')).toEqual(['ō', 'sa', 'ka']);
    expect(syllables('yuuki')).toEqual(['yuu', 'ki']);
    expect(syllables('tôkyô')).toEqual(['tô', 'kyô']);
  });

  it('splits geminates (small tsu): gakkō (interscript hepburn-1954), tekko (sokuon example), tch, ssh, tts, pp', () => {
    expect(syllables('gakkō')).toEqual(['ga', 'k', 'kō']);
    expect(syllables('tekko')).toEqual(['te', 'k', 'ko']);
    expect(syllables('matcha')).toEqual(['ma', 't', 'cha']);
    expect(syllables('kesshite')).toEqual(['ke', 's', 'shi', 'te']);
    expect(syllables('mittsu')).toEqual(['mi', 't', 'tsu']);
    expect(syllables('ippon')).toEqual(['i', 'p', 'po', 'n']);
  });

  it('splits hyphenated elements one after the other (invented epithet Hoshi-kagura)', () => {
    expect(syllables('Hoshi-kagura')).toEqual(['ho', 'shi', 'ka', 'gu', 'ra']);
  });

  it.each([
    ['Smith', 'must be followed by a vowel'],
    ['Oliver', '"l" is not used'],
    ['Quinn', '"q" is not used'],
    ['Xavier', '"x" is not used'],
    ['Clover', '"c" is only used in "ch"'],
    ['sitaku', 'Hepburn writes "shi"'],
    ['tuki', 'Hepburn writes "tsu"'],
    ['hune', 'Hepburn writes "fu"'],
    ['syako', 'Hepburn writes "sha"'],
    ['kat', 'must be followed by a vowel'],
    ['kkara', 'doubled consonant must follow a vowel'],
    ['nnaka', 'cannot start with the moraic n'],
    ['yeti', 'not a syllable of the Hepburn table'],
    ['O’Hara', 'apostrophe'],
  ])('rejects %s (not Hepburn: %s)', (word, problem) => {
    const r = splitHepburn(word);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems.join(' ')).toContain(problem);
  });

  it('isHepburn is true only when every word is Hepburn', () => {
    expect(isHepburn('Tsukiyo no Niwa')).toBe(true);
    expect(isHepburn('Copper Wren')).toBe(false);
    expect(isHepburn('')).toBe(false);
  });
});

describe('respell (Grovewalk guide: equal weight, lower case, one sound per vowel — docs/domain.md)', () => {
  // Vowel values from docs/domain.md: a as in father, e as in bed, i as in machine, o as in more, u as in rule.
  const VOWEL = { a: 'ah', e: 'eh', i: 'ee', o: 'oh', u: 'oo' } as const;

  it.each([...GOJUON, ...YOON])('table syllable %s keeps its vowel sound', (s) => {
    const vowel = s[s.length - 1] as keyof typeof VOWEL;
    const guide = respell(s);
    expect(guide).not.toBeNull();
    expect(guide!.endsWith(VOWEL[vowel])).toBe(true);
    expect(guide).toBe(guide!.toLowerCase());
  });

  it('respells invented romanised epithets syllable by syllable', () => {
    expect(respell('Hoshi-kagura')).toBe('hoh-shee-kah-goo-rah');
    expect(respell('Tsukiyo no Niwa')).toBe('tsoo-kee-yoh noh nee-wah');
    expect(respell('Benisuzume')).toBe('beh-nee-soo-zoo-meh');
  });

  it('closes a syllable with the moraic n or the first half of a geminate, and keeps g hard', () => {
    expect(respell('Gakkō')).toBe('gahk-koh');
    expect(respell("Shin'yo")).toBe('sheen-yoh');
    expect(respell('Ginka')).toBe('gheen-kah');
    expect(respell('Kogane')).toBe('koh-gah-neh');
  });

  it('returns null for English (non-Hepburn) epithets so the moderator-entered guide is shown', () => {
    expect(respell('Copper Wren')).toBeNull();
    expect(respell('Lantern Hollow')).toBeNull();
    expect(respell('')).toBeNull();
  });
});

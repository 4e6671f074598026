// How search words become MariaDB full-text and REGEXP terms. Outside sources: MariaDB documentation —
// innodb_ft_min_token_size default 3 and innodb_ft_max_token_size default 84 (system variables), the
// InnoDB default stopword list (information_schema.INNODB_FT_DEFAULT_STOPWORD: 36 rows, "the" twice),
// boolean-mode operators (ft_boolean_syntax).
import { describe, expect, it } from 'vitest';
import {
  INNODB_DEFAULT_STOPWORDS,
  INNODB_FT_DEFAULTS,
  booleanAllPrefix,
  booleanAnyGroup,
  planWords,
  regExpUsable,
  wholeWordRegExp,
} from '../../../server/modules/search/fulltext';

describe('InnoDB defaults (MariaDB documentation)', () => {
  it('lists the 35 distinct default stopwords and the token size limits', () => {
    expect(INNODB_DEFAULT_STOPWORDS.size).toBe(35);
    for (const w of ['a', 'about', 'com', 'de', 'la', 'und', 'www', 'with', 'where']) expect(INNODB_DEFAULT_STOPWORDS.has(w), w).toBe(true);
    expect(INNODB_DEFAULT_STOPWORDS.has('maple')).toBe(false);
    expect(INNODB_FT_DEFAULTS).toEqual({ minToken: 3, maxToken: 84 });
  });
});

describe('planWords', () => {
  it('sends words of 3+ letters to the index and short words and stopwords to the fallback', () => {
    expect(planWords(['ao', 'no', 'kaze', 'the', 'bark', 'with', 'x'])).toEqual({ indexed: ['kaze', 'bark'], fallback: ['ao', 'no', 'the', 'with', 'x'] });
    expect(planWords(['red'])).toEqual({ indexed: ['red'], fallback: [] });
    expect(planWords(['a'.repeat(85), 'a'.repeat(84)])).toEqual({ indexed: ['a'.repeat(84)], fallback: ['a'.repeat(85)] });
    // A server with another minimum: four-letter words become the shortest indexed ones.
    expect(planWords(['red', 'leaf'], { minToken: 4, maxToken: 84 })).toEqual({ indexed: ['leaf'], fallback: ['red'] });
    // Length counts characters, not UTF-16 units.
    expect(planWords(['ōta'])).toEqual({ indexed: ['ōta'], fallback: [] });
  });
});

describe('boolean-mode terms', () => {
  it('requires every word, the last one also as a prefix', () => {
    expect(booleanAllPrefix(['lace', 'maple'])).toBe('+lace +maple*');
    expect(booleanAllPrefix(['brind'])).toBe('+brind*');
  });
  it('groups the words of each spelling, any group may match', () => {
    expect(booleanAnyGroup([['brindlewick', 'flame'], ['brindelwick', 'flame'], []])).toBe('(+brindlewick +flame) (+brindelwick +flame)');
  });
  it('refuses a term carrying an operator character (defence in depth)', () => {
    for (const bad of ['a*', '-x', 'a b', '"q', '(x)', 'x~', '@2', '']) {
      expect(() => booleanAllPrefix([bad]), bad).toThrow(/unsafe/);
    }
  });
});

describe('REGEXP', () => {
  it('builds a whole-word pattern for ASCII words only', () => {
    expect(wholeWordRegExp('ao')).toBe('(^|[^[:alnum:]])ao([^[:alnum:]]|$)');
    expect(regExpUsable('ao')).toBe(true);
    expect(regExpUsable('ō')).toBe(false);
  });
});

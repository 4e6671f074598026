// LIKE patterns from user text. Outside source: MariaDB documentation, LIKE — "%" and "_" are the
// wildcards and "\" is the default escape character.
import { describe, expect, it } from 'vitest';
import { escapeLike, likeContains } from '../../../server/db/like';

describe('LIKE escaping (MariaDB LIKE)', () => {
  it('escapes %, _ and the escape character itself', () => {
    expect(escapeLike('50% a_b c\\d')).toBe('50\\% a\\_b c\\\\d');
    expect(likeContains('%')).toBe('%\\%%');
  });

  it('likeContains escapes the wildcards % and _ and the escape character inside its own % … %', () => {
    expect(likeContains('50%_a\\b')).toBe('%50\\%\\_a\\\\b%');
  });
});

/**
 * LIKE patterns from user text. MariaDB's LIKE treats "%" and "_" as wildcards and "\" as its
 * escape character, so all three are escaped: a search for "50%" or "a_b" means those characters.
 */

/** `s` with LIKE's wildcards and escape character escaped. */
export function escapeLike(s: string): string {
  return s.replace(/[\\%_]/g, (c) => `\\${c}`);
}

/** `%s%`: contains `s`, taken literally. */
export function likeContains(s: string): string {
  return `%${escapeLike(s)}%`;
}

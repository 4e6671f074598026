/**
 * Rewrites one name variant to the accepted name inside caption text: the step a moderator's
 * accepted spelling fix runs over every caption.
 */

/** The rewritten text and how many occurrences actually changed. */
export interface ReplaceResult {
  text: string;
  count: number;
}

const WORD_CHAR = String.raw`[\p{L}\p{M}\p{N}]`;
// Spaces (including no-break and thin ones) and hyphens of any width between the words.
const GAP = String.raw`[\s\u00A0\u2009\u202F\-\u2010\u2011\u2013]+`;

function escapeRegExp(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');
}

/**
 * Replaces every whole-word occurrence of `variant` with `accepted`. Matching ignores case and
 * accepts any run of spaces or hyphens where the variant has a space or hyphen, so "beni  kawa"
 * and "Beni-Kawa" are both occurrences of the variant "beni kawa"; it never touches part of a
 * longer word. Everything else (punctuation, a possessive 's, markup) is left as it was.
 * Occurrences already identical to `accepted` are not counted.
 */
export function replaceVariant(text: string, variant: string, accepted: string): ReplaceResult {
  const words = variant.trim().split(/[\s\u00A0\-\u2010\u2011\u2013]+/).filter((w) => w.length > 0);
  if (words.length === 0) return { text, count: 0 };
  const pattern = new RegExp(
    `(?<!${WORD_CHAR})${words.map(escapeRegExp).join(GAP)}(?!${WORD_CHAR})`,
    'giu',
  );
  let count = 0;
  const out = text.replace(pattern, (match) => {
    if (match === accepted) return match;
    count++;
    return accepted;
  });
  return { text: out, count };
}

import type { GlossaryEntry } from '@shared/schemas/glossary';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** "Said in 2 tours (3 captions)", or that no published tour says it yet. */
export function spokenSummary(spoken: GlossaryEntry['spoken']): string {
  if (spoken.tours === 0) return 'Not said in a published tour yet.';
  return `Said in ${plural(spoken.tours, 'tour', 'tours')} (${plural(spoken.cues, 'caption', 'captions')}).`;
}

/** "also heard as “a”, “b” and “c”" for the variants, or null when there are none. */
export function variantsText(variants: readonly string[]): string | null {
  if (variants.length === 0) return null;
  const quoted = variants.map((v) => `“${v}”`);
  const list = quoted.length === 1 ? quoted[0]! : `${quoted.slice(0, -1).join(', ')} and ${quoted[quoted.length - 1]}`;
  return `Also written or heard as ${list}.`;
}

/** How a search found an entry, in words, when it was not by the name itself. */
export function matchNote(match: GlossaryEntry['match']): string | null {
  if (!match) return null;
  switch (match.kind) {
    case 'variant':
      return 'Found by a recorded misspelling';
    case 'fuzzy':
      return 'Close spelling';
    case 'phonetic':
      return 'Sounds alike';
    default:
      return null;
  }
}

/** A letter for the address: one of A–Z or "#", upper-case; anything else means "all letters". */
export function letterParam(raw: string | null): string {
  const t = (raw ?? '').trim().toUpperCase();
  return /^[A-Z#]$/.test(t) ? t : '';
}

/** Every heading of the A–Z bar in order, with its count (0 for letters with no names). */
export function letterBar(letters: readonly { letter: string; count: number }[]): { letter: string; count: number }[] {
  const counts = new Map(letters.map((l) => [l.letter.toUpperCase(), l.count]));
  const all = [...'ABCDEFGHIJKLMNOPQRSTUVWXYZ'].map((letter) => ({ letter, count: counts.get(letter) ?? 0 }));
  if ((counts.get('#') ?? 0) > 0) all.push({ letter: '#', count: counts.get('#')! });
  return all;
}

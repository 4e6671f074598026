/**
 * The comparison form of a name or variant: accents folded, lower case, every run of punctuation
 * or space a single space ("Sora-no-Hane" and "sora no hane" compare equal). Stored beside each
 * variant so lookups are plain equality.
 */
export function normalizeName(s: string): string {
  return s
    .normalize('NFKD')
    .replace(/\p{M}+/gu, '')
    .toLowerCase()
    .replace(/[^\p{L}\p{N}]+/gu, ' ')
    .trim();
}

/** Longest slug base; leaves room for a "-NN" suffix within the 160-character column. */
const SLUG_BASE_MAX = 150;

/**
 * A URL slug from an accepted name: accents folded, quotes and brackets dropped, everything that
 * is not an ASCII letter or digit turned into single hyphens ("Acer palmatum (Dissectum Group)
 * 'Fernhollow Ember'", an invented epithet → "acer-palmatum-dissectum-group-fernhollow-ember").
 */
export function slugify(name: string): string {
  const slug = name
    .normalize('NFKD')
    .replace(/\p{M}+/gu, '')
    .replace(/['‘’"“”()[\]]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, SLUG_BASE_MAX)
    .replace(/-+$/, '');
  return slug || 'cultivar';
}

/** The first of base, base-2, base-3… that is not in `taken`. */
export function firstFreeSlug(base: string, taken: ReadonlySet<string>): string {
  if (!taken.has(base)) return base;
  for (let n = 2; ; n++) {
    const candidate = `${base}-${n}`;
    if (!taken.has(candidate)) return candidate;
  }
}

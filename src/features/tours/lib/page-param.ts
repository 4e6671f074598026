/** The page number from ?page=, falling back to 1 for anything that is not a positive whole number (hand-edited links). */
export function pageFromParams(params: URLSearchParams): number {
  const raw = params.get('page');
  const n = raw === null || raw.trim() === '' ? 1 : Number(raw);
  return Number.isInteger(n) && n >= 1 && n <= 100_000 ? n : 1;
}

/**
 * A positive whole number from the address (a tour, stop or author id, a page number), or null
 * for anything else, so a mistyped address shows "not found" instead of asking the server.
 */
export function positiveIntParam(raw: string | null | undefined): number | null {
  if (!raw || !/^\d{1,9}$/.test(raw)) return null;
  const id = Number(raw);
  return id >= 1 ? id : null;
}

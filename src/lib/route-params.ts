import { idSchema, pageQuerySchema } from '@shared/schemas/common';

/**
 * A positive whole number from the address (a tour, stop or author id, a page number), or null
 * for anything else, so a mistyped address shows "not found" instead of asking the server. The
 * rule is the server's own (`idSchema`).
 */
export function positiveIntParam(raw: string | null | undefined): number | null {
  const parsed = idSchema.safeParse(raw ?? '');
  return parsed.success ? parsed.data : null;
}

/**
 * The page number from ?page=, by the server's own rule for paged lists (`pageQuerySchema`), so a
 * hand-edited link never asks for a page the server would refuse; anything else is page 1.
 */
export function pageFromParams(params: URLSearchParams): number {
  const parsed = pageQuerySchema.shape.page.safeParse(params.get('page') ?? undefined);
  return parsed.success ? parsed.data : 1;
}

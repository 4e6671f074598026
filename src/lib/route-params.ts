import { idSchema } from '@shared/schemas/common';

/**
 * A positive whole number from the address (a tour, stop or author id, a page number), or null
 * for anything else, so a mistyped address shows "not found" instead of asking the server. The
 * rule is the server's own (`idSchema`).
 */
export function positiveIntParam(raw: string | null | undefined): number | null {
  const parsed = idSchema.safeParse(raw ?? '');
  return parsed.success ? parsed.data : null;
}

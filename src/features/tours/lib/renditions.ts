import type { Rendition } from '@shared/schemas/tours';

/**
 * The rendition to start with: the smallest one at least as wide as the player is in device
 * pixels (sharp without fetching more than the screen can show), else the largest there is.
 * `renditions` may come in any order.
 */
export function pickRendition(renditions: readonly Rendition[], playerWidthCss: number, devicePixelRatio = 1): Rendition | null {
  if (renditions.length === 0) return null;
  const byWidth = [...renditions].sort((a, b) => a.width - b.width || a.height - b.height);
  const need = Math.max(1, playerWidthCss) * Math.max(1, devicePixelRatio);
  return byWidth.find((r) => r.width >= need) ?? byWidth[byWidth.length - 1]!;
}

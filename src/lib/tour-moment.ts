import { z } from 'zod';

/**
 * A published tour moment that shows a cultivar, as the finder and side by side receive it. Kept
 * here because several features link to and play the same moments.
 */
export const tourMomentLinkSchema = z.object({
  tourId: z.number(),
  tourTitle: z.string(),
  stopId: z.number(),
  startMs: z.number(),
  endMs: z.number(),
  posterUrl: z.string().nullable(),
  videoUrl: z.string().nullable(),
});
/** One moment: where in which tour a tree is shown. */
export type TourMomentLink = z.infer<typeof tourMomentLinkSchema>;

/**
 * Seconds for a `?t=` deep link, rounded down to a tenth so the player never opens after the stop
 * has begun; whole seconds print without a decimal point ("8", "12.5").
 */
export function startParam(startMs: number): string {
  const tenths = Math.floor(Math.max(0, startMs) / 100);
  return tenths % 10 === 0 ? String(tenths / 10) : (tenths / 10).toFixed(1);
}

/** The watch page of a tour opened at a moment. */
export function tourMomentHref(tourId: number, startMs: number): string {
  return `/tours/${tourId}?t=${startParam(startMs)}`;
}

/**
 * A position or length in a tour as a clock: "0:07", "4:05", "1:02:03" (hours only when needed).
 * Fractions of a second are dropped, never rounded up, so the clock does not run ahead of the
 * picture; anything that is not a time reads "0:00".
 */
export function clockText(ms: number): string {
  if (!Number.isFinite(ms) || ms < 0) return '0:00';
  const total = Math.floor(ms / 1000 + 1e-6);
  const h = Math.floor(total / 3600);
  const m = Math.floor((total % 3600) / 60);
  const ss = String(total % 60).padStart(2, '0');
  return h > 0 ? `${h}:${String(m).padStart(2, '0')}:${ss}` : `${m}:${ss}`;
}

/**
 * A video address limited to one stop with a temporal media fragment (W3C Media Fragments URI
 * 1.0, "#t=start,end" in seconds), so the browser starts at the stop and pauses at its end. Any
 * fragment already on the address is replaced.
 */
export function clipSrc(videoUrl: string, startMs: number, endMs: number): string {
  const base = videoUrl.split('#')[0] ?? videoUrl;
  const sec = (ms: number) => {
    const v = Math.round(Math.max(0, ms)) / 1000;
    return String(Number(v.toFixed(3)));
  };
  const end = endMs > startMs ? `,${sec(endMs)}` : '';
  return `${base}#t=${sec(startMs)}${end}`;
}

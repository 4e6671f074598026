import type { JobSummary, TourDto } from '../../../shared/schemas/tours';
import type { Job } from '../../db/entities/job.entity';
import type { Tour } from '../../db/entities/tour.entity';
import type { User } from '../../db/entities/user.entity';
import { canEditTour } from './tour.policy';

export function presentJob(job: Job | null | undefined): JobSummary | null {
  if (!job) return null;
  return {
    id: job.id,
    state: job.state,
    progress: Math.round(job.progress * 10) / 10,
    etaSeconds: job.etaSeconds,
    attempts: job.attempts,
    maxAttempts: job.maxAttempts,
    error: job.error,
  };
}

/** Media URLs go through the visibility-checking media route; disk paths never leave the server. */
export function mediaUrl(tour: Tour, file: string): string {
  return `/media/tours/${tour.id}/${encodeURIComponent(file)}?v=${encodeURIComponent(tour.mediaDir?.split('/').pop() ?? '0')}`;
}

/** The poster picture's URL, or null when the tour has none yet. */
export function posterUrl(tour: Tour): string | null {
  return tour.posterFile ? mediaUrl(tour, tour.posterFile) : null;
}

/** The tour's renditions, tallest first: the order players list them and clips pick from. */
function tallestFirst(tour: Tour) {
  return (tour.renditions ?? []).slice().sort((a, b) => b.height - a.height);
}

/** The URL of the tallest rendition, for a clip of one moment; null before transcoding. */
export function topRenditionUrl(tour: Tour): string | null {
  const top = tallestFirst(tour)[0];
  return top ? mediaUrl(tour, top.file) : null;
}

export function presentTour(tour: Tour, viewer: User | undefined, job?: Job | null): TourDto {
  const renditions = tallestFirst(tour).map((r) => ({ height: r.height, width: r.width, bytes: r.bytes, url: mediaUrl(tour, r.file), label: `${r.height}p` }));
  return {
    id: tour.id,
    title: tour.title,
    descriptionHtml: tour.descriptionHtml,
    garden: tour.garden,
    filmedOn: tour.filmedOn,
    state: tour.state,
    publishedAt: tour.publishedAt?.toISOString() ?? null,
    author: { id: tour.authorId, displayName: tour.author?.displayName ?? '' },
    durationMs: tour.durationMs,
    width: tour.width,
    height: tour.height,
    sourceName: canEditTour(viewer, tour) ? tour.sourceName : null,
    sourceCodecs: tour.sourceCodecs,
    posterUrl: posterUrl(tour),
    thumbStrip: tour.thumbStrip
      ? { ...tour.thumbStrip, sheets: tour.thumbStrip.sheets.map((s) => ({ url: mediaUrl(tour, s.file), width: s.width, height: s.height })) }
      : null,
    renditions,
    failureReason: canEditTour(viewer, tour) ? tour.failureReason : null,
    job: canEditTour(viewer, tour) ? presentJob(job) : null,
    canEdit: canEditTour(viewer, tour),
    createdAt: tour.createdAt.toISOString(),
    updatedAt: tour.updatedAt.toISOString(),
  };
}

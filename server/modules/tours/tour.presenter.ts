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

export function presentTour(tour: Tour, viewer: User | undefined, job?: Job | null): TourDto {
  const renditions = (tour.renditions ?? [])
    .slice()
    .sort((a, b) => b.height - a.height)
    .map((r) => ({ height: r.height, width: r.width, bytes: r.bytes, url: mediaUrl(tour, r.file), label: `${r.height}p` }));
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
    posterUrl: tour.posterFile ? mediaUrl(tour, tour.posterFile) : null,
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

import type { JobSummary, TourState } from '@shared/schemas/tours';
import { Badge, type BadgeTone } from '@/components/badge';

const labels: Record<TourState, string> = {
  draft: 'Draft',
  processing: 'Preparing video',
  ready: 'Ready, not published',
  failed: 'Video could not be prepared',
  published: 'Published',
};
const tones: Record<TourState, BadgeTone> = { draft: 'plain', processing: 'ochre', ready: 'bark', failed: 'maple', published: 'moss' };

/**
 * A tour's state as a badge; while a job runs on an already playable tour (a replaced video)
 * the badge says so, since the state alone would still read "Published".
 */
export function TourStateBadge({ state, job }: { state: TourState; job?: JobSummary | null }) {
  const rerun = state !== 'processing' && (job?.state === 'queued' || job?.state === 'running');
  return (
    <span className="inline-flex flex-wrap gap-1.5">
      <Badge tone={tones[state]}>{labels[state]}</Badge>
      {rerun && <Badge tone="ochre">New video being prepared</Badge>}
    </span>
  );
}

import type { CultivarSummary } from '@shared/schemas/cultivars';
import { Badge } from '@/components/badge';

const STATUS_WORDS: Record<CultivarSummary['status'], string> = { proposed: 'Waiting for approval', approved: 'Approved', retired: 'Retired' };

/** A record's status for moderators and proposers; approved records need no badge in lists. */
export function StatusBadge({ status, always = false }: { status: CultivarSummary['status']; always?: boolean }) {
  if (status === 'approved' && !always) return null;
  return <Badge tone={status === 'proposed' ? 'ochre' : status === 'retired' ? 'bark' : 'moss'}>{STATUS_WORDS[status]}</Badge>;
}

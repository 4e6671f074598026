import type { SpellingFixDetail, SpellingFixRow } from '../../../shared/schemas/spelling-fixes';
import type { SpellingFix } from '../../db/entities/spelling-fix.entity';
import type { FixDetailData, FixRowData } from './spelling-fix.service';

/** Titles listed per row; the count says how many there are in all. */
const TITLES_SHOWN = 5;

function who(fix: SpellingFix): string {
  if (fix.source === 'detection') return 'automatic';
  return fix.proposer?.displayName ?? 'a former member';
}

/** A row of the moderators' queue. */
export function presentFixRow({ fix, cultivar, occurrences, changedCues }: FixRowData): SpellingFixRow {
  const tours = new Map<number, string>();
  for (const o of occurrences) tours.set(o.tourId, o.tourTitle);
  return {
    id: fix.id,
    proposedText: fix.proposedText,
    suggestion: {
      epithet: fix.status === 'open' ? cultivar.epithet : fix.suggestion,
      acceptedName: cultivar.acceptedName,
      cultivar: { id: cultivar.id, slug: cultivar.slug, epithet: cultivar.epithet, acceptedName: cultivar.acceptedName },
    },
    occurrences: occurrences.length,
    toursAffected: { count: tours.size, titles: [...tours.values()].sort((a, b) => a.localeCompare(b)).slice(0, TITLES_SHOWN) },
    proposer: who(fix),
    source: fix.source,
    status: fix.status,
    declineReason: fix.declineReason,
    decidedBy: fix.decidedBy?.displayName ?? null,
    decidedAt: fix.decidedAt?.toISOString() ?? null,
    createdAt: fix.createdAt.toISOString(),
    changedCues,
  };
}

/** A fix with its audit rows (empty unless the viewer is a moderator). */
export function presentFixDetail(data: FixDetailData): SpellingFixDetail {
  return {
    ...presentFixRow(data),
    undoneBy: data.fix.undoneBy?.displayName ?? null,
    undoneAt: data.fix.undoneAt?.toISOString() ?? null,
    changes: data.changes.map(({ change, tour }) => ({
      id: change.id,
      cueId: change.cueId,
      trackId: change.trackId,
      tourId: tour?.id ?? null,
      tourTitle: tour?.title ?? null,
      startMs: change.startMs,
      endMs: change.endMs,
      before: change.beforeText,
      after: change.afterText,
      createdAt: change.createdAt.toISOString(),
    })),
  };
}

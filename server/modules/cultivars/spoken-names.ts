import type { DataSource } from 'typeorm';
import { cuePlainText } from '../../../shared/captions/cue-text';
import { buildNameIndex, findNames, type NameRecord } from '../../../shared/names/matcher';
import type { SpokenMoment } from '../../../shared/schemas/cultivars';
import { readRevisions, RevisionCache } from '../search/search-revisions';

/** Where one record is heard across published tours. */
export interface SpokenSummary {
  /** The first cue per published tour, newest tour first. */
  moments: SpokenMoment[];
  /** Cues that say the name, over all published tours. */
  cues: number;
}

interface PublishedCueRow {
  id: number;
  trackId: number;
  tourId: number;
  tourTitle: string;
  publishedAt: Date | string | null;
  lang: string;
  startMs: number;
  endMs: number;
  text: string;
}

/** The cues of every published tour in playing order, tour by tour. */
async function publishedCues(ds: DataSource): Promise<PublishedCueRow[]> {
  const rows: Record<string, unknown>[] = await ds.query(
    `SELECT c.id, c.track_id AS trackId, t.tour_id AS tourId, r.title AS tourTitle, r.published_at AS publishedAt, t.lang,
            c.start_ms AS startMs, c.end_ms AS endMs, c.text
       FROM cues c
       JOIN caption_tracks t ON t.id = c.track_id
       JOIN tours r ON r.id = t.tour_id
      WHERE r.state = 'published'
      ORDER BY t.tour_id, c.start_ms, c.id`,
  );
  return rows.map((r) => ({
    id: Number(r.id),
    trackId: Number(r.trackId),
    tourId: Number(r.tourId),
    tourTitle: String(r.tourTitle),
    publishedAt: (r.publishedAt as Date | string | null) ?? null,
    lang: String(r.lang),
    startMs: Number(r.startMs),
    endMs: Number(r.endMs),
    text: String(r.text),
  }));
}

/**
 * Runs the name matcher once over every published cue against every approved record and says,
 * per record, where it is heard. Pure: the caller supplies the rows.
 */
export function spokenByRecord(records: readonly NameRecord[], cues: readonly PublishedCueRow[]): Map<number, SpokenSummary> {
  const out = new Map<number, SpokenSummary>();
  if (records.length === 0) return out;
  const index = buildNameIndex(records);
  const published = new Map<number, number>();
  for (const cue of cues) {
    const seenInCue = new Set<number>();
    for (const match of findNames(index, cue.text)) {
      const id = Number(match.recordId);
      if (seenInCue.has(id)) continue;
      seenInCue.add(id);
      let summary = out.get(id);
      if (!summary) out.set(id, (summary = { moments: [], cues: 0 }));
      summary.cues++;
      // Rows come tour by tour in playing order, so the first hit per tour is the earliest moment.
      if (!summary.moments.some((m) => m.tourId === cue.tourId)) {
        summary.moments.push({
          tourId: cue.tourId,
          tourTitle: cue.tourTitle,
          trackId: cue.trackId,
          lang: cue.lang,
          startMs: cue.startMs,
          endMs: cue.endMs,
          text: cuePlainText(cue.text).replace(/\s+/g, ' ').trim(),
          heard: match.matchedText,
          kind: match.kind,
        });
        published.set(cue.tourId, cue.publishedAt ? new Date(cue.publishedAt).getTime() : 0);
      }
    }
  }
  for (const summary of out.values()) {
    summary.moments.sort((a, b) => (published.get(b.tourId) ?? 0) - (published.get(a.tourId) ?? 0) || a.tourId - b.tourId);
  }
  return out;
}

/**
 * "Where is this name spoken", for record pages and the glossary. Matching every published cue is
 * done once and kept until captions, published tours, records or variants change: the search
 * revisions (kept by database triggers) tell for tours and records, a cheap checksum query for
 * caption tracks, so several server processes each keep a correct copy.
 */
export class SpokenNames {
  private readonly cache: RevisionCache<Map<number, SpokenSummary>>;

  constructor(
    private readonly dataSource: DataSource,
    private readonly records: () => Promise<NameRecord[]>,
  ) {
    this.cache = new RevisionCache(async () => {
      const [records, cues] = await Promise.all([this.records(), publishedCues(this.dataSource)]);
      return spokenByRecord(records, cues);
    });
  }

  private async fingerprint(): Promise<string> {
    const [[row], revisions] = await Promise.all([
      this.dataSource.query(
        `SELECT CONCAT(COUNT(*), ':', COALESCE(SUM(t.version), 0), ':', COALESCE(SUM(t.id), 0), ':', COALESCE(MAX(t.updated_at), '')) AS tracks
         FROM caption_tracks t JOIN tours r ON r.id = t.tour_id WHERE r.state = 'published'`,
      ) as Promise<{ tracks: string }[]>,
      readRevisions(this.dataSource),
    ]);
    return [row?.tracks, revisions.tours, revisions.catalogue].map(String).join('|');
  }

  /** Every approved record heard somewhere, by record id. */
  async all(): Promise<Map<number, SpokenSummary>> {
    return this.cache.get(await this.fingerprint());
  }

  /** Where one record is heard (nothing for proposals and retired records: they are not matched). */
  async of(cultivarId: number): Promise<SpokenSummary> {
    return (await this.all()).get(cultivarId) ?? { moments: [], cues: 0 };
  }
}

import { In, QueryFailedError, type DataSource } from 'typeorm';
import { buildNameIndex, findNames, type NameIndex } from '../../../shared/names/matcher';
import { normalizeName } from '../../../shared/names/normalize';
import type { DetectionReport } from '../../../shared/schemas/spelling-fixes';
import { CaptionTrack } from '../../db/entities/caption-track.entity';
import type { Cultivar } from '../../db/entities/cultivar.entity';
import { CueRow } from '../../db/entities/cue.entity';
import { SpellingFix } from '../../db/entities/spelling-fix.entity';
import { NotFound } from '../../errors/http-error';
import type { CultivarService } from '../cultivars/cultivar.service';

/** Cues read per query when detection runs over every track. */
const BATCH = 2000;

/** A name heard in a cue but written otherwise than the accepted epithet. */
export interface Misspelling {
  cultivarId: number;
  text: string;
  key: string;
  cueId: number;
  trackId: number;
}

/**
 * The misspellings in one cue: every match of the shared matcher whose words differ from the
 * record's accepted epithet — a recorded variant, a close spelling, a sound-alike, or the name
 * itself with other capitals, spaces or hyphens. Matches that run across caption markup are left
 * out (a fix could not rewrite them as one piece of text).
 */
export function misspellingsIn(index: NameIndex, byId: ReadonlyMap<number, Pick<Cultivar, 'epithet'>>, cue: { id: number; trackId: number; text: string }): Misspelling[] {
  const out: Misspelling[] = [];
  for (const match of findNames(index, cue.text)) {
    const cultivarId = Number(match.recordId);
    const record = byId.get(cultivarId);
    if (!record || match.matchedText === record.epithet) continue;
    if (/[<>&]/.test(match.matchedText)) continue;
    const text = match.matchedText.replace(/\s+/g, ' ').trim();
    const key = normalizeName(text);
    if (!key || text.length > 120) continue;
    out.push({ cultivarId, text, key, cueId: cue.id, trackId: cue.trackId });
  }
  return out;
}

/**
 * Name detection over captions: finds approved names written wrongly and opens a spelling fix for
 * each new one (source "detection"). A misspelling with a fix already open, or declined or undone
 * before (a moderator said no), is not proposed again.
 */
export class NameDetection {
  constructor(
    private readonly dataSource: DataSource,
    private readonly cultivars: CultivarService,
  ) {}

  /** Runs over one track, or over every track of every tour when none is given. */
  async run(opts: { trackId?: number } = {}): Promise<DetectionReport> {
    const cues = this.dataSource.getRepository(CueRow);
    if (opts.trackId !== undefined && !(await this.dataSource.getRepository(CaptionTrack).existsBy({ id: opts.trackId }))) {
      throw new NotFound('No such caption track.');
    }
    const { records, byId } = await this.cultivars.approvedNameRecords();
    const report: DetectionReport = { tracks: 0, cues: 0, misspellings: 0, proposed: 0, known: 0 };
    const found = new Map<string, Misspelling>();
    const tracks = new Set<number>();
    if (records.length) {
      const index = buildNameIndex(records);
      let after = 0;
      for (;;) {
        const qb = cues.createQueryBuilder('c').select(['c.id', 'c.trackId', 'c.text']).where('c.id > :after', { after }).orderBy('c.id', 'ASC').take(BATCH);
        if (opts.trackId !== undefined) qb.andWhere('c.trackId = :trackId', { trackId: opts.trackId });
        const batch = await qb.getMany();
        if (!batch.length) break;
        for (const cue of batch) {
          tracks.add(cue.trackId);
          report.cues++;
          for (const m of misspellingsIn(index, byId, cue)) {
            report.misspellings++;
            const k = `${m.cultivarId}\u0000${m.key}`;
            if (!found.has(k)) found.set(k, m);
          }
        }
        after = batch[batch.length - 1]!.id;
      }
    } else {
      report.cues = opts.trackId !== undefined ? await cues.countBy({ trackId: opts.trackId }) : await cues.count();
    }
    report.tracks = opts.trackId !== undefined ? 1 : records.length ? tracks.size : await this.dataSource.getRepository(CaptionTrack).count();

    if (found.size) {
      const fixes = this.dataSource.getRepository(SpellingFix);
      const ids = [...new Set([...found.values()].map((m) => m.cultivarId))];
      const blocking = await fixes.find({ where: { cultivarId: In(ids), status: In(['open', 'declined', 'undone']) }, select: { cultivarId: true, proposedNormalized: true } });
      const blocked = new Set(blocking.map((f) => `${f.cultivarId}\u0000${f.proposedNormalized}`));
      for (const [k, m] of found) {
        if (blocked.has(k)) {
          report.known++;
          continue;
        }
        try {
          await fixes.insert({
            proposedText: m.text,
            proposedNormalized: m.key,
            cultivarId: m.cultivarId,
            suggestion: byId.get(m.cultivarId)!.epithet,
            source: 'detection',
            proposerId: null,
            cueId: m.cueId,
            trackId: m.trackId,
            status: 'open',
            openGuard: 1,
          });
          report.proposed++;
        } catch (err) {
          // Opened meanwhile by a viewer or a parallel run.
          if (err instanceof QueryFailedError && (err as QueryFailedError & { code?: string }).code === 'ER_DUP_ENTRY') report.known++;
          else throw err;
        }
      }
    }
    return report;
  }
}

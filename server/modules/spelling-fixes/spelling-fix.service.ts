import { In, QueryFailedError, type DataSource, type EntityManager } from 'typeorm';
import { normalizeName } from '../../../shared/names/normalize';
import { replaceVariant } from '../../../shared/names/replace';
import { hasRole } from '../../../shared/schemas/common';
import type { ListFixesQuery, ProposeFixInput } from '../../../shared/schemas/spelling-fixes';
import { CaptionTrack } from '../../db/entities/caption-track.entity';
import { CueRow } from '../../db/entities/cue.entity';
import { Cultivar } from '../../db/entities/cultivar.entity';
import { CultivarVariant } from '../../db/entities/cultivar-variant.entity';
import { SpellingFix } from '../../db/entities/spelling-fix.entity';
import { SpellingFixChange } from '../../db/entities/spelling-fix-change.entity';
import { Tour } from '../../db/entities/tour.entity';
import { User } from '../../db/entities/user.entity';
import { BadRequest, Conflict, NotFound } from '../../errors/http-error';
import { linkMessage, type Mailer } from '../../mail/mailer';
import { clock } from '../stops/stop.service';
import { cuesToChange, type CueHit } from './cue-search';

/** What the service needs: the database, and mail to tell proposers about decisions. */
export interface SpellingFixDeps {
  dataSource: DataSource;
  mailer: Mailer;
  publicUrl: string;
  log?: (msg: string, err?: unknown) => void;
}

/** A fix with what the queue shows about it. */
export interface FixRowData {
  fix: SpellingFix;
  cultivar: Cultivar;
  occurrences: CueHit[];
  changedCues: number;
}

/** A fix with its audit rows (and the tour each row's track belongs to, if it still exists). */
export interface FixDetailData extends FixRowData {
  changes: { change: SpellingFixChange; tour: Tour | null }[];
}

/** What a track looks like after an accept or undo moved its version on. */
export interface TouchedTrack {
  id: number;
  tourId: number;
  version: number;
}

/** Thrown inside a transaction to start it again (new occurrences appeared while locking). */
class RetryTransaction extends Error {}

const MAX_ATTEMPTS = 4;

function isDuplicateKey(err: unknown): boolean {
  return err instanceof QueryFailedError && (err as QueryFailedError & { code?: string }).code === 'ER_DUP_ENTRY';
}

function isDeadlock(err: unknown): boolean {
  const code = (err as { code?: string; driverError?: { code?: string } })?.code ?? (err as { driverError?: { code?: string } })?.driverError?.code;
  return code === 'ER_LOCK_DEADLOCK';
}

function quoteText(s: string): string {
  return `“${s}”`;
}

function fixNotOpen(fix: SpellingFix): Conflict {
  return new Conflict('fix_not_open', `This fix was already ${fix.status}; only open fixes can be accepted or declined.`);
}

function stale(fix: SpellingFix): Conflict {
  return new Conflict(
    'fix_stale',
    `${quoteText(fix.proposedText)} no longer occurs in any caption (someone may have corrected it already), so there is nothing to change. Decline the fix to close it.`,
  );
}

/**
 * Spelling fixes: viewers' flags, the moderators' queue, accept (rewrite every caption that has
 * the text, with an audit row per cue), decline, and undo that never overwrites a later edit.
 *
 * Locking: accept and undo take row locks in one order — the cultivar record, the fix, the caption
 * tracks by id, then their cues by id — the same order the record merge and the caption editor's
 * save use (record before fixes; track before its cues). Two moderators working at once therefore
 * take turns instead of overwriting each other's text, and deadlocks cannot form among them; a
 * deadlock with some other writer is retried.
 */
export class SpellingFixService {
  constructor(private readonly deps: SpellingFixDeps) {}

  private get ds(): DataSource {
    return this.deps.dataSource;
  }

  /** Runs a READ COMMITTED transaction (each locking read sees the latest commit), again on a deadlock or a retry signal. */
  private async inTransaction<T>(work: (m: EntityManager) => Promise<T>): Promise<T> {
    for (let attempt = 1; ; attempt++) {
      try {
        return await this.ds.transaction('READ COMMITTED', work);
      } catch (err) {
        if ((err instanceof RetryTransaction || isDeadlock(err)) && attempt < MAX_ATTEMPTS) continue;
        if (err instanceof RetryTransaction) throw new Conflict('busy', 'Captions are being changed right now; try again in a moment.');
        throw err;
      }
    }
  }

  // ---- proposing ----

  /**
   * A viewer's flag. The record must be approved, the text must not already be its accepted
   * epithet or another record's, and it must occur as whole words in the cue given or, without a
   * cue, in some caption the viewer can see. A second flag of an open fix returns that fix.
   */
  async propose(user: User, input: ProposeFixInput): Promise<{ fix: SpellingFix; created: boolean }> {
    const text = input.proposedText.replace(/\s+/g, ' ').trim();
    const key = normalizeName(text);
    if (!key) throw new BadRequest('invalid_text', 'Select the misspelt words.', { proposedText: 'Select letters or digits.' });
    const cultivar = await this.ds.getRepository(Cultivar).findOneBy({ id: input.cultivarId, status: 'approved' });
    if (!cultivar || cultivar.mergedIntoId) {
      throw new BadRequest('cultivar_missing', 'That cultivar record does not exist or is not approved.', { cultivarId: 'Pick an approved cultivar record.' });
    }
    if (text === cultivar.epithet) {
      throw new BadRequest('already_accepted_name', `${quoteText(text)} is already the accepted name: nothing to fix.`, { proposedText: 'Already the accepted name.' });
    }
    const other = (await this.ds.getRepository(Cultivar).find({ where: { status: 'approved' }, select: { id: true, epithet: true, acceptedName: true } })).find(
      (c) => c.id !== cultivar.id && normalizeName(c.epithet) === key,
    );
    if (other) {
      throw new BadRequest(
        'is_other_name',
        `${quoteText(text)} is the accepted name of ${other.acceptedName}. A spelling fix cannot turn one cultivar into another; if a tree was misnamed, ask the tour's author to relink its stop.`,
        { proposedText: 'Another record has this name.' },
      );
    }

    const visibleTo = { userId: user.id, everything: hasRole(user.role, 'moderator') };
    let hits: CueHit[];
    if (input.cueId !== undefined || input.cue !== undefined) {
      const where = input.cueId !== undefined ? { cueId: input.cueId } : { trackId: input.cue!.trackId, startMs: input.cue!.startMs };
      const cue = await this.visibleCue(where, visibleTo);
      if (!cue) throw new NotFound('No such caption.');
      hits = await cuesToChange(this.ds.manager, text, cultivar.epithet, { ...where, visibleTo, limit: 1 });
      if (!hits.length) {
        throw new BadRequest('text_not_in_cue', `${quoteText(text)} does not occur as whole words in that caption.`, { proposedText: 'Not found in this caption.' });
      }
    } else {
      hits = await cuesToChange(this.ds.manager, text, cultivar.epithet, { visibleTo, limit: 1 });
      if (!hits.length) {
        throw new BadRequest('text_not_found', `${quoteText(text)} does not occur as whole words in any caption you can see.`, { proposedText: 'Not found in any caption.' });
      }
    }

    const repo = this.ds.getRepository(SpellingFix);
    const existing = await repo.findOneBy({ cultivarId: cultivar.id, proposedNormalized: key, status: 'open' });
    if (existing) return { fix: existing, created: false };
    try {
      const saved = await repo.save(
        repo.create({
          proposedText: text,
          proposedNormalized: key,
          cultivarId: cultivar.id,
          suggestion: cultivar.epithet,
          source: 'viewer',
          proposerId: user.id,
          cueId: hits[0]!.cueId,
          trackId: hits[0]!.trackId,
          status: 'open',
          openGuard: 1,
        }),
      );
      return { fix: await repo.findOneByOrFail({ id: saved.id }), created: true };
    } catch (err) {
      // Someone flagged the same words for the same record a moment earlier.
      if (isDuplicateKey(err)) return { fix: await repo.findOneByOrFail({ cultivarId: cultivar.id, proposedNormalized: key, status: 'open' }), created: false };
      throw err;
    }
  }

  private async visibleCue(where: { cueId?: number; trackId?: number; startMs?: number }, visibleTo: { userId: number; everything: boolean }): Promise<boolean> {
    const qb = this.ds
      .getRepository(CueRow)
      .createQueryBuilder('c')
      .innerJoin(CaptionTrack, 't', 't.id = c.trackId')
      .innerJoin(Tour, 'r', 'r.id = t.tourId');
    if (where.cueId !== undefined) qb.andWhere('c.id = :cueId', { cueId: where.cueId });
    if (where.trackId !== undefined) qb.andWhere('c.trackId = :trackId', { trackId: where.trackId });
    if (where.startMs !== undefined) qb.andWhere('c.startMs = :startMs', { startMs: where.startMs });
    if (!visibleTo.everything) qb.andWhere("(r.state = 'published' OR r.authorId = :me)", { me: visibleTo.userId });
    return (await qb.getCount()) > 0;
  }

  // ---- reading ----

  private async rowData(fixes: SpellingFix[]): Promise<FixRowData[]> {
    if (!fixes.length) return [];
    const cultivars = await this.ds.getRepository(Cultivar).findBy({ id: In([...new Set(fixes.map((f) => f.cultivarId))]) });
    const byId = new Map(cultivars.map((c) => [c.id, c]));
    const counts: { fixId: number; n: string }[] = await this.ds
      .getRepository(SpellingFixChange)
      .createQueryBuilder('a')
      .select('a.fixId', 'fixId')
      .addSelect('COUNT(*)', 'n')
      .where('a.fixId IN (:...ids)', { ids: fixes.map((f) => f.id) })
      .groupBy('a.fixId')
      .getRawMany();
    const changed = new Map(counts.map((r) => [Number(r.fixId), Number(r.n)]));
    const out: FixRowData[] = [];
    for (const fix of fixes) {
      const cultivar = byId.get(fix.cultivarId)!;
      // Occurrences are what an accept would change now: only meaningful while the fix is open.
      const occurrences = fix.status === 'open' ? await cuesToChange(this.ds.manager, fix.proposedText, cultivar.epithet) : [];
      out.push({ fix, cultivar, occurrences, changedCues: changed.get(fix.id) ?? 0 });
    }
    return out;
  }

  /** The moderators' queue: open fixes oldest first (first come, first served); decided ones newest first. */
  async list(q: ListFixesQuery): Promise<{ items: FixRowData[]; total: number; page: number; pageSize: number }> {
    const qb = this.ds
      .getRepository(SpellingFix)
      .createQueryBuilder('f')
      .leftJoinAndSelect('f.proposer', 'p')
      .leftJoinAndSelect('f.decidedBy', 'd')
      .leftJoinAndSelect('f.undoneBy', 'u')
      .where('f.status = :status', { status: q.status });
    if (q.status === 'open') qb.orderBy('f.createdAt', 'ASC').addOrderBy('f.id', 'ASC');
    else qb.orderBy(q.status === 'undone' ? 'f.undoneAt' : 'f.decidedAt', 'DESC').addOrderBy('f.id', 'DESC');
    qb.skip((q.page - 1) * q.pageSize).take(q.pageSize);
    const [fixes, total] = await qb.getManyAndCount();
    return { items: await this.rowData(fixes), total, page: q.page, pageSize: q.pageSize };
  }

  private async loadFix(id: number): Promise<SpellingFix> {
    const fix = await this.ds.getRepository(SpellingFix).findOne({ where: { id }, relations: { proposer: true, decidedBy: true, undoneBy: true } });
    if (!fix) throw new NotFound('No such spelling fix.');
    return fix;
  }

  /** One fix as the queue shows it, without its audit (the answer to a flag, whoever flagged it). */
  async summary(id: number): Promise<FixDetailData> {
    const [row] = await this.rowData([await this.loadFix(id)]);
    return { ...row!, changes: [] };
  }

  /** One fix; moderators also see its audit (before and after of every cue it changed). */
  async get(id: number, viewer: User): Promise<FixDetailData> {
    const fix = await this.loadFix(id);
    const moderator = hasRole(viewer.role, 'moderator');
    if (!moderator && fix.proposerId !== viewer.id) throw new NotFound('No such spelling fix.');
    const [row] = await this.rowData([fix]);
    if (!moderator) return { ...row!, changes: [] };
    const changes = await this.ds.getRepository(SpellingFixChange).find({ where: { fixId: id }, order: { id: 'ASC' } });
    const tracks = changes.length ? await this.ds.getRepository(CaptionTrack).findBy({ id: In([...new Set(changes.map((c) => c.trackId))]) }) : [];
    const tours = tracks.length ? await this.ds.getRepository(Tour).findBy({ id: In([...new Set(tracks.map((t) => t.tourId))]) }) : [];
    const tourOfTrack = new Map(tracks.map((t) => [t.id, tours.find((r) => r.id === t.tourId) ?? null]));
    return { ...row!, changes: changes.map((change) => ({ change, tour: tourOfTrack.get(change.trackId) ?? null })) };
  }

  // ---- deciding ----

  /** Locks the record the fix names, then the fix (the merge's order), and checks the fix did not move meanwhile. */
  private async lockRecordAndFix(m: EntityManager, id: number): Promise<{ fix: SpellingFix; cultivar: Cultivar }> {
    const peek = await m.getRepository(SpellingFix).findOneBy({ id });
    if (!peek) throw new NotFound('No such spelling fix.');
    const cultivar = await m.getRepository(Cultivar).findOne({ where: { id: peek.cultivarId }, lock: { mode: 'pessimistic_write' } });
    const fix = await m.getRepository(SpellingFix).findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
    if (!fix) throw new NotFound('No such spelling fix.');
    // A merge moved the fix to another record between the two reads: start again.
    if (!cultivar || fix.cultivarId !== cultivar.id) throw new RetryTransaction();
    return { fix, cultivar };
  }

  /** Locks tracks, then all their cues, both in id order; returns the cues by id. */
  private async lockTracksAndCues(m: EntityManager, trackIds: readonly number[]): Promise<{ tracks: CaptionTrack[]; cues: CueRow[] }> {
    if (!trackIds.length) return { tracks: [], cues: [] };
    const tracks = await m.getRepository(CaptionTrack).find({ where: { id: In([...trackIds]) }, order: { id: 'ASC' }, lock: { mode: 'pessimistic_write' } });
    if (!tracks.length) return { tracks, cues: [] };
    const cues = await m.getRepository(CueRow).find({ where: { trackId: In(tracks.map((t) => t.id)) }, order: { id: 'ASC' }, lock: { mode: 'pessimistic_write' } });
    return { tracks, cues };
  }

  private async bumpTracks(m: EntityManager, tracks: readonly CaptionTrack[], touched: ReadonlySet<number>, userId: number): Promise<TouchedTrack[]> {
    const out: TouchedTrack[] = [];
    for (const track of tracks) {
      if (!touched.has(track.id)) continue;
      // The caption editor saves with the version it loaded; moving it on turns an open editor's
      // next save into a conflict instead of an overwrite of the corrected text.
      await m.getRepository(CaptionTrack).update({ id: track.id }, { version: track.version + 1, updatedById: userId });
      out.push({ id: track.id, tourId: track.tourId, version: track.version + 1 });
    }
    return out;
  }

  /**
   * Accepts a fix in one transaction: every cue of every tour that holds the proposed text as
   * whole words is rewritten with the accepted epithet (the rest of the cue untouched), each
   * rewrite gets an audit row, touched tracks move to a new version, the text becomes a variant
   * of the record (unless it is one already), and the fix is marked accepted. Then the proposer
   * is told by e-mail.
   */
  async accept(id: number, moderator: User): Promise<{ fix: SpellingFix; changedCues: number; tracks: TouchedTrack[] }> {
    const result = await this.inTransaction(async (m) => {
      const { fix, cultivar } = await this.lockRecordAndFix(m, id);
      if (fix.status !== 'open') throw fixNotOpen(fix);
      if (cultivar.status !== 'approved' || cultivar.mergedIntoId) {
        throw new Conflict('cultivar_not_approved', `${cultivar.acceptedName} is not an approved record any more; decline this fix.`);
      }
      // The record may have been renamed since the fix was proposed: write today's epithet.
      const accepted = cultivar.epithet;
      const found = await cuesToChange(m, fix.proposedText, accepted);
      if (!found.length) throw stale(fix);
      const trackIds = [...new Set(found.map((h) => h.trackId))].sort((a, b) => a - b);
      const { tracks, cues } = await this.lockTracksAndCues(m, trackIds);
      // Text that appeared in other tracks while we were locking: start again with those too.
      const lockedTracks = new Set(tracks.map((t) => t.id));
      if ((await cuesToChange(m, fix.proposedText, accepted)).some((h) => !lockedTracks.has(h.trackId))) throw new RetryTransaction();

      const touched = new Set<number>();
      let changedCues = 0;
      for (const cue of cues) {
        const r = replaceVariant(cue.text, fix.proposedText, accepted);
        if (r.count === 0) continue;
        await m.getRepository(CueRow).update({ id: cue.id }, { text: r.text });
        await m.getRepository(SpellingFixChange).insert({
          fixId: fix.id,
          cueId: cue.id,
          trackId: cue.trackId,
          startMs: cue.startMs,
          endMs: cue.endMs,
          beforeText: cue.text,
          afterText: r.text,
        });
        touched.add(cue.trackId);
        changedCues++;
      }
      if (!changedCues) throw stale(fix);
      const bumped = await this.bumpTracks(m, tracks, touched, moderator.id);

      let addedVariantId: number | null = null;
      const key = fix.proposedNormalized;
      if (key !== normalizeName(accepted)) {
        const variants = m.getRepository(CultivarVariant);
        if (!(await variants.existsBy({ cultivarId: cultivar.id, normalized: key }))) {
          const v = await variants.save(variants.create({ cultivarId: cultivar.id, text: fix.proposedText, normalized: key }));
          addedVariantId = v.id;
        }
      }
      await m.getRepository(SpellingFix).update(
        { id: fix.id },
        { status: 'accepted', openGuard: null, suggestion: accepted, addedVariantId, decidedById: moderator.id, decidedAt: new Date() },
      );
      // Record pages and the glossary cache on record changes; a new variant is one.
      await m.getRepository(Cultivar).update({ id: cultivar.id }, { updatedAt: new Date() });
      return { changedCues, tracks: bumped, tours: new Set(found.map((h) => h.tourId)).size, cultivar };
    });
    const fix = await this.loadFix(id);
    await this.tellProposer(fix, 'Your spelling fix was accepted', [
      `Thank you. Your spelling fix ${quoteText(fix.proposedText)} → ${result.cultivar.acceptedName} was accepted.`,
      `${result.changedCues} caption${result.changedCues === 1 ? '' : 's'} in ${result.tours} tour${result.tours === 1 ? '' : 's'} now show the accepted name, and ${quoteText(fix.proposedText)} is recorded as a variant so search finds the tree either way.`,
    ], result.cultivar);
    return { fix, changedCues: result.changedCues, tracks: result.tracks };
  }

  /** Declines an open fix with a reason the proposer receives by e-mail. */
  async decline(id: number, moderator: User, reason: string): Promise<SpellingFix> {
    const cultivar = await this.inTransaction(async (m) => {
      const { fix, cultivar } = await this.lockRecordAndFix(m, id);
      if (fix.status !== 'open') throw fixNotOpen(fix);
      await m.getRepository(SpellingFix).update({ id }, { status: 'declined', openGuard: null, declineReason: reason, decidedById: moderator.id, decidedAt: new Date() });
      return cultivar;
    });
    const fix = await this.loadFix(id);
    await this.tellProposer(fix, 'Your spelling fix was declined', [
      `Thank you for your spelling fix ${quoteText(fix.proposedText)} → ${cultivar.acceptedName}. A moderator declined it, and the captions stay as they are.`,
      `Reason: ${reason}`,
    ], cultivar);
    return fix;
  }

  /**
   * Undoes an accepted fix: each audited cue gets its text from before the fix back, but only if
   * it still reads exactly as the fix left it. If any cue was edited (or removed) since, nothing is
   * changed and the answer lists those cues, so a later edit is never lost. A cue the caption
   * editor re-saved unchanged (new row, same track, time and text) counts as unchanged.
   */
  async undo(id: number, moderator: User): Promise<{ fix: SpellingFix; restoredCues: number; tracks: TouchedTrack[] }> {
    const result = await this.inTransaction(async (m) => {
      const { fix } = await this.lockRecordAndFix(m, id);
      if (fix.status !== 'accepted') throw new Conflict('fix_not_accepted', `Only an accepted fix can be undone; this one is ${fix.status}.`);
      const changes = await m.getRepository(SpellingFixChange).find({ where: { fixId: id }, order: { id: 'ASC' } });
      const { tracks, cues } = await this.lockTracksAndCues(m, [...new Set(changes.map((c) => c.trackId))].sort((a, b) => a - b));
      const byId = new Map(cues.map((c) => [c.id, c]));
      const used = new Set<number>();
      const plan: { cue: CueRow; before: string }[] = [];
      const conflicts: { change: SpellingFixChange; now: string | null }[] = [];
      const audited = new Set(changes.map((c) => c.cueId));
      for (const change of changes) {
        // The cue itself, or (after a save that replaced the track's rows) the unchanged copy of it.
        const cue =
          byId.get(change.cueId) ??
          cues.find(
            (c) =>
              !used.has(c.id) && !audited.has(c.id) && c.trackId === change.trackId && c.startMs === change.startMs && c.endMs === change.endMs && c.text === change.afterText,
          );
        if (!cue) {
          // Gone, or re-saved with other text: report what now sits at that time, if anything.
          const there = cues.find((c) => !used.has(c.id) && !audited.has(c.id) && c.trackId === change.trackId && c.startMs === change.startMs && c.endMs === change.endMs);
          conflicts.push({ change, now: there?.text ?? null });
        } else if (cue.text !== change.afterText) {
          conflicts.push({ change, now: cue.text });
        } else {
          used.add(cue.id);
          plan.push({ cue, before: change.beforeText });
        }
      }
      if (conflicts.length) throw await this.undoConflict(m, conflicts);

      for (const { cue, before } of plan) await m.getRepository(CueRow).update({ id: cue.id }, { text: before });
      const bumped = await this.bumpTracks(m, tracks, new Set(plan.map((p) => p.cue.trackId)), moderator.id);
      if (fix.addedVariantId) await m.getRepository(CultivarVariant).delete({ id: fix.addedVariantId });
      await m.getRepository(SpellingFix).update({ id }, { status: 'undone', openGuard: null, undoneById: moderator.id, undoneAt: new Date() });
      await m.getRepository(Cultivar).update({ id: fix.cultivarId }, { updatedAt: new Date() });
      return { restoredCues: plan.length, tracks: bumped };
    });
    return { fix: await this.loadFix(id), ...result };
  }

  private async undoConflict(m: EntityManager, conflicts: { change: SpellingFixChange; now: string | null }[]): Promise<Conflict> {
    const tracks = await m.getRepository(CaptionTrack).findBy({ id: In([...new Set(conflicts.map((c) => c.change.trackId))]) });
    const tours = tracks.length ? await m.getRepository(Tour).findBy({ id: In([...new Set(tracks.map((t) => t.tourId))]) }) : [];
    const title = (trackId: number) => {
      const track = tracks.find((t) => t.id === trackId);
      return tours.find((r) => r.id === track?.tourId)?.title ?? 'a deleted tour';
    };
    const where = conflicts.map(({ change }) => `${title(change.trackId)} at ${clock(change.startMs)}`);
    const fields: Record<string, string> = {};
    for (const { change, now } of conflicts) {
      fields[`cue-${change.cueId}`] =
        now === null
          ? `${title(change.trackId)} at ${clock(change.startMs)}: this caption was removed or retimed after the fix.`
          : `${title(change.trackId)} at ${clock(change.startMs)}: now reads ${quoteText(now)}, not ${quoteText(change.afterText)}.`;
    }
    const n = conflicts.length;
    return new Conflict(
      'undo_conflict',
      `Nothing was undone: ${n} caption${n === 1 ? ' was' : 's were'} edited after this fix was accepted (${where.join('; ')}), and undoing would overwrite ${n === 1 ? 'that edit' : 'those edits'}. Correct ${n === 1 ? 'it' : 'them'} by hand in the caption editor instead.`,
      fields,
    );
  }

  /** E-mails the proposer of a viewer fix; a failed send is logged and the decision stands. */
  private async tellProposer(fix: SpellingFix, subject: string, lines: string[], cultivar: Cultivar): Promise<void> {
    if (!fix.proposerId) return;
    const proposer = await this.ds.getRepository(User).findOneBy({ id: fix.proposerId });
    if (!proposer || proposer.disabledAt) return;
    const { text, html } = linkMessage({
      greeting: `Hello ${proposer.displayName},`,
      lines,
      linkLabel: `See ${cultivar.acceptedName}`,
      url: `${this.deps.publicUrl}/cultivars/${encodeURIComponent(cultivar.slug)}`,
      footer: 'You receive this because you proposed a spelling fix on Grovewalk.',
    });
    try {
      await this.deps.mailer.send({ to: proposer.email, subject, text, html });
    } catch (err) {
      this.deps.log?.(`mail to ${proposer.email} failed`, err);
    }
  }
}

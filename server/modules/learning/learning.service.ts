import { createHmac, timingSafeEqual } from 'node:crypto';
import { In, type DataSource } from 'typeorm';
import { compareRecords } from '../../../shared/finder/compare';
import { nearestLookalikes } from '../../../shared/finder/lookalike';
import { nextQuestion } from '../../../shared/finder/next-question';
import { scoreCandidates, type FinderRecord } from '../../../shared/finder/score';
import { fitsZone, isUsdaZone } from '../../../shared/hardiness';
import type { FinderRequest, PairNoteInput } from '../../../shared/schemas/learning';
import type { TraitProfile } from '../../../shared/traits';
import { Cultivar } from '../../db/entities/cultivar.entity';
import { LearnAttempt } from '../../db/entities/learn-attempt.entity';
import { PairNote } from '../../db/entities/pair-note.entity';
import { Stop } from '../../db/entities/stop.entity';
import { Tour } from '../../db/entities/tour.entity';
import type { User } from '../../db/entities/user.entity';
import { BadRequest, NotFound } from '../../errors/http-error';
import { presentCultivarSummary } from '../cultivars/cultivar.presenter';
import { cultivarByIdOrSlug } from '../cultivars/cultivar.service';
import { posterUrl, topRenditionUrl } from '../tours/tour.presenter';
import { sanitizeRichText } from '../tours/sanitize';
import { publishedMoments } from '../watch/published-moments';

/** A published tour moment that shows a record. */
export interface Moment {
  tourId: number;
  tourTitle: string;
  stopId: number;
  startMs: number;
  endMs: number;
  posterUrl: string | null;
  videoUrl: string | null;
}

const MOMENTS_PER_RECORD = 3;
/**
 * A look-alike must be compared on at least this many traits: two sparse records that agree on
 * the one or two traits they both give are not look-alikes, just under-described (product rule).
 */
export const LOOKALIKE_MIN_SHARED = 4;
const LEARN_TOKEN_TTL_MS = 2 * 3600_000;

/** The tree finder, look-alikes, side by side, pair notes and learn mode. */
export class LearningService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly secret: string,
  ) {}

  private async approved(): Promise<Cultivar[]> {
    return this.dataSource.getRepository(Cultivar).find({ where: { status: 'approved' }, order: { acceptedName: 'ASC' } });
  }

  private static finderRecord(c: Cultivar): FinderRecord {
    return { id: String(c.id), traits: (c.traits ?? {}) as TraitProfile };
  }

  /** Published moments for many records in one query, newest tour first, each tour's stops by time. */
  async momentsFor(cultivarIds: number[], perRecord = MOMENTS_PER_RECORD): Promise<Map<number, Moment[]>> {
    const map = new Map<number, Moment[]>();
    const { moments } = await publishedMoments(this.dataSource, cultivarIds, { order: 'newest' });
    for (const s of moments) {
      const list = map.get(s.cultivarId!) ?? [];
      if (list.length >= perRecord) continue;
      const t = s.tour;
      list.push({ tourId: t.id, tourTitle: t.title, stopId: s.id, startMs: s.startMs, endMs: s.endMs, posterUrl: posterUrl(t), videoUrl: topRenditionUrl(t) });
      map.set(s.cultivarId!, list);
    }
    return map;
  }

  /** Ranked candidates with why they match, their tour moments and zone fit, plus the next best questions. */
  async find(req: FinderRequest, viewer: User | undefined) {
    const records = await this.approved();
    const usable = records.filter((r) => r.traits && Object.keys(r.traits).length > 0);
    const finderRecords = usable.map(LearningService.finderRecord);
    const scored = scoreCandidates(finderRecords, req.answers);
    const top = scored.slice(0, req.limit);
    const byId = new Map(usable.map((r) => [String(r.id), r]));
    const moments = await this.momentsFor(top.map((c) => Number(c.id)));
    const zone = viewer?.hardinessZone ?? req.zone ?? null;
    const next = nextQuestion(finderRecords, req.answers, { season: req.season });
    return {
      total: finderRecords.length,
      zone,
      candidates: top.map((c) => {
        const rec = byId.get(c.id)!;
        return {
          cultivar: presentCultivarSummary(rec),
          traits: rec.traits,
          score: c.score,
          weight: c.weight,
          matched: c.matched,
          partial: c.partial,
          conflicted: c.conflicted,
          unknown: c.unknown,
          fit: zone && isUsdaZone(zone) ? fitsZone(rec.traits?.hardiness ?? null, zone, { container: req.container }) : null,
          moments: moments.get(rec.id) ?? [],
        };
      }),
      next,
    };
  }

  private async approvedByIdOrSlug(idOrSlug: string): Promise<Cultivar> {
    const c = await this.dataSource.getRepository(Cultivar).findOneBy(cultivarByIdOrSlug(idOrSlug));
    if (!c || c.status !== 'approved') throw new NotFound('No such cultivar record.');
    return c;
  }

  /** The most similar records by trait distance (same pure function the finder uses). */
  async lookalikes(idOrSlug: string, k = 5) {
    const record = await this.approvedByIdOrSlug(idOrSlug);
    const others = (await this.approved()).filter((c) => c.id !== record.id && c.traits);
    if (!record.traits || Object.keys(record.traits).length === 0) return { cultivar: presentCultivarSummary(record), items: [] };
    const near = nearestLookalikes(LearningService.finderRecord(record), others.map(LearningService.finderRecord), k, { minShared: LOOKALIKE_MIN_SHARED });
    const byId = new Map(others.map((c) => [String(c.id), c]));
    return {
      cultivar: presentCultivarSummary(record),
      items: near.map((n) => ({ cultivar: presentCultivarSummary(byId.get(n.id)!), distance: n.distance, shared: n.shared })),
    };
  }

  /** Two or three records side by side: differences first, a clip each, and the pair notes. */
  async compare(ids: number[]) {
    const found = await this.dataSource.getRepository(Cultivar).findBy({ id: In(ids), status: 'approved' });
    if (found.length !== ids.length) throw new NotFound('One of those cultivar records does not exist (or is not approved).');
    const records = ids.map((id) => found.find((c) => c.id === id)!);
    const comparison = compareRecords(records.map(LearningService.finderRecord));
    const moments = await this.momentsFor(ids, 1);
    const notes = await this.notesAmong(ids);
    return {
      records: records.map((c) => ({ cultivar: presentCultivarSummary(c), traits: c.traits, clip: moments.get(c.id)?.[0] ?? null })),
      comparison,
      notes,
    };
  }

  private async notesAmong(ids: number[]) {
    const rows = await this.dataSource.getRepository(PairNote).findBy({ cultivarAId: In(ids), cultivarBId: In(ids) });
    return rows.map((n) => ({ aId: n.cultivarAId, bId: n.cultivarBId, notesHtml: n.notesHtml, updatedAt: n.updatedAt.toISOString() }));
  }

  /** Writes the "how to tell them apart" note of a pair (stored lower id first). */
  async savePairNote(user: User, input: PairNoteInput) {
    const [a, b] = input.aId < input.bId ? [input.aId, input.bId] : [input.bId, input.aId];
    const count = await this.dataSource.getRepository(Cultivar).countBy({ id: In([a, b]) });
    if (count !== 2) throw new NotFound('One of those cultivar records does not exist.');
    const notesHtml = sanitizeRichText(input.notesHtml);
    const repo = this.dataSource.getRepository(PairNote);
    await repo.upsert({ cultivarAId: a, cultivarBId: b, notesHtml, updatedById: user.id }, ['cultivarAId', 'cultivarBId']);
    const row = await repo.findOneByOrFail({ cultivarAId: a, cultivarBId: b });
    return { aId: a, bId: b, notesHtml: row.notesHtml, updatedAt: row.updatedAt.toISOString() };
  }

  private sign(payload: string): string {
    return createHmac('sha256', this.secret).update(`learn:${payload}`).digest('base64url');
  }

  /**
   * A self-test question: a stop of a published tour, linked to a record, plus three look-alikes
   * as wrong answers. The answer travels in a signed token, so nothing is stored until answered.
   */
  async question(random: () => number = Math.random) {
    const stops = await this.dataSource
      .getRepository(Stop)
      .createQueryBuilder('s')
      .innerJoinAndSelect('s.tour', 't')
      .innerJoinAndSelect('s.cultivar', 'c')
      .where("t.state = 'published'")
      .andWhere("c.status = 'approved'")
      .getMany();
    const records = (await this.approved()).filter((c) => c.traits);
    if (!stops.length || records.length < 4) {
      throw new BadRequest('learn_not_ready', 'Learn mode needs published tours with at least four identified trees. Check back when more tours are published.');
    }
    const stop = stops[Math.floor(random() * stops.length)];
    const answer = stop.cultivar!;
    const near = nearestLookalikes(
      LearningService.finderRecord(answer),
      records.filter((r) => r.id !== answer.id).map(LearningService.finderRecord),
      3,
    ).map((n) => Number(n.id));
    const wrong = near.length >= 3 ? near : records.filter((r) => r.id !== answer.id).slice(0, 3).map((r) => r.id);
    const optionIds = [answer.id, ...wrong];
    for (let i = optionIds.length - 1; i > 0; i--) {
      const j = Math.floor(random() * (i + 1));
      [optionIds[i], optionIds[j]] = [optionIds[j], optionIds[i]];
    }
    const byId = new Map(records.map((r) => [r.id, r]));
    const payload = `${stop.id}.${answer.id}.${optionIds.join('-')}.${Date.now()}`;
    const t = stop.tour as Tour;
    return {
      token: `${Buffer.from(payload).toString('base64url')}.${this.sign(payload)}`,
      clip: { tourId: t.id, startMs: stop.startMs, endMs: stop.endMs, videoUrl: topRenditionUrl(t), posterUrl: posterUrl(t) },
      options: optionIds.map((id) => presentCultivarSummary(byId.get(id) ?? answer)),
    };
  }

  /** Checks an answer; signed-in learners get it recorded for their progress. */
  async answer(token: string, chosenId: number, viewer: User | undefined) {
    const [encoded, sig] = token.split('.');
    const payload = Buffer.from(encoded ?? '', 'base64url').toString();
    const expected = this.sign(payload);
    if (!sig || sig.length !== expected.length || !timingSafeEqual(Buffer.from(sig), Buffer.from(expected))) {
      throw new BadRequest('learn_token_invalid', 'That question is not valid any more. Take a new one.');
    }
    const [stopId, answerId, options, issued] = payload.split('.');
    if (Date.now() - Number(issued) > LEARN_TOKEN_TTL_MS) throw new BadRequest('learn_token_expired', 'That question has expired. Take a new one.');
    const optionIds = options.split('-').map(Number);
    if (!optionIds.includes(chosenId)) throw new BadRequest('learn_choice_invalid', 'Pick one of the four names offered.', { chosenId: 'Not one of the options.' });
    const correct = chosenId === Number(answerId);
    if (viewer) {
      await this.dataSource.getRepository(LearnAttempt).insert({ userId: viewer.id, stopId: Number(stopId), cultivarId: Number(answerId), chosenId, correct });
    }
    const answer = await this.dataSource.getRepository(Cultivar).findOneBy({ id: Number(answerId) });
    return { correct, answer: answer ? presentCultivarSummary(answer) : null, recorded: !!viewer };
  }

  /** A learner's scores: totals and per-day figures for the last 30 days with answers. */
  async progress(user: User) {
    const rows: { day: string; total: string; correct: string }[] = await this.dataSource.query(
      `SELECT DATE_FORMAT(created_at, '%Y-%m-%d') AS day, COUNT(*) AS total, SUM(correct) AS correct
         FROM learn_attempts WHERE user_id = ? GROUP BY day ORDER BY day DESC LIMIT 30`,
      [user.id],
    );
    const days = rows.map((r) => ({ day: r.day, total: Number(r.total), correct: Number(r.correct) })).reverse();
    const total = days.reduce((s, d) => s + d.total, 0);
    const correct = days.reduce((s, d) => s + d.correct, 0);
    return { total, correct, days };
  }
}

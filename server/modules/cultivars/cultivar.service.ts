import { Brackets, In, QueryFailedError, type DataSource, type EntityManager } from 'typeorm';
import { hasRole } from '../../../shared/schemas/common';
import { formatAcceptedName, validateNameParts } from '../../../shared/names/cultivar-name';
import type { NameRecord } from '../../../shared/names/matcher';
import { normalizeName } from '../../../shared/names/normalize';
import type { CultivarIndexQuery, CultivarInput, UpdateCultivarInput } from '../../../shared/schemas/cultivars';
import { Cultivar } from '../../db/entities/cultivar.entity';
import { CultivarPhoto } from '../../db/entities/cultivar-photo.entity';
import { CultivarVariant } from '../../db/entities/cultivar-variant.entity';
import { SpellingFix } from '../../db/entities/spelling-fix.entity';
import { Stop } from '../../db/entities/stop.entity';
import { escapeLike, likeContains } from '../../db/like';
import type { User } from '../../db/entities/user.entity';
import { BadRequest, Conflict, NotFound } from '../../errors/http-error';
import { sanitizeRichText } from '../tours/sanitize';
import { publishedMoments } from '../watch/published-moments';
import { namePartsOf, type CultivarFullParts } from './cultivar.presenter';
import { SpokenNames } from './spoken-names';
import { firstFreeSlug, slugify } from './slug';

/** The name fields of a record as stored (trimmed; empty optional parts become null). */
type NameFields = Pick<Cultivar, 'genus' | 'species' | 'infraspecificRank' | 'infraspecificEpithet' | 'groupName' | 'epithet'>;

function orNull(v: string | null | undefined): string | null {
  const t = v?.trim().replace(/\s+/g, ' ');
  return t ? t : null;
}

/** The lookup for a record named in a URL: by id when it is all digits, else by slug (any case). */
export function cultivarByIdOrSlug(idOrSlug: string): { id: number } | { slug: string } {
  return /^\d+$/.test(idOrSlug) ? { id: Number(idOrSlug) } : { slug: idOrSlug.toLowerCase() };
}

/** Proposals are seen by their proposer and moderators; approved and retired records by everyone. */
export function canSeeCultivar(c: Cultivar, viewer: User | undefined): boolean {
  return c.status !== 'proposed' || hasRole(viewer?.role, 'moderator') || (viewer !== undefined && c.createdById === viewer.id);
}

const NAME_FIELD_OF: Record<string, string> = { group: 'groupName' };

function isDuplicateKey(err: unknown): boolean {
  return err instanceof QueryFailedError && (err as QueryFailedError & { code?: string }).code === 'ER_DUP_ENTRY';
}

/**
 * Cultivar records, minimal: search, read, propose (authors) or add (moderators), edit and approve
 * (moderators). Names are checked with the shared ICNCP writing rules before anything is stored.
 */
export class CultivarService {
  /** Where each approved record is heard in published tours (cached; see SpokenNames). */
  readonly spoken: SpokenNames;

  constructor(private readonly dataSource: DataSource) {
    this.spoken = new SpokenNames(dataSource, async () => (await this.approvedNameRecords()).records);
  }

  private repo(m: EntityManager = this.dataSource.manager) {
    return m.getRepository(Cultivar);
  }

  /**
   * A page of the cultivar index: search, filters (Group, genus, leaf form, habit, container) and
   * sorting by name or last change. Others' proposals and retired records are listed only to
   * moderators; authors asking for them see their own.
   */
  async list(q: CultivarIndexQuery, viewer: User | undefined): Promise<{ items: Cultivar[]; total: number; page: number; pageSize: number }> {
    const qb = this.repo().createQueryBuilder('c').where('c.mergedIntoId IS NULL');
    if (q.status !== 'any') qb.andWhere('c.status = :status', { status: q.status });
    if (q.status !== 'approved' && !hasRole(viewer?.role, 'moderator')) {
      qb.andWhere(new Brackets((w) => w.where("c.status = 'approved'").orWhere('c.createdById = :me', { me: viewer?.id ?? 0 })));
    }
    if (q.q) {
      const pattern = likeContains(q.q);
      qb.andWhere(
        new Brackets((w) =>
          w
            .where('c.acceptedName LIKE :p', { p: pattern })
            .orWhere('c.epithet LIKE :p')
            .orWhere('EXISTS (SELECT 1 FROM cultivar_variants v WHERE v.cultivar_id = c.id AND (v.text LIKE :p OR v.normalized LIKE :p))'),
        ),
      );
    }
    if (q.genus) qb.andWhere('c.genus = :genus', { genus: q.genus });
    if (q.group) {
      const group = q.group.replace(/^\(|\)$/g, '').trim();
      // The column's collation ignores case: "dissectum" finds "Dissectum Group".
      qb.andWhere('(c.groupName = :group OR c.groupName = :groupFull)', { group, groupFull: /\sgroup$/i.test(group) ? group : `${group} Group` });
    }
    if (q.leafForm) qb.andWhere("JSON_UNQUOTE(JSON_EXTRACT(c.traits, '$.leafForm')) = :leafForm", { leafForm: q.leafForm });
    if (q.habit) qb.andWhere("JSON_CONTAINS(c.traits, JSON_QUOTE(:habit), '$.habit') = 1", { habit: q.habit });
    if (q.container) qb.andWhere("JSON_UNQUOTE(JSON_EXTRACT(c.traits, '$.containerSuitability')) = :container", { container: q.container });
    if (q.sort === 'updated') {
      qb.orderBy('c.updatedAt', q.dir === 'asc' ? 'ASC' : 'DESC').addOrderBy('c.id', q.dir === 'asc' ? 'ASC' : 'DESC');
    } else {
      qb.orderBy('c.acceptedName', q.dir === 'desc' ? 'DESC' : 'ASC').addOrderBy('c.id', q.dir === 'desc' ? 'DESC' : 'ASC');
    }
    qb.skip((q.page - 1) * q.pageSize).take(q.pageSize);
    const [items, total] = await qb.getManyAndCount();
    return { items, total, page: q.page, pageSize: q.pageSize };
  }

  /** See `canSeeCultivar`. */
  canSee(c: Cultivar, viewer: User | undefined): boolean {
    return canSeeCultivar(c, viewer);
  }

  /** One record by id or slug, with its variants; a proposal only for its proposer and moderators. */
  async get(idOrSlug: string, viewer: User | undefined): Promise<{ cultivar: Cultivar; variants: CultivarVariant[] }> {
    const cultivar = await this.repo().findOneBy(cultivarByIdOrSlug(idOrSlug));
    if (!cultivar || !this.canSee(cultivar, viewer)) throw new NotFound('No such cultivar record.');
    const variants = await this.dataSource.getRepository(CultivarVariant).find({ where: { cultivarId: cultivar.id }, order: { text: 'ASC' } });
    return { cultivar, variants };
  }

  /**
   * One record in full for its page and the tree card: variants, photos the viewer may see, where
   * published tours say the name, their stops that show it, and the record it was merged into.
   */
  async full(idOrSlug: string, viewer: User | undefined): Promise<CultivarFullParts> {
    const { cultivar, variants } = await this.get(idOrSlug, viewer);
    const [photos, mergedInto, spoken, stops] = await Promise.all([
      this.photosOf(cultivar, viewer),
      this.mergedTarget(cultivar),
      cultivar.status === 'approved' && !cultivar.mergedIntoId ? this.spoken.of(cultivar.id) : Promise.resolve({ moments: [], cues: 0 }),
      publishedMoments(this.dataSource, [cultivar.id], { order: 'newest' }),
    ]);
    return { cultivar, variants, photos, mergedInto, spokenAt: spoken.moments, stops: stops.moments };
  }

  /** Checks the name with the shared rules; 400 with one message per field when it breaks them. */
  private checkName(fields: NameFields): string {
    const problems = validateNameParts(namePartsOf(fields));
    if (problems.length) {
      const byField: Record<string, string> = {};
      for (const p of problems) {
        const key = NAME_FIELD_OF[p.field] ?? p.field;
        byField[key] = byField[key] ? `${byField[key]} ${p.message}` : p.message;
      }
      throw new BadRequest('invalid_name', 'The name does not follow the writing rules for cultivated plant names; see the notes by each field.', byField);
    }
    return formatAcceptedName(namePartsOf(fields));
  }

  private async refuseDuplicate(m: EntityManager, acceptedName: string, exceptId?: number): Promise<void> {
    // The column's collation compares without regard to case, so "acer 'x'" and "Acer 'X'" clash.
    const qb = this.repo(m).createQueryBuilder('c').where('c.acceptedName = :n', { n: acceptedName });
    if (exceptId) qb.andWhere('c.id <> :id', { id: exceptId });
    const other = await qb.getOne();
    if (other) {
      throw new Conflict('cultivar_exists', `A cultivar record named ${other.acceptedName} already exists${other.status === 'proposed' ? ' (still waiting for approval)' : other.status === 'retired' ? ' (retired)' : ''}. Open it instead of adding another.`, {
        epithet: 'A record with this name exists.',
      });
    }
  }

  private async freeSlug(m: EntityManager, acceptedName: string): Promise<string> {
    const base = slugify(acceptedName);
    const rows: { slug: string }[] = await this.repo(m)
      .createQueryBuilder('c')
      .select('c.slug', 'slug')
      .where('c.slug = :base OR c.slug LIKE :like', { base, like: `${escapeLike(base)}-%` })
      .getRawMany();
    return firstFreeSlug(base, new Set(rows.map((r) => r.slug)));
  }

  private nameFields(input: Partial<CultivarInput>, current?: NameFields): NameFields {
    const pick = <K extends keyof NameFields>(k: K, v: string | null | undefined) => (v === undefined ? (current?.[k] ?? null) : orNull(v));
    return {
      genus: orNull(input.genus) ?? current?.genus ?? '',
      species: pick('species', input.species),
      infraspecificRank: pick('infraspecificRank', input.infraspecificRank),
      infraspecificEpithet: pick('infraspecificEpithet', input.infraspecificEpithet),
      groupName: pick('groupName', input.groupName),
      epithet: orNull(input.epithet) ?? current?.epithet ?? '',
    };
  }

  /**
   * Adds a record: approved at once when a moderator or admin adds it, otherwise a proposal a
   * moderator approves. The slug comes from the accepted name, with -2, -3… on a clash.
   */
  async create(user: User, input: CultivarInput): Promise<Cultivar> {
    const fields = this.nameFields(input);
    const acceptedName = this.checkName(fields);
    for (let attempt = 0; ; attempt++) {
      try {
        return await this.dataSource.transaction(async (m) => {
          await this.refuseDuplicate(m, acceptedName);
          const repo = this.repo(m);
          const saved = await repo.save(
            repo.create({
              ...fields,
              acceptedName,
              slug: await this.freeSlug(m, acceptedName),
              status: hasRole(user.role, 'moderator') ? 'approved' : 'proposed',
              traits: input.traits ?? null,
              notesHtml: sanitizeRichText(input.notesHtml ?? ''),
              pronunciation: orNull(input.pronunciation),
              meaning: orNull(input.meaning),
              fictional: input.fictional ?? false,
              createdById: user.id,
            }),
          );
          return repo.findOneByOrFail({ id: saved.id });
        });
      } catch (err) {
        // Two records given the same slug at once: the unique index refused one; pick again.
        if (isDuplicateKey(err) && attempt < 3) continue;
        throw err;
      }
    }
  }

  /** A moderator's edit; the slug stays as it was so links keep working after a rename. */
  async update(id: number, input: UpdateCultivarInput): Promise<Cultivar> {
    return this.dataSource.transaction(async (m) => {
      const repo = this.repo(m);
      const cultivar = await repo.findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
      if (!cultivar) throw new NotFound('No such cultivar record.');
      const fields = this.nameFields(input, cultivar);
      const acceptedName = this.checkName(fields);
      if (acceptedName !== cultivar.acceptedName) await this.refuseDuplicate(m, acceptedName, cultivar.id);
      Object.assign(cultivar, fields, { acceptedName });
      if (input.traits !== undefined) cultivar.traits = input.traits;
      if (input.notesHtml !== undefined) cultivar.notesHtml = sanitizeRichText(input.notesHtml);
      if (input.pronunciation !== undefined) cultivar.pronunciation = orNull(input.pronunciation);
      if (input.meaning !== undefined) cultivar.meaning = orNull(input.meaning);
      if (input.fictional !== undefined) cultivar.fictional = input.fictional;
      if (input.status !== undefined) cultivar.status = input.status;
      // Given explicitly: TypeORM's own value is CURRENT_TIMESTAMP, whole seconds on MariaDB, which
      // would sort edits made within one second in the wrong order.
      cultivar.updatedAt = new Date();
      await repo.save(cultivar);
      return repo.findOneByOrFail({ id });
    });
  }

  /** Makes a proposal (or a retired record) an approved one that stops can link to. */
  async approve(id: number): Promise<Cultivar> {
    const repo = this.repo();
    const cultivar = await repo.findOneBy({ id });
    if (!cultivar) throw new NotFound('No such cultivar record.');
    if (cultivar.mergedIntoId) throw new Conflict('cultivar_merged', 'This record was merged into another one; approve that one instead.');
    if (cultivar.status !== 'approved') await repo.update({ id }, { status: 'approved', updatedAt: new Date() });
    return repo.findOneByOrFail({ id });
  }

  /** Takes a record out of use (stops keep their link); approving it again reinstates it. */
  async retire(id: number): Promise<Cultivar> {
    const repo = this.repo();
    const cultivar = await repo.findOneBy({ id });
    if (!cultivar) throw new NotFound('No such cultivar record.');
    if (cultivar.status !== 'retired') await repo.update({ id }, { status: 'retired', updatedAt: new Date() });
    return repo.findOneByOrFail({ id });
  }

  /**
   * Merges a duplicate into the record that stays, in one transaction: its stops link to the
   * survivor, its variants move there (those the survivor already has are dropped), its epithet
   * becomes a variant of the survivor, its photos and open spelling fixes follow, and the
   * duplicate is retired with `mergedIntoId` so old links can redirect.
   */
  async merge(id: number, intoId: number): Promise<{ survivor: Cultivar; merged: Cultivar; movedStops: number; movedVariants: number }> {
    if (id === intoId) throw new BadRequest('merge_self', 'A record cannot be merged into itself.', { intoId: 'Choose another record.' });
    return this.dataSource.transaction(async (m) => {
      const repo = this.repo(m);
      // Both rows locked in id order, so two merges of the same pair take turns instead of deadlocking.
      const locked = await repo.find({ where: { id: In([id, intoId]) }, order: { id: 'ASC' }, lock: { mode: 'pessimistic_write' } });
      const merged = locked.find((c) => c.id === id);
      const survivor = locked.find((c) => c.id === intoId);
      if (!merged) throw new NotFound('No such cultivar record.');
      if (!survivor) throw new BadRequest('merge_target_missing', 'The record to merge into does not exist.', { intoId: 'Choose an existing record.' });
      if (merged.mergedIntoId) throw new Conflict('cultivar_merged', 'This record was already merged into another one.');
      if (survivor.mergedIntoId || survivor.status === 'retired') {
        throw new Conflict('merge_target_retired', `${survivor.acceptedName} is retired; merge into a record in use.`, { intoId: 'Choose a record in use.' });
      }
      if (survivor.status !== 'approved') {
        // Stops may only link to approved records, so the survivor must be one.
        throw new Conflict('merge_target_proposed', `${survivor.acceptedName} is still a proposal; approve it first, then merge.`, { intoId: 'Approve this record first.' });
      }

      const moved = await m.getRepository(Stop).update({ cultivarId: merged.id }, { cultivarId: survivor.id });

      const vrepo = m.getRepository(CultivarVariant);
      const survivorVariants = await vrepo.find({ where: { cultivarId: survivor.id }, lock: { mode: 'pessimistic_write' } });
      const taken = new Set([normalizeName(survivor.epithet), ...survivorVariants.map((v) => v.normalized)]);
      let movedVariants = 0;
      for (const v of await vrepo.find({ where: { cultivarId: merged.id }, order: { id: 'ASC' }, lock: { mode: 'pessimistic_write' } })) {
        const key = normalizeName(v.text);
        if (taken.has(key)) {
          await vrepo.delete({ id: v.id });
        } else {
          await vrepo.update({ id: v.id }, { cultivarId: survivor.id, normalized: key });
          taken.add(key);
          movedVariants++;
        }
      }
      const epithetKey = normalizeName(merged.epithet);
      if (!taken.has(epithetKey)) {
        await vrepo.insert({ cultivarId: survivor.id, text: merged.epithet, normalized: epithetKey });
        movedVariants++;
      }

      const photos = m.getRepository(CultivarPhoto);
      const last: { max: number | null } | undefined = await photos.createQueryBuilder('p').select('MAX(p.position)', 'max').where('p.cultivarId = :id', { id: survivor.id }).getRawOne();
      const start = last?.max == null ? 0 : Number(last.max) + 1;
      for (const [i, p] of (await photos.find({ where: { cultivarId: merged.id }, order: { position: 'ASC', id: 'ASC' } })).entries()) {
        await photos.update({ id: p.id }, { cultivarId: survivor.id, position: start + i });
      }

      // Open fixes follow the record unless the survivor already has the same one open.
      const fixes = m.getRepository(SpellingFix);
      for (const fix of await fixes.find({ where: { cultivarId: merged.id, status: 'open' }, lock: { mode: 'pessimistic_write' } })) {
        const twin = await fixes.findOneBy({ cultivarId: survivor.id, proposedNormalized: fix.proposedNormalized, status: 'open' });
        if (twin) {
          await fixes.update({ id: fix.id }, { status: 'declined', openGuard: null, declineReason: `Merged into ${survivor.acceptedName}, which has the same fix open.`, decidedAt: new Date() });
        } else {
          await fixes.update({ id: fix.id }, { cultivarId: survivor.id, suggestion: survivor.epithet });
        }
      }

      await repo.update({ id: merged.id }, { status: 'retired', mergedIntoId: survivor.id, updatedAt: new Date() });
      // Touch the survivor so caches keyed on records (spoken names, glossary) see the change.
      await repo.update({ id: survivor.id }, { updatedAt: new Date() });
      return {
        survivor: await repo.findOneByOrFail({ id: survivor.id }),
        merged: await repo.findOneByOrFail({ id: merged.id }),
        movedStops: moved.affected ?? 0,
        movedVariants,
      };
    });
  }

  /**
   * Records a misspelling or mishearing for a record, so the matcher finds it and search maps it
   * to the accepted name. Refused when it is the record's own epithet, already recorded, or the
   * accepted epithet of another record (a variant must not hide a real name).
   */
  async addVariant(id: number, text: string): Promise<CultivarVariant> {
    const clean = text.trim().replace(/\s+/g, ' ');
    const key = normalizeName(clean);
    if (!key) throw new BadRequest('variant_empty', 'Enter letters or digits.', { text: 'Enter the misspelling or mishearing.' });
    return this.dataSource.transaction(async (m) => {
      const cultivar = await this.repo(m).findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
      if (!cultivar) throw new NotFound('No such cultivar record.');
      if (normalizeName(cultivar.epithet) === key) {
        throw new BadRequest('variant_is_epithet', `"${clean}" is the accepted epithet itself (letter case, spaces and hyphens aside).`, { text: 'This is the accepted epithet.' });
      }
      const vrepo = m.getRepository(CultivarVariant);
      const existing = await vrepo.findOneBy({ cultivarId: id, normalized: key });
      if (existing) throw new Conflict('variant_exists', `"${existing.text}" is already recorded for this record.`, { text: 'Already recorded.' });
      const other = await this.repo(m)
        .createQueryBuilder('c')
        .where('c.id <> :id', { id })
        .andWhere('c.mergedIntoId IS NULL')
        .andWhere("c.status <> 'retired'")
        .getMany()
        .then((all) => all.find((c) => normalizeName(c.epithet) === key));
      if (other) {
        throw new Conflict('variant_is_other_name', `"${clean}" is the accepted epithet of ${other.acceptedName}; it cannot also be a misspelling of this record.`, {
          text: 'Another record has this name.',
        });
      }
      const saved = await vrepo.save(vrepo.create({ cultivarId: id, text: clean, normalized: key }));
      await this.repo(m).update({ id }, { updatedAt: new Date() });
      return saved;
    });
  }

  /** Forgets a recorded variant. */
  async removeVariant(id: number, variantId: number): Promise<void> {
    const result = await this.dataSource.getRepository(CultivarVariant).delete({ id: variantId, cultivarId: id });
    if (!result.affected) throw new NotFound('No such variant of this record.');
    await this.repo().update({ id }, { updatedAt: new Date() });
  }

  /** The record a merged one now lives on, for redirects. */
  async mergedTarget(c: Cultivar): Promise<Cultivar | null> {
    return c.mergedIntoId ? this.repo().findOneBy({ id: c.mergedIntoId }) : null;
  }

  /** Photos in their order; only when the viewer may see them (see `canSeePhotos`). */
  async photosOf(c: Cultivar, viewer: User | undefined): Promise<CultivarPhoto[]> {
    if (!this.canSeePhotos(c, viewer)) return [];
    return this.dataSource.getRepository(CultivarPhoto).find({ where: { cultivarId: c.id }, order: { position: 'ASC', id: 'ASC' } });
  }

  /** Photos are public once the record is approved; before that (or once retired) only for its proposer and moderators. */
  canSeePhotos(c: Cultivar, viewer: User | undefined): boolean {
    return c.status === 'approved' || hasRole(viewer?.role, 'moderator') || (viewer !== undefined && c.createdById === viewer.id);
  }

  /** An approved record a stop may link to, or null. */
  approvedById(id: number, m: EntityManager = this.dataSource.manager): Promise<Cultivar | null> {
    return this.repo(m).findOneBy({ id, status: 'approved' });
  }

  /** Approved records as the name matcher takes them: id, accepted epithet and recorded variants. */
  async approvedNameRecords(): Promise<{ records: NameRecord[]; byId: Map<number, Cultivar> }> {
    const cultivars = await this.repo().createQueryBuilder('c').where("c.status = 'approved'").andWhere('c.mergedIntoId IS NULL').getMany();
    const byId = new Map(cultivars.map((c) => [c.id, c]));
    const variants = cultivars.length
      ? await this.dataSource
          .getRepository(CultivarVariant)
          .createQueryBuilder('v')
          .where('v.cultivarId IN (:...ids)', { ids: cultivars.map((c) => c.id) })
          .getMany()
      : [];
    const byCultivar = new Map<number, string[]>();
    for (const v of variants) byCultivar.set(v.cultivarId, [...(byCultivar.get(v.cultivarId) ?? []), v.text]);
    return { records: cultivars.map((c) => ({ id: c.id, acceptedEpithet: c.epithet, variants: byCultivar.get(c.id) ?? [] })), byId };
  }
}

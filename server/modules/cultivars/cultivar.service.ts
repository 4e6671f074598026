import { Brackets, QueryFailedError, type DataSource, type EntityManager } from 'typeorm';
import { hasRole } from '../../../shared/schemas/common';
import { formatAcceptedName, validateNameParts } from '../../../shared/names/cultivar-name';
import type { NameRecord } from '../../../shared/names/matcher';
import type { CultivarInput, ListCultivarsQuery, UpdateCultivarInput } from '../../../shared/schemas/cultivars';
import { Cultivar } from '../../db/entities/cultivar.entity';
import { CultivarVariant } from '../../db/entities/cultivar-variant.entity';
import type { User } from '../../db/entities/user.entity';
import { BadRequest, Conflict, NotFound } from '../../errors/http-error';
import { sanitizeRichText } from '../tours/sanitize';
import { namePartsOf } from './cultivar.presenter';
import { firstFreeSlug, slugify } from './slug';

/** The name fields of a record as stored (trimmed; empty optional parts become null). */
type NameFields = Pick<Cultivar, 'genus' | 'species' | 'infraspecificRank' | 'infraspecificEpithet' | 'groupName' | 'epithet'>;

function orNull(v: string | null | undefined): string | null {
  const t = v?.trim().replace(/\s+/g, ' ');
  return t ? t : null;
}

/** Escapes LIKE wildcards so a search for "50%" or "a_b" means those characters. */
export function likePattern(q: string): string {
  return `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
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
  constructor(private readonly dataSource: DataSource) {}

  private repo(m: EntityManager = this.dataSource.manager) {
    return m.getRepository(Cultivar);
  }

  /**
   * A page of records by accepted name. Others' proposals and retired records are listed only to
   * moderators; authors asking for them see their own.
   */
  async list(q: ListCultivarsQuery, viewer: User | undefined): Promise<{ items: Cultivar[]; total: number; page: number; pageSize: number }> {
    const qb = this.repo().createQueryBuilder('c').where('c.mergedIntoId IS NULL');
    if (q.status !== 'any') qb.andWhere('c.status = :status', { status: q.status });
    if (q.status !== 'approved' && !hasRole(viewer?.role, 'moderator')) {
      qb.andWhere(new Brackets((w) => w.where("c.status = 'approved'").orWhere('c.createdById = :me', { me: viewer?.id ?? 0 })));
    }
    if (q.q) {
      const pattern = likePattern(q.q);
      qb.andWhere(
        new Brackets((w) =>
          w
            .where('c.acceptedName LIKE :p', { p: pattern })
            .orWhere('c.epithet LIKE :p')
            .orWhere('EXISTS (SELECT 1 FROM cultivar_variants v WHERE v.cultivar_id = c.id AND (v.text LIKE :p OR v.normalized LIKE :p))'),
        ),
      );
    }
    qb.orderBy('c.acceptedName', 'ASC').addOrderBy('c.id', 'ASC').skip((q.page - 1) * q.pageSize).take(q.pageSize);
    const [items, total] = await qb.getManyAndCount();
    return { items, total, page: q.page, pageSize: q.pageSize };
  }

  private canSee(c: Cultivar, viewer: User | undefined): boolean {
    return c.status !== 'proposed' || hasRole(viewer?.role, 'moderator') || (viewer !== undefined && c.createdById === viewer.id);
  }

  /** One record by id or slug, with its variants; a proposal only for its proposer and moderators. */
  async get(idOrSlug: string, viewer: User | undefined): Promise<{ cultivar: Cultivar; variants: CultivarVariant[] }> {
    const where = /^\d+$/.test(idOrSlug) ? { id: Number(idOrSlug) } : { slug: idOrSlug.toLowerCase() };
    const cultivar = await this.repo().findOneBy(where);
    if (!cultivar || !this.canSee(cultivar, viewer)) throw new NotFound('No such cultivar record.');
    const variants = await this.dataSource.getRepository(CultivarVariant).find({ where: { cultivarId: cultivar.id }, order: { text: 'ASC' } });
    return { cultivar, variants };
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
      throw new Conflict('cultivar_exists', `A record named ${other.acceptedName} already exists (/${other.slug}${other.status === 'approved' ? '' : `, ${other.status}`}).`, {
        epithet: 'A record with this name exists.',
      });
    }
  }

  private async freeSlug(m: EntityManager, acceptedName: string): Promise<string> {
    const base = slugify(acceptedName);
    const rows: { slug: string }[] = await this.repo(m)
      .createQueryBuilder('c')
      .select('c.slug', 'slug')
      .where('c.slug = :base OR c.slug LIKE :like', { base, like: `${base.replace(/[\\%_]/g, (c) => `\\${c}`)}-%` })
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
    if (cultivar.status !== 'approved') await repo.update({ id }, { status: 'approved' });
    return repo.findOneByOrFail({ id });
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

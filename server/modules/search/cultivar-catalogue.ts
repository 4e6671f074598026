import type { DataSource } from 'typeorm';
import { buildNameIndex, type NameIndex } from '../../../shared/names/matcher';
import { normalizeName } from '../../../shared/names/normalize';
import { Cultivar } from '../../db/entities/cultivar.entity';
import { CultivarVariant } from '../../db/entities/cultivar-variant.entity';
import { RevisionCache } from './search-revisions';

/** One searchable record with its spellings in comparison form. */
export interface CatalogueRecord {
  cultivar: Cultivar;
  epithetFold: string;
  nameFold: string;
  variants: { text: string; fold: string }[];
}

/** Approved records, their spellings and the name matcher's index over them. */
export interface Catalogue {
  records: CatalogueRecord[];
  byId: Map<number, CatalogueRecord>;
  index: NameIndex;
}

/**
 * The approved cultivar records kept in memory for search: a few thousand records fit easily and
 * the name matcher needs them all at hand. Each search passes the catalogue revision it read (see
 * search-revisions.ts); a database trigger replaces it whenever a record or a spelling changes, so
 * an edit, an approval, a merge or a new variant shows up in the very next search, on every server
 * process.
 */
export class CultivarCatalogue {
  private readonly cache: RevisionCache<Catalogue>;

  constructor(private readonly dataSource: DataSource) {
    this.cache = new RevisionCache(() => this.load());
  }

  private async load(): Promise<Catalogue> {
    const cultivars = await this.dataSource
      .getRepository(Cultivar)
      .createQueryBuilder('c')
      .where("c.status = 'approved'")
      .andWhere('c.mergedIntoId IS NULL')
      .getMany();
    const variants = cultivars.length
      ? await this.dataSource.getRepository(CultivarVariant).createQueryBuilder('v').innerJoin(Cultivar, 'c', "c.id = v.cultivarId AND c.status = 'approved' AND c.mergedIntoId IS NULL").getMany()
      : [];
    const byCultivar = new Map<number, string[]>();
    for (const v of variants) byCultivar.set(v.cultivarId, [...(byCultivar.get(v.cultivarId) ?? []), v.text]);
    const records = cultivars.map((c) => ({
      cultivar: c,
      epithetFold: normalizeName(c.epithet),
      nameFold: normalizeName(c.acceptedName),
      variants: (byCultivar.get(c.id) ?? []).map((text) => ({ text, fold: normalizeName(text) })),
    }));
    const index = buildNameIndex(cultivars.map((c) => ({ id: c.id, acceptedEpithet: c.epithet, variants: byCultivar.get(c.id) ?? [] })));
    return { records, byId: new Map(records.map((r) => [r.cultivar.id, r])), index };
  }

  /** The catalogue as of `revision` (see `readRevisions`): kept, or rebuilt when the records changed. */
  get(revision: string): Promise<Catalogue> {
    return this.cache.get(revision);
  }
}

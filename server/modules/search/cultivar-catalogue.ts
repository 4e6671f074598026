import type { DataSource } from 'typeorm';
import { buildNameIndex, type NameIndex } from '../../../shared/names/matcher';
import { normalizeName } from '../../../shared/names/normalize';
import { Cultivar } from '../../db/entities/cultivar.entity';
import { CultivarVariant } from '../../db/entities/cultivar-variant.entity';

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
 * the name matcher needs them all at hand. Each search first asks the database for a cheap
 * fingerprint of both tables (counts and checksums of the fields search reads) and rebuilds only
 * when it moved, so an edit, an approval, a merge or a new variant shows up in the very next search,
 * on every server process.
 */
export class CultivarCatalogue {
  private current: { version: string; catalogue: Catalogue } | null = null;
  private loading: { version: string; promise: Promise<Catalogue> } | null = null;

  constructor(private readonly dataSource: DataSource) {}

  private async version(): Promise<string> {
    // A checksum over what search reads, not just the newest change: an update may write a
    // timestamp no later than another record's, and a status change must count on its own.
    const [row] = (await this.dataSource.query(
      `SELECT (SELECT CONCAT(COUNT(*), ':', COALESCE(SUM(CRC32(CONCAT_WS('|', id, status, IFNULL(merged_into_id, 0), updated_at, accepted_name, epithet, IFNULL(traits, '')))), 0)) FROM cultivars) AS c,
              (SELECT CONCAT(COUNT(*), ':', COALESCE(SUM(CRC32(CONCAT_WS('|', id, cultivar_id, text))), 0)) FROM cultivar_variants) AS v`,
    )) as { c: string; v: string }[];
    return `${row!.c}|${row!.v}`;
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

  /** The catalogue as of now: one fingerprint query, plus a reload when the records changed. */
  async get(): Promise<Catalogue> {
    const version = await this.version();
    if (this.current?.version === version) return this.current.catalogue;
    let loading = this.loading;
    if (!loading || loading.version !== version) {
      // Only the newest load may replace the catalogue, so a slow older one cannot win.
      const entry: { version: string; promise: Promise<Catalogue> } = {
        version,
        promise: this.load().then(
          (catalogue) => {
            if (this.loading === entry) {
              this.current = { version, catalogue };
              this.loading = null;
            }
            return catalogue;
          },
          (err: unknown) => {
            if (this.loading === entry) this.loading = null;
            throw err;
          },
        ),
      };
      this.loading = loading = entry;
    }
    return loading.promise;
  }
}

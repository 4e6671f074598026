import type { DataSource } from 'typeorm';
import { formatNameParts } from '../../../shared/names/cultivar-name';
import { respell } from '../../../shared/names/hepburn';
import { buildNameIndex, findNames, type MatchKind } from '../../../shared/names/matcher';
import { normalizeName } from '../../../shared/names/normalize';
import type { GlossaryEntry, GlossaryQuery, GlossaryResponse } from '../../../shared/schemas/glossary';
import { Cultivar } from '../../db/entities/cultivar.entity';
import { CultivarVariant } from '../../db/entities/cultivar-variant.entity';
import { namePartsOf } from '../cultivars/cultivar.presenter';
import type { CultivarService } from '../cultivars/cultivar.service';

/** The A–Z heading of an epithet: its first letter with accents folded, or "#" for anything else. */
export function headingLetter(epithet: string): string {
  const first = normalizeName(epithet).charAt(0).toUpperCase();
  return /^[A-Z]$/.test(first) ? first : '#';
}

type SearchKind = 'prefix' | MatchKind;
const KIND_RANK: Record<SearchKind, number> = { exact: 0, prefix: 1, variant: 2, fuzzy: 3, phonetic: 4 };

/** A looser threshold than caption matching: a searcher types a name on purpose (common practice, no source). */
const SEARCH_THRESHOLD = 0.7;

/**
 * The glossary: every approved record A–Z by epithet with its pronunciation guide, meaning,
 * variants and where published tours say it. Search combines prefixes (of the epithet, the
 * accepted name, a variant, or any word of them) with the shared name matcher, so a misspelt or
 * misheard query still finds the name.
 */
export class GlossaryService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly cultivars: CultivarService,
  ) {}

  async list(q: GlossaryQuery): Promise<GlossaryResponse> {
    const records = await this.dataSource
      .getRepository(Cultivar)
      .createQueryBuilder('c')
      .where("c.status = 'approved'")
      .andWhere('c.mergedIntoId IS NULL')
      .getMany();
    const variants = records.length
      ? await this.dataSource.getRepository(CultivarVariant).createQueryBuilder('v').where('v.cultivarId IN (:...ids)', { ids: records.map((c) => c.id) }).orderBy('v.text', 'ASC').getMany()
      : [];
    const variantsOf = new Map<number, string[]>();
    for (const v of variants) variantsOf.set(v.cultivarId, [...(variantsOf.get(v.cultivarId) ?? []), v.text]);
    const spoken = records.length ? await this.cultivars.spoken.all() : new Map();

    const sorted = [...records].sort((a, b) => normalizeName(a.epithet).localeCompare(normalizeName(b.epithet), 'en') || a.acceptedName.localeCompare(b.acceptedName, 'en') || a.id - b.id);
    const letterCounts = new Map<string, number>();
    for (const c of sorted) letterCounts.set(headingLetter(c.epithet), (letterCounts.get(headingLetter(c.epithet)) ?? 0) + 1);

    let matches: Map<number, { kind: SearchKind; score: number }> | null = null;
    if (q.q) matches = this.search(q.q, sorted, variantsOf);

    const items: GlossaryEntry[] = [];
    for (const c of sorted) {
      const letter = headingLetter(c.epithet);
      if (q.letter && letter !== q.letter) continue;
      const match = matches?.get(c.id);
      if (matches && !match) continue;
      const s = spoken.get(c.id);
      items.push({
        id: c.id,
        slug: c.slug,
        letter,
        acceptedName: c.acceptedName,
        nameSegments: formatNameParts(namePartsOf(c)),
        epithet: c.epithet,
        respelling: respell(c.epithet),
        pronunciation: c.pronunciation,
        meaning: c.meaning,
        variants: variantsOf.get(c.id) ?? [],
        fictional: c.fictional,
        spoken: { tours: s?.moments.length ?? 0, cues: s?.cues ?? 0, first: s?.moments[0] ?? null },
        ...(match ? { match } : {}),
      });
    }
    // With a search, the best matches come first; A–Z within the same kind and score.
    if (matches) {
      items.sort((a, b) => KIND_RANK[a.match!.kind] - KIND_RANK[b.match!.kind] || b.match!.score - a.match!.score);
    }
    return { letters: [...letterCounts].map(([letter, count]) => ({ letter, count })).sort((a, b) => (a.letter === '#' ? 1 : b.letter === '#' ? -1 : a.letter.localeCompare(b.letter))), items };
  }

  private search(query: string, records: readonly Cultivar[], variantsOf: ReadonlyMap<number, string[]>): Map<number, { kind: SearchKind; score: number }> {
    const out = new Map<number, { kind: SearchKind; score: number }>();
    const keep = (id: number, kind: SearchKind, score: number) => {
      const had = out.get(id);
      if (!had || KIND_RANK[kind] < KIND_RANK[had.kind] || (KIND_RANK[kind] === KIND_RANK[had.kind] && score > had.score)) out.set(id, { kind, score });
    };
    const nq = normalizeName(query);
    if (!nq) return out;
    const compact = nq.replace(/ /g, '');
    for (const c of records) {
      const names = [c.epithet, c.acceptedName, ...(variantsOf.get(c.id) ?? [])].map(normalizeName);
      if (normalizeName(c.epithet) === nq || normalizeName(c.epithet).replace(/ /g, '') === compact) keep(c.id, 'exact', 1);
      else if (names.some((n) => n.startsWith(nq) || n.replace(/ /g, '').startsWith(compact) || n.split(' ').some((w) => w.startsWith(nq)))) keep(c.id, 'prefix', 1);
    }
    const index = buildNameIndex(records.map((c) => ({ id: c.id, acceptedEpithet: c.epithet, variants: variantsOf.get(c.id) ?? [] })));
    for (const m of findNames(index, query, { threshold: SEARCH_THRESHOLD })) keep(Number(m.recordId), m.kind, m.score);
    return out;
  }
}

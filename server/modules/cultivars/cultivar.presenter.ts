import { formatNameParts, type NameParts } from '../../../shared/names/cultivar-name';
import type { CultivarDetail, CultivarSummary } from '../../../shared/schemas/cultivars';
import type { Cultivar } from '../../db/entities/cultivar.entity';
import type { CultivarVariant } from '../../db/entities/cultivar-variant.entity';

/** The record's name fields in the shape the shared name rules take (the Group field is `group` there). */
export function namePartsOf(c: Pick<Cultivar, 'genus' | 'species' | 'infraspecificRank' | 'infraspecificEpithet' | 'groupName' | 'epithet'>): NameParts {
  const parts: NameParts = { genus: c.genus, epithet: c.epithet };
  if (c.species) parts.species = c.species;
  if (c.infraspecificRank) parts.infraspecificRank = c.infraspecificRank;
  if (c.infraspecificEpithet) parts.infraspecificEpithet = c.infraspecificEpithet;
  if (c.groupName) parts.group = c.groupName;
  return parts;
}

/** The list and picker shape: name parts plus the printed segments with italics marked. */
export function presentCultivarSummary(c: Cultivar): CultivarSummary {
  return {
    id: c.id,
    slug: c.slug,
    acceptedName: c.acceptedName,
    nameSegments: formatNameParts(namePartsOf(c)),
    genus: c.genus,
    species: c.species,
    groupName: c.groupName,
    epithet: c.epithet,
    status: c.status,
    fictional: c.fictional,
  };
}

/** The full record for the record page and the tree card. */
export function presentCultivarDetail(c: Cultivar, variants: readonly CultivarVariant[]): CultivarDetail {
  return {
    ...presentCultivarSummary(c),
    infraspecificRank: c.infraspecificRank,
    infraspecificEpithet: c.infraspecificEpithet,
    traits: c.traits,
    notesHtml: c.notesHtml,
    pronunciation: c.pronunciation,
    meaning: c.meaning,
    variants: variants.map((v) => ({ id: v.id, text: v.text })),
    createdAt: c.createdAt.toISOString(),
    updatedAt: c.updatedAt.toISOString(),
  };
}

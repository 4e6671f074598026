import path from 'node:path';
import { formatNameParts, type NameParts } from '../../../shared/names/cultivar-name';
import { respell, splitHepburn } from '../../../shared/names/hepburn';
import type {
  CultivarDetail,
  CultivarFull,
  CultivarIndexRow,
  CultivarPhotoDto,
  CultivarSummary,
  SpokenMoment,
  TourMoment,
} from '../../../shared/schemas/cultivars';
import type { Cultivar } from '../../db/entities/cultivar.entity';
import type { CultivarPhoto } from '../../db/entities/cultivar-photo.entity';
import type { CultivarVariant } from '../../db/entities/cultivar-variant.entity';
import { sanitizeRichText } from '../tours/sanitize';
import { posterUrl } from '../tours/tour.presenter';
import type { PublishedMoment } from '../watch/published-moments';
import { momentThumbnail } from '../watch/thumbnail.presenter';
import { CARE_CAUTION, careNoteFor } from './care-note';

/** The record's name fields in the shape the shared name rules take (the Group field is `group` there). */
/** The columns a printed name is made from. */
export type NamePartColumns = 'genus' | 'species' | 'infraspecificRank' | 'infraspecificEpithet' | 'groupName' | 'epithet';

export function namePartsOf(c: Pick<Cultivar, NamePartColumns>): NameParts {
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
    // Sanitised when stored; again here so rows written another way (seed, imports) never leak markup.
    notesHtml: sanitizeRichText(c.notesHtml),
    pronunciation: c.pronunciation,
    meaning: c.meaning,
    variants: variants.map((v) => ({ id: v.id, text: v.text })),
    createdAt: c.createdAt.toISOString(),
    updatedAt: c.updatedAt.toISOString(),
  };
}

/** A row of the cultivar index table. */
export function presentCultivarIndexRow(c: Cultivar): CultivarIndexRow {
  return { ...presentCultivarSummary(c), traits: c.traits, updatedAt: c.updatedAt.toISOString() };
}

/** Photo URLs go through the visibility-checking media route; disk paths stay on the server. */
export function presentCultivarPhoto(p: CultivarPhoto): CultivarPhotoDto {
  const base = `/media/cultivars/${p.cultivarId}/`;
  return {
    id: p.id,
    url: base + encodeURIComponent(path.posix.basename(p.file)),
    width: p.width,
    height: p.height,
    thumbUrl: base + encodeURIComponent(path.posix.basename(p.thumbFile)),
    thumbWidth: p.thumbWidth,
    thumbHeight: p.thumbHeight,
    altText: p.altText,
    position: p.position,
  };
}

/** A stop of a published tour as the record page lists it: the poster, and the preview tile at the stop's start. */
export function presentTourMoment(stop: PublishedMoment): TourMoment {
  const { tour } = stop;
  const thumb = momentThumbnail(tour, stop.startMs);
  return {
    tourId: tour.id,
    tourTitle: tour.title,
    stopId: stop.id,
    stopTitle: stop.title,
    startMs: stop.startMs,
    endMs: stop.endMs,
    posterUrl: posterUrl(tour),
    thumbnail: thumb?.kind === 'tile' ? { url: thumb.url, x: thumb.x, y: thumb.y, w: thumb.w, h: thumb.h } : null,
  };
}

/** The epithet's Hepburn syllables word by word, or null when any word is not Hepburn. */
export function hepburnSyllables(epithet: string): string[][] | null {
  const words = epithet.trim().split(/\s+/).map((w) => w.replace(/^[.,!]+|[.,!]+$/g, '')).filter((w) => w.length > 0);
  const out: string[][] = [];
  for (const word of words) {
    const split = splitHepburn(word);
    if (!split.ok) return null;
    out.push(split.syllables);
  }
  return out.length ? out : null;
}

/** Everything the record page and the tree card show about one record. */
export interface CultivarFullParts {
  cultivar: Cultivar;
  variants: readonly CultivarVariant[];
  photos: readonly CultivarPhoto[];
  mergedInto: Cultivar | null;
  spokenAt: readonly SpokenMoment[];
  stops: readonly PublishedMoment[];
}

/** The record in full, as GET /api/cultivars/:idOrSlug returns it. */
export function presentCultivarFull(parts: CultivarFullParts): CultivarFull {
  const { cultivar: c } = parts;
  const detail = presentCultivarDetail(c, parts.variants);
  return {
    ...detail,
    respelling: respell(c.epithet),
    hepburnSyllables: hepburnSyllables(c.epithet),
    mergedInto: parts.mergedInto ? { id: parts.mergedInto.id, slug: parts.mergedInto.slug, acceptedName: parts.mergedInto.acceptedName } : null,
    photos: parts.photos.map(presentCultivarPhoto),
    spokenAt: [...parts.spokenAt],
    tourMoments: parts.stops.map(presentTourMoment),
    careNote: careNoteFor(c.notesHtml),
    careCaution: CARE_CAUTION,
  };
}

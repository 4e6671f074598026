import { CONTAINER_CAUTION, zoneBounds } from '../../../shared/hardiness';
import { respell } from '../../../shared/names/hepburn';
import type { TreeCard } from '../../../shared/schemas/watch';
import {
  LEAF_FORM_LABELS,
  PLANT_COLOURS,
  SEASONS,
  TRAIT_LABELS,
  type TraitProfile,
} from '../../../shared/traits';
import type { Cultivar } from '../../db/entities/cultivar.entity';
import { presentCultivarSummary } from '../cultivars/cultivar.presenter';

const VALUE_LABELS: Record<string, string> = {
  'coral-red': 'Coral-red',
  'full-sun': 'Full sun',
  'part-shade': 'Part shade',
  'shallow-lobed': 'Lobed less than halfway',
};
const CONTAINER_LABELS = { good: 'Suits a container', fair: 'Grows in a container with care', poor: 'Better in the ground' } as const;

function valueLabel(id: string): string {
  return VALUE_LABELS[id] ?? id.charAt(0).toUpperCase() + id.slice(1).replace(/-/g, ' ');
}

type KeyTrait = TreeCard['keyTraits'][number];

function keyTraits(t: TraitProfile): KeyTrait[] {
  const out: KeyTrait[] = [];
  const push = (trait: keyof TraitProfile, values: { id: string; label: string }[]) => {
    if (values.length) out.push({ trait, label: TRAIT_LABELS[trait], values });
  };
  if (t.leafForm) push('leafForm', [{ id: t.leafForm, label: LEAF_FORM_LABELS[t.leafForm] }]);
  if (t.lobeCount) {
    const { min, max } = t.lobeCount;
    push('lobeCount', [{ id: `${min}-${max}`, label: min === max ? String(min) : `${min}–${max}` }]);
  }
  if (t.leafSize) push('leafSize', [{ id: t.leafSize, label: valueLabel(t.leafSize) }]);
  if (t.habit) push('habit', t.habit.map((h) => ({ id: h, label: valueLabel(h) })));
  if (t.bark) push('bark', t.bark.map((b) => ({ id: b, label: valueLabel(b) })));
  if (t.growthRate) push('growthRate', [{ id: t.growthRate, label: valueLabel(t.growthRate) }]);
  if (t.sunTolerance) push('sunTolerance', t.sunTolerance.map((s) => ({ id: s, label: valueLabel(s) })));
  return out;
}

const COLOUR_BY_ID = new Map<string, (typeof PLANT_COLOURS)[number]>(PLANT_COLOURS.map((c) => [c.id, c]));

/**
 * The tree card for a record: name (with italic segments), pronunciation (the moderator's guide,
 * else a Hepburn respelling of a romanised epithet), key traits with labels, seasonal colours
 * with their swatch hex values, sizes in metres (the client converts), the USDA zone range with
 * its temperature band, and container suitability with the safety note that goes with it.
 */
export function presentTreeCard(c: Cultivar): TreeCard {
  const t: TraitProfile = c.traits ?? {};
  const guide = c.pronunciation?.trim();
  const hepburn = guide ? null : respell(c.epithet);
  const colours = SEASONS.flatMap((season) => {
    const ids = t.colours?.[season];
    if (!ids?.length) return [];
    return [
      {
        season,
        swatches: ids.map((id) => {
          const colour = COLOUR_BY_ID.get(id)!;
          return { id, label: colour.label, hex: colour.hex, accentHex: 'accentHex' in colour ? colour.accentHex : null };
        }),
      },
    ];
  });
  // Spread is not in the trait vocabulary yet; read it if a record carries it.
  const spread = (t as { spreadM?: { min: number; max: number } }).spreadM ?? null;
  return {
    ...presentCultivarSummary(c),
    pronunciation: guide ? { text: guide, source: 'record' } : hepburn ? { text: hepburn, source: 'hepburn' } : null,
    meaning: c.meaning,
    keyTraits: keyTraits(t),
    colours,
    size: { heightM: t.heightM ?? null, spreadM: spread, heightClass: t.heightClass ?? null },
    hardiness: t.hardiness
      ? {
          min: t.hardiness.min,
          max: t.hardiness.max,
          coldestF: zoneBounds(t.hardiness.min).minF,
          coldestC: Math.round(zoneBounds(t.hardiness.min).minC * 10) / 10,
          warmestF: zoneBounds(t.hardiness.max).maxF,
          warmestC: Math.round(zoneBounds(t.hardiness.max).maxC * 10) / 10,
        }
      : null,
    container: t.containerSuitability ? { suitability: t.containerSuitability, label: CONTAINER_LABELS[t.containerSuitability], caution: CONTAINER_CAUTION } : null,
    link: `/cultivars/${c.slug}`,
  };
}

/**
 * Built tree cards keyed by the fields a card shows (and the last-change time), so a busy tour page
 * does not rebuild the same cards for every viewer, while any edit gives a new card, even two edits
 * within one second (updates write whole-second timestamps). The cards are shared objects; callers
 * serialise them and must not change them.
 */
export class TreeCardCache {
  private readonly cards = new Map<string, TreeCard>();

  constructor(private readonly max = 5000) {}

  card(c: Cultivar): TreeCard {
    const key = JSON.stringify([
      c.id, c.updatedAt, c.slug, c.genus, c.species, c.infraspecificRank, c.infraspecificEpithet, c.groupName,
      c.epithet, c.acceptedName, c.status, c.fictional, c.pronunciation, c.meaning, c.traits,
    ]);
    let card = this.cards.get(key);
    if (!card) {
      card = presentTreeCard(c);
      if (this.cards.size >= this.max) this.cards.clear();
      this.cards.set(key, card);
    }
    return card;
  }
}

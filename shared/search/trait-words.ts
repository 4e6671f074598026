/**
 * Trait words in a search ("weeping", "coral bark", "autumn red", "dwarf container") read as
 * conditions on a cultivar record's traits, in Grovewalk's trait vocabulary (shared/traits.ts).
 * The word lists are Grovewalk's own plain-English synonyms (common practice, no source).
 * "palmatum" is not read as a leaf form: it is the species epithet of most records, so it would
 * turn every name search into a trait search.
 */
import { USDA_ZONES, zoneIndex, type UsdaZone } from '../hardiness';
import {
  HEIGHT_CLASS_M,
  LEAF_FORM_LABELS,
  PLANT_COLOURS,
  colourFamily,
  type Bark,
  type ColourFamily,
  type ContainerSuitability,
  type GrowthRate,
  type Habit,
  type LeafForm,
  type LeafSize,
  type PlantColour,
  type Season,
  type SunTolerance,
  type TraitProfile,
} from '../traits';
import { foldText } from './text-fold';

/** One condition read from the search, with the words (by index) that said it. */
export type TraitTerm = (
  | { trait: 'habit'; value: Habit }
  | { trait: 'bark'; value: Bark }
  | { trait: 'leafForm'; value: LeafForm }
  | { trait: 'leafSize'; value: LeafSize }
  | { trait: 'heightClass'; value: 'dwarf' }
  | { trait: 'containerSuitability'; value: ContainerSuitability }
  | { trait: 'sunTolerance'; value: SunTolerance }
  | { trait: 'growthRate'; value: GrowthRate }
  | { trait: 'hardiness'; value: string; zones: UsdaZone[] }
  | { trait: 'colours'; value: string; colour?: PlantColour; family?: ColourFamily; seasons: Season[] | null }
) & { label: string; words: [number, number] };

/** Why a record matched one trait term, for the result's list of reasons. */
export interface TraitReason {
  kind: 'trait';
  trait: keyof TraitProfile;
  value: string;
  label: string;
  /** For colours: the seasons and palette colours that matched. */
  seasons?: Season[];
  colours?: PlantColour[];
}

type TermBody = TraitTerm extends infer T ? (T extends unknown ? Omit<T, 'words' | 'label'> : never) : never;

const cap = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

const HABIT_WORDS: Record<string, Habit> = {
  weeping: 'weeping', weeper: 'weeping', weepers: 'weeping', pendulous: 'weeping', cascading: 'weeping',
  upright: 'upright', erect: 'upright',
  mounding: 'mounding', mounded: 'mounding',
  rounded: 'rounded',
  vase: 'vase',
  spreading: 'spreading',
  columnar: 'columnar', fastigiate: 'columnar',
};

const LEAF_FORM_WORDS: Record<string, LeafForm> = {
  lace: 'dissectum', lacy: 'dissectum', laceleaf: 'dissectum', 'lace leaf': 'dissectum', 'lace leaves': 'dissectum',
  dissected: 'dissectum', dissectum: 'dissectum',
  linearilobum: 'linearilobum', 'strap leaf': 'linearilobum', 'strap leaves': 'linearilobum',
  amoenum: 'amoenum', matsumurae: 'matsumurae', compound: 'compound', unlobed: 'unlobed',
};

// "<colour> bark" (also stems, twigs): the colour word that names each bark value.
const BARK_WORDS: Record<string, Bark> = {
  coral: 'coral-red', 'coral red': 'coral-red', red: 'coral-red', green: 'green', grey: 'grey', gray: 'grey', brown: 'brown',
  yellow: 'yellow', gold: 'yellow', golden: 'yellow', striped: 'striped', snake: 'striped', corky: 'corky', peeling: 'peeling', flaking: 'peeling',
};
const BARK_NOUNS = new Set(['bark', 'stems', 'stem', 'twigs', 'twig']);
const ONE_WORD_BARK: Record<string, Bark> = { coralbark: 'coral-red', snakebark: 'striped' };

const COLOUR_IDS = new Map<string, PlantColour>(PLANT_COLOURS.map((c) => [foldText(c.label.replace(/-/g, ' ')), c.id]));
// Broad words read as a colour family; the rest name one palette colour.
const FAMILY_WORDS: Record<string, ColourFamily> = { red: 'red', reds: 'red', green: 'green', greens: 'green', yellow: 'yellow', gold: 'yellow', golden: 'yellow', orange: 'orange', purple: 'purple', pink: 'pink', variegated: 'variegated', variegation: 'variegated' };
const COLOUR_WORDS: Record<string, PlantColour> = {
  ...Object.fromEntries(COLOUR_IDS),
  crimson: 'deep-red', burgundy: 'deep-red', black: 'near-black', cream: 'cream-variegated', copper: 'bronze',
};
const FAMILY_LABELS: Record<ColourFamily, string> = { green: 'green', yellow: 'yellow', orange: 'orange', pink: 'pink', red: 'red', purple: 'purple', variegated: 'variegated' };
const SEASON_WORDS: Record<string, Season> = { spring: 'spring', summer: 'summer', autumn: 'autumn', fall: 'autumn', autumnal: 'autumn' };

const OTHER_WORDS: Record<string, TermBody> = {
  dwarf: { trait: 'heightClass', value: 'dwarf' }, dwarfs: { trait: 'heightClass', value: 'dwarf' }, miniature: { trait: 'heightClass', value: 'dwarf' },
  container: { trait: 'containerSuitability', value: 'good' }, containers: { trait: 'containerSuitability', value: 'good' },
  pot: { trait: 'containerSuitability', value: 'good' }, pots: { trait: 'containerSuitability', value: 'good' },
  potted: { trait: 'containerSuitability', value: 'good' }, planter: { trait: 'containerSuitability', value: 'good' }, patio: { trait: 'containerSuitability', value: 'good' },
  'full sun': { trait: 'sunTolerance', value: 'full-sun' }, sunny: { trait: 'sunTolerance', value: 'full-sun' },
  'part shade': { trait: 'sunTolerance', value: 'part-shade' }, 'partial shade': { trait: 'sunTolerance', value: 'part-shade' }, dappled: { trait: 'sunTolerance', value: 'part-shade' },
  shade: { trait: 'sunTolerance', value: 'shade' }, shady: { trait: 'sunTolerance', value: 'shade' },
  'slow growing': { trait: 'growthRate', value: 'slow' }, slow: { trait: 'growthRate', value: 'slow' },
  'fast growing': { trait: 'growthRate', value: 'fast' }, fast: { trait: 'growthRate', value: 'fast' }, vigorous: { trait: 'growthRate', value: 'fast' },
  'small leaf': { trait: 'leafSize', value: 'small' }, 'small leaves': { trait: 'leafSize', value: 'small' }, 'small leaved': { trait: 'leafSize', value: 'small' },
  'large leaf': { trait: 'leafSize', value: 'large' }, 'large leaves': { trait: 'leafSize', value: 'large' }, 'large leaved': { trait: 'leafSize', value: 'large' },
};

const SUN_LABELS: Record<SunTolerance, string> = { 'full-sun': 'full sun', 'part-shade': 'part shade', shade: 'shade' };
const CONTAINER_LABELS: Record<ContainerSuitability, string> = { good: 'suits a container', fair: 'fair in a container', poor: 'poor in a container' };
const BARK_LABELS: Record<Bark, string> = { green: 'green', grey: 'grey', brown: 'brown', 'coral-red': 'coral-red', yellow: 'yellow', striped: 'striped', corky: 'corky', peeling: 'peeling' };

function labelOf(body: TermBody, seasons: Season[] | null): string {
  switch (body.trait) {
    case 'habit':
      return `${cap(body.value)} habit`;
    case 'bark':
      return `${cap(BARK_LABELS[body.value])} bark`;
    case 'leafForm':
      return LEAF_FORM_LABELS[body.value];
    case 'leafSize':
      return `${cap(body.value)} leaves`;
    case 'heightClass':
      return 'Dwarf';
    case 'containerSuitability':
      return cap(CONTAINER_LABELS[body.value]);
    case 'sunTolerance':
      return `Takes ${SUN_LABELS[body.value]}`;
    case 'growthRate':
      return `${cap(body.value)} growing`;
    case 'hardiness':
      return `Hardy in zone ${body.value}`;
    case 'colours': {
      const what = body.colour ? PLANT_COLOURS.find((c) => c.id === body.colour)!.label : cap(FAMILY_LABELS[body.family!]);
      return seasons?.length ? `${what} in ${seasons.join(' and ')}` : `${what} leaves`;
    }
  }
}

/** A half zone, or both halves of a whole zone ("6" → 6a, 6b), or null when not on the map. */
function zonesOf(text: string): UsdaZone[] | null {
  const m = /^(\d{1,2})([ab])?$/.exec(text);
  if (!m) return null;
  const names = m[2] ? [`${m[1]}${m[2]}`] : [`${m[1]}a`, `${m[1]}b`];
  const zones = names.filter((z): z is UsdaZone => (USDA_ZONES as readonly string[]).includes(z));
  return zones.length ? zones : null;
}

/** The words of a search as the trait reader sees them (folded letters and digits). */
function tokens(q: string): string[] {
  return [...foldText(q).matchAll(/[\p{L}\p{N}]+/gu)].map((m) => m[0]);
}

/**
 * Reads trait conditions from a search. Longer phrases win ("coral bark" is bark, not a leaf
 * colour); season words ("autumn red", "red in fall") narrow every colour in the search to those
 * seasons. `skip` lists word indexes already taken by a cultivar name, which are not read as traits.
 */
export function parseTraitWords(q: string, skip: ReadonlySet<number> = new Set()): { terms: TraitTerm[]; words: string[] } {
  const words = tokens(q);
  const bodies: { body: TermBody; words: [number, number] }[] = [];
  const seasons: Season[] = [];
  const phrase = (i: number, n: number) => (i + n <= words.length ? words.slice(i, i + n).join(' ') : null);
  const free = (i: number, n: number) => {
    for (let k = i; k < i + n; k++) if (skip.has(k)) return false;
    return true;
  };

  for (let i = 0; i < words.length; ) {
    let taken = 0;
    // Longest first: three words ("coral red bark"), then two, then one.
    for (const n of [3, 2, 1]) {
      const p = phrase(i, n);
      if (p === null || !free(i, n)) continue;
      const parts = p.split(' ');
      const last = parts[parts.length - 1]!;
      if (n >= 2 && BARK_NOUNS.has(last)) {
        const barkWord = parts.slice(0, -1).join(' ');
        const bark = BARK_WORDS[barkWord];
        if (bark) {
          bodies.push({ body: { trait: 'bark', value: bark }, words: [i, i + n - 1] });
          taken = n;
          break;
        }
      }
      if (n === 1 && ONE_WORD_BARK[p]) {
        bodies.push({ body: { trait: 'bark', value: ONE_WORD_BARK[p] }, words: [i, i] });
        taken = 1;
        break;
      }
      if (HABIT_WORDS[p]) {
        bodies.push({ body: { trait: 'habit', value: HABIT_WORDS[p] }, words: [i, i + n - 1] });
        taken = n;
        break;
      }
      if (LEAF_FORM_WORDS[p]) {
        bodies.push({ body: { trait: 'leafForm', value: LEAF_FORM_WORDS[p] }, words: [i, i + n - 1] });
        taken = n;
        break;
      }
      if (OTHER_WORDS[p]) {
        bodies.push({ body: OTHER_WORDS[p], words: [i, i + n - 1] });
        taken = n;
        break;
      }
      if (n === 2 && parts[0] === 'zone') {
        const zones = zonesOf(parts[1]!);
        if (zones) {
          bodies.push({ body: { trait: 'hardiness', value: parts[1]!, zones }, words: [i, i + 1] });
          taken = 2;
          break;
        }
      }
      if (n === 1 && /^z\d{1,2}[ab]?$/.test(p)) {
        const zones = zonesOf(p.slice(1));
        if (zones) {
          bodies.push({ body: { trait: 'hardiness', value: p.slice(1), zones }, words: [i, i] });
          taken = 1;
          break;
        }
      }
      if (n === 1 && SEASON_WORDS[p]) {
        if (!seasons.includes(SEASON_WORDS[p])) seasons.push(SEASON_WORDS[p]);
        taken = 1;
        break;
      }
      if (n <= 2 && FAMILY_WORDS[p]) {
        bodies.push({ body: { trait: 'colours', value: p, family: FAMILY_WORDS[p], seasons: null }, words: [i, i + n - 1] });
        taken = n;
        break;
      }
      if (n <= 2 && COLOUR_WORDS[p]) {
        bodies.push({ body: { trait: 'colours', value: COLOUR_WORDS[p], colour: COLOUR_WORDS[p], seasons: null }, words: [i, i + n - 1] });
        taken = n;
        break;
      }
    }
    i += taken || 1;
  }

  const terms: TraitTerm[] = bodies.map(({ body, words: w }) => {
    const b = body.trait === 'colours' ? { ...body, seasons: seasons.length ? [...seasons] : null } : body;
    return { ...b, words: w, label: labelOf(b, b.trait === 'colours' ? b.seasons : null) } as TraitTerm;
  });
  return { terms, words };
}

/** Why `profile` satisfies `term`, or null when it does not (or the trait is not recorded). */
export function traitReason(profile: TraitProfile | null | undefined, term: TraitTerm): TraitReason | null {
  if (!profile) return null;
  const reason = (value: string, extra: Partial<TraitReason> = {}): TraitReason => ({ kind: 'trait', trait: term.trait, value, label: term.label, ...extra });
  switch (term.trait) {
    case 'habit':
      return profile.habit?.includes(term.value) ? reason(term.value) : null;
    case 'bark':
      return profile.bark?.includes(term.value) ? reason(term.value) : null;
    case 'leafForm':
      return profile.leafForm === term.value ? reason(term.value) : null;
    case 'leafSize':
      return profile.leafSize === term.value ? reason(term.value) : null;
    case 'heightClass': {
      const dwarf = profile.heightClass === 'dwarf' || (profile.heightM !== undefined && profile.heightM.max < HEIGHT_CLASS_M.dwarf.max);
      return dwarf ? reason('dwarf') : null;
    }
    case 'containerSuitability':
      return profile.containerSuitability === term.value ? reason(term.value) : null;
    case 'sunTolerance':
      return profile.sunTolerance?.includes(term.value) ? reason(term.value) : null;
    case 'growthRate':
      return profile.growthRate === term.value ? reason(term.value) : null;
    case 'hardiness': {
      const h = profile.hardiness;
      if (!h) return null;
      const lo = zoneIndex(h.min);
      const hi = zoneIndex(h.max);
      return term.zones.some((z) => zoneIndex(z) >= lo && zoneIndex(z) <= hi) ? reason(term.value) : null;
    }
    case 'colours': {
      const seasons: Season[] = term.seasons ?? ['spring', 'summer', 'autumn'];
      const hitSeasons: Season[] = [];
      const hitColours: PlantColour[] = [];
      for (const s of seasons) {
        for (const c of profile.colours?.[s] ?? []) {
          if (term.colour ? c === term.colour : colourFamily(c) === term.family) {
            if (!hitSeasons.includes(s)) hitSeasons.push(s);
            if (!hitColours.includes(c)) hitColours.push(c);
          }
        }
      }
      return hitSeasons.length ? reason(term.colour ?? term.family!, { seasons: hitSeasons, colours: hitColours }) : null;
    }
  }
}

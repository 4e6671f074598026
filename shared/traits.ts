import { z } from 'zod';
import { USDA_ZONES, zoneIndex } from './hardiness';

/*
 * Grovewalk's trait vocabulary. Cultivar records, the tree finder, look-alikes and side by side all
 * speak these values, so a search for "coral bark" or "weeping red" means the same thing everywhere.
 * Ids are kebab-case and stable (stored in the database); labels are for people and may change.
 */

/**
 * Leaf form. Besides general forms, the values named after Acer palmatum cultivar Groups describe
 * how deeply the leaf is cut, as those Groups are used in horticulture (common practice, from memory,
 * no published source): Amoenum about two-thirds, Palmatum two-thirds to three-quarters,
 * Matsumurae beyond three-quarters, Dissectum to the base and cut again (lace), Linearilobum
 * narrow straps. Here they are plain trait values, not claims of Group membership.
 */
export const LEAF_FORMS = [
  'unlobed',
  'shallow-lobed',
  'amoenum',
  'palmatum',
  'matsumurae',
  'dissectum',
  'linearilobum',
  'compound',
] as const;
/** One leaf-form value, as stored on records and given as a finder answer. */
export type LeafForm = (typeof LEAF_FORMS)[number];

/** Plain-English labels; the Group-like values say "-like" so no Group membership is implied. */
export const LEAF_FORM_LABELS: Record<LeafForm, string> = {
  unlobed: 'Not lobed',
  'shallow-lobed': 'Lobed less than halfway',
  amoenum: 'Lobed to about two-thirds (Amoenum-like)',
  palmatum: 'Lobed two-thirds to three-quarters (Palmatum-like)',
  matsumurae: 'Lobed nearly to the base (Matsumurae-like)',
  dissectum: 'Cut to the base, lace-like (Dissectum-like)',
  linearilobum: 'Narrow strap-like lobes (Linearilobum-like)',
  compound: 'Compound (separate leaflets)',
};

/** Fewest lobes a learner can give; 0 is an unlobed leaf. */
export const LOBE_COUNT_MIN = 0;
/** Most lobes a learner can give; more is a miscount, not a maple. */
export const LOBE_COUNT_MAX = 15;

/** Leaf size classes by leaf width in cm; Grovewalk's own bands (common practice, no source). Upper bound exclusive. */
export const LEAF_SIZES = ['small', 'medium', 'large'] as const;
/** One leaf-size class. */
export type LeafSize = (typeof LEAF_SIZES)[number];
/** The width band behind each size class, so labels can show "5–10 cm" in the reader's unit. */
export const LEAF_SIZE_CM: Record<LeafSize, { min: number; max: number }> = {
  small: { min: 0, max: 5 },
  medium: { min: 5, max: 10 },
  large: { min: 10, max: 30 },
};

/** Seasons with their own leaf colour; winter interest is carried by bark. */
export const SEASONS = ['spring', 'summer', 'autumn'] as const;
/** A season with its own colour entry on records and in finder answers. */
export type Season = (typeof SEASONS)[number];

/**
 * Named plant colours with a swatch. `family` groups near colours so that the finder can give
 * partial credit when a learner says "scarlet" for a leaf the record calls "deep red".
 * Two-tone leaves carry a second swatch. Names, hex values and families are Grovewalk's own.
 */
export const PLANT_COLOURS = [
  { id: 'lime', label: 'Lime', hex: '#a8c83c', family: 'green' },
  { id: 'green', label: 'Green', hex: '#4f8a3a', family: 'green' },
  { id: 'dark-green', label: 'Dark green', hex: '#2f5a2b', family: 'green' },
  { id: 'gold', label: 'Gold', hex: '#e0b53a', family: 'yellow' },
  { id: 'orange', label: 'Orange', hex: '#e0762b', family: 'orange' },
  { id: 'coral', label: 'Coral', hex: '#ec7a63', family: 'orange' },
  { id: 'pink', label: 'Pink', hex: '#e59bb0', family: 'pink' },
  { id: 'scarlet', label: 'Scarlet', hex: '#cf2f26', family: 'red' },
  { id: 'deep-red', label: 'Deep red', hex: '#8e1d22', family: 'red' },
  { id: 'purple-red', label: 'Purple-red', hex: '#6e2440', family: 'purple' },
  { id: 'near-black', label: 'Near black', hex: '#35202a', family: 'purple' },
  { id: 'bronze', label: 'Bronze', hex: '#9a6a3a', family: 'orange' },
  { id: 'cream-variegated', label: 'Green and cream', hex: '#5f8f46', accentHex: '#efe7c4', family: 'variegated' },
  { id: 'pink-variegated', label: 'Green, white and pink', hex: '#6a9650', accentHex: '#f0bccb', family: 'variegated' },
] as const;
/** A palette colour id. */
export type PlantColour = (typeof PLANT_COLOURS)[number]['id'];
/** Colour families used for partial credit. */
export type ColourFamily = (typeof PLANT_COLOURS)[number]['family'];
/** The palette ids as a tuple, for zod enums and pickers. */
export const PLANT_COLOUR_IDS = PLANT_COLOURS.map((c) => c.id) as unknown as readonly [PlantColour, ...PlantColour[]];

const COLOUR_FAMILY = new Map<string, ColourFamily>(PLANT_COLOURS.map((c) => [c.id, c.family]));
/** The family of a colour id, used for partial matches. */
export function colourFamily(colour: PlantColour): ColourFamily {
  return COLOUR_FAMILY.get(colour) as ColourFamily;
}

/** Bark as seen in winter. */
export const BARKS = ['green', 'grey', 'brown', 'coral-red', 'yellow', 'striped', 'corky', 'peeling'] as const;
/** One bark value. */
export type Bark = (typeof BARKS)[number];

/** Growth habit (overall shape). */
export const HABITS = ['upright', 'weeping', 'mounding', 'rounded', 'vase', 'spreading', 'columnar'] as const;
/** One habit value. */
export type Habit = (typeof HABITS)[number];

/**
 * Height at maturity. The metre bands are Grovewalk's own (common practice, no source); the upper
 * bound is exclusive and "large" is open-ended in practice (30 m stands in for "and more").
 */
export const HEIGHT_CLASSES = ['dwarf', 'small', 'medium', 'large'] as const;
/** One height class. */
export type HeightClass = (typeof HEIGHT_CLASSES)[number];
/** Metre band of each height class; the finder and look-alikes compare heights through these. */
export const HEIGHT_CLASS_M: Record<HeightClass, { min: number; max: number }> = {
  dwarf: { min: 0, max: 2 },
  small: { min: 2, max: 4 },
  medium: { min: 4, max: 8 },
  large: { min: 8, max: 30 },
};

/** Growth rate, slowest first (the order gives neighbours half credit). */
export const GROWTH_RATES = ['slow', 'moderate', 'fast'] as const;
/** One growth-rate value. */
export type GrowthRate = (typeof GROWTH_RATES)[number];

/** Light a plant tolerates; records list every one that suits it. */
export const SUN_TOLERANCES = ['full-sun', 'part-shade', 'shade'] as const;
/** One sun-tolerance value. */
export type SunTolerance = (typeof SUN_TOLERANCES)[number];

/** How well a cultivar suits a container, best first (the order gives neighbours half credit). */
export const CONTAINER_SUITABILITIES = ['good', 'fair', 'poor'] as const;
/** One container-suitability value. */
export type ContainerSuitability = (typeof CONTAINER_SUITABILITIES)[number];

/** The class whose band holds `metres` (used when a record gives metres but no class). */
export function heightClassOf(metres: number): HeightClass {
  for (const c of HEIGHT_CLASSES) if (metres < HEIGHT_CLASS_M[c].max) return c;
  return 'large';
}

const rangeOf = (n: z.ZodNumber) =>
  z
    .object({ min: n, max: n })
    .strict()
    .refine((r: { min: number; max: number }) => r.min <= r.max, { message: 'min must not be above max', path: ['max'] });

/** Zod schemas for each vocabulary, shared by request validation and record forms. */
export const leafFormSchema = z.enum(LEAF_FORMS);
export const leafSizeSchema = z.enum(LEAF_SIZES);
export const seasonSchema = z.enum(SEASONS);
export const plantColourSchema = z.enum(PLANT_COLOUR_IDS);
export const barkSchema = z.enum(BARKS);
export const habitSchema = z.enum(HABITS);
export const heightClassSchema = z.enum(HEIGHT_CLASSES);
export const growthRateSchema = z.enum(GROWTH_RATES);
export const sunToleranceSchema = z.enum(SUN_TOLERANCES);
export const containerSuitabilitySchema = z.enum(CONTAINER_SUITABILITIES);
export const usdaZoneSchema = z.enum(USDA_ZONES);

/** A record's lobe count as a range (leaves on one tree vary). */
export const lobeCountRangeSchema = rangeOf(z.number().int().min(LOBE_COUNT_MIN).max(LOBE_COUNT_MAX));
/** A height range in metres; 100 m caps typos. */
export const heightRangeSchema = rangeOf(z.number().min(0).max(100));

const nonEmptySet = <T extends z.ZodTypeAny>(item: T) =>
  z
    .array(item)
    .min(1)
    .refine((a) => new Set(a).size === a.length, { message: 'values must not repeat' });

/**
 * What a cultivar record says about a plant. Every field is optional: a missing field means "not
 * recorded", never "absent". Fields that hold lists name every value the plant shows (a bark can
 * be green and striped; autumn colour can be orange and scarlet).
 */
export const traitProfileSchema = z
  .object({
    leafForm: leafFormSchema.optional(),
    lobeCount: lobeCountRangeSchema.optional(),
    leafSize: leafSizeSchema.optional(),
    colours: z
      .object({
        spring: nonEmptySet(plantColourSchema).optional(),
        summer: nonEmptySet(plantColourSchema).optional(),
        autumn: nonEmptySet(plantColourSchema).optional(),
      })
      .strict()
      .optional(),
    bark: nonEmptySet(barkSchema).optional(),
    habit: nonEmptySet(habitSchema).optional(),
    heightClass: heightClassSchema.optional(),
    /** Mature height in metres, when known more closely than the class. */
    heightM: heightRangeSchema.optional(),
    growthRate: growthRateSchema.optional(),
    sunTolerance: nonEmptySet(sunToleranceSchema).optional(),
    containerSuitability: containerSuitabilitySchema.optional(),
    hardiness: z
      .object({ min: usdaZoneSchema, max: usdaZoneSchema })
      .strict()
      .refine((r) => zoneIndex(r.min) <= zoneIndex(r.max), { message: 'coldest zone must come first', path: ['max'] })
      .optional(),
  })
  .strict();
/** The traits of one cultivar record; see `traitProfileSchema`. */
export type TraitProfile = z.infer<typeof traitProfileSchema>;

/** Labels for trait names in finder questions, side by side rows and search chips. */
export const TRAIT_LABELS = {
  leafForm: 'Leaf form',
  lobeCount: 'Number of lobes',
  leafSize: 'Leaf size',
  colours: 'Leaf colour',
  bark: 'Bark',
  habit: 'Habit',
  heightClass: 'Height class',
  heightM: 'Height at maturity',
  growthRate: 'Growth rate',
  sunTolerance: 'Sun or shade',
  containerSuitability: 'Suits a container',
  hardiness: 'Hardiness zones',
} as const satisfies Record<keyof TraitProfile, string>;

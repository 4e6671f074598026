import type { TraitProfile } from '../../../shared/traits';

/** A demo cultivar record. Every epithet here is invented for the Grovewalk demo (fictional). */
export interface DemoCultivar {
  key: string;
  genus: string;
  species: string;
  group: string | null;
  epithet: string;
  meaning: string;
  pronunciation?: string;
  traits: TraitProfile;
  variants: string[];
  notesHtml: string;
}

const CARE =
  '<p><strong>Care note (general):</strong> prune with clean, sharp tools in late winter; lift large containers with help or a trolley. Follow product labels and local codes; ask a licensed arborist about large trees.</p>';

/**
 * Invented Acer cultivars for the demo club's walks. They are fictional: any likeness to a real
 * cultivar name is accidental. Traits are chosen so that look-alike pairs exist
 * (Sora-no-hane / Mizu-kagari, Ember Lantern / Akane-shizuku).
 */
export const DEMO_CULTIVARS: DemoCultivar[] = [
  {
    key: 'sora',
    genus: 'Acer',
    species: 'palmatum',
    group: 'Dissectum Group',
    epithet: 'Sora-no-hane',
    meaning: 'Invented name, read as "feather of the sky" (fictional demo record).',
    traits: {
      leafForm: 'dissectum',
      lobeCount: { min: 7, max: 9 },
      leafSize: 'small',
      colours: { spring: ['deep-red'], summer: ['purple-red'], autumn: ['scarlet'] },
      bark: ['grey'],
      habit: ['weeping', 'mounding'],
      heightClass: 'small',
      heightM: { min: 1.5, max: 2.5 },
      growthRate: 'slow',
      sunTolerance: ['full-sun', 'part-shade'],
      containerSuitability: 'good',
      hardiness: { min: '6a', max: '8b' },
    },
    variants: ['Sora no hane', 'Sorano hane'],
    notesHtml: `<p>A low, weeping lace-leaf that holds its deep red colour into summer (fictional demo record).</p>${CARE}`,
  },
  {
    key: 'mizu',
    genus: 'Acer',
    species: 'palmatum',
    group: 'Dissectum Group',
    epithet: 'Mizu-kagari',
    meaning: 'Invented name, read as "water lantern-light" (fictional demo record).',
    traits: {
      leafForm: 'dissectum',
      lobeCount: { min: 7, max: 9 },
      leafSize: 'small',
      colours: { spring: ['lime'], summer: ['green'], autumn: ['gold', 'orange'] },
      bark: ['green'],
      habit: ['weeping', 'mounding'],
      heightClass: 'small',
      heightM: { min: 1.5, max: 2.5 },
      growthRate: 'slow',
      sunTolerance: ['part-shade'],
      containerSuitability: 'good',
      hardiness: { min: '6a', max: '8b' },
    },
    variants: ['Mizu kagari', 'Misu-kagari'],
    notesHtml: `<p>The green twin of the red lace-leaves: the same mound, lime in spring, gold in autumn (fictional demo record).</p>${CARE}`,
  },
  {
    key: 'ember',
    genus: 'Acer',
    species: 'palmatum',
    group: 'Palmatum Group',
    epithet: 'Ember Lantern',
    meaning: 'Invented name for the glowing winter twigs (fictional demo record).',
    traits: {
      leafForm: 'palmatum',
      lobeCount: { min: 5, max: 7 },
      leafSize: 'medium',
      colours: { spring: ['lime'], summer: ['green'], autumn: ['gold'] },
      bark: ['coral-red'],
      habit: ['upright', 'vase'],
      heightClass: 'medium',
      heightM: { min: 4, max: 6 },
      growthRate: 'moderate',
      sunTolerance: ['full-sun', 'part-shade'],
      containerSuitability: 'fair',
      hardiness: { min: '5b', max: '8a' },
    },
    variants: ['Ember Lanterns'],
    notesHtml: `<p>Coral-red young stems light up the winter garden; upright, vase-shaped (fictional demo record).</p>${CARE}`,
  },
  {
    key: 'akane',
    genus: 'Acer',
    species: 'palmatum',
    group: 'Palmatum Group',
    epithet: 'Akane-shizuku',
    meaning: 'Invented name, read as "madder-red droplet" (fictional demo record).',
    traits: {
      leafForm: 'palmatum',
      lobeCount: { min: 5, max: 7 },
      leafSize: 'small',
      colours: { spring: ['coral'], summer: ['green'], autumn: ['orange'] },
      bark: ['coral-red'],
      habit: ['upright'],
      heightClass: 'small',
      heightM: { min: 2.5, max: 3.5 },
      growthRate: 'moderate',
      sunTolerance: ['part-shade'],
      containerSuitability: 'good',
      hardiness: { min: '6a', max: '8b' },
    },
    variants: ['Akane shizuku', 'Akani-shizuku'],
    notesHtml: `<p>Smaller than the other coral-bark trees, with coral spring leaves (fictional demo record).</p>${CARE}`,
  },
  {
    key: 'yuki',
    genus: 'Acer',
    species: 'palmatum',
    group: 'Matsumurae Group',
    epithet: 'Yuki-hotaru',
    meaning: 'Invented name, read as "snow firefly" for the cream-flecked leaves (fictional demo record).',
    traits: {
      leafForm: 'matsumurae',
      lobeCount: { min: 7, max: 7 },
      leafSize: 'medium',
      colours: { spring: ['pink-variegated'], summer: ['cream-variegated'], autumn: ['orange'] },
      bark: ['green'],
      habit: ['rounded'],
      heightClass: 'small',
      heightM: { min: 2, max: 3 },
      growthRate: 'slow',
      sunTolerance: ['part-shade', 'shade'],
      containerSuitability: 'good',
      hardiness: { min: '6b', max: '8b' },
    },
    variants: ['Yuki hotaru', 'Yukihotaru', 'Yuki-hataru'],
    notesHtml: `<p>Variegated leaves scorch in hot afternoon sun: give it shade after midday (fictional demo record).</p>${CARE}`,
  },
  {
    key: 'tsuru',
    genus: 'Acer',
    species: 'palmatum',
    group: 'Linearilobum Group',
    epithet: 'Tsuru-beni',
    meaning: 'Invented name, read as "crane red" for the narrow red lobes (fictional demo record).',
    traits: {
      leafForm: 'linearilobum',
      lobeCount: { min: 5, max: 7 },
      leafSize: 'medium',
      colours: { spring: ['deep-red'], summer: ['bronze'], autumn: ['scarlet'] },
      bark: ['brown'],
      habit: ['upright'],
      heightClass: 'small',
      heightM: { min: 2.5, max: 4 },
      growthRate: 'moderate',
      sunTolerance: ['full-sun'],
      containerSuitability: 'fair',
      hardiness: { min: '6a', max: '9a' },
    },
    variants: ['Tsuru beni', 'Tsurubeni', 'Sure-beni'],
    notesHtml: `<p>Strap-like red lobes like narrow ribbons (fictional demo record).</p>${CARE}`,
  },
  {
    key: 'copper',
    genus: 'Acer',
    species: 'palmatum',
    group: null,
    epithet: 'Hollow Copper',
    meaning: 'Invented name after the demo club’s own village (fictional demo record).',
    traits: {
      leafForm: 'amoenum',
      lobeCount: { min: 5, max: 7 },
      leafSize: 'small',
      colours: { spring: ['bronze'], summer: ['green'], autumn: ['orange', 'scarlet'] },
      bark: ['grey'],
      habit: ['mounding'],
      heightClass: 'dwarf',
      heightM: { min: 0.6, max: 1.2 },
      growthRate: 'slow',
      sunTolerance: ['full-sun', 'part-shade'],
      containerSuitability: 'good',
      hardiness: { min: '5b', max: '8b' },
    },
    variants: ['Hollow Coppers', 'Holo Copper'],
    notesHtml: `<p>A dwarf dome for a small pot or a rock garden (fictional demo record).</p>${CARE}`,
  },
  {
    key: 'kumo',
    genus: 'Acer',
    species: 'shirasawanum',
    group: null,
    epithet: 'Kumo-tsubasa',
    meaning: 'Invented name, read as "cloud wing" (fictional demo record).',
    traits: {
      leafForm: 'shallow-lobed',
      lobeCount: { min: 9, max: 11 },
      leafSize: 'large',
      colours: { spring: ['gold'], summer: ['lime'], autumn: ['orange'] },
      bark: ['grey'],
      habit: ['spreading'],
      heightClass: 'medium',
      heightM: { min: 3, max: 5 },
      growthRate: 'slow',
      sunTolerance: ['part-shade'],
      containerSuitability: 'fair',
      hardiness: { min: '5b', max: '7b' },
    },
    variants: ['Kumo tsubasa', 'Cumo-tsubasa', 'Kumo tsubassa'],
    notesHtml: `<p>Round golden leaves with many shallow lobes; protect from strong afternoon sun (fictional demo record).</p>${CARE}`,
  },
];

/** A walk-through tour in the demo: stops in order, each with what the narrator says. */
export interface DemoTour {
  title: string;
  author: string;
  garden: string;
  filmedOn: string;
  description: string;
  stops: { cultivar: string | null; seconds: number; lines: string[] }[];
}

/**
 * The demo club's filmed walks. The narration is invented; some lines deliberately mishear or
 * misspell a name ("Sora no hani", "amber lantern") so the spelling tools have work to show.
 */
export const DEMO_TOURS: DemoTour[] = [
  {
    title: 'Spring walk through the sunken garden',
    author: 'author@fernhollow.example',
    garden: 'Pellworth Sunken Garden (fictional)',
    filmedOn: '2026-04-18',
    description:
      '<p>A slow spring walk past the lace-leaf maples in their buried pots. Fictional demo tour: the garden, the people and every cultivar name are invented.</p>',
    stops: [
      { cultivar: 'sora', seconds: 8, lines: ['We start at the bottom of the steps with Sora-no-hane.', 'See how the lace leaves weep right down to the gravel.'] },
      { cultivar: 'mizu', seconds: 8, lines: ['Beside it, the green twin, Mizu kagari.', 'Same mound, but lime green in spring.'] },
      { cultivar: 'yuki', seconds: 8, lines: ['Under the birch we keep Yuki-hotaru in shade.', 'The pink and cream flecks burn in hot sun.'] },
      { cultivar: null, seconds: 6, lines: ['This one lost its label years ago.', 'If you know it, tell us in the comments.'] },
    ],
  },
  {
    title: 'Winter bark along the courtyard wall',
    author: 'author2@fernhollow.example',
    garden: 'Oduya Courtyard (fictional)',
    filmedOn: '2026-01-09',
    description: '<p>Bare branches show the bark colours best. Fictional demo tour with invented cultivar names.</p>',
    stops: [
      { cultivar: 'ember', seconds: 8, lines: ['First the tall one by the gate: Amber Lantern.', 'Those coral twigs glow on a grey day.'] },
      { cultivar: 'akane', seconds: 8, lines: ['Smaller, and easy to confuse with it, Akane-shizuku.', 'Coral bark too, but a much smaller tree.'] },
      { cultivar: 'tsuru', seconds: 8, lines: ['By the bench, Tsuru beni.', 'In spring those narrow lobes turn deep red.'] },
      { cultivar: 'copper', seconds: 6, lines: ['And the little dome in the trough is Hollow Copper.'] },
    ],
  },
  {
    title: 'Autumn colour on the terrace',
    author: 'author@fernhollow.example',
    garden: 'Pellworth Sunken Garden (fictional)',
    filmedOn: '2026-10-30',
    description: '<p>The terrace pots at peak colour. Fictional demo tour with invented cultivar names.</p>',
    stops: [
      { cultivar: 'kumo', seconds: 8, lines: ['The big round leaves here are Kumo-tsubasa.', 'Gold in spring, orange now.'] },
      { cultivar: 'sora', seconds: 8, lines: ['And back to Sora no hani, now scarlet.', 'Same tree as in the spring walk.'] },
      { cultivar: 'ember', seconds: 8, lines: ['Ember Lantern turns butter yellow in autumn.', 'Watch the ladder on the wet terrace.'] },
    ],
  },
];

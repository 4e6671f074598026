import { recordHeightRange, type FinderAnswers, type FinderTrait } from '@shared/finder/score';
import type { FinderQuestion } from '@shared/finder/next-question';
import type { UnitSystem } from '@shared/units';
import {
  BARKS,
  HABITS,
  HEIGHT_CLASSES,
  LEAF_FORMS,
  LEAF_SIZES,
  LOBE_COUNT_MAX,
  LOBE_COUNT_MIN,
  PLANT_COLOURS,
  type Season,
  type TraitProfile,
} from '@shared/traits';
import {
  BARK_LABELS,
  CONTAINER_LABELS,
  colourListText,
  colourOf,
  GROWTH_LABELS,
  HABIT_LABELS,
  heightClassLabel,
  heightText,
  joinList,
  LEAF_FORM_SHORT,
  leafSizeLabel,
  lobeText,
  SEASON_LABELS,
  SUN_LABELS,
} from '@/lib/trait-words';

/** The questions as the learner reads them, in Grovewalk's own words. */
export const QUESTION_TEXT: Record<FinderQuestion, string> = {
  leafForm: 'How deeply are the leaves cut?',
  lobeCount: 'How many lobes (points) does a leaf have?',
  leafSize: 'How wide is a typical leaf?',
  colour: 'What colour are the leaves now?',
  bark: 'What do the bark and young stems look like?',
  habit: 'What shape does the tree grow in?',
  height: 'About how tall is it, or will it be?',
};

/** Short names of the questions, for "Most useful next: …" and chips. */
export function questionName(trait: FinderQuestion | FinderTrait, season: Season | null | undefined): string {
  switch (trait) {
    case 'leafForm':
      return 'Leaf form';
    case 'lobeCount':
      return 'Number of lobes';
    case 'leafSize':
      return 'Leaf size';
    case 'colour':
      return season ? `Colour in ${SEASON_LABELS[season]}` : 'Leaf colour';
    case 'bark':
      return 'Bark';
    case 'habit':
      return 'Shape';
    case 'height':
      return 'Height';
    case 'growthRate':
      return 'Growth rate';
    case 'sunTolerance':
      return 'Sun or shade';
    case 'containerSuitability':
      return 'Container';
  }
}

/** Words for one answer value of a question (a vocabulary id, a lobe count, a height class). */
export function optionText(trait: FinderQuestion, value: string | number, system: UnitSystem): string {
  switch (trait) {
    case 'leafForm':
      return (LEAF_FORMS as readonly string[]).includes(String(value)) ? LEAF_FORM_SHORT[value as (typeof LEAF_FORMS)[number]] : String(value);
    case 'lobeCount':
      return Number(value) === 0 ? 'No lobes' : String(value);
    case 'leafSize':
      return (LEAF_SIZES as readonly string[]).includes(String(value)) ? leafSizeLabel(value as (typeof LEAF_SIZES)[number], system) : String(value);
    case 'colour':
      return colourOf(String(value)).label;
    case 'bark':
      return (BARKS as readonly string[]).includes(String(value)) ? BARK_LABELS[value as (typeof BARKS)[number]] : String(value);
    case 'habit':
      return (HABITS as readonly string[]).includes(String(value)) ? HABIT_LABELS[value as (typeof HABITS)[number]] : String(value);
    case 'height':
      return (HEIGHT_CLASSES as readonly string[]).includes(String(value))
        ? heightClassLabel(value as (typeof HEIGHT_CLASSES)[number], system)
        : String(value);
  }
}

/** Every answer a question can take, in vocabulary order (the likely ones are put first by the caller). */
export function allOptions(trait: FinderQuestion): (string | number)[] {
  switch (trait) {
    case 'leafForm':
      return [...LEAF_FORMS];
    case 'lobeCount': {
      const out: number[] = [];
      // Counts above 13 are miscounts on maples; the vocabulary still accepts them from a typed link.
      for (let n = LOBE_COUNT_MIN; n <= Math.min(LOBE_COUNT_MAX, 13); n++) out.push(n);
      return out;
    }
    case 'leafSize':
      return [...LEAF_SIZES];
    case 'colour':
      return PLANT_COLOURS.map((c) => c.id);
    case 'bark':
      return [...BARKS];
    case 'habit':
      return [...HABITS];
    case 'height':
      return [...HEIGHT_CLASSES];
  }
}

/**
 * Options with the likely answers first (as the next-question ranking gives them, most likely
 * first) and then the rest in vocabulary order, each once.
 */
export function orderedOptions(trait: FinderQuestion, likely: readonly { value: string | number }[]): { value: string | number; likely: boolean }[] {
  const all = allOptions(trait);
  const known = new Set(all.map(String));
  const first = likely.map((o) => o.value).filter((v) => known.has(String(v)));
  const seen = new Set(first.map(String));
  return [...first.map((value) => ({ value, likely: true })), ...all.filter((v) => !seen.has(String(v))).map((value) => ({ value, likely: false }))];
}

/** What the learner said for one trait, e.g. "Lace, cut to the base", "about 3 m", or null when unanswered. */
export function answerText(trait: FinderTrait, answers: FinderAnswers, system: UnitSystem): string | null {
  switch (trait) {
    case 'leafForm':
      return answers.leafForm ? LEAF_FORM_SHORT[answers.leafForm] : null;
    case 'lobeCount':
      return answers.lobeCount === undefined ? null : optionText('lobeCount', answers.lobeCount, system);
    case 'leafSize':
      return answers.leafSize ? leafSizeLabel(answers.leafSize, system) : null;
    case 'colour':
      return answers.colour ? colourOf(answers.colour.colour).label : null;
    case 'bark':
      return answers.bark ? BARK_LABELS[answers.bark] : null;
    case 'habit':
      return answers.habit ? HABIT_LABELS[answers.habit] : null;
    case 'height': {
      const h = answers.height;
      if (h === undefined) return null;
      if (typeof h === 'string') return heightClassLabel(h, system);
      return h.min === h.max ? `About ${heightText(h, system)}` : heightText(h, system);
    }
    case 'growthRate':
      return answers.growthRate ? GROWTH_LABELS[answers.growthRate] : null;
    case 'sunTolerance':
      return answers.sunTolerance ? SUN_LABELS[answers.sunTolerance] : null;
    case 'containerSuitability':
      return answers.containerSuitability ? CONTAINER_LABELS[answers.containerSuitability] : null;
  }
}

/** What the record says for one trait, in words, or null when it does not say. */
export function recordValueText(trait: FinderTrait, t: TraitProfile, answers: FinderAnswers, system: UnitSystem): string | null {
  switch (trait) {
    case 'leafForm':
      return t.leafForm ? LEAF_FORM_SHORT[t.leafForm] : null;
    case 'lobeCount':
      return t.lobeCount ? lobeText(t.lobeCount) : null;
    case 'leafSize':
      return t.leafSize ? leafSizeLabel(t.leafSize, system) : null;
    case 'colour': {
      const season = answers.colour?.season;
      const seen = season ? t.colours?.[season] : undefined;
      return seen ? colourListText(seen) : null;
    }
    case 'bark':
      return t.bark ? joinList(t.bark.map((b) => BARK_LABELS[b])) : null;
    case 'habit':
      return t.habit ? joinList(t.habit.map((h) => HABIT_LABELS[h])) : null;
    case 'height': {
      const r = recordHeightRange(t);
      return r ? heightText(r, system) : null;
    }
    case 'growthRate':
      return t.growthRate ? GROWTH_LABELS[t.growthRate] : null;
    case 'sunTolerance':
      return t.sunTolerance ? joinList(t.sunTolerance.map((s) => SUN_LABELS[s])) : null;
    case 'containerSuitability':
      return t.containerSuitability ? CONTAINER_LABELS[t.containerSuitability] : null;
  }
}

/** How one answer relates to a candidate. */
export type EvidenceKind = 'matched' | 'partial' | 'conflicted';

/** One chip on a candidate card. */
export interface EvidenceChip {
  kind: EvidenceKind;
  trait: FinderTrait;
  /** Visible text: "Shape: weeping or low mound". */
  text: string;
  /** Full sentence for screen readers and the tooltip. */
  description: string;
}

const MARK: Record<EvidenceKind, string> = { matched: '✓', partial: '≈', conflicted: '✗' };
/** The mark each kind of chip starts with; the words carry the meaning too, never the colour alone. */
export const EVIDENCE_MARK = MARK;

/**
 * The chips of a candidate: conflicts first (they are what rules a tree out), then close answers,
 * then matches; each names the trait and what the record says, and the description adds what the
 * learner answered.
 */
export function evidenceChips(
  c: { matched: FinderTrait[]; partial: FinderTrait[]; conflicted: FinderTrait[]; traits: TraitProfile | null },
  answers: FinderAnswers,
  system: UnitSystem,
): EvidenceChip[] {
  const traits = c.traits ?? {};
  const chip = (kind: EvidenceKind, trait: FinderTrait): EvidenceChip => {
    const name = questionName(trait, answers.colour?.season);
    const record = recordValueText(trait, traits, answers, system);
    const said = answerText(trait, answers, system);
    const verdict = kind === 'matched' ? 'matches' : kind === 'partial' ? 'is close to' : 'does not match';
    return {
      kind,
      trait,
      text: record ? `${name}: ${record.charAt(0).toLowerCase()}${record.slice(1)}` : name,
      description: `${name} ${verdict} your answer${said ? ` (${said.charAt(0).toLowerCase()}${said.slice(1)})` : ''}${record ? `; this record says ${record.charAt(0).toLowerCase()}${record.slice(1)}` : ''}.`,
    };
  };
  return [...c.conflicted.map((t) => chip('conflicted', t)), ...c.partial.map((t) => chip('partial', t)), ...c.matched.map((t) => chip('matched', t))];
}

/** A score 0..1 as a whole percent for the bar's label. */
export function scorePercent(score: number): number {
  if (!Number.isFinite(score)) return 0;
  return Math.round(Math.min(1, Math.max(0, score)) * 100);
}

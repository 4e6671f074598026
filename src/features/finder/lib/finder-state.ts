import type { z } from 'zod';
import { answeredTraits, type FinderAnswers } from '@shared/finder/score';
import type { FinderQuestion } from '@shared/finder/next-question';
import {
  barkSchema,
  habitSchema,
  heightClassSchema,
  leafFormSchema,
  leafSizeSchema,
  LOBE_COUNT_MAX,
  LOBE_COUNT_MIN,
  plantColourSchema,
  seasonSchema,
  type Bark,
  type Habit,
  type HeightClass,
  type LeafForm,
  type LeafSize,
  type PlantColour,
  type Season,
} from '@shared/traits';

/**
 * The finder's state lives in the address (`/finder?leafForm=dissectum&season=spring&colour=deep-red`),
 * so the back button undoes an answer, a reload keeps them and a learner can share a half-done key.
 */
export interface FinderState {
  answers: FinderAnswers;
  /** The season the learner is looking in; the colour answer belongs to it. */
  season: Season | null;
}

/** The value each question takes from the page. Height is a class, or "about N metres" as a point. */
export interface QuestionValue {
  leafForm: LeafForm;
  lobeCount: number;
  leafSize: LeafSize;
  colour: PlantColour;
  bark: Bark;
  habit: Habit;
  height: HeightClass | { min: number; max: number };
}

/** Largest height a learner can type, in metres; above it the answer is taken as a typo. */
export const MAX_TYPED_HEIGHT_M = 100;

function parseHeight(raw: string | null): FinderAnswers['height'] {
  if (!raw) return undefined;
  const cls = heightClassSchema.safeParse(raw);
  if (cls.success) return cls.data;
  if (!/^\d+(\.\d+)?$/.test(raw)) return undefined;
  const m = Number(raw);
  return m > 0 && m <= MAX_TYPED_HEIGHT_M ? { min: m, max: m } : undefined;
}

/**
 * Reads the finder state from the address. Values that are not in the vocabulary are dropped one
 * by one (a bad link still opens the finder with what it could read); a colour without a season is
 * dropped because "red" means nothing without knowing when it was seen.
 */
export function readFinderState(params: URLSearchParams): FinderState {
  const answers: FinderAnswers = {};
  const pick = <T,>(key: string, schema: z.ZodType<T>): T | undefined => {
    const raw = params.get(key);
    if (raw === null) return undefined;
    const r = schema.safeParse(raw);
    return r.success ? r.data : undefined;
  };
  const leafForm = pick('leafForm', leafFormSchema);
  if (leafForm) answers.leafForm = leafForm;
  const lobes = params.get('lobes');
  if (lobes !== null && /^\d{1,2}$/.test(lobes)) {
    const n = Number(lobes);
    if (n >= LOBE_COUNT_MIN && n <= LOBE_COUNT_MAX) answers.lobeCount = n;
  }
  const leafSize = pick('leafSize', leafSizeSchema);
  if (leafSize) answers.leafSize = leafSize;
  const season = pick('season', seasonSchema) ?? null;
  const colour = pick('colour', plantColourSchema);
  if (colour && season) answers.colour = { season, colour };
  const bark = pick('bark', barkSchema);
  if (bark) answers.bark = bark;
  const habit = pick('habit', habitSchema);
  if (habit) answers.habit = habit;
  const height = parseHeight(params.get('height'));
  if (height) answers.height = height;
  return { answers, season };
}

/** The address form of a state, in a fixed order so equal states give equal links. */
export function writeFinderState(state: FinderState): URLSearchParams {
  const p = new URLSearchParams();
  const a = state.answers;
  if (a.leafForm) p.set('leafForm', a.leafForm);
  if (a.lobeCount !== undefined) p.set('lobes', String(a.lobeCount));
  if (a.leafSize) p.set('leafSize', a.leafSize);
  if (state.season) p.set('season', state.season);
  if (a.colour && state.season) p.set('colour', a.colour.colour);
  if (a.bark) p.set('bark', a.bark);
  if (a.habit) p.set('habit', a.habit);
  if (a.height !== undefined) p.set('height', typeof a.height === 'string' ? a.height : String(a.height.min));
  return p;
}

/** The state with one question answered, or cleared when `value` is undefined. */
export function withAnswer<K extends FinderQuestion>(state: FinderState, trait: K, value: QuestionValue[K] | undefined): FinderState {
  const answers: FinderAnswers = { ...state.answers };
  if (value === undefined) {
    delete answers[trait];
    return { ...state, answers };
  }
  if (trait === 'colour') {
    if (!state.season) return state;
    answers.colour = { season: state.season, colour: value as PlantColour };
  } else {
    (answers as Record<string, unknown>)[trait] = value;
  }
  return { ...state, answers };
}

/** A new season; a colour seen in another season no longer applies, so it is cleared. */
export function withSeason(state: FinderState, season: Season | null): FinderState {
  if (season === state.season) return state;
  const answers: FinderAnswers = { ...state.answers };
  delete answers.colour;
  return { answers, season };
}

/** How many questions the learner has answered. */
export function answeredCount(state: FinderState): number {
  return answeredTraits(state.answers).length;
}

/** True when `value` is the learner's current answer to `trait` (for pressed buttons). */
export function isCurrentAnswer(state: FinderState, trait: FinderQuestion, value: string | number): boolean {
  const a = state.answers;
  if (trait === 'colour') return a.colour?.colour === value;
  if (trait === 'height') return typeof a.height === 'string' && a.height === value;
  return a[trait] === value;
}

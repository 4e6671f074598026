import { z } from 'zod';
import { LearningInputError } from '../learning-error';
import {
  CONTAINER_SUITABILITIES,
  GROWTH_RATES,
  HEIGHT_CLASS_M,
  LEAF_SIZES,
  LOBE_COUNT_MAX,
  LOBE_COUNT_MIN,
  barkSchema,
  colourFamily,
  containerSuitabilitySchema,
  growthRateSchema,
  habitSchema,
  heightClassSchema,
  heightRangeSchema,
  leafFormSchema,
  leafSizeSchema,
  plantColourSchema,
  seasonSchema,
  sunToleranceSchema,
  type TraitProfile,
} from '../traits';

/** A candidate as the finder sees it: a cultivar record's id and traits. */
export interface FinderRecord {
  id: string;
  traits: TraitProfile;
}

/** Traits a learner can answer in the tree finder, in the order they are listed. */
export const FINDER_TRAITS = [
  'leafForm',
  'lobeCount',
  'leafSize',
  'colour',
  'bark',
  'habit',
  'height',
  'growthRate',
  'sunTolerance',
  'containerSuitability',
] as const;
/** One answerable trait; also the names in matched/partial/conflicted/unknown. */
export type FinderTrait = (typeof FINDER_TRAITS)[number];

/**
 * What the learner has said so far. Colour is "the colour now", so it carries the season it was
 * seen in; height is a class or a rough range in metres. Unanswered traits are left out.
 */
export const finderAnswersSchema = z
  .object({
    leafForm: leafFormSchema.optional(),
    lobeCount: z.number().int().min(LOBE_COUNT_MIN).max(LOBE_COUNT_MAX).optional(),
    leafSize: leafSizeSchema.optional(),
    colour: z.object({ season: seasonSchema, colour: plantColourSchema }).strict().optional(),
    bark: barkSchema.optional(),
    habit: habitSchema.optional(),
    height: z.union([heightClassSchema, heightRangeSchema]).optional(),
    growthRate: growthRateSchema.optional(),
    sunTolerance: sunToleranceSchema.optional(),
    containerSuitability: containerSuitabilitySchema.optional(),
  })
  .strict();
/** Validated finder answers. */
export type FinderAnswers = z.infer<typeof finderAnswersSchema>;

/**
 * Score shrinkage: the mean similarity is pulled toward 0.5 by one imaginary neutral answer, so a
 * record that matched one trait out of one (0.75) ranks below one that matched three of three
 * (0.875). This is the "small confidence factor"; traits the record lacks are not counted at all.
 */
export const SCORE_PRIOR = 0.5;
/** How many imaginary neutral answers the score is shrunk by. */
export const SCORE_PRIOR_WEIGHT = 1;

/**
 * The weights assume a learner's answer is right 9 times in 10 (our assumption, not a measured
 * figure): each full match multiplies a record's weight by √9 = 3, each conflict by 1/3, a partial
 * match (0.5) or an unknown trait by 1. weight ∝ exp(β · Σ (s − 0.5)) with β = ln 9.
 */
export const ANSWER_RELIABILITY = 0.9;
/** β = ln(0.9 / 0.1) = ln 9, the log-odds of a right answer. */
export const LIKELIHOOD_BETA = Math.log(ANSWER_RELIABILITY / (1 - ANSWER_RELIABILITY));

/** One ranked candidate with the evidence behind its place, so the UI can say why. */
export interface ScoredCandidate {
  id: string;
  /** 0..1; 0.5 means "no evidence either way". */
  score: number;
  /** Normalised likelihood weight (all candidates sum to 1), the prior for the next question. */
  weight: number;
  matched: FinderTrait[];
  /** Near misses that earned half credit (neighbouring size, same colour family, one lobe off, height within 25 %). */
  partial: FinderTrait[];
  conflicted: FinderTrait[];
  /** Answered traits the record does not give. */
  unknown: FinderTrait[];
}

interface Range {
  min: number;
  max: number;
}

/**
 * Whether two ranges share more than an edge; a single point counts when it lies inside the other
 * range. Bands meeting at 4 m ("small" 2–4, "medium" 4–8) therefore do not overlap.
 */
export function rangesOverlap(a: Range, b: Range): boolean {
  const lo = Math.max(a.min, b.min);
  const hi = Math.min(a.max, b.max);
  if (lo < hi) return true;
  return lo === hi && (a.min === a.max || b.min === b.max);
}

/** Height range a record stands for: its metres when given, otherwise its class band. */
export function recordHeightRange(traits: TraitProfile): Range | null {
  if (traits.heightM) return traits.heightM;
  if (traits.heightClass) return HEIGHT_CLASS_M[traits.heightClass];
  return null;
}

function ordinal<T extends string>(scale: readonly T[], a: T, b: T): number {
  const d = Math.abs(scale.indexOf(a) - scale.indexOf(b));
  return d === 0 ? 1 : d === 1 ? 0.5 : 0;
}

/**
 * Similarity 0..1 of one answered trait to a record, or null when the record does not give the
 * trait. Tolerances are Grovewalk's own choices: lobe counts one outside the record's range
 * (a small basal lobe is easily missed) and neighbouring size classes score 0.5.
 */
export function traitSimilarity(trait: FinderTrait, answers: FinderAnswers, t: TraitProfile): number | null {
  switch (trait) {
    case 'leafForm':
      return t.leafForm === undefined || answers.leafForm === undefined ? null : t.leafForm === answers.leafForm ? 1 : 0;
    case 'lobeCount': {
      const n = answers.lobeCount;
      if (n === undefined || !t.lobeCount) return null;
      if (n >= t.lobeCount.min && n <= t.lobeCount.max) return 1;
      return n === t.lobeCount.min - 1 || n === t.lobeCount.max + 1 ? 0.5 : 0;
    }
    case 'leafSize':
      return t.leafSize === undefined || answers.leafSize === undefined ? null : ordinal(LEAF_SIZES, t.leafSize, answers.leafSize);
    case 'colour': {
      const c = answers.colour;
      const seen = c ? t.colours?.[c.season] : undefined;
      if (!c || !seen) return null;
      if (seen.includes(c.colour)) return 1;
      const fam = colourFamily(c.colour);
      return seen.some((s) => colourFamily(s) === fam) ? 0.5 : 0;
    }
    case 'bark':
      return !t.bark || answers.bark === undefined ? null : t.bark.includes(answers.bark) ? 1 : 0;
    case 'habit':
      return !t.habit || answers.habit === undefined ? null : t.habit.includes(answers.habit) ? 1 : 0;
    case 'height': {
      const r = recordHeightRange(t);
      const h = answers.height;
      if (!r || h === undefined) return null;
      const a = typeof h === 'string' ? HEIGHT_CLASS_M[h] : h;
      if (rangesOverlap(a, r)) return 1;
      // Heights are guessed: a gap of at most a quarter of the higher facing edge earns half credit.
      const lo = Math.max(a.min, r.min);
      const hi = Math.min(a.max, r.max);
      return lo - hi <= 0.25 * lo ? 0.5 : 0;
    }
    case 'growthRate':
      return t.growthRate === undefined || answers.growthRate === undefined ? null : ordinal(GROWTH_RATES, t.growthRate, answers.growthRate);
    case 'sunTolerance':
      return !t.sunTolerance || answers.sunTolerance === undefined ? null : t.sunTolerance.includes(answers.sunTolerance) ? 1 : 0;
    case 'containerSuitability':
      return t.containerSuitability === undefined || answers.containerSuitability === undefined
        ? null
        : ordinal(CONTAINER_SUITABILITIES, t.containerSuitability, answers.containerSuitability);
  }
}

/** Validates finder answers from a request or the URL; throws `invalid_answer` with the first problem. */
export function parseFinderAnswers(input: unknown): FinderAnswers {
  const parsed = finderAnswersSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const where = issue && issue.path.length ? issue.path.join('.') : 'answers';
    throw new LearningInputError('invalid_answer', `Finder answer "${where}" is not valid: ${issue?.message ?? 'unreadable'}.`);
  }
  return parsed.data;
}

/** The traits the learner has answered, in `FINDER_TRAITS` order. */
export function answeredTraits(answers: FinderAnswers): FinderTrait[] {
  return FINDER_TRAITS.filter((k) => answers[k] !== undefined);
}

/** Throws `invalid_records` for a non-array, a record without a string id, or a repeated id. */
export function checkRecords(records: readonly FinderRecord[]): void {
  if (!Array.isArray(records)) throw new LearningInputError('invalid_records', 'Records must be a list.');
  const seen = new Set<string>();
  for (const r of records) {
    if (!r || typeof r.id !== 'string' || r.id === '') throw new LearningInputError('invalid_records', 'Every record needs a non-empty string id.');
    if (seen.has(r.id)) throw new LearningInputError('invalid_records', `Record "${r.id}" appears twice.`);
    seen.add(r.id);
  }
}

/**
 * Ranks candidates for the tree finder, a multi-access key: answers may come in any order and
 * each is compared only where the record gives that trait. A query with no answers is not an
 * error: every record scores 0.5 with equal weight, in the order given (callers may pre-sort,
 * e.g. by how often a tree appears in tours). Ties keep that order too, after the higher weight.
 */
export function scoreCandidates(records: readonly FinderRecord[], answers: FinderAnswers): ScoredCandidate[] {
  checkRecords(records);
  const checked = parseFinderAnswers(answers);
  const traits = answeredTraits(checked);

  const rows = records.map((rec, order) => {
    const out: ScoredCandidate = { id: rec.id, score: 0, weight: 0, matched: [], partial: [], conflicted: [], unknown: [] };
    let sum = 0;
    let n = 0;
    let logLik = 0;
    for (const trait of traits) {
      const s = traitSimilarity(trait, checked, rec.traits ?? {});
      if (s === null) {
        out.unknown.push(trait);
        continue;
      }
      sum += s;
      n += 1;
      logLik += LIKELIHOOD_BETA * (s - 0.5);
      (s === 1 ? out.matched : s === 0 ? out.conflicted : out.partial).push(trait);
    }
    out.score = (sum + SCORE_PRIOR * SCORE_PRIOR_WEIGHT) / (n + SCORE_PRIOR_WEIGHT);
    return { out, logLik, order };
  });

  // Normalise in log space so that many conflicts cannot underflow to 0/0.
  const top = Math.max(...rows.map((r) => r.logLik));
  const total = rows.reduce((acc, r) => acc + Math.exp(r.logLik - top), 0);
  for (const r of rows) r.out.weight = Math.exp(r.logLik - top) / total;

  rows.sort((a, b) => b.out.score - a.out.score || b.out.weight - a.out.weight || a.order - b.order);
  return rows.map((r) => r.out);
}

import { LearningInputError } from '../learning-error';
import { HEIGHT_CLASSES, HEIGHT_CLASS_M, SEASONS, type Season, type TraitProfile } from '../traits';
import {
  FINDER_TRAITS,
  rangesOverlap,
  recordHeightRange,
  scoreCandidates,
  type FinderAnswers,
  type FinderRecord,
  type FinderTrait,
} from './score';

/**
 * Questions the finder may ask: what a learner can see on the tree in front of them. Growth rate,
 * sun tolerance and container suitability can be answered but are never asked, because nobody can
 * read them off a tree in a tour.
 */
export const FINDER_QUESTIONS = ['leafForm', 'colour', 'habit', 'bark', 'lobeCount', 'leafSize', 'height'] as const satisfies readonly FinderTrait[];
/** A trait the finder may ask about. */
export type FinderQuestion = (typeof FINDER_QUESTIONS)[number];

/**
 * Offered, in this order, before anything has been answered: what a beginner can tell at a glance.
 * Ranking by information gain alone at that point tends to put lobe counting first, which
 * beginners get wrong on dissected leaves; one glance-level answer makes the gains meaningful.
 */
export const STARTER_QUESTIONS = ['leafForm', 'colour', 'habit'] as const satisfies readonly FinderQuestion[];

/** A likely answer, so the question can offer the answers that matter first. */
export interface AnswerOption {
  value: string | number;
  /** Chance of this answer under the current candidate weights. */
  probability: number;
}

/** A question with what it is worth, so the UI can show more than the top one. */
export interface RankedQuestion {
  trait: FinderQuestion;
  /** Expected information gain in bits: H(candidates) − E[H(candidates | answer)]. */
  gain: number;
  /** Share of candidate weight whose record gives this trait (how much the answer can be checked). */
  coverage: number;
  /** Likely answers, most likely first; the season the colour question is about when it is "colour". */
  options: AnswerOption[];
  season?: Season;
}

/** The ranked questions and the current uncertainty (0 bits = one candidate left). */
export interface NextQuestionResult {
  /** "starter" when nothing is answered yet (fixed glance-level order), otherwise "gain" (ranked by gain). */
  mode: 'starter' | 'gain';
  /** Entropy of the current candidate weights in bits. */
  entropy: number;
  questions: RankedQuestion[];
}

/** Context the records cannot give. */
export interface NextQuestionOptions {
  /** The season the learner is looking at; the colour question is only asked when it is known. */
  season?: Season;
}

/** Shannon entropy in bits (log2) of a probability list; zero entries contribute nothing. */
export function entropyBits(probabilities: readonly number[]): number {
  let h = 0;
  for (const p of probabilities) if (p > 0) h -= p * Math.log2(p);
  return h;
}

type Dist = Map<string | number, number>;

function uniform(values: readonly (string | number)[]): Dist {
  const d: Dist = new Map();
  for (const v of values) d.set(v, 1 / values.length);
  return d;
}

/**
 * How a record would answer a question, as a distribution over answers, or null when the record
 * does not give the trait. A record that lists several values (bark, habit, colours) or a range
 * (lobes, height) answers each with equal chance.
 */
function answerDistribution(q: FinderQuestion, t: TraitProfile, season: Season | undefined): Dist | null {
  switch (q) {
    case 'leafForm':
      return t.leafForm ? uniform([t.leafForm]) : null;
    case 'leafSize':
      return t.leafSize ? uniform([t.leafSize]) : null;
    case 'colour': {
      const seen = season ? t.colours?.[season] : undefined;
      return seen ? uniform(seen) : null;
    }
    case 'habit':
      return t.habit ? uniform(t.habit) : null;
    case 'bark':
      return t.bark ? uniform(t.bark) : null;
    case 'lobeCount': {
      if (!t.lobeCount) return null;
      const values: number[] = [];
      for (let n = t.lobeCount.min; n <= t.lobeCount.max; n++) values.push(n);
      return uniform(values);
    }
    case 'height': {
      const r = recordHeightRange(t);
      if (!r) return null;
      const classes = HEIGHT_CLASSES.filter((c) => rangesOverlap(HEIGHT_CLASS_M[c], r));
      return uniform(classes.length ? classes : ['large']);
    }
  }
}

/**
 * Expected information gain of one question (ID3-style: Quinlan 1986, from memory). The answer
 * distribution comes from the candidates' weights: P(a) = Σᵢ pᵢ·P(a | i). Records that do not give
 * the trait answer like the weighted pool of those that do, so a gap in the data neither helps nor
 * hurts them. Answers are assumed to follow the record exactly here; the finder's scoring, not the
 * question choice, absorbs learner mistakes.
 */
function rankQuestion(
  q: FinderQuestion,
  records: readonly FinderRecord[],
  weights: readonly number[],
  h0: number,
  season: Season | undefined,
): RankedQuestion | null {
  const dists = records.map((r) => answerDistribution(q, r.traits ?? {}, season));
  let coverage = 0;
  const pool: Dist = new Map();
  dists.forEach((d, i) => {
    if (!d) return;
    const w = weights[i] as number;
    coverage += w;
    for (const [a, pa] of d) pool.set(a, (pool.get(a) ?? 0) + w * pa);
  });
  if (coverage === 0) return null;
  for (const [a, v] of pool) pool.set(a, v / coverage);

  // joint[a][i] = pᵢ·P(a | i)
  const joint = new Map<string | number, number[]>();
  dists.forEach((d, i) => {
    const w = weights[i] as number;
    for (const [a, pa] of d ?? pool) {
      let col = joint.get(a);
      if (!col) joint.set(a, (col = new Array<number>(records.length).fill(0)));
      col[i] = (col[i] as number) + w * pa;
    }
  });
  let expected = 0;
  const options: AnswerOption[] = [];
  for (const [a, col] of joint) {
    const pA = col.reduce((s, x) => s + x, 0);
    if (pA <= 0) continue;
    options.push({ value: a, probability: pA });
    expected += pA * entropyBits(col.map((x) => x / pA));
  }
  options.sort((x, y) => y.probability - x.probability || String(x.value).localeCompare(String(y.value)));
  const gain = Math.max(0, h0 - expected);
  const ranked: RankedQuestion = { trait: q, gain: gain < 1e-12 ? 0 : gain, coverage, options };
  if (q === 'colour' && season) ranked.season = season;
  return ranked;
}

/**
 * The finder's next question: every visible trait not yet answered, ranked by how well its answer
 * is expected to split the remaining candidates, weighted by the current scores. With no answers
 * yet the result is the fixed starter list (`STARTER_QUESTIONS`, still with their gains) in
 * "starter" mode, unless no candidate gives any starter trait, in which case it falls back to the
 * gain ranking. Questions no candidate can answer are left out; an empty record list gives no
 * questions. A colour answer counts as "colour answered" whatever its season.
 */
export function nextQuestion(
  records: readonly FinderRecord[],
  answers: FinderAnswers,
  opts: NextQuestionOptions = {},
): NextQuestionResult {
  if (opts.season !== undefined && !SEASONS.includes(opts.season)) {
    throw new LearningInputError('invalid_argument', `Season must be one of ${SEASONS.join(', ')}.`);
  }
  const scored = scoreCandidates(records, answers);
  const weightById = new Map(scored.map((s) => [s.id, s.weight]));
  const weights = records.map((r) => weightById.get(r.id) as number);
  const entropy = entropyBits(weights);

  const answered = new Set<FinderTrait>(FINDER_TRAITS.filter((k) => answers[k] !== undefined));
  const ask = (qs: readonly FinderQuestion[]) =>
    qs
      .filter((q) => !answered.has(q) && (q !== 'colour' || opts.season !== undefined))
      .map((q) => rankQuestion(q, records, weights, entropy, opts.season))
      .filter((q): q is RankedQuestion => q !== null);

  if (answered.size === 0) {
    const starters = ask(STARTER_QUESTIONS);
    if (starters.length) return { mode: 'starter', entropy, questions: starters };
  }
  const order = (q: FinderQuestion) => FINDER_QUESTIONS.indexOf(q);
  const questions = ask(FINDER_QUESTIONS).sort((a, b) => (Math.abs(b.gain - a.gain) > 1e-9 ? b.gain - a.gain : order(a.trait) - order(b.trait)));
  return { mode: 'gain', entropy, questions };
}

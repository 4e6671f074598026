import { describe, expect, it } from 'vitest';
import { STARTER_QUESTIONS, entropyBits, nextQuestion } from '@shared/finder/next-question';
import type { FinderRecord } from '@shared/finder/score';
import type { TraitProfile } from '@shared/traits';
import { LearningInputError } from '@shared/learning-error';

// INVENTED records (fictional Millbrook Garden Club cultivars). Every record is "medium"-leaved and
// the learner has answered leafSize = medium, so all start with equal weight and the finder is in
// "gain" mode, not "starter" mode.
const rec = (id: string, traits: TraitProfile): FinderRecord => ({ id: `invented-${id}`, traits: { leafSize: 'medium', ...traits } });
const sameSize = { leafSize: 'medium' } as const;

function gainOf(result: ReturnType<typeof nextQuestion>, trait: string): number | undefined {
  return result.questions.find((q) => q.trait === trait)?.gain;
}

describe('entropy in bits (Shannon 1948, H = −Σ p log2 p)', () => {
  it('matches values worked by hand', () => {
    expect(entropyBits([0.25, 0.25, 0.25, 0.25])).toBeCloseTo(2, 12);
    expect(entropyBits([0.5, 0.5])).toBeCloseTo(1, 12);
    expect(entropyBits([1, 0])).toBe(0);
    // H(0.9, 0.1) = 0.9·0.152003 + 0.1·3.321928 = 0.468996
    expect(entropyBits([0.9, 0.1])).toBeCloseTo(0.468996, 6);
  });
});

/*
 * Set 1, four equally likely candidates (p = 1/4 each, H = log2 4 = 2 bits):
 *   leafForm  A,B dissectum | C,D palmatum  → 2/2 split: each answer has P = 1/2 and leaves 2 equal
 *             candidates (H = 1), expected H after = 1, gain = 2 − 1 = 1 bit
 *   bark      A,B,C green | D grey          → P(green) = 3/4 leaves 3 (H = log2 3 = 1.584963),
 *             P(grey) = 1/4 leaves 1 (H = 0); expected 0.75 × 1.584963 = 1.188722; gain 0.811278
 *   habit     all upright                   → no split: gain 0
 *   lobes, height: no record gives them     → not asked
 */
describe('nextQuestion ranks by expected information gain (hand-worked, log2; ID3 gain, Quinlan 1986, from memory)', () => {
  const set1 = [
    rec('a', { leafForm: 'dissectum', bark: ['green'], habit: ['upright'] }),
    rec('b', { leafForm: 'dissectum', bark: ['green'], habit: ['upright'] }),
    rec('c', { leafForm: 'palmatum', bark: ['green'], habit: ['upright'] }),
    rec('d', { leafForm: 'palmatum', bark: ['grey'], habit: ['upright'] }),
  ];

  it('the 2/2 split comes first with 1 bit, the non-splitting trait last with 0', () => {
    const r = nextQuestion(set1, sameSize);
    expect(r.mode).toBe('gain');
    expect(r.entropy).toBeCloseTo(2, 12);
    expect(r.questions.map((q) => q.trait)).toEqual(['leafForm', 'bark', 'habit']);
    expect(gainOf(r, 'leafForm')).toBeCloseTo(1, 12);
    expect(gainOf(r, 'bark')).toBeCloseTo(0.811278, 6);
    expect(gainOf(r, 'habit')).toBe(0);
  });

  it('reports the answer distribution implied by the weights', () => {
    const bark = nextQuestion(set1, sameSize).questions.find((q) => q.trait === 'bark');
    expect(bark?.options).toEqual([
      { value: 'green', probability: 0.75 },
      { value: 'grey', probability: 0.25 },
    ]);
    expect(bark?.coverage).toBeCloseTo(1, 12);
  });

  /*
   * Set 2, after "dissected" (weights from scoring: A,B ×3, C,D ×1/3 → 0.45, 0.45, 0.05, 0.05):
   *   H before = 2·0.45·log2(1/0.45) + 2·0.05·log2(1/0.05) = 1.036803 + 0.432193 = 1.468996 bits
   *   bark  A,C green | B,D grey: P(green) = 0.5, posterior A 0.9, C 0.1 → H = 0.468996 (same for grey)
   *         gain = 1.468996 − 0.468996 = 1 bit
   *   habit A,B weeping | C,D upright (repeats what leaf form said): P(weeping) = 0.9 → A,B 0.5/0.5,
   *         H = 1; P(upright) = 0.1 → H = 1; expected 1; gain = 0.468996
   */
  it('uses the current candidate weights: a question that repeats an earlier answer is worth less', () => {
    const set2 = [
      rec('a', { leafForm: 'dissectum', bark: ['green'], habit: ['weeping'] }),
      rec('b', { leafForm: 'dissectum', bark: ['grey'], habit: ['weeping'] }),
      rec('c', { leafForm: 'palmatum', bark: ['green'], habit: ['upright'] }),
      rec('d', { leafForm: 'palmatum', bark: ['grey'], habit: ['upright'] }),
    ];
    const r = nextQuestion(set2, { ...sameSize, leafForm: 'dissectum' });
    expect(r.entropy).toBeCloseTo(1.468996, 6);
    expect(r.questions.map((q) => q.trait)).toEqual(['bark', 'habit']);
    expect(gainOf(r, 'bark')).toBeCloseTo(1, 9);
    expect(gainOf(r, 'habit')).toBeCloseTo(0.468996, 6);
  });

  /*
   * Set 3, records listing several values answer each with equal chance:
   *   A weeping | B weeping or mounding | C mounding | D upright, p = 1/4 each.
   * Route 1 (posterior): P(weeping) = (1 + 0.5)/4 = 0.375 → A 2/3, B 1/3, H = 0.918296; mounding the same;
   *   P(upright) = 0.25 → D alone, H = 0; expected 0.75 × 0.918296 = 0.688722; gain 2 − 0.688722 = 1.311278.
   * Route 2 (mutual information, I(C;A) = H(A) − H(A|C), Cover & Thomas, Elements of Information
   *   Theory, ch. 2, from memory): H(A) = 2·0.375·log2(1/0.375) + 0.25·2 = 1.061278 + 0.5 = 1.561278;
   *   H(A|C) = ¼·H(B's answer) = ¼·1 = 0.25; I = 1.311278. Both routes agree.
   */
  it('handles records that list several values, agreeing with the mutual-information identity', () => {
    const set3 = [
      rec('a', { habit: ['weeping'] }),
      rec('b', { habit: ['weeping', 'mounding'] }),
      rec('c', { habit: ['mounding'] }),
      rec('d', { habit: ['upright'] }),
    ];
    const habit = nextQuestion(set3, sameSize).questions.find((q) => q.trait === 'habit');
    expect(habit?.gain).toBeCloseTo(1.311278, 6);
    expect(habit?.options.map((o) => [o.value, o.probability])).toEqual([
      ['mounding', 0.375],
      ['weeping', 0.375],
      ['upright', 0.25],
    ]);
  });

  /*
   * Set 4, a record without the trait answers like the weighted pool of those that have it:
   *   A dissectum, B palmatum, C unknown; p = 1/3 each; pool = ½ dissectum, ½ palmatum.
   *   P(dissectum) = 1/3 + 1/3·½ = ½ → A 2/3, C 1/3, H = 0.918296; palmatum the same.
   *   gain = log2 3 − 0.918296 = 1.584963 − 0.918296 = 0.666667 (exactly 2/3 bit); coverage 2/3.
   */
  it('treats a missing trait as neither help nor harm', () => {
    const set4 = [rec('a', { leafForm: 'dissectum' }), rec('b', { leafForm: 'palmatum' }), rec('c', {})];
    const leaf = nextQuestion(set4, sameSize).questions.find((q) => q.trait === 'leafForm');
    expect(leaf?.gain).toBeCloseTo(2 / 3, 9);
    expect(leaf?.coverage).toBeCloseTo(2 / 3, 9);
  });

  it('asks the colour question for the season being looked at, and not at all without one', () => {
    const set = [
      rec('a', { colours: { autumn: ['scarlet'], spring: ['lime'] } }),
      rec('b', { colours: { autumn: ['gold'], spring: ['lime'] } }),
    ];
    const autumn = nextQuestion(set, sameSize, { season: 'autumn' }).questions.find((q) => q.trait === 'colour');
    expect(autumn?.season).toBe('autumn');
    expect(autumn?.gain).toBeCloseTo(1, 12); // 1/1 split of two equal candidates: 1 − 0
    const spring = nextQuestion(set, sameSize, { season: 'spring' }).questions.find((q) => q.trait === 'colour');
    expect(spring?.gain).toBe(0); // both lime
    expect(nextQuestion(set, sameSize).questions.some((q) => q.trait === 'colour')).toBe(false);
  });
});

describe('no answers yet: the starter questions (documented fixed order)', () => {
  const set = [
    rec('a', { leafForm: 'dissectum', habit: ['weeping'], colours: { autumn: ['gold'] }, lobeCount: { min: 7, max: 9 } }),
    rec('b', { leafForm: 'palmatum', habit: ['upright'], colours: { autumn: ['scarlet'] }, lobeCount: { min: 5, max: 7 } }),
  ];

  it('offers leaf form, colour now and habit, in that order, with their gains', () => {
    const r = nextQuestion(set, {}, { season: 'autumn' });
    expect(r.mode).toBe('starter');
    expect(STARTER_QUESTIONS).toEqual(['leafForm', 'colour', 'habit']);
    expect(r.questions.map((q) => q.trait)).toEqual(['leafForm', 'colour', 'habit']);
    expect(r.questions.every((q) => Math.abs(q.gain - 1) < 1e-12)).toBe(true); // each splits 1/1
  });

  it('leaves out colour without a season, and falls back to gain when no record gives a starter trait', () => {
    expect(nextQuestion(set, {}).questions.map((q) => q.trait)).toEqual(['leafForm', 'habit']);
    const barkOnly: FinderRecord[] = [
      { id: 'invented-x', traits: { bark: ['green'] } },
      { id: 'invented-y', traits: { bark: ['grey'] } },
    ];
    const r = nextQuestion(barkOnly, {});
    expect(r.mode).toBe('gain');
    expect(r.questions.map((q) => q.trait)).toEqual(['bark']);
  });

  it('gives no questions for no records, and rejects a bad season or bad answers', () => {
    expect(nextQuestion([], {}).questions).toEqual([]);
    expect(() => nextQuestion(set, {}, { season: 'winter' as never })).toThrow(LearningInputError);
    expect(() => nextQuestion(set, { lobeCount: 40 })).toThrow(LearningInputError);
  });
});

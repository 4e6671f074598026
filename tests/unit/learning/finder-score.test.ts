import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { scoreCandidates, type FinderRecord } from '@shared/finder/score';
import { LearningInputError } from '@shared/learning-error';

function codeOf(fn: () => unknown): string | undefined {
  try {
    fn();
  } catch (e) {
    return e instanceof LearningInputError ? e.code : `not a LearningInputError: ${String(e)}`;
  }
  return undefined;
}

// INVENTED records: fictional cultivars of the fictional Millbrook Garden Club, not real plants.
const lace: FinderRecord = {
  id: "invented-millbrook-lace",
  traits: {
    leafForm: 'dissectum',
    lobeCount: { min: 7, max: 9 },
    colours: { autumn: ['gold', 'orange'] },
    habit: ['weeping', 'mounding'],
    heightM: { min: 1.5, max: 2.5 },
  },
};
const glow: FinderRecord = {
  id: 'invented-cinder-glow',
  traits: {
    leafForm: 'palmatum',
    lobeCount: { min: 5, max: 7 },
    colours: { autumn: ['scarlet'] },
    bark: ['coral-red'],
    habit: ['upright'],
    heightClass: 'medium',
  },
};
const lantern: FinderRecord = {
  id: 'invented-orchard-lantern',
  traits: { leafForm: 'dissectum', lobeCount: { min: 7, max: 9 }, colours: { autumn: ['deep-red'] }, habit: ['weeping'] },
};
const harbour: FinderRecord = { id: 'invented-quiet-harbour', traits: {} };
const records = [lace, glow, lantern, harbour];

/*
 * Hand-worked example. Answers: dissected leaf, 6 lobes, scarlet now in autumn, weeping, small (2–4 m).
 * Per-trait similarity s (1 match, 0.5 near, 0 conflict, – unknown):
 *
 *                 leafForm  lobes(6)        colour(scarlet)          habit  height(small 2–4 m)
 *   lace          1         0.5 (7–9, 1 off) 0 (gold/orange ≠ red)    1      1 (1.5–2.5 overlaps 2–4)
 *   glow          0         1 (5–7)          1                        0      0.5 (medium 4–8 only touches 4; gap 0 ≤ 25 %)
 *   lantern       1         0.5              0.5 (deep red, red family) 1     –
 *   harbour       –         –                –                        –      –
 *
 * score = (Σs + 0.5) / (n + 1):
 *   lace    (3.5 + 0.5) / 6 = 0.6667     glow  (2.5 + 0.5) / 6 = 0.5
 *   lantern (3.0 + 0.5) / 5 = 0.7        harbour (0 + 0.5) / 1 = 0.5
 * weight ∝ 9^Σ(s − 0.5):
 *   lace    9^(0.5 + 0 − 0.5 + 0.5 + 0.5) = 9^1 = 9
 *   glow    9^(−0.5 + 0.5 + 0.5 − 0.5 + 0) = 9^0 = 1
 *   lantern 9^(0.5 + 0 + 0 + 0.5) = 9
 *   harbour 9^0 = 1                       total 20 → 0.45, 0.05, 0.45, 0.05
 * Rank by score: lantern, lace, then glow and harbour tie on score and weight and keep input order.
 */
describe('scoreCandidates on a hand-worked example (invented records; expected values worked by hand above)', () => {
  const answers = {
    leafForm: 'dissectum',
    lobeCount: 6,
    colour: { season: 'autumn', colour: 'scarlet' },
    habit: 'weeping',
    height: 'small',
  } as const;
  const ranked = scoreCandidates(records, answers);
  const byId = new Map(ranked.map((r) => [r.id, r]));

  it('ranks lantern, lace, glow, harbour', () => {
    expect(ranked.map((r) => r.id)).toEqual([lantern.id, lace.id, glow.id, harbour.id]);
  });

  it('gives the hand-computed scores', () => {
    expect(byId.get(lace.id)?.score).toBeCloseTo(4 / 6, 12);
    expect(byId.get(glow.id)?.score).toBeCloseTo(0.5, 12);
    expect(byId.get(lantern.id)?.score).toBeCloseTo(0.7, 12);
    expect(byId.get(harbour.id)?.score).toBeCloseTo(0.5, 12);
  });

  it('gives the hand-computed likelihood weights', () => {
    expect(byId.get(lace.id)?.weight).toBeCloseTo(0.45, 12);
    expect(byId.get(glow.id)?.weight).toBeCloseTo(0.05, 12);
    expect(byId.get(lantern.id)?.weight).toBeCloseTo(0.45, 12);
    expect(byId.get(harbour.id)?.weight).toBeCloseTo(0.05, 12);
  });

  it('sorts each trait into matched, partial, conflicted and unknown', () => {
    expect(byId.get(lace.id)).toMatchObject({
      matched: ['leafForm', 'habit', 'height'],
      partial: ['lobeCount'],
      conflicted: ['colour'],
      unknown: [],
    });
    expect(byId.get(glow.id)).toMatchObject({
      matched: ['lobeCount', 'colour'],
      partial: ['height'],
      conflicted: ['leafForm', 'habit'],
    });
    expect(byId.get(lantern.id)).toMatchObject({ matched: ['leafForm', 'habit'], partial: ['lobeCount', 'colour'], unknown: ['height'] });
    // harbour has no traits: every answered trait is unknown, listed in finder order
    expect(byId.get(harbour.id)?.unknown).toEqual(['leafForm', 'lobeCount', 'colour', 'habit', 'height']);
  });
});

describe('scoreCandidates tolerance rules (Grovewalk rules, worked by hand)', () => {
  it('reads colour per season: an autumn answer ignores spring colours', () => {
    // INVENTED record. Spring purple-red, no autumn colour recorded → colour unknown, score stays 0.5.
    const spring: FinderRecord = { id: 'invented-spring-only', traits: { colours: { spring: ['purple-red'] } } };
    const [r] = scoreCandidates([spring], { colour: { season: 'autumn', colour: 'purple-red' } });
    expect(r?.unknown).toEqual(['colour']);
    expect(r?.score).toBe(0.5);
  });

  it('matches heights by overlap, and far heights conflict', () => {
    // dwarf 0–2 m vs record 10–12 m: gap 8 m > 25 % of 10 m → 0; score (0 + 0.5)/2 = 0.25
    const tall: FinderRecord = { id: 'invented-tall', traits: { heightM: { min: 10, max: 12 } } };
    expect(scoreCandidates([tall], { height: 'dwarf' })[0]?.score).toBe(0.25);
    // 9–11 m typed by the learner overlaps 10–12 → 1; score (1 + 0.5)/2 = 0.75
    expect(scoreCandidates([tall], { height: { min: 9, max: 11 } })[0]?.score).toBe(0.75);
  });

  it('lobe counts two outside the range conflict', () => {
    // 5–7 vs 9: two off → 0
    expect(scoreCandidates([glow], { lobeCount: 9 })[0]?.conflicted).toEqual(['lobeCount']);
  });
});

describe('bad input and empty queries', () => {
  it('a finder query with no answers is neutral: every record 0.5, equal weights, input order kept', () => {
    const ranked = scoreCandidates(records, {});
    expect(ranked.map((r) => r.id)).toEqual(records.map((r) => r.id));
    for (const r of ranked) {
      expect(r.score).toBe(0.5);
      expect(r.weight).toBeCloseTo(0.25, 12);
      expect([...r.matched, ...r.partial, ...r.conflicted, ...r.unknown]).toEqual([]);
    }
  });

  it('no records give no candidates', () => {
    expect(scoreCandidates([], { leafForm: 'palmatum' })).toEqual([]);
  });

  it('rejects malformed answers and repeated ids with typed errors', () => {
    expect(codeOf(() => scoreCandidates(records, { lobeCount: 6.5 }))).toBe('invalid_answer');
    expect(codeOf(() => scoreCandidates(records, { lobeCount: -1 }))).toBe('invalid_answer');
    expect(codeOf(() => scoreCandidates(records, { leafForm: 'feathery' } as never))).toBe('invalid_answer');
    expect(codeOf(() => scoreCandidates(records, { colour: { colour: 'scarlet' } } as never))).toBe('invalid_answer');
    expect(codeOf(() => scoreCandidates(records, { smell: 'sweet' } as never))).toBe('invalid_answer');
    expect(codeOf(() => scoreCandidates([lace, lace], {}))).toBe('invalid_records');
    expect(codeOf(() => scoreCandidates([{ id: '', traits: {} }], {}))).toBe('invalid_records');
  });

  it('keeps scores in 0..1 and weights summing to 1 for any answers (property)', () => {
    const answer = fc.record(
      {
        leafForm: fc.constantFrom('dissectum', 'palmatum', 'unlobed' as const),
        lobeCount: fc.integer({ min: 0, max: 15 }),
        habit: fc.constantFrom('weeping', 'upright', 'columnar' as const),
        height: fc.constantFrom('dwarf', 'small', 'medium', 'large' as const),
      },
      { requiredKeys: [] },
    );
    fc.assert(
      fc.property(answer, (a) => {
        const ranked = scoreCandidates(records, a);
        const total = ranked.reduce((s, r) => s + r.weight, 0);
        expect(total).toBeCloseTo(1, 9);
        for (const r of ranked) {
          expect(r.score).toBeGreaterThanOrEqual(0);
          expect(r.score).toBeLessThanOrEqual(1);
        }
      }),
    );
  });

  it('does not underflow with many conflicting answers across many records', () => {
    const many: FinderRecord[] = Array.from({ length: 500 }, (_, i) => ({
      id: `invented-${i}`,
      traits: { leafForm: 'palmatum', habit: ['upright'], bark: ['grey'], lobeCount: { min: 5, max: 5 } },
    }));
    const ranked = scoreCandidates(many, { leafForm: 'dissectum', habit: 'weeping', bark: 'green', lobeCount: 13 });
    expect(ranked[0]?.weight).toBeCloseTo(1 / 500, 12);
  });
});

import { describe, expect, it } from 'vitest';
import { answeredCount, isCurrentAnswer, readFinderState, withAnswer, withSeason, writeFinderState } from '@/features/finder/lib/finder-state';

// The finder keeps its answers in the address. The vocabulary is shared/traits.ts; the checks here
// are that a link round-trips and that bad values are dropped one by one, never the whole state.

const read = (qs: string) => readFinderState(new URLSearchParams(qs));

describe('finder state in the address', () => {
  it('reads every kind of answer and writes it back in a fixed order', () => {
    const state = read('habit=weeping&colour=deep-red&season=spring&leafForm=dissectum&lobes=7&leafSize=small&bark=grey&height=small');
    expect(state).toEqual({
      season: 'spring',
      answers: {
        leafForm: 'dissectum',
        lobeCount: 7,
        leafSize: 'small',
        colour: { season: 'spring', colour: 'deep-red' },
        bark: 'grey',
        habit: 'weeping',
        height: 'small',
      },
    });
    expect(writeFinderState(state).toString()).toBe('leafForm=dissectum&lobes=7&leafSize=small&season=spring&colour=deep-red&bark=grey&habit=weeping&height=small');
    expect(answeredCount(state)).toBe(7);
  });

  it('a typed height is a point in metres', () => {
    expect(read('height=3.5').answers.height).toEqual({ min: 3.5, max: 3.5 });
    expect(writeFinderState(read('height=3.5')).get('height')).toBe('3.5');
  });

  it('drops unknown values one by one and keeps the rest', () => {
    const state = read('leafForm=feathery&lobes=99&leafSize=tiny&habit=weeping&height=-2&bark=plaid');
    expect(state.answers).toEqual({ habit: 'weeping' });
    expect(read('lobes=7.5').answers.lobeCount).toBeUndefined();
    expect(read('height=500').answers.height).toBeUndefined();
  });

  it('a colour without a season is dropped: a colour means nothing without when it was seen', () => {
    expect(read('colour=lime').answers.colour).toBeUndefined();
    expect(read('colour=lime&season=winter').answers.colour).toBeUndefined();
  });

  it('answering, changing and clearing', () => {
    let s = read('');
    s = withAnswer(s, 'leafForm', 'palmatum');
    s = withAnswer(s, 'lobeCount', 0);
    expect(s.answers).toEqual({ leafForm: 'palmatum', lobeCount: 0 });
    expect(isCurrentAnswer(s, 'lobeCount', 0)).toBe(true);
    s = withAnswer(s, 'leafForm', undefined);
    expect(s.answers).toEqual({ lobeCount: 0 });
    // No season yet: a colour cannot be recorded.
    expect(withAnswer(s, 'colour', 'gold')).toBe(s);
  });

  it('changing the season clears the colour seen in the old one', () => {
    const s = withAnswer(withSeason(read(''), 'autumn'), 'colour', 'scarlet');
    expect(s.answers.colour).toEqual({ season: 'autumn', colour: 'scarlet' });
    expect(isCurrentAnswer(s, 'colour', 'scarlet')).toBe(true);
    const moved = withSeason(s, 'spring');
    expect(moved.season).toBe('spring');
    expect(moved.answers.colour).toBeUndefined();
    expect(withSeason(s, 'autumn')).toBe(s);
  });
});

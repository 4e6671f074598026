import { describe, expect, it } from 'vitest';
import { learnKeyAction } from '@/features/learn/lib/learn-keyboard';
import { dayBars, localDay, progressSummary, recentDays, shortDay } from '@/features/learn/lib/progress';

const open = { answered: false, busy: false, optionCount: 4 };
const done = { answered: true, busy: false, optionCount: 4 };

describe('learn mode keys', () => {
  it('1–4 answer while the question is open; 5 and beyond the options do nothing', () => {
    expect(learnKeyAction({ key: '1' }, open)).toEqual({ type: 'answer', index: 0 });
    expect(learnKeyAction({ key: '4' }, open)).toEqual({ type: 'answer', index: 3 });
    expect(learnKeyAction({ key: '5' }, open)).toBeNull();
    expect(learnKeyAction({ key: '3' }, { ...open, optionCount: 2 })).toBeNull();
  });

  it('n (either case) moves on only after answering', () => {
    expect(learnKeyAction({ key: 'n' }, open)).toBeNull();
    expect(learnKeyAction({ key: 'N' }, done)).toEqual({ type: 'next' });
    expect(learnKeyAction({ key: '2' }, done)).toBeNull();
    expect(learnKeyAction({ key: 'n' }, { ...done, busy: true })).toBeNull();
  });

  it('leaves typing and shortcuts alone', () => {
    expect(learnKeyAction({ key: '1', targetTag: 'input' }, open)).toBeNull();
    expect(learnKeyAction({ key: '1', targetEditable: true }, open)).toBeNull();
    expect(learnKeyAction({ key: 'n', ctrlKey: true }, done)).toBeNull();
    expect(learnKeyAction({ key: '1', metaKey: true }, open)).toBeNull();
    expect(learnKeyAction({ key: '1', targetTag: 'BUTTON' }, open)).toEqual({ type: 'answer', index: 0 });
  });
});

describe('progress', () => {
  it('percent right, none before the first answer', () => {
    expect(progressSummary({ total: 0, correct: 0 })).toEqual({ total: 0, correct: 0, percent: null });
    expect(progressSummary({ total: 3, correct: 2 })).toEqual({ total: 3, correct: 2, percent: 67 });
    expect(progressSummary({ total: 2, correct: 5 }).correct).toBe(2);
  });

  it('bars scale to the busiest day and share the width', () => {
    const bars = dayBars(
      [
        { day: '2026-04-01', total: 4, correct: 1 },
        { day: '2026-04-02', total: 2, correct: 2 },
      ],
      { width: 100, height: 40, gap: 10 },
    );
    expect(bars.map((b) => [b.x, b.width, b.totalHeight, b.totalY, b.correctHeight])).toEqual([
      [0, 45, 40, 0, 10],
      [55, 45, 20, 20, 20],
    ]);
    expect(dayBars([], { width: 100, height: 40, gap: 2 })).toEqual([]);
  });

  it('the chart window fills days without answers with zeros and runs to today', () => {
    const days = recentDays([{ day: '2026-02-27', total: 3, correct: 1 }], 4, '2026-03-01');
    // 2026 is not a leap year: 27 Feb, 28 Feb, 1 Mar (Gregorian calendar).
    expect(days.map((d) => `${d.day}:${d.total}`)).toEqual(['2026-02-26:0', '2026-02-27:3', '2026-02-28:0', '2026-03-01:0']);
    // A server day later than the reader's "today" still shows.
    expect(recentDays([{ day: '2026-03-02', total: 1, correct: 1 }], 2, '2026-03-01').map((d) => d.day)).toEqual(['2026-03-01', '2026-03-02']);
  });

  it('day labels', () => {
    expect(shortDay('2026-04-18')).toBe('18 Apr');
    expect(shortDay('soon')).toBe('soon');
    expect(localDay(new Date(2026, 0, 5, 23, 30))).toBe('2026-01-05');
  });
});

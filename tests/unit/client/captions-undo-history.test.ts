import { describe, expect, it } from 'vitest';
import { closeGroup, record, redo, startHistory, undo } from '@/features/captions/lib/undo-history';

// Undo/redo over snapshots, as text editors commonly behave (common practice, no published
// source): a new change clears the redo branch; a run of typing in one place undoes as one step.

describe('undo history of whole snapshots', () => {
  it('steps back and forward through recorded snapshots, and does nothing at either end', () => {
    let h = startHistory('a');
    h = record(h, 'b');
    h = record(h, 'c');
    expect(h.present).toBe('c');
    h = undo(h);
    expect(h.present).toBe('b');
    h = undo(h);
    expect(h.present).toBe('a');
    expect(undo(h)).toBe(h);
    h = redo(h);
    h = redo(h);
    expect(h.present).toBe('c');
    expect(redo(h)).toBe(h);
  });

  it('drops what could be redone once a new change is made', () => {
    let h = record(record(startHistory(1), 2), 3);
    h = undo(h);
    h = record(h, 4);
    expect(h.future).toEqual([]);
    expect(h.past).toEqual([1, 2]);
    expect(undo(h).present).toBe(2);
  });

  it('joins changes of one group (typing in one cue) into a single step, until the group closes', () => {
    let h = startHistory('');
    h = record(h, 'M', 'text:c1');
    h = record(h, 'Mi', 'text:c1');
    h = record(h, 'Miz', 'text:c1');
    expect(h.past).toEqual(['']);
    expect(undo(h).present).toBe('');
    h = closeGroup(h);
    h = record(h, 'Mizu', 'text:c1');
    expect(h.past).toEqual(['', 'Miz']);
    h = record(h, 'Mizu!', 'text:c2');
    expect(h.past).toEqual(['', 'Miz', 'Mizu']);
  });

  it('ignores recording the present again, and keeps at most `limit` steps', () => {
    const h = startHistory([1]);
    expect(record(h, h.present)).toBe(h);
    let long = startHistory(0);
    for (let i = 1; i <= 10; i++) long = record(long, i, null, 3);
    expect(long.past).toEqual([7, 8, 9]);
    expect(long.present).toBe(10);
  });
});

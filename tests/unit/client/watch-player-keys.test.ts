import { describe, expect, it } from 'vitest';
import { playerActionForKey, SHORTCUT_HELP } from '@/features/tours/lib/player-keys';
import { isSearchShortcut } from '@/lib/site-keys';

// Key names are KeyboardEvent.key values from the W3C "UI Events KeyboardEvent key Values"
// specification ("ArrowRight", "?", "/"). Leaving arrows to a focused slider and Space to a focused
// button follows the WAI-ARIA Authoring Practices keyboard patterns; which letters step between
// stops is Grovewalk's own choice.

describe('the keys added for stops and help', () => {
  it('Shift + arrows and N / P step between stops; "?" opens the key list', () => {
    expect(playerActionForKey({ key: 'ArrowRight', shiftKey: true })).toEqual({ kind: 'stop', step: 1 });
    expect(playerActionForKey({ key: 'ArrowLeft', shiftKey: true })).toEqual({ kind: 'stop', step: -1 });
    expect(playerActionForKey({ key: 'n' })).toEqual({ kind: 'stop', step: 1 });
    expect(playerActionForKey({ key: 'P' })).toEqual({ kind: 'stop', step: -1 });
    expect(playerActionForKey({ key: '?', shiftKey: true })).toEqual({ kind: 'help' });
  });

  it('keeps plain arrows for seeking, and leaves arrows of any kind to a focused slider', () => {
    expect(playerActionForKey({ key: 'ArrowRight' })).toEqual({ kind: 'seek', by: 5 });
    expect(playerActionForKey({ key: 'ArrowRight', shiftKey: true, targetTag: 'DIV', targetRole: 'slider' })).toBeNull();
    expect(playerActionForKey({ key: 'n', targetTag: 'DIV', targetRole: 'slider' })).toEqual({ kind: 'stop', step: 1 });
  });

  it('never takes them while typing or with Ctrl, Cmd or Alt', () => {
    expect(playerActionForKey({ key: 'n', targetTag: 'INPUT' })).toBeNull();
    expect(playerActionForKey({ key: '?', targetTag: 'TEXTAREA' })).toBeNull();
    expect(playerActionForKey({ key: 'ArrowRight', shiftKey: true, altKey: true })).toBeNull();
    expect(playerActionForKey({ key: 'p', ctrlKey: true })).toBeNull();
  });

  it('lists the new keys in the help', () => {
    const listed = SHORTCUT_HELP.flatMap((row) => row.keys);
    for (const key of ['Shift + →', 'Shift + ←', 'N', 'P', '?']) expect(listed).toContain(key);
  });
});

describe('"/" goes to the site search', () => {
  it('from anywhere except a field, and not with modifiers', () => {
    expect(isSearchShortcut({ key: '/', targetTag: 'BODY' })).toBe(true);
    expect(isSearchShortcut({ key: '/', targetTag: 'BUTTON' })).toBe(true);
    expect(isSearchShortcut({ key: '/', targetTag: 'INPUT' })).toBe(false);
    expect(isSearchShortcut({ key: '/', targetTag: 'textarea' })).toBe(false);
    expect(isSearchShortcut({ key: '/', targetTag: 'DIV', editable: true })).toBe(false);
    expect(isSearchShortcut({ key: '/', ctrlKey: true })).toBe(false);
    expect(isSearchShortcut({ key: '?', targetTag: 'BODY' })).toBe(false);
  });
});

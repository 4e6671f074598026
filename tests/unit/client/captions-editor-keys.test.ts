import { describe, expect, it } from 'vitest';
import { ariaShortcutFor, EDITOR_SHORTCUTS, editorCommandForKey, type EditorCommand } from '@/features/captions/lib/editor-keys';

// The bindings are Grovewalk's own. Physical keys are named by the W3C "UI Events KeyboardEvent
// code Values" (KeyN, BracketLeft…), and aria-keyshortcuts values follow WAI-ARIA 1.2 (modifiers
// first, joined with "+", several shortcuts separated by spaces).

describe('editor shortcuts', () => {
  it('maps Alt combinations by physical key, so layouts where Alt+N types "˜" still work', () => {
    expect(editorCommandForKey({ key: '˜', code: 'KeyN', altKey: true })).toBe('add-cue');
    expect(editorCommandForKey({ key: '“', code: 'BracketLeft', altKey: true })).toBe('set-start');
    expect(editorCommandForKey({ key: ']', code: 'BracketRight', altKey: true })).toBe('set-end');
    expect(editorCommandForKey({ key: 'ß', code: 'KeyS', altKey: true })).toBe('split');
    expect(editorCommandForKey({ key: 'µ', code: 'KeyM', altKey: true })).toBe('merge');
  });

  it('nudges the start with Alt+arrows and the end with Alt+Shift+arrows, also while typing', () => {
    expect(editorCommandForKey({ key: 'ArrowLeft', altKey: true, typing: true })).toBe('nudge-start-back');
    expect(editorCommandForKey({ key: 'ArrowRight', altKey: true })).toBe('nudge-start-forward');
    expect(editorCommandForKey({ key: 'ArrowLeft', altKey: true, shiftKey: true })).toBe('nudge-end-back');
    expect(editorCommandForKey({ key: 'ArrowRight', altKey: true, shiftKey: true })).toBe('nudge-end-forward');
    expect(editorCommandForKey({ key: 'Delete', altKey: true, typing: true })).toBe('delete');
    expect(editorCommandForKey({ key: 'ArrowDown', altKey: true })).toBe('next-cue');
  });

  it('takes undo and redo with Ctrl or Cmd everywhere in the editor', () => {
    expect(editorCommandForKey({ key: 'z', code: 'KeyZ', ctrlKey: true, typing: true })).toBe('undo');
    expect(editorCommandForKey({ key: 'Z', code: 'KeyZ', metaKey: true, shiftKey: true })).toBe('redo');
    expect(editorCommandForKey({ key: 'y', code: 'KeyY', ctrlKey: true })).toBe('redo');
    expect(editorCommandForKey({ key: 'c', code: 'KeyC', ctrlKey: true })).toBeNull();
    expect(editorCommandForKey({ key: 'z', code: 'KeyZ', ctrlKey: true, altKey: true })).toBeNull();
  });

  it('leaves single keys to text fields, and Space to buttons and links', () => {
    expect(editorCommandForKey({ key: ' ' })).toBe('play-pause');
    expect(editorCommandForKey({ key: ' ', onControl: true })).toBeNull();
    expect(editorCommandForKey({ key: ' ', typing: true })).toBeNull();
    expect(editorCommandForKey({ key: 'j' })).toBe('back');
    expect(editorCommandForKey({ key: 'L' })).toBe('forward');
    expect(editorCommandForKey({ key: 'l', typing: true })).toBeNull();
    expect(editorCommandForKey({ key: '?' })).toBe('help');
    expect(editorCommandForKey({ key: 'n' })).toBeNull();
  });

  it('lists every command in the help table exactly once, with a matching aria-keyshortcuts value', () => {
    const listed = EDITOR_SHORTCUTS.flatMap((l) => (Array.isArray(l.command) ? l.command : [l.command]));
    expect(new Set(listed).size).toBe(listed.length);
    const all: EditorCommand[] = ['add-cue', 'set-start', 'set-end', 'nudge-start-back', 'nudge-start-forward', 'nudge-end-back', 'nudge-end-forward', 'split', 'merge', 'delete', 'previous-cue', 'next-cue', 'undo', 'redo', 'play-pause', 'back', 'forward', 'help'];
    expect([...listed].sort()).toEqual([...all].sort());
    expect(ariaShortcutFor('set-start')).toBe('Alt+BracketLeft');
    expect(ariaShortcutFor('nudge-end-forward')).toBe('Alt+Shift+ArrowRight');
    for (const line of EDITOR_SHORTCUTS) {
      for (const shortcut of line.aria.split(' ')) expect(shortcut, line.does).toMatch(/^((Alt|Control|Shift|Meta)\+)*[A-Za-z]+$/);
    }
  });
});

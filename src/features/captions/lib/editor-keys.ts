// Keyboard of the timed caption editor. One table drives both the key handling and the help
// panel, so what the panel says is what the keys do.

/** What a key press asks the editor to do. */
export type EditorCommand =
  | 'add-cue'
  | 'set-start'
  | 'set-end'
  | 'nudge-start-back'
  | 'nudge-start-forward'
  | 'nudge-end-back'
  | 'nudge-end-forward'
  | 'split'
  | 'merge'
  | 'delete'
  | 'previous-cue'
  | 'next-cue'
  | 'undo'
  | 'redo'
  | 'play-pause'
  | 'back'
  | 'forward'
  | 'help';

/** The parts of a keyboard event the map reads (a plain object in tests). */
export interface EditorKeyPress {
  key: string;
  /** The physical key (KeyboardEvent.code): Alt+letter gives other characters on some layouts. */
  code?: string;
  altKey?: boolean;
  ctrlKey?: boolean;
  metaKey?: boolean;
  shiftKey?: boolean;
  /** True when the focus is in a text field, a select or a text area. */
  typing?: boolean;
  /** True when the focus is on a button, link, checkbox or summary, which use Space themselves. */
  onControl?: boolean;
}

/** Seconds that J and L move the playhead. */
export const SEEK_STEP_S = 2;

/** One line of the help panel: the keys as printed, what they do, and the aria-keyshortcuts value. */
export interface ShortcutLine {
  keys: string[];
  does: string;
  aria: string;
  command: EditorCommand | EditorCommand[];
}

/** Every shortcut, in the order the help panel lists them. */
export const EDITOR_SHORTCUTS: ShortcutLine[] = [
  { keys: ['Alt', 'N'], does: 'New cue at the playhead', aria: 'Alt+N', command: 'add-cue' },
  { keys: ['Alt', '['], does: 'Move the selected cue’s start to the playhead', aria: 'Alt+BracketLeft', command: 'set-start' },
  { keys: ['Alt', ']'], does: 'Move the selected cue’s end to the playhead', aria: 'Alt+BracketRight', command: 'set-end' },
  { keys: ['Alt', '← / →'], does: 'Move the start 0.1 s earlier / later', aria: 'Alt+ArrowLeft Alt+ArrowRight', command: ['nudge-start-back', 'nudge-start-forward'] },
  { keys: ['Alt', 'Shift', '← / →'], does: 'Move the end 0.1 s earlier / later', aria: 'Alt+Shift+ArrowLeft Alt+Shift+ArrowRight', command: ['nudge-end-back', 'nudge-end-forward'] },
  { keys: ['Alt', 'S'], does: 'Split the cue at the playhead (the text at the cursor, or in half by words)', aria: 'Alt+S', command: 'split' },
  { keys: ['Alt', 'M'], does: 'Merge the cue with the next one', aria: 'Alt+M', command: 'merge' },
  { keys: ['Alt', 'Delete'], does: 'Delete the selected cue', aria: 'Alt+Delete', command: 'delete' },
  { keys: ['Alt', '↑ / ↓'], does: 'Select the previous / next cue and go to its start', aria: 'Alt+ArrowUp Alt+ArrowDown', command: ['previous-cue', 'next-cue'] },
  { keys: ['Ctrl', 'Z'], does: 'Undo', aria: 'Control+Z', command: 'undo' },
  { keys: ['Ctrl', 'Shift', 'Z'], does: 'Redo (Ctrl+Y works too)', aria: 'Control+Shift+Z Control+Y', command: 'redo' },
  { keys: ['Space'], does: 'Play or pause (when not typing)', aria: 'Space', command: 'play-pause' },
  { keys: ['J / L'], does: `Back / forward ${SEEK_STEP_S} seconds (when not typing)`, aria: 'J L', command: ['back', 'forward'] },
  { keys: ['?'], does: 'Show or hide this list (when not typing)', aria: 'Shift+Slash', command: 'help' },
];

/** The aria-keyshortcuts value for a command, for the button that does the same thing. */
export function ariaShortcutFor(command: EditorCommand): string | undefined {
  const line = EDITOR_SHORTCUTS.find((l) => (Array.isArray(l.command) ? l.command.includes(command) : l.command === command));
  if (!line) return undefined;
  if (!Array.isArray(line.command)) return line.aria;
  return line.aria.split(' ')[line.command.indexOf(command)];
}

function letter(press: EditorKeyPress): string {
  if (press.code?.startsWith('Key')) return press.code.slice(3).toLowerCase();
  return press.key.toLowerCase();
}

/**
 * Maps a key press to a command, or null to leave it to the browser. Alt combinations work while
 * typing in a cue (that is where they are needed); Ctrl/Cmd+Z and redo are taken everywhere in
 * the editor because its history covers text edits too; single keys (Space, J, L, ?) only when
 * the focus is not in a field, and Space never on a button or link.
 */
export function editorCommandForKey(press: EditorKeyPress): EditorCommand | null {
  const mod = press.ctrlKey || press.metaKey;
  if (mod && !press.altKey) {
    const l = letter(press);
    if (l === 'z') return press.shiftKey ? 'redo' : 'undo';
    if (l === 'y' && !press.shiftKey) return 'redo';
    return null;
  }
  if (press.altKey && !mod) {
    const code = press.code ?? '';
    switch (press.key) {
      case 'ArrowLeft':
        return press.shiftKey ? 'nudge-end-back' : 'nudge-start-back';
      case 'ArrowRight':
        return press.shiftKey ? 'nudge-end-forward' : 'nudge-start-forward';
      case 'ArrowUp':
        return press.shiftKey ? null : 'previous-cue';
      case 'ArrowDown':
        return press.shiftKey ? null : 'next-cue';
      case 'Delete':
      case 'Backspace':
        return press.shiftKey ? null : 'delete';
    }
    if (press.shiftKey) return null;
    if (code === 'BracketLeft' || press.key === '[') return 'set-start';
    if (code === 'BracketRight' || press.key === ']') return 'set-end';
    switch (letter(press)) {
      case 'n':
        return 'add-cue';
      case 's':
        return 'split';
      case 'm':
        return 'merge';
    }
    return null;
  }
  if (mod || press.altKey || press.typing) return null;
  switch (press.key) {
    case ' ':
    case 'Spacebar':
      return press.onControl ? null : 'play-pause';
    case 'j':
    case 'J':
      return 'back';
    case 'l':
    case 'L':
      return 'forward';
    case '?':
      return 'help';
  }
  return null;
}

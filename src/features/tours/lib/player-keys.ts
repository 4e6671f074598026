/** Speeds offered by the player, slowest first; 1 is normal speed. */
export const PLAYBACK_SPEEDS = [0.5, 0.75, 1, 1.25, 1.5, 1.75, 2] as const;

/** What a key press on the focused player asks for. */
export type PlayerAction =
  | { kind: 'toggle-play' }
  | { kind: 'seek'; by: number }
  | { kind: 'toggle-mute' }
  | { kind: 'toggle-fullscreen' }
  | { kind: 'speed'; step: 1 | -1 }
  | { kind: 'toggle-captions' }
  | { kind: 'jump'; to: 'start' | 'end' }
  | { kind: 'stop'; step: 1 | -1 }
  | { kind: 'help' };

/** The parts of a keyboard event the shortcut map looks at (a plain object in tests). */
export interface KeyPress {
  key: string;
  ctrlKey?: boolean;
  metaKey?: boolean;
  altKey?: boolean;
  shiftKey?: boolean;
  /** The focused element's tag and role, so keys that element uses itself are left to it. */
  targetTag?: string;
  targetRole?: string | null;
}

/** The shortcuts as the "Keyboard" help lists them; the map below is the single source. */
export const SHORTCUT_HELP: { keys: string[]; does: string }[] = [
  { keys: ['Space', 'K'], does: 'Play or pause' },
  { keys: ['←', '→'], does: 'Back or forward 5 seconds' },
  { keys: ['J', 'L'], does: 'Back or forward 10 seconds' },
  { keys: ['Home', 'End'], does: 'Go to the start or the end' },
  { keys: ['M'], does: 'Sound off or on' },
  { keys: ['F'], does: 'Full screen on or off' },
  { keys: ['<', '>'], does: 'Slower or faster' },
  { keys: ['C'], does: 'Captions on or off (once the tour has captions)' },
  { keys: ['Shift + →', 'N'], does: 'Next stop on the trail' },
  { keys: ['Shift + ←', 'P'], does: 'Previous stop on the trail' },
  { keys: ['?'], does: 'Show this list of keys' },
];

const BUTTONLIKE = new Set(['BUTTON', 'A', 'SUMMARY']);
const TYPING = new Set(['INPUT', 'SELECT', 'TEXTAREA']);

/**
 * Maps a key press inside the player region (the video, the trail, the tree card and the
 * transcript) to an action, or null to let the browser handle it. Keys with Ctrl, Cmd or Alt are
 * never taken (browser and screen-reader commands), typing in a field is never taken, Space is
 * left to a focused button, and arrows (with or without Shift) to a focused slider (the progress
 * and volume bars move themselves).
 */
export function playerActionForKey(press: KeyPress): PlayerAction | null {
  if (press.ctrlKey || press.metaKey || press.altKey) return null;
  const tag = press.targetTag?.toUpperCase() ?? '';
  if (TYPING.has(tag)) return null;
  const onButton = BUTTONLIKE.has(tag) || press.targetRole === 'button' || press.targetRole === 'menuitem' || press.targetRole === 'menuitemradio';
  const onSlider = press.targetRole === 'slider';
  if (press.shiftKey && (press.key === 'ArrowLeft' || press.key === 'ArrowRight')) {
    return onSlider ? null : { kind: 'stop', step: press.key === 'ArrowRight' ? 1 : -1 };
  }
  switch (press.key) {
    case ' ':
    case 'Spacebar':
      return onButton ? null : { kind: 'toggle-play' };
    case 'k':
    case 'K':
      return { kind: 'toggle-play' };
    case 'ArrowLeft':
      return onSlider ? null : { kind: 'seek', by: -5 };
    case 'ArrowRight':
      return onSlider ? null : { kind: 'seek', by: 5 };
    case 'j':
    case 'J':
      return { kind: 'seek', by: -10 };
    case 'l':
    case 'L':
      return { kind: 'seek', by: 10 };
    case 'Home':
      return onSlider ? null : { kind: 'jump', to: 'start' };
    case 'End':
      return onSlider ? null : { kind: 'jump', to: 'end' };
    case 'm':
    case 'M':
      return { kind: 'toggle-mute' };
    case 'f':
    case 'F':
      return { kind: 'toggle-fullscreen' };
    case '>':
      return { kind: 'speed', step: 1 };
    case '<':
      return { kind: 'speed', step: -1 };
    case 'c':
    case 'C':
      return { kind: 'toggle-captions' };
    case 'n':
    case 'N':
      return { kind: 'stop', step: 1 };
    case 'p':
    case 'P':
      return { kind: 'stop', step: -1 };
    case '?':
      return { kind: 'help' };
    default:
      return null;
  }
}

/**
 * The next speed up or down from the current one. A speed that is not on the list (set some other
 * way) moves to the nearest listed speed in the asked direction; the ends stay where they are.
 */
export function nextSpeed(current: number, step: 1 | -1): number {
  const speeds: readonly number[] = PLAYBACK_SPEEDS;
  if (step > 0) return speeds.find((s) => s > current + 1e-9) ?? speeds[speeds.length - 1]!;
  return [...speeds].reverse().find((s) => s < current - 1e-9) ?? speeds[0]!;
}

/** Where a seek lands: never before the start, and never past the end when the length is known. */
export function seekTarget(current: number, by: number, duration: number | null | undefined): number {
  const to = Math.max(0, current + by);
  return duration != null && Number.isFinite(duration) && duration > 0 ? Math.min(to, duration) : to;
}

/** "1.5×" style label for a speed; 1 reads "Normal". */
export function speedLabel(speed: number): string {
  return speed === 1 ? 'Normal' : `${speed}×`;
}

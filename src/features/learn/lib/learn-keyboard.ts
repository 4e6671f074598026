/** The parts of a key press that decide what it does. */
export interface KeyPress {
  key: string;
  ctrlKey?: boolean;
  metaKey?: boolean;
  altKey?: boolean;
  /** Tag name of the focused element, upper case as the DOM gives it. */
  targetTag?: string;
  targetEditable?: boolean;
}

/** Where the round is. */
export interface RoundState {
  answered: boolean;
  optionCount: number;
  /** An answer is on its way to the server. */
  busy: boolean;
}

/** What a key asks for. */
export type LearnKeyAction = { type: 'answer'; index: number } | { type: 'next' } | null;

const TYPING = new Set(['INPUT', 'TEXTAREA', 'SELECT']);

/**
 * Learn mode's keys: 1–4 pick an answer while the question is open, N (either case) moves to the
 * next clip once answered. Keys typed into a field or with Ctrl, Alt or Cmd held are left alone,
 * so browser shortcuts and the video's own keys keep working.
 */
export function learnKeyAction(press: KeyPress, round: RoundState): LearnKeyAction {
  if (press.ctrlKey || press.metaKey || press.altKey) return null;
  if (press.targetEditable || (press.targetTag && TYPING.has(press.targetTag.toUpperCase()))) return null;
  if (/^[1-9]$/.test(press.key)) {
    const index = Number(press.key) - 1;
    if (round.answered || round.busy || index >= round.optionCount) return null;
    return { type: 'answer', index };
  }
  if (press.key === 'n' || press.key === 'N') return round.answered && !round.busy ? { type: 'next' } : null;
  return null;
}

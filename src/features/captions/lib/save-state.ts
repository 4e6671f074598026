// The autosave's states and the words the editor shows for them.
import { ApiError } from '@/lib/api';

/** Quiet time after the last change before the editor saves (common practice for autosave: a second or two). */
export const AUTOSAVE_DELAY_MS = 1500;
/** First wait before trying a failed save again; it doubles each time up to RETRY_MAX_MS. */
export const RETRY_FIRST_MS = 2000;
/** Longest wait between two tries of a failed save. */
export const RETRY_MAX_MS = 30_000;

/**
 * Where the autosave stands. `clean`: nothing changed since the track was opened; `waiting`:
 * changes not sent yet; `retrying`: the last try did not reach the server and another is planned;
 * `refused`: the server said no for a reason another try will not fix; `conflict`: someone else
 * saved first and the author must choose.
 */
export type SaveState =
  | { phase: 'clean' }
  | { phase: 'waiting' }
  | { phase: 'saving' }
  | { phase: 'saved'; at: Date }
  | { phase: 'retrying'; message: string; delayMs: number; attempt: number }
  | { phase: 'refused'; message: string }
  | { phase: 'conflict'; message: string };

/** Wait before try number `attempt` (1-based) of a failed save: 2 s, 4 s, 8 s … at most 30 s. */
export function retryDelayMs(attempt: number): number {
  const n = Math.max(1, Math.floor(attempt));
  return Math.min(RETRY_MAX_MS, RETRY_FIRST_MS * 2 ** (n - 1));
}

/**
 * True for failures another try can fix: no answer at all, the server busy or failing (5xx),
 * rate limits and timeouts. A refused or invalid save (other 4xx) would only fail again.
 */
export function isRetryable(error: unknown): boolean {
  if (!(error instanceof ApiError)) return false;
  return error.status === 0 || error.status >= 500 || error.status === 408 || error.status === 429;
}

/** True when a save was refused because the stored version moved on. */
export function isVersionConflict(error: unknown): boolean {
  return error instanceof ApiError && error.status === 409 && error.code === 'version_conflict';
}

function hhmm(at: Date): string {
  return `${String(at.getHours()).padStart(2, '0')}:${String(at.getMinutes()).padStart(2, '0')}`;
}

/** The status line beside the editor's title. */
export function saveStatusText(state: SaveState): string {
  switch (state.phase) {
    case 'clean':
      return 'No changes yet';
    case 'waiting':
    case 'saving':
      return 'Saving…';
    case 'saved':
      return `Saved at ${hhmm(state.at)}`;
    case 'retrying':
      return `Not saved — ${state.message} Trying again in ${Math.round(state.delayMs / 1000)} s; your changes stay in this tab.`;
    case 'refused':
      return `Not saved — ${state.message}`;
    case 'conflict':
      return 'Not saved — someone else saved this track first.';
  }
}

/** True while leaving the page would lose work: changes not yet stored on the server. */
export function hasUnsavedWork(state: SaveState): boolean {
  return state.phase === 'waiting' || state.phase === 'saving' || state.phase === 'retrying' || state.phase === 'refused' || state.phase === 'conflict';
}

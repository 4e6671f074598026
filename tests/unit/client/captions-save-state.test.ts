import { describe, expect, it } from 'vitest';
import { hasUnsavedWork, isRetryable, isVersionConflict, retryDelayMs, saveStatusText } from '@/features/captions/lib/save-state';
import { ApiError } from '@/lib/api';

// Which failures are worth another try follows HTTP semantics: RFC 9110 §15.6 (5xx: the server
// failed), §15.5.9 (408 Request Timeout) and RFC 6585 §4 (429 Too Many Requests); status 0 is the
// client's "no answer". Doubling waits (exponential backoff) are common practice.

const err = (status: number, code = 'x') => new ApiError({ status, code, message: 'm' });

describe('autosave helpers', () => {
  it('waits 2, 4, 8, 16 s, then never more than 30 s', () => {
    expect([1, 2, 3, 4, 5, 9].map(retryDelayMs)).toEqual([2000, 4000, 8000, 16_000, 30_000, 30_000]);
  });

  it('tries again after no answer, 5xx, 408 and 429, but not after other refusals', () => {
    for (const status of [0, 500, 502, 503, 408, 429]) expect(isRetryable(err(status)), String(status)).toBe(true);
    for (const status of [400, 403, 404, 409, 413, 422]) expect(isRetryable(err(status)), String(status)).toBe(false);
    expect(isRetryable(new Error('plain'))).toBe(false);
  });

  it('recognises a version conflict only by its status and code', () => {
    expect(isVersionConflict(err(409, 'version_conflict'))).toBe(true);
    expect(isVersionConflict(err(409, 'track_exists'))).toBe(false);
  });

  it('says "Saving…", "Saved at hh:mm" and "Not saved", and knows when leaving would lose work', () => {
    expect(saveStatusText({ phase: 'saving' })).toBe('Saving…');
    expect(saveStatusText({ phase: 'saved', at: new Date(2026, 3, 18, 9, 5) })).toBe('Saved at 09:05');
    expect(saveStatusText({ phase: 'retrying', message: 'No connection.', delayMs: 4000, attempt: 2 })).toMatch(/^Not saved — No connection\. Trying again in 4 s/);
    expect(saveStatusText({ phase: 'conflict', message: 'x' })).toMatch(/^Not saved/);
    expect(hasUnsavedWork({ phase: 'waiting' })).toBe(true);
    expect(hasUnsavedWork({ phase: 'conflict', message: '' })).toBe(true);
    expect(hasUnsavedWork({ phase: 'saved', at: new Date() })).toBe(false);
    expect(hasUnsavedWork({ phase: 'clean' })).toBe(false);
  });
});

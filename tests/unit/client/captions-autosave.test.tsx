import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, cleanup, renderHook } from '@testing-library/react';
import type { ReactNode } from 'react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { useAutosave } from '@/features/captions/hooks/use-autosave';
import type { EditorCue } from '@/features/captions/lib/cue-ops';
import { AUTOSAVE_DELAY_MS, RETRY_FIRST_MS } from '@/features/captions/lib/save-state';
import { forgetCsrfToken } from '@/lib/api';

// The contract is the captions API of issue 4: PUT /api/tracks/:id/cues { version, cues } answers
// { track } with the next version, or 409 "version_conflict" with a message naming who saved and
// when; GET /api/tracks/:id gives the stored version. Two authors must never overwrite each other
// silently. Cue texts are invented for the fictional demo club.

const TRACK = 5;
const trackDto = (version: number) => ({ id: TRACK, tourId: 2, lang: 'en', label: 'English', version, cueCount: 1, updatedAt: '2026-04-18T10:00:00.000Z' });
const cue = (text: string): EditorCue => ({ key: 'k1', id: null, startMs: 1000, endMs: 3000, text, settings: '' });

interface Put {
  version: number;
  texts: string[];
}

function json(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}

let puts: Put[];
let answer: (put: Put) => Response | Promise<Response>;
let storedVersion: number;

beforeEach(() => {
  vi.useFakeTimers();
  forgetCsrfToken();
  puts = [];
  storedVersion = 3;
  answer = (put) => json(200, { track: trackDto(put.version + 1) });
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = String(input);
      if (url === '/api/auth/csrf') return json(200, { token: 't' });
      if (url === `/api/tracks/${TRACK}/cues` && init?.method === 'PUT') {
        const body = JSON.parse(String(init.body)) as { version: number; cues: { text: string }[] };
        const put = { version: body.version, texts: body.cues.map((c) => c.text) };
        puts.push(put);
        return answer(put);
      }
      if (url === `/api/tracks/${TRACK}`) return json(200, { track: trackDto(storedVersion), cues: [], quality: [] });
      return json(404, { error: { code: 'not_found', message: 'No such thing.' } });
    }),
  );
});

afterEach(() => {
  cleanup();
  vi.useRealTimers();
  vi.unstubAllGlobals();
});

function setup(baseline: EditorCue[]) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={client}>{children}</QueryClientProvider>;
  return renderHook(({ cues }: { cues: EditorCue[] }) => useAutosave(TRACK, 3, cues, baseline), { wrapper, initialProps: { cues: baseline } });
}

describe('autosave', () => {
  it('saves once the author pauses, based on the version it has, and moves to the version the server returns', async () => {
    const start = [cue('Mizu-kagari')];
    const hook = setup(start);
    expect(hook.result.current.state.phase).toBe('clean');
    hook.rerender({ cues: [cue('Mizu-kagari in spring')] });
    hook.rerender({ cues: [cue('Mizu-kagari in spring!')] });
    expect(hook.result.current.state.phase).toBe('waiting');
    await act(() => vi.advanceTimersByTimeAsync(AUTOSAVE_DELAY_MS - 100));
    expect(puts).toEqual([]);
    await act(() => vi.advanceTimersByTimeAsync(200));
    expect(puts).toEqual([{ version: 3, texts: ['Mizu-kagari in spring!'] }]);
    expect(hook.result.current.state.phase).toBe('saved');
    expect(hook.result.current.version).toBe(4);

    hook.rerender({ cues: [cue('Mizu-kagari in autumn')] });
    await act(() => vi.advanceTimersByTimeAsync(AUTOSAVE_DELAY_MS + 10));
    expect(puts[1]).toEqual({ version: 4, texts: ['Mizu-kagari in autumn'] });
  });

  it('stops at a version conflict, never saving over the other author until asked, then saves on the stored version', async () => {
    answer = () => json(409, { error: { code: 'version_conflict', message: 'Bo Oduya saved this track at 2026-04-18 10:02 UTC (version 5; you were editing version 3).' } });
    const hook = setup([cue('a')]);
    hook.rerender({ cues: [cue('mine')] });
    await act(() => vi.advanceTimersByTimeAsync(AUTOSAVE_DELAY_MS + 10));
    expect(hook.result.current.state).toMatchObject({ phase: 'conflict', message: expect.stringContaining('Bo Oduya saved this track') });

    hook.rerender({ cues: [cue('mine, edited further')] });
    await act(() => vi.advanceTimersByTimeAsync(10 * AUTOSAVE_DELAY_MS));
    expect(puts).toHaveLength(1);
    expect(hook.result.current.state.phase).toBe('conflict');

    storedVersion = 5;
    answer = (put) => json(200, { track: trackDto(put.version + 1) });
    await act(() => hook.result.current.saveOverTheirs());
    expect(puts[1]).toEqual({ version: 5, texts: ['mine, edited further'] });
    expect(hook.result.current.state.phase).toBe('saved');
    expect(hook.result.current.version).toBe(6);
  });

  it('keeps the changes and tries again after a network failure, with the latest cues', async () => {
    let fail = true;
    answer = (put) => (fail ? Promise.reject(new TypeError('Failed to fetch')) : json(200, { track: trackDto(put.version + 1) }));
    const hook = setup([cue('a')]);
    hook.rerender({ cues: [cue('b')] });
    await act(() => vi.advanceTimersByTimeAsync(AUTOSAVE_DELAY_MS + 10));
    expect(hook.result.current.state).toMatchObject({ phase: 'retrying', attempt: 1, delayMs: RETRY_FIRST_MS });
    hook.rerender({ cues: [cue('c')] });
    fail = false;
    await act(() => vi.advanceTimersByTimeAsync(RETRY_FIRST_MS + 10));
    expect(puts.map((p) => p.texts[0])).toEqual(['b', 'c']);
    expect(puts[1]!.version).toBe(3);
    expect(hook.result.current.state.phase).toBe('saved');
  });

  it('does not save when an undo brings the list back to what was loaded', async () => {
    const start = [cue('a')];
    const hook = setup(start);
    hook.rerender({ cues: [cue('b')] });
    hook.rerender({ cues: start });
    await act(() => vi.advanceTimersByTimeAsync(3 * AUTOSAVE_DELAY_MS));
    expect(puts).toEqual([]);
    expect(hook.result.current.state.phase).toBe('clean');
  });
});

import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import { errorMessage } from '@/lib/api';
import { captionKeys } from '../api/caption-keys';
import { fetchTrack, saveCues } from '../api/captions-api';
import { cuesForSave, type EditorCue } from '../lib/cue-ops';
import { AUTOSAVE_DELAY_MS, isRetryable, isVersionConflict, retryDelayMs, type SaveState } from '../lib/save-state';

/** What the editor needs from the autosave. */
export interface Autosave {
  state: SaveState;
  /** The stored version the next save is based on. */
  version: number;
  /** Saves now instead of after the quiet time (and retries a failed save at once). */
  saveNow: () => void;
  /** "Keep mine and save over it": reads the stored version again, then saves this tab's cues on top. */
  saveOverTheirs: () => Promise<void>;
}

/**
 * Saves the cue list a moment after the author stops changing it, one request at a time, each
 * based on the version the last save returned. A save refused because someone else saved first
 * stops autosaving until the author chooses; a save that did not reach the server is tried again
 * after a growing wait, and the changes stay in the tab meanwhile.
 */
export function useAutosave(trackId: number, initialVersion: number, cues: EditorCue[], baseline: EditorCue[]): Autosave {
  const client = useQueryClient();
  const [state, setState] = useState<SaveState>({ phase: 'clean' });
  const [version, setVersion] = useState(initialVersion);
  const versionRef = useRef(initialVersion);
  const savedRef = useRef(baseline);
  const cuesRef = useRef(cues);
  const stateRef = useRef(state);
  const inFlight = useRef(false);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const attempt = useRef(0);
  const alive = useRef(true);

  cuesRef.current = cues;
  const set = useCallback((next: SaveState) => {
    stateRef.current = next;
    if (alive.current) setState(next);
  }, []);

  const clearTimer = () => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
  };

  const run = useCallback(async (): Promise<void> => {
    clearTimer();
    if (inFlight.current || stateRef.current.phase === 'conflict') return;
    const snapshot = cuesRef.current;
    if (snapshot === savedRef.current) {
      if (stateRef.current.phase !== 'saved') set({ phase: 'clean' });
      return;
    }
    inFlight.current = true;
    set({ phase: 'saving' });
    try {
      const track = await saveCues(trackId, { version: versionRef.current, cues: cuesForSave(snapshot) });
      versionRef.current = track.version;
      savedRef.current = snapshot;
      attempt.current = 0;
      if (alive.current) setVersion(track.version);
      set({ phase: 'saved', at: new Date() });
      void client.invalidateQueries({ queryKey: captionKeys.tracks(track.tourId) });
      void client.invalidateQueries({ queryKey: captionKeys.transcripts(track.tourId) });
    } catch (error) {
      if (isVersionConflict(error)) {
        set({ phase: 'conflict', message: errorMessage(error) });
      } else if (isRetryable(error)) {
        attempt.current += 1;
        const delayMs = retryDelayMs(attempt.current);
        set({ phase: 'retrying', message: errorMessage(error), delayMs, attempt: attempt.current });
        if (alive.current) timer.current = setTimeout(() => void run(), delayMs);
      } else {
        set({ phase: 'refused', message: errorMessage(error) });
      }
    } finally {
      inFlight.current = false;
    }
    // Changes made while the request was out go in the next save.
    if (alive.current && stateRef.current.phase === 'saved' && cuesRef.current !== savedRef.current) {
      set({ phase: 'waiting' });
      timer.current = setTimeout(() => void run(), AUTOSAVE_DELAY_MS);
    }
  }, [client, set, trackId]);

  useEffect(() => {
    const phase = stateRef.current.phase;
    if (phase === 'conflict' || inFlight.current) return;
    if (cues === savedRef.current) {
      if (phase === 'waiting' || phase === 'retrying' || phase === 'refused') {
        clearTimer();
        attempt.current = 0;
        set(savedRef.current === baseline ? { phase: 'clean' } : { phase: 'saved', at: new Date() });
      }
      return;
    }
    // A pending retry keeps its own wait; every other change restarts the quiet time.
    if (phase === 'retrying') return;
    set({ phase: 'waiting' });
    clearTimer();
    timer.current = setTimeout(() => void run(), AUTOSAVE_DELAY_MS);
  }, [cues, baseline, run, set]);

  useEffect(() => {
    alive.current = true;
    return () => {
      alive.current = false;
      clearTimer();
    };
  }, []);

  const saveNow = useCallback(() => void run(), [run]);

  const saveOverTheirs = useCallback(async () => {
    try {
      const fresh = await client.fetchQuery({ queryKey: [...captionKeys.track(trackId), 'version-check'], queryFn: ({ signal }) => fetchTrack(trackId, signal), staleTime: 0, gcTime: 0 });
      versionRef.current = fresh.track.version;
      if (alive.current) setVersion(fresh.track.version);
      // Whatever is stored now is theirs; ours differs from it, so the save below always goes out.
      savedRef.current = [];
      set({ phase: 'waiting' });
      await run();
    } catch (error) {
      set(isRetryable(error) ? { phase: 'conflict', message: `${errorMessage(error)} Try again.` } : { phase: 'refused', message: errorMessage(error) });
    }
  }, [client, run, set, trackId]);

  return { state, version, saveNow, saveOverTheirs };
}

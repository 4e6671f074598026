import { useCallback, useEffect, useRef, useState } from 'react';
import type { TourDto } from '@shared/schemas/tours';
import { UploadCancelled, type UploadProgress, type UploadRequest } from '../api/upload-api';

/** Where an upload stands, for the progress bar and the messages around it. */
export type UploadState =
  | { phase: 'idle' }
  | { phase: 'sending'; progress: UploadProgress }
  | { phase: 'checking'; progress: UploadProgress }
  | { phase: 'done'; tour: TourDto }
  | { phase: 'cancelled' }
  | { phase: 'failed'; error: unknown };

/** Sends one file; the hook hands it progress reporting and the Cancel signal. */
export type UploadSender = (file: UploadRequest['file'], opts: Pick<UploadRequest, 'onProgress' | 'signal'>) => Promise<TourDto>;

/**
 * Runs one upload at a time with progress and Cancel. Once every byte is sent the server still
 * checks the file with ffprobe before it answers, so that wait is its own phase ("checking")
 * rather than a bar stuck at 100 %. Leaving the page cancels a running upload.
 */
export function useVideoUpload() {
  const [state, setState] = useState<UploadState>({ phase: 'idle' });
  const controller = useRef<AbortController | null>(null);

  useEffect(() => () => controller.current?.abort(), []);

  const sending = state.phase === 'sending' || state.phase === 'checking';
  // Closing or reloading the tab would drop the upload: the browser asks first while one is running.
  useEffect(() => {
    if (!sending) return;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [sending]);

  const start = useCallback(
    async (file: UploadRequest['file'], send: UploadSender): Promise<TourDto | null> => {
      controller.current?.abort();
      const abort = new AbortController();
      controller.current = abort;
      const total = file.size;
      setState({ phase: 'sending', progress: { sent: 0, total } });
      try {
        const tour = await send(file, {
          signal: abort.signal,
          onProgress: (progress) => {
            if (abort.signal.aborted) return;
            setState({ phase: progress.sent >= progress.total ? 'checking' : 'sending', progress });
          },
        });
        if (controller.current === abort) controller.current = null;
        setState({ phase: 'done', tour });
        return tour;
      } catch (error) {
        if (controller.current === abort) controller.current = null;
        setState(error instanceof UploadCancelled ? { phase: 'cancelled' } : { phase: 'failed', error });
        return null;
      }
    },
    [],
  );

  const cancel = useCallback(() => controller.current?.abort(), []);
  const reset = useCallback(() => setState({ phase: 'idle' }), []);

  return { state, start, cancel, reset, busy: sending };
}

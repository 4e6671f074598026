import { Button } from '@/components/button';
import { FormError } from '@/components/form-error';
import { errorMessage, isApiError } from '@/lib/api';
import type { UploadState } from '../hooks/use-video-upload';
import { percentOf, uploadProgressText } from '../lib/media-format';
import { ProgressBar } from './progress-bar';

function failureText(error: unknown): string {
  if (isApiError(error) && error.status === 413) return 'That file is larger than this site accepts. Shorten the clip or export it at a lower size, then try again.';
  if (isApiError(error) && error.status === 401) return 'Your session has ended. Sign in again, then upload the file once more.';
  return errorMessage(error);
}

/**
 * The upload's progress bar, bytes and percent, and the Cancel button; then the outcome in words
 * (the server's reason when it refused the file).
 */
export function UploadStatus({ state, onCancel, fileName }: { state: UploadState; onCancel: () => void; fileName?: string }) {
  if (state.phase === 'idle' || state.phase === 'done') return null;
  if (state.phase === 'cancelled') {
    return (
      <p role="status" className="rounded-md border-l-4 border-ochre bg-ochre-wash px-4 py-3">
        Upload cancelled. Nothing was saved; choose the file again to start over.
      </p>
    );
  }
  if (state.phase === 'failed') {
    return (
      <FormError message="The video was not uploaded.">
        <p>{failureText(state.error)}</p>
      </FormError>
    );
  }
  const { sent, total } = state.progress;
  const text = uploadProgressText(sent, total);
  const checking = state.phase === 'checking';
  return (
    <div className="space-y-3 rounded-lg border border-rule bg-card p-4 shadow-leaf">
      {/* A status, so the start and the end of sending are announced; the bytes are on the bar for anyone who asks. */}
      <p role="status" className="font-bold">
        {checking ? 'Upload complete. Checking the video…' : `Uploading${fileName ? ` ${fileName}` : ''}…`}
      </p>
      <ProgressBar label="Upload progress" value={percentOf(sent, total)} valueText={checking ? 'Upload complete, checking the video' : text} />
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="font-ui text-sm tabular-nums text-ink-soft">{text}</p>
        {!checking && (
          <Button variant="secondary" size="sm" onClick={onCancel}>
            Cancel upload
          </Button>
        )}
      </div>
      <p className="text-sm text-ink-soft">Keep this page open until the upload has finished.</p>
    </div>
  );
}

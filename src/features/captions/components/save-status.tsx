import { useState } from 'react';
import { Button } from '@/components/button';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { Spinner } from '@/components/spinner';
import { saveStatusText, type SaveState } from '../lib/save-state';

/** The one-line autosave status beside the editor's heading; announced politely as it changes. */
export function SaveStatusLine({ state, onRetry }: { state: SaveState; onRetry: () => void }) {
  const busy = state.phase === 'waiting' || state.phase === 'saving';
  const bad = state.phase === 'retrying' || state.phase === 'refused' || state.phase === 'conflict';
  return (
    <div className="flex flex-wrap items-center gap-2">
      <p role="status" className={`flex items-center gap-2 font-ui text-sm ${bad ? 'font-bold text-maple' : 'text-ink-soft'}`}>
        {busy && <Spinner className="size-4" />}
        {saveStatusText(state)}
      </p>
      {(state.phase === 'retrying' || state.phase === 'refused') && (
        <Button size="sm" variant="secondary" onClick={onRetry}>
          Try now
        </Button>
      )}
    </div>
  );
}

/**
 * Shown when someone else saved the track first: their message (who and when), and the two ways
 * on. Nothing is overwritten without the author choosing it, and loading their version asks first.
 */
export function ConflictPanel({ message, onLoadTheirs, onKeepMine }: { message: string; onLoadTheirs: () => void; onKeepMine: () => Promise<void> }) {
  const [confirming, setConfirming] = useState(false);
  const [busy, setBusy] = useState(false);
  return (
    <div role="alert" className="rounded-md border-l-4 border-maple bg-maple-wash px-4 py-3">
      <p className="font-bold">Someone else saved this track while you were editing.</p>
      <p className="mt-1">{message}</p>
      <p className="mt-1 text-sm">Your changes are still here in this tab. Choose what happens to them:</p>
      <div className="mt-3 flex flex-wrap gap-3">
        <Button variant="secondary" size="sm" onClick={() => setConfirming(true)} disabled={busy}>
          Load their version
        </Button>
        <Button
          size="sm"
          busy={busy}
          onClick={async () => {
            setBusy(true);
            try {
              await onKeepMine();
            } finally {
              setBusy(false);
            }
          }}
        >
          Keep mine and save over it
        </Button>
      </div>
      <ConfirmDialog
        open={confirming}
        title="Discard your changes?"
        confirmLabel="Discard mine and load theirs"
        tone="danger"
        onCancel={() => setConfirming(false)}
        onConfirm={() => {
          setConfirming(false);
          onLoadTheirs();
        }}
      >
        <p>The track is loaded as it is stored now. The changes you made in this tab since your last save are lost, and so is their undo history.</p>
      </ConfirmDialog>
    </div>
  );
}

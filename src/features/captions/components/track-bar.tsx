import { useId, useState, type FormEvent } from 'react';
import type { TrackDto } from '@shared/schemas/captions';
import { Button } from '@/components/button';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { FormError } from '@/components/form-error';
import { errorMessage, isApiError } from '@/lib/api';
import { useCreateTrack, useDeleteTrack, useRenameTrack } from '../api/captions-api';
import { LanguageFields, languageName, useLanguageFields } from './language-fields';

/** A track's line in the picker: its label, language and size. */
export function trackTitle(t: TrackDto): string {
  return `${t.label} — ${languageName(t.lang)} · ${t.cueCount} cue${t.cueCount === 1 ? '' : 's'}`;
}

/** "New track": a BCP 47 language (common choices or typed) and a label; the server canonicalises the tag. */
export function NewTrackForm({ tourId, tracks, onCreated, onCancel }: { tourId: number; tracks: readonly TrackDto[]; onCreated: (t: TrackDto) => void; onCancel: () => void }) {
  const id = useId();
  const create = useCreateTrack(tourId);
  const fields = useLanguageFields(tracks.length === 0 ? { lang: 'en', label: 'English' } : { lang: 'de', label: 'Deutsch' });
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const checked = fields.check();
    if (!checked) return;
    create.mutate(checked, {
      onSuccess: onCreated,
      onError: (error) => {
        if (isApiError(error)) fields.setErrors({ lang: error.fields.lang, label: error.fields.label });
      },
    });
  };
  return (
    <form onSubmit={submit} aria-labelledby={`${id}-h`} data-editor-keys="own" noValidate className="space-y-3 rounded-lg border border-moss bg-card p-4 shadow-leaf">
      <h2 id={`${id}-h`} className="text-lg">
        New caption track
      </h2>
      <p className="text-sm text-ink-soft">One track per language. Start it empty and write the cues beside the video, or import a file into it later.</p>
      <LanguageFields state={fields} tracks={tracks} />
      <FormError message={create.isError ? errorMessage(create.error) : null} />
      <div className="flex flex-wrap gap-3">
        <Button type="submit" size="sm" busy={create.isPending}>
          Create track
        </Button>
        <Button size="sm" variant="secondary" onClick={onCancel} disabled={create.isPending}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

/** Renaming and deleting the open track (its language is fixed once it exists). */
export function TrackSettings({ tourId, track, onDeleted, onClose }: { tourId: number; track: TrackDto; onDeleted: () => void; onClose: () => void }) {
  const id = useId();
  const rename = useRenameTrack(tourId);
  const remove = useDeleteTrack(tourId);
  const [label, setLabel] = useState(track.label);
  const [confirming, setConfirming] = useState(false);
  const labelError = isApiError(rename.error) ? rename.error.fields.label : undefined;
  return (
    <div aria-labelledby={`${id}-h`} role="group" data-editor-keys="own" className="space-y-3 rounded-lg border border-rule bg-card p-4 shadow-leaf">
      <h2 id={`${id}-h`} className="text-lg">
        Track settings
      </h2>
      <form
        className="flex flex-wrap items-end gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          rename.mutate({ trackId: track.id, label: label.trim() }, { onSuccess: onClose });
        }}
      >
        <div className="space-y-1">
          <label htmlFor={`${id}-label`} className="block text-sm font-bold">
            Label viewers see
          </label>
          <input
            id={`${id}-label`}
            value={label}
            maxLength={80}
            onChange={(e) => setLabel(e.target.value)}
            className="block w-56 rounded-md border border-edge bg-card px-3 py-2 text-base"
          />
        </div>
        <Button type="submit" size="sm" busy={rename.isPending}>
          Rename
        </Button>
        <Button size="sm" variant="secondary" onClick={onClose}>
          Close
        </Button>
      </form>
      <FormError message={rename.isError ? (labelError ?? errorMessage(rename.error)) : null} />
      <p className="text-sm">
        The language ({languageName(track.lang)}) stays with the track. To change it, import the captions into a track in the other language.
      </p>
      <Button size="sm" variant="danger" onClick={() => setConfirming(true)}>
        Delete this track…
      </Button>
      <ConfirmDialog
        open={confirming}
        title={`Delete the “${track.label}” track?`}
        confirmLabel="Delete track"
        tone="danger"
        busy={remove.isPending}
        onCancel={() => {
          remove.reset();
          setConfirming(false);
        }}
        onConfirm={() => remove.mutate(track.id, { onSuccess: onDeleted })}
      >
        <p>Its {track.cueCount} cues go for good; download a copy first if you may want them back.</p>
        {remove.isError && <p className="mt-3 font-bold text-maple">{errorMessage(remove.error)}</p>}
      </ConfirmDialog>
    </div>
  );
}

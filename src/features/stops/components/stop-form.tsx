import { useId, useState, type FormEvent } from 'react';
import { Button } from '@/components/button';
import { FormError } from '@/components/form-error';
import { TimeField } from '@/components/time-field';
import { errorMessage, isApiError } from '@/lib/api';
import { formatTimeInput } from '@/lib/time-input';
import { ProposeRecordForm } from './propose-record-form';
import { RecordCombobox, type StopRecord } from './record-combobox';

/** The fields of a stop as the form edits them. */
export interface StopFields {
  startMs: number;
  endMs: number;
  title: string;
  record: StopRecord | null;
}

/** Props of StopForm. */
export interface StopFormProps {
  heading: string;
  initial: StopFields;
  durationMs: number | null;
  playheadMs: number;
  submitLabel: string;
  busy: boolean;
  /** The server's answer to the last try (overlap, past the end, missing record…), shown beside the fields. */
  error: unknown;
  onSubmit: (fields: StopFields) => void;
  onCancel: () => void;
}

/**
 * Adding or changing one stop: its times (typed or taken from the playhead), a title, and the
 * cultivar record it shows. Server refusals are shown here, next to the stop they are about.
 */
export function StopForm({ heading, initial, durationMs, playheadMs, submitLabel, busy, error, onSubmit, onCancel }: StopFormProps) {
  const id = useId();
  const [fields, setFields] = useState<StopFields>(initial);
  const [proposing, setProposing] = useState<string | null>(null);
  const [note, setNote] = useState<string | null>(null);
  const serverFields = isApiError(error) ? error.fields : {};
  const set = (patch: Partial<StopFields>) => setFields((f) => ({ ...f, ...patch }));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    onSubmit(fields);
  };

  return (
    <form onSubmit={submit} aria-labelledby={`${id}-h`} data-editor-keys="own" className="space-y-4 rounded-md border border-moss bg-card p-4" noValidate>
      <h3 id={`${id}-h`} className="font-bold">
        {heading}
      </h3>
      <div className="flex flex-wrap items-start gap-x-4 gap-y-3">
        <div>
          <TimeField label="Starts at" valueMs={fields.startMs} durationMs={durationMs} onCommit={(startMs) => set({ startMs })} error={serverFields.startMs} />
          <Button size="sm" variant="quiet" className="mt-1" onClick={() => set({ startMs: playheadMs })}>
            Start at playhead ({formatTimeInput(playheadMs)})
          </Button>
        </div>
        <div>
          <TimeField label="Ends at" valueMs={fields.endMs} durationMs={durationMs} onCommit={(endMs) => set({ endMs })} error={serverFields.endMs} />
          <Button size="sm" variant="quiet" className="mt-1" onClick={() => set({ endMs: playheadMs })}>
            End at playhead ({formatTimeInput(playheadMs)})
          </Button>
        </div>
      </div>
      <div className="space-y-1">
        <label htmlFor={`${id}-title`} className="block font-bold">
          Title <span className="font-normal text-ink-soft">(optional)</span>
        </label>
        <p id={`${id}-title-hint`} className="text-sm text-ink-soft">
          Shown on the trail and in the player’s list of stops; without one, the record’s name is used.
        </p>
        <input
          id={`${id}-title`}
          value={fields.title}
          maxLength={160}
          onChange={(e) => set({ title: e.target.value })}
          aria-describedby={`${id}-title-hint`}
          className="block w-full rounded-md border border-edge bg-card px-3 py-2 text-base"
        />
      </div>
      <RecordCombobox
        label="Cultivar record"
        value={fields.record}
        error={serverFields.cultivarId}
        onChange={(record) => {
          setNote(null);
          set({ record, title: fields.title.trim() === '' && record?.epithet ? record.epithet : fields.title });
        }}
        onPropose={(typed) => {
          setNote(null);
          setProposing(typed);
        }}
      />
      {proposing !== null && (
        <ProposeRecordForm
          typed={proposing}
          onCancel={() => setProposing(null)}
          onDone={(record, usable) => {
            setProposing(null);
            if (usable) {
              set({ record, title: fields.title.trim() === '' ? record.epithet : fields.title });
              setNote(`Added the record ${record.acceptedName}; this stop now links to it.`);
            } else {
              set({ record: null });
              setNote(`Proposed ${record.acceptedName}. A moderator checks it before stops can link to it; meanwhile this stop shows an unidentified tree.`);
            }
          }}
        />
      )}
      {note && (
        <p role="status" className="rounded-md border-l-4 border-moss bg-moss-wash px-3 py-2 text-sm">
          {note}
        </p>
      )}
      <FormError message={error ? errorMessage(error) : null} />
      <div className="flex flex-wrap gap-3">
        <Button type="submit" size="sm" busy={busy}>
          {submitLabel}
        </Button>
        <Button size="sm" variant="secondary" onClick={onCancel} disabled={busy}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

import { useId, useRef, useState, type DragEvent } from 'react';
import { cuePlainText } from '@shared/captions/cue-text';
import { CAPTION_FILE_MAX_BYTES, type ImportPreview, type TrackDto } from '@shared/schemas/captions';
import { Badge } from '@/components/badge';
import { Button } from '@/components/button';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { FormError } from '@/components/form-error';
import { Loading } from '@/components/spinner';
import { errorMessage, isApiError } from '@/lib/api';
import { formatTimeInput } from '@/lib/time-input';
import { previewCaptionFile, useImportTrack } from '../api/captions-api';
import { sameLanguage } from '../lib/languages';
import { LanguageFields, useLanguageFields } from './language-fields';

/** Props of ImportPanel. */
export interface ImportPanelProps {
  tourId: number;
  durationMs: number | null;
  tracks: readonly TrackDto[];
  /** The track open in the editor; its language is the first guess for the import. */
  openTrack: TrackDto | null;
  onImported: (track: TrackDto) => void;
  onClose: () => void;
}

const FORMAT_NAMES: Record<ImportPreview['format'], string> = { vtt: 'WebVTT (.vtt)', srt: 'SubRip (.srt)' };
const MAX_MB = CAPTION_FILE_MAX_BYTES / (1024 * 1024);
/** Rows shown in the review table; the rest are counted. */
const REVIEW_ROWS = 300;

type Step = { phase: 'choose'; error?: string } | { phase: 'reading'; file: File } | { phase: 'review'; file: File; preview: ImportPreview };

function Review({ file, preview, durationMs }: { file: File; preview: ImportPreview; durationMs: number | null }) {
  const pastEnd = new Set(preview.pastEnd);
  const errors = preview.problems.filter((p) => p.severity === 'error').length;
  return (
    <div className="space-y-4">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm sm:grid-cols-[auto_1fr_auto_1fr]">
        <dt className="font-bold">File</dt>
        <dd className="break-all">{file.name}</dd>
        <dt className="font-bold">Format</dt>
        <dd>{FORMAT_NAMES[preview.format]}</dd>
        <dt className="font-bold">Text encoding</dt>
        <dd>{preview.encoding}</dd>
        <dt className="font-bold">Cues read</dt>
        <dd>{preview.cues.length}</dd>
        <dt className="font-bold">Problems</dt>
        <dd>
          {preview.problems.length === 0 ? 'none' : `${errors} error${errors === 1 ? '' : 's'}, ${preview.problems.length - errors} warning${preview.problems.length - errors === 1 ? '' : 's'}`}
        </dd>
        <dt className="font-bold">Past the end</dt>
        <dd>{durationMs == null ? 'video length not known yet' : `${preview.pastEnd.length} cue${preview.pastEnd.length === 1 ? '' : 's'}`}</dd>
      </dl>
      {preview.problems.length > 0 && (
        <section aria-labelledby="import-problems">
          <h4 id="import-problems" className="font-bold">
            Problems found in the file
          </h4>
          <p className="text-sm text-ink-soft">Errors mark parts that could not be read and are left out; warnings mark parts that were read with a correction.</p>
          <ol className="mt-2 max-h-64 space-y-1 overflow-y-auto rounded-md border border-rule bg-card p-2 text-sm">
            {preview.problems.map((p, i) => (
              <li key={i} className="flex flex-wrap items-baseline gap-2">
                <span className="w-24 shrink-0 font-mono text-xs tabular-nums">{p.line === 0 ? 'Whole file' : `Line ${p.line}${p.col ? `:${p.col}` : ''}`}</span>
                <Badge tone={p.severity === 'error' ? 'maple' : 'ochre'}>{p.severity === 'error' ? 'Error' : 'Warning'}</Badge>
                <span className="min-w-0 flex-1">{p.message}</span>
              </li>
            ))}
          </ol>
        </section>
      )}
      {preview.cues.length > 0 && (
        <section aria-labelledby="import-cues">
          <h4 id="import-cues" className="font-bold">
            The cues that were read
          </h4>
          {preview.pastEnd.length > 0 && <p className="text-sm text-maple">Cues marked “after the end” start or end after the video does; viewers would not see them in full.</p>}
          <div className="mt-2 max-h-80 overflow-auto rounded-md border border-rule">
            <table className="w-full border-collapse text-sm">
              <caption className="sr-only">Cues read from {file.name}</caption>
              <thead className="sticky top-0 bg-bark-wash text-left font-ui text-xs">
                <tr>
                  <th scope="col" className="px-2 py-1">
                    #
                  </th>
                  <th scope="col" className="px-2 py-1">
                    Start
                  </th>
                  <th scope="col" className="px-2 py-1">
                    End
                  </th>
                  <th scope="col" className="px-2 py-1">
                    Text
                  </th>
                </tr>
              </thead>
              <tbody>
                {preview.cues.slice(0, REVIEW_ROWS).map((c, i) => (
                  <tr key={i} className={`border-t border-rule align-top ${pastEnd.has(i) ? 'bg-maple-wash' : 'bg-card'}`}>
                    <td className="px-2 py-1 tabular-nums">{i + 1}</td>
                    <td className="px-2 py-1 font-mono text-xs whitespace-nowrap tabular-nums">{formatTimeInput(c.startMs)}</td>
                    <td className="px-2 py-1 font-mono text-xs whitespace-nowrap tabular-nums">{formatTimeInput(c.endMs)}</td>
                    <td className="px-2 py-1 whitespace-pre-line">
                      {cuePlainText(c.text)}
                      {pastEnd.has(i) && (
                        <span className="ml-2 font-ui text-xs font-bold text-maple">
                          after the end
                        </span>
                      )}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          {preview.cues.length > REVIEW_ROWS && <p className="mt-1 text-sm text-ink-soft">The first {REVIEW_ROWS} of {preview.cues.length} cues are shown.</p>}
        </section>
      )}
    </div>
  );
}

/**
 * "Import file": choose or drop a .vtt or .srt file; the server reads it without storing anything
 * and the author reviews what was read (format, encoding, problems by line, cues after the
 * video's end) before importing the cues into a track or cancelling. Importing into a language
 * that already has a track asks before replacing its cues.
 */
export function ImportPanel({ tourId, durationMs, tracks, openTrack, onImported, onClose }: ImportPanelProps) {
  const id = useId();
  const [step, setStep] = useState<Step>({ phase: 'choose' });
  const [over, setOver] = useState(false);
  const [confirmReplace, setConfirmReplace] = useState<{ lang: string; label: string; cueCount: number | null } | null>(null);
  const fileInput = useRef<HTMLInputElement>(null);
  const abort = useRef<AbortController | null>(null);
  const lang = useLanguageFields(openTrack ? { lang: openTrack.lang, label: openTrack.label } : { lang: 'en', label: 'English' });
  const save = useImportTrack(tourId);

  const read = async (file: File) => {
    save.reset();
    if (file.size === 0) return setStep({ phase: 'choose', error: 'This file is empty. Choose the caption file itself.' });
    if (file.size > CAPTION_FILE_MAX_BYTES) return setStep({ phase: 'choose', error: `Caption files can be at most ${MAX_MB} MB and “${file.name}” is larger.` });
    abort.current?.abort();
    const controller = new AbortController();
    abort.current = controller;
    setStep({ phase: 'reading', file });
    try {
      const preview = await previewCaptionFile(tourId, file, controller.signal);
      if (!controller.signal.aborted) setStep({ phase: 'review', file, preview });
    } catch (error) {
      if (!controller.signal.aborted) setStep({ phase: 'choose', error: errorMessage(error) });
    }
  };

  const doImport = (replace: boolean) => {
    if (step.phase !== 'review') return;
    const checked = lang.check();
    if (!checked) return;
    const existing = tracks.find((t) => sameLanguage(t.lang, checked.lang));
    if (existing && !replace) {
      setConfirmReplace(existing);
      return;
    }
    setConfirmReplace(null);
    save.mutate(
      { lang: checked.lang, label: checked.label, cues: step.preview.cues, replace },
      {
        onSuccess: (track) => onImported(track),
        onError: (error) => {
          // Someone added that language since the list was loaded: ask the same question.
          if (isApiError(error, 'track_exists')) setConfirmReplace({ lang: checked.lang, label: checked.label, cueCount: null });
          else if (isApiError(error)) lang.setErrors({ lang: error.fields.lang, label: error.fields.label });
        },
      },
    );
  };

  const onDrop = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setOver(false);
    const file = event.dataTransfer.files[0];
    if (file) void read(file);
  };

  const count = step.phase === 'review' ? step.preview.cues.length : 0;

  return (
    <section aria-labelledby={`${id}-h`} data-editor-keys="own" className="rounded-lg border border-moss bg-card p-4 shadow-leaf sm:p-5">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id={`${id}-h`} className="text-xl">
          {step.phase === 'review' ? 'Review the file before importing' : 'Import a caption file'}
        </h2>
        <Button
          size="sm"
          variant="quiet"
          onClick={() => {
            abort.current?.abort();
            onClose();
          }}
        >
          Close<span className="sr-only"> the import</span>
        </Button>
      </div>

      {step.phase === 'choose' && (
        <div className="mt-3 space-y-3">
          <div
            onDragOver={(e) => {
              e.preventDefault();
              setOver(true);
            }}
            onDragLeave={() => setOver(false)}
            onDrop={onDrop}
            className={`grid place-items-center gap-2 rounded-md border-2 border-dashed px-4 py-8 text-center ${over ? 'border-moss bg-moss-wash' : 'border-edge bg-paper'}`}
          >
            <p className="font-bold">Drop a .vtt or .srt file here</p>
            <p className="text-sm text-ink-soft">or</p>
            <Button variant="secondary" onClick={() => fileInput.current?.click()}>
              Choose a file
            </Button>
            <input
              ref={fileInput}
              id={`${id}-file`}
              type="file"
              accept=".vtt,.srt,text/vtt,application/x-subrip"
              className="sr-only"
              aria-label="Caption file"
              tabIndex={-1}
              onChange={(e) => {
                const file = e.target.files?.[0];
                e.target.value = '';
                if (file) void read(file);
              }}
            />
            <p className="text-sm text-ink-soft">WebVTT or SubRip, up to {MAX_MB} MB. Nothing is stored until you have looked at what was read.</p>
          </div>
          <FormError message={step.error} />
        </div>
      )}

      {step.phase === 'reading' && <Loading label={`Reading “${step.file.name}”…`} />}

      {step.phase === 'review' && (
        <div className="mt-3 space-y-5">
          <Review file={step.file} preview={step.preview} durationMs={durationMs} />
          <fieldset className="space-y-3 rounded-md border border-rule p-3">
            <legend className="px-1 font-bold">Import into the track for</legend>
            <LanguageFields state={lang} tracks={tracks} />
          </fieldset>
          {count === 0 && <p className="font-bold text-maple">No cues could be read from this file, so there is nothing to import. Check the problems above.</p>}
          <FormError message={save.isError && !isApiError(save.error, 'track_exists') ? errorMessage(save.error) : null} />
          <div className="flex flex-wrap gap-3">
            <Button busy={save.isPending} disabled={count === 0} onClick={() => doImport(false)}>
              Import the {count} cue{count === 1 ? '' : 's'} that were read
            </Button>
            <Button variant="secondary" disabled={save.isPending} onClick={onClose}>
              Cancel
            </Button>
            <Button variant="quiet" disabled={save.isPending} onClick={() => setStep({ phase: 'choose' })}>
              Choose another file
            </Button>
          </div>
        </div>
      )}

      <ConfirmDialog
        open={confirmReplace !== null}
        title={`Replace the “${confirmReplace?.label ?? ''}” captions?`}
        confirmLabel="Replace its cues"
        tone="danger"
        busy={save.isPending}
        onCancel={() => setConfirmReplace(null)}
        onConfirm={() => doImport(true)}
      >
        <p>
          This tour already has a caption track in “{confirmReplace?.lang}”
          {confirmReplace?.cueCount != null ? ` with ${confirmReplace.cueCount} cue${confirmReplace.cueCount === 1 ? '' : 's'}` : ''}. Replacing
          puts the {count} cue{count === 1 ? '' : 's'} from this file in their place; unsaved changes to that track in any open editor are lost.
        </p>
      </ConfirmDialog>
    </section>
  );
}

import { useEffect, useId, useMemo, useRef, useState, type FormEvent } from 'react';
import { Link, useLocation } from 'react-router';
import { proposeFixInput } from '@shared/schemas/spelling-fixes';
import { Button, buttonClasses } from '@/components/button';
import { CultivarPicker, type PickedCultivar } from '@/components/cultivar-picker';
import { FormError, FormSuccess } from '@/components/form-error';
import { errorMessage, isApiError } from '@/lib/api';
import { useMe } from '@/lib/auth';
import { clockText } from '@/lib/tour-moment';
import { useProposeFix } from '../api/spelling-api';
import { prefillText, textOfWords, wordSpans } from '../lib/fix-words';

/** The caption a flag is about: its track and start time identify it to the server. */
export interface FlaggedCue {
  trackId: number;
  startMs: number;
  text: string;
}

/** Props of FlagNameDialog. */
export interface FlagNameDialogProps {
  /** The caption being flagged; the dialog is open while this is set. */
  cue: FlaggedCue | null;
  /** Text the reader had selected when they asked to flag (used when it lies inside the caption). */
  selection?: string | null;
  onClose: () => void;
}

function WordPicker({ text, onPick }: { text: string; onPick: (words: string) => void }) {
  const words = useMemo(() => wordSpans(text), [text]);
  const [range, setRange] = useState<[number, number] | null>(null);
  const tap = (i: number) => {
    // The first tap picks one word; a second tap stretches the choice to that word.
    const next: [number, number] = range && range[0] === range[1] && range[0] !== i ? [Math.min(range[0], i), Math.max(range[0], i)] : [i, i];
    setRange(next);
    onPick(textOfWords(text, words, next[0], next[1]));
  };
  return (
    <div>
      <p className="font-ui text-sm font-bold" id="flag-words-label">
        Or tap the first and the last misheard word
      </p>
      <ul aria-labelledby="flag-words-label" className="mt-1 flex flex-wrap gap-1">
        {words.map((w, i) => {
          const on = range !== null && i >= range[0] && i <= range[1];
          return (
            <li key={`${w.start}`}>
              <button type="button" aria-pressed={on} onClick={() => tap(i)} className={`min-h-9 rounded-md border px-2 py-1 text-sm ${on ? 'border-moss bg-moss text-card' : 'border-rule bg-card hover:bg-moss-wash'}`}>
                {w.text}
              </button>
            </li>
          );
        })}
      </ul>
    </div>
  );
}

/**
 * "Flag a misspelt name": a reader marks the words a caption got wrong and picks the record they should
 * name; a moderator then reviews the spelling fix. Built on the native <dialog> (focus kept
 * inside, Escape closes, focus returns to the opener). Any transcript or caption list can mount it.
 */
export function FlagNameDialog({ cue, selection, onClose }: FlagNameDialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const textId = useId();
  const { data: me } = useMe();
  const location = useLocation();
  const propose = useProposeFix();
  const [text, setText] = useState('');
  const [record, setRecord] = useState<PickedCultivar | null>(null);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [pickerKey, setPickerKey] = useState(0);

  const open = cue !== null;
  const cueKey = cue ? `${cue.trackId}:${cue.startMs}` : '';
  const { reset } = propose;
  useEffect(() => {
    if (!cue) return;
    setText(prefillText(selection, cue.text));
    setRecord(null);
    setErrors({});
    setPickerKey((k) => k + 1);
    reset();
    // Reset only when another caption is flagged, not on every render of the same one.
  }, [cueKey]);

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!cue) return;
    const checked = proposeFixInput.safeParse({ proposedText: text, cultivarId: record?.id ?? 0, cue: { trackId: cue.trackId, startMs: cue.startMs } });
    if (!checked.success) {
      const errs: Record<string, string> = {};
      for (const issue of checked.error.issues) {
        const key = String(issue.path[0] ?? '_');
        errs[key] ??= key === 'cultivarId' ? 'Choose the record the words should name.' : issue.message;
      }
      setErrors(errs);
      return;
    }
    setErrors({});
    propose.mutate(checked.data);
  };

  const server = isApiError(propose.error) ? propose.error.fields : {};
  const textError = errors.proposedText ?? server.proposedText;
  const done = propose.data;

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(event) => {
        event.preventDefault();
        if (!propose.isPending) onClose();
      }}
      className="m-auto max-h-[calc(100dvh-2rem)] w-[min(36rem,calc(100vw-2rem))] overflow-y-auto rounded-lg border border-rule bg-card p-0 text-ink shadow-leaf"
    >
      {cue && (
        <div className="p-5 sm:p-6">
          <h2 id={titleId} className="text-xl">
            Flag a misspelt name
          </h2>
          <figure className="mt-3 rounded-md border-l-4 border-bark bg-bark-wash px-3 py-2">
            <figcaption className="font-ui text-xs font-bold text-bark">Caption at {clockText(cue.startMs)}</figcaption>
            <blockquote className="mt-1">{cue.text}</blockquote>
          </figure>

          {me === null ? (
            <div className="mt-4">
              <p>Sign in to flag a name: a moderator may want to ask you about it, and we e-mail you the decision.</p>
              <div className="mt-4 flex flex-wrap gap-3">
                <Link to={`/sign-in?next=${encodeURIComponent(location.pathname + location.search)}`} className={buttonClasses('primary')}>
                  Sign in
                </Link>
                <Button variant="secondary" onClick={onClose}>
                  Close
                </Button>
              </div>
            </div>
          ) : done ? (
            <div className="mt-4 space-y-4">
              <FormSuccess>
                {done.created ? (
                  <p className="font-bold">Thanks — a moderator will review it; we’ll e-mail you.</p>
                ) : (
                  <p className="font-bold">Thanks — these words were already flagged, and a moderator will review them soon.</p>
                )}
                <p className="mt-1">
                  “{done.fix.proposedText}” → ‘{done.fix.suggestion.epithet}’ ({done.fix.occurrences} caption{done.fix.occurrences === 1 ? '' : 's'} in {done.fix.toursAffected.count} tour
                  {done.fix.toursAffected.count === 1 ? '' : 's'}).
                </p>
              </FormSuccess>
              <Button onClick={onClose} autoFocus>
                Close
              </Button>
            </div>
          ) : (
            <form onSubmit={submit} noValidate className="mt-4 space-y-4">
              <FormError message={propose.error && !Object.keys(server).length ? errorMessage(propose.error) : null} />
              <div>
                <label htmlFor={textId} className="block font-bold">
                  The words as the caption has them
                </label>
                <p id={`${textId}-hint`} className="text-sm text-ink-soft">
                  Only the misspelt words, e.g. “Sora no hani”, not the whole caption.
                </p>
                <input
                  id={textId}
                  value={text}
                  onChange={(e) => setText(e.target.value)}
                  aria-describedby={`${textId}-hint${textError ? ` ${textId}-e` : ''}`}
                  aria-invalid={textError ? true : undefined}
                  autoComplete="off"
                  className={`mt-1 block w-full rounded-md border bg-card px-3 py-2 text-base ${textError ? 'border-2 border-maple' : 'border-edge'}`}
                />
                {textError && (
                  <p id={`${textId}-e`} className="mt-1 text-sm font-bold text-maple">
                    {textError}
                  </p>
                )}
              </div>
              <WordPicker key={cueKey} text={cue.text} onPick={setText} />
              <CultivarPicker
                key={pickerKey}
                label="The right name"
                hint="Search the records; misspellings find the name too."
                value={record}
                onChange={setRecord}
                initialQuery={text === cue.text ? '' : text}
                error={errors.cultivarId ?? server.cultivarId}
              />
              <p className="text-sm text-ink-soft">A moderator checks every flag before any caption changes, and we e-mail you the decision.</p>
              <div className="flex flex-wrap justify-end gap-3">
                <Button variant="secondary" onClick={onClose} disabled={propose.isPending}>
                  Cancel
                </Button>
                <Button type="submit" busy={propose.isPending}>
                  Send the flag
                </Button>
              </div>
            </form>
          )}
        </div>
      )}
    </dialog>
  );
}

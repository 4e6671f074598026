import { useId, useState } from 'react';
import type { StopDto, StopSuggestion } from '@shared/schemas/stops';
import { Badge } from '@/components/badge';
import { Button } from '@/components/button';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { CultivarName, FictionalMark } from '@/components/cultivar-name';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { FormError, FormSuccess } from '@/components/form-error';
import { Loading } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { formatTimeInput } from '@/lib/time-input';
import { useCreateStop, useDeleteStop, usePlaceKeyframes, useStops, useStopSuggestions, useUpdateStop } from '../api/stops-api';
import { draftAtPlayhead, draftFromCue, overlapsAny, stopIndexAt } from '../lib/stop-draft';
import { ChosenRecord } from './record-combobox';
import { StopForm, type StopFields } from './stop-form';

type Range = { startMs: number; endMs: number };

/** Props of StopsPanel. */
export interface StopsPanelProps {
  tourId: number;
  durationMs: number | null;
  playheadMs: number;
  seek: (ms: number) => void;
  /** The selected cue of the open caption track, for "Add stop from this cue". */
  cue: (Range & { text: string }) | null;
  /** Language of the open caption track, for the suggestions; null when the tour has no captions. */
  lang: string | null;
}

function span(r: Range): string {
  return `${formatTimeInput(r.startMs)}–${formatTimeInput(r.endMs)}`;
}

function toInput(f: StopFields) {
  return { startMs: f.startMs, endMs: f.endMs, title: f.title.trim(), cultivarId: f.record?.id ?? null };
}

function fieldsOf(stop: StopDto): StopFields {
  return { startMs: stop.startMs, endMs: stop.endMs, title: stop.title, record: stop.cultivar };
}

function StopItem({ stop, index, here, tourId, durationMs, playheadMs, seek, onChanged }: { stop: StopDto; index: number; here: boolean; onChanged: () => void } & Pick<StopsPanelProps, 'tourId' | 'durationMs' | 'playheadMs' | 'seek'>) {
  const [editing, setEditing] = useState(false);
  const [confirming, setConfirming] = useState(false);
  const update = useUpdateStop(tourId);
  const remove = useDeleteStop(tourId);
  const titleId = useId();

  if (editing) {
    return (
      <li>
        <StopForm
          heading={`Edit stop ${index + 1}`}
          initial={fieldsOf(stop)}
          durationMs={durationMs}
          playheadMs={playheadMs}
          submitLabel="Save stop"
          busy={update.isPending}
          error={update.error}
          onCancel={() => {
            update.reset();
            setEditing(false);
          }}
          onSubmit={(f) =>
            update.mutate(
              { stopId: stop.id, input: toInput(f) },
              {
                onSuccess: () => {
                  setEditing(false);
                  onChanged();
                },
              },
            )
          }
        />
      </li>
    );
  }

  return (
    <li aria-labelledby={titleId} className={`rounded-md border p-3 ${here ? 'border-moss bg-moss-wash' : 'border-rule bg-card'}`}>
      <div className="flex flex-wrap items-start gap-x-3 gap-y-1">
        <span aria-hidden="true" className="grid size-7 shrink-0 place-items-center rounded-full bg-bark font-ui text-sm font-bold text-card">
          {index + 1}
        </span>
        <div className="min-w-0 flex-1">
          <p id={titleId} className="font-bold">
            <span className="sr-only">Stop {index + 1}: </span>
            {stop.title.trim() || (stop.cultivar ? <CultivarName record={stop.cultivar} /> : 'Unidentified tree')}
            {here && (
              <span className="ml-2 align-middle">
                <Badge tone="moss">Playing now</Badge>
              </span>
            )}
          </p>
          <p className="text-sm">
            <ChosenRecord value={stop.cultivar} />
          </p>
          <p className="font-mono text-sm text-ink-soft tabular-nums">{span(stop)}</p>
        </div>
        <div className="flex flex-wrap gap-2">
          <Button size="sm" variant="quiet" onClick={() => seek(stop.startMs)}>
            Go to<span className="sr-only"> stop {index + 1}</span>
          </Button>
          <Button size="sm" variant="secondary" onClick={() => setEditing(true)}>
            Edit<span className="sr-only"> stop {index + 1}</span>
          </Button>
          <Button size="sm" variant="quiet" onClick={() => setConfirming(true)}>
            Delete<span className="sr-only"> stop {index + 1}</span>
          </Button>
        </div>
      </div>
      <ConfirmDialog
        open={confirming}
        title={`Delete stop ${index + 1}?`}
        confirmLabel="Delete stop"
        tone="danger"
        busy={remove.isPending}
        onCancel={() => {
          remove.reset();
          setConfirming(false);
        }}
        onConfirm={() =>
          remove.mutate(stop.id, {
            onSuccess: () => {
              setConfirming(false);
              onChanged();
            },
          })
        }
      >
        <p>
          The stop from {span(stop)} goes from the timeline, the trail and the chapters. The video and captions stay as they are.
        </p>
        {remove.isError && <p className="mt-3 font-bold text-maple">{errorMessage(remove.error)}</p>}
      </ConfirmDialog>
    </li>
  );
}

const KIND_WORDS: Record<StopSuggestion['kind'], string> = { exact: 'accepted name', variant: 'known misspelling', fuzzy: 'close spelling' };

function Suggestions({ tourId, lang, onAdded }: { tourId: number; lang: string; onAdded: () => void }) {
  const stops = useStops(tourId);
  const suggestions = useStopSuggestions(tourId, lang, true);
  const create = useCreateStop(tourId);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [adding, setAdding] = useState<Set<string>>(new Set());
  const keyOf = (s: StopSuggestion) => `${s.startMs}-${s.cultivar.id}`;
  const items = (suggestions.data ?? []).filter((s) => !overlapsAny(stops.data ?? [], s));

  const add = async (list: StopSuggestion[]) => {
    setAdding(new Set(list.map(keyOf)));
    const failed: Record<string, string> = {};
    let added = 0;
    for (const s of list) {
      try {
        await create.mutateAsync({ startMs: s.startMs, endMs: s.endMs, title: '', cultivarId: s.cultivar.id });
        added++;
      } catch (error) {
        failed[keyOf(s)] = errorMessage(error);
      }
    }
    setErrors(failed);
    setAdding(new Set());
    if (added) onAdded();
  };

  return (
    <section aria-labelledby="suggestions-heading" className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 id="suggestions-heading" className="text-lg">
          Suggested stops
        </h3>
        {items.length > 1 && (
          <Button size="sm" variant="secondary" busy={adding.size > 1} disabled={adding.size > 0} onClick={() => void add(items)}>
            Add all {items.length}
          </Button>
        )}
      </div>
      <p className="text-sm text-ink-soft">
        Grovewalk listens for cultivar names in the “{lang}” captions and proposes a stop from each name it hears until the next one. Check each before adding it.
      </p>
      {suggestions.isPending ? (
        <Loading label="Looking for names in the captions…" />
      ) : suggestions.isError ? (
        <ErrorState title="The suggestions could not be loaded" error={suggestions.error} onRetry={() => void suggestions.refetch()} />
      ) : items.length === 0 ? (
        <p className="rounded-md border border-dashed border-edge px-3 py-2 text-sm">No suggestions: no record names are heard outside the existing stops.</p>
      ) : (
        <ul className="space-y-2">
          {items.map((s) => (
            <li key={keyOf(s)} className="rounded-md border border-rule bg-card p-3">
              <div className="flex flex-wrap items-start gap-x-3 gap-y-1">
                <div className="min-w-0 flex-1 text-sm">
                  <p>
                    <span className="text-ink-soft">Heard </span>“{s.heard}” <span className="text-ink-soft">at</span>{' '}
                    <span className="font-mono tabular-nums">{formatTimeInput(s.cueStartMs)}</span>
                  </p>
                  <p className="font-bold">
                    <CultivarName record={s.cultivar} /> <FictionalMark record={s.cultivar} />
                  </p>
                  <p className="text-ink-soft">
                    <span className="font-mono tabular-nums">{span(s)}</span> · found by {KIND_WORDS[s.kind]}
                  </p>
                </div>
                <Button size="sm" busy={adding.has(keyOf(s))} disabled={adding.size > 0} onClick={() => void add([s])}>
                  Add<span className="sr-only"> a stop for {s.cultivar.acceptedName} at {formatTimeInput(s.startMs)}</span>
                </Button>
              </div>
              {errors[keyOf(s)] && <p className="mt-2 text-sm font-bold text-maple">{errors[keyOf(s)]}</p>}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

function KeyframesOffer({ tourId, count }: { tourId: number; count: number }) {
  const place = usePlaceKeyframes(tourId);
  return (
    <section aria-labelledby="keyframes-heading" className="rounded-md border-l-4 border-bark bg-bark-wash p-4">
      <h3 id="keyframes-heading" className="font-bold">
        Make jumps land exactly on each stop?
      </h3>
      <p className="mt-1 text-sm">
        Right now a jump to a stop can start a moment early, because a video can only begin playing at certain frames. Preparing the video again for the{' '}
        {count} stop start{count === 1 ? '' : 's'} makes every jump land on the stop’s first frame. It takes about as long as the first preparation; viewers keep
        the current video until the new one is ready.
      </p>
      {place.isSuccess ? (
        <div className="mt-3">
          <FormSuccess>
            <p>Queued. The video is being prepared again for exact jumps; the edit page shows its progress.</p>
          </FormSuccess>
        </div>
      ) : (
        <Button size="sm" className="mt-3" busy={place.isPending} onClick={() => place.mutate()}>
          Prepare the video again for exact jumps
        </Button>
      )}
      <div className="mt-2">
        <FormError message={place.isError ? errorMessage(place.error) : null} />
      </div>
    </section>
  );
}

/**
 * The "Stops" part of the captions editor: add a stop at the playhead or from the selected cue,
 * edit and delete stops (each with its cultivar record), take suggestions from names heard in the
 * captions, and afterwards offer to re-prepare the video with keyframes at the stop starts.
 */
export function StopsPanel({ tourId, durationMs, playheadMs, seek, cue, lang }: StopsPanelProps) {
  const stops = useStops(tourId);
  const create = useCreateStop(tourId);
  const [draft, setDraft] = useState<{ fields: StopFields; from: string } | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  const [changed, setChanged] = useState(false);
  const items = stops.data ?? [];
  const here = stopIndexAt(items, playheadMs);
  const noVideo = durationMs == null;

  const start = (result: ReturnType<typeof draftAtPlayhead>, from: string) => {
    create.reset();
    if (!result.ok) {
      setDraft(null);
      setMessage(result.message);
      return;
    }
    setMessage(null);
    setDraft({ fields: { startMs: result.startMs, endMs: result.endMs, title: '', record: null }, from });
  };
  const markChanged = () => setChanged(true);

  return (
    <div className="space-y-5" data-editor-keys="own">
      <p className="text-sm text-ink-soft">
        A stop is the stretch of the walk that shows one tree, linked to its cultivar record (or marked as an unidentified tree). Stops may not overlap.
      </p>
      {noVideo ? (
        <p className="rounded-md border border-dashed border-edge px-3 py-2">Stops can be added once the video has been uploaded and measured.</p>
      ) : (
        <div className="flex flex-wrap gap-2">
          <Button size="sm" onClick={() => start(draftAtPlayhead(items, playheadMs, durationMs), 'the playhead')}>
            Add stop at playhead ({formatTimeInput(playheadMs)})
          </Button>
          <Button size="sm" variant="secondary" disabled={!cue} onClick={() => cue && start(draftFromCue(items, cue, durationMs), 'the selected cue')}>
            Add stop from this cue{cue ? ` (${formatTimeInput(cue.startMs)})` : ''}
          </Button>
        </div>
      )}
      {message && (
        <p role="alert" className="rounded-md border-l-4 border-maple bg-maple-wash px-3 py-2 text-sm font-bold">
          {message}
        </p>
      )}
      {draft && (
        <StopForm
          key={`${draft.fields.startMs}-${draft.from}`}
          heading={`New stop from ${draft.from}`}
          initial={draft.fields}
          durationMs={durationMs}
          playheadMs={playheadMs}
          submitLabel="Save stop"
          busy={create.isPending}
          error={create.error}
          onCancel={() => {
            create.reset();
            setDraft(null);
          }}
          onSubmit={(f) =>
            create.mutate(toInput(f), {
              onSuccess: () => {
                setDraft(null);
                markChanged();
              },
            })
          }
        />
      )}
      <section aria-labelledby="stop-list-heading" className="space-y-2">
        <h3 id="stop-list-heading" className="text-lg">
          Stops of this tour
        </h3>
        {stops.isPending ? (
          <Loading label="Loading the stops…" />
        ) : stops.isError ? (
          <ErrorState title="The stops could not be loaded" error={stops.error} onRetry={() => void stops.refetch()} />
        ) : items.length === 0 ? (
          <EmptyState title="No stops yet">Play to a tree and add a stop at the playhead, or take one of the suggestions below.</EmptyState>
        ) : (
          <ol className="space-y-2">
            {items.map((stop, i) => (
              <StopItem key={stop.id} stop={stop} index={i} here={i === here} tourId={tourId} durationMs={durationMs} playheadMs={playheadMs} seek={seek} onChanged={markChanged} />
            ))}
          </ol>
        )}
      </section>
      {changed && items.length > 0 && <KeyframesOffer tourId={tourId} count={items.length} />}
      {lang ? (
        <Suggestions tourId={tourId} lang={lang} onAdded={markChanged} />
      ) : (
        <p className="text-sm text-ink-soft">Suggestions appear once the tour has captions: Grovewalk looks for cultivar names in them.</p>
      )}
    </div>
  );
}

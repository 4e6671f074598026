import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useDeferredValue, useEffect, useId, useMemo, useRef, useState, type KeyboardEvent as ReactKeyboardEvent, type ReactNode } from 'react';
import { Link, useBlocker, useSearchParams } from 'react-router';
import { checkCues, type QualityIssue } from '@shared/captions/quality';
import { cuePlainText } from '@shared/captions/cue-text';
import type { TrackDetail, TrackDto } from '@shared/schemas/captions';
import type { TourDto } from '@shared/schemas/tours';
import { Button } from '@/components/button';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { useDocumentTitle } from '@/components/page';
import { Loading } from '@/components/spinner';
import { formatTimeInput } from '@/lib/time-input';
import { captionKeys } from '../api/caption-keys';
import { useTrack, useTracks } from '../api/captions-api';
import { useAutosave } from '../hooks/use-autosave';
import { useCueHistory } from '../hooks/use-cue-history';
import { usePlayhead, type Playhead } from '../hooks/use-playhead';
import {
  addCueAt,
  cueIndexAt,
  deleteCue,
  editorCues,
  indexOfKey,
  mergeWithNext,
  NUDGE_MS,
  nudgeEdge,
  setEdge,
  setText,
  splitCue,
  type EditorCue,
} from '../lib/cue-ops';
import { editorCommandForKey, SEEK_STEP_S, type EditorCommand } from '../lib/editor-keys';
import { summarise } from '../lib/quality-view';
import { hasUnsavedWork } from '../lib/save-state';
import { CueEditor } from './cue-editor';
import { DownloadsPanel } from './downloads-panel';
import { ImportPanel } from './import-panel';
import { ConflictPanel, SaveStatusLine } from './save-status';
import { NewTrackForm, trackTitle, TrackSettings } from './track-bar';

/** What the stops feature (composed in by the route) sees of the editor: the playhead and the cues. */
export interface WorkspaceContext {
  tourId: number;
  durationMs: number | null;
  playheadMs: number;
  seek: (ms: number) => void;
  cues: readonly EditorCue[];
  /** The selected cue, for "Add stop from this cue". */
  selectedCue: EditorCue | null;
  /** Language of the open track; null when the tour has no captions. */
  lang: string | null;
}

/** Props of CaptionsWorkspace; the two render props let the route add the stops parts. */
export interface CaptionsWorkspaceProps {
  tour: TourDto;
  /** Drawn under the video. */
  renderTimeline?: (ctx: WorkspaceContext) => ReactNode;
  /** The content of the "Stops" tab. */
  renderStops?: (ctx: WorkspaceContext) => ReactNode;
}

type Tab = 'cues' | 'stops' | 'files';
const TABS: { id: Tab; label: string }[] = [
  { id: 'cues', label: 'Cues' },
  { id: 'stops', label: 'Stops' },
  { id: 'files', label: 'Downloads' },
];
const GLOBAL_COMMANDS = new Set<EditorCommand>(['play-pause', 'back', 'forward', 'help']);
const TEXT_INPUTS = new Set(['text', 'search', 'email', 'url', 'tel', 'password', 'number', 'date', 'time']);

function prefersReducedMotion(): boolean {
  return typeof window !== 'undefined' && window.matchMedia?.('(prefers-reduced-motion: reduce)').matches === true;
}

function bestRendition(tour: TourDto) {
  return [...tour.renditions].sort((a, b) => b.height - a.height)[0] ?? null;
}

function VideoPane({ tour, playhead, nowText }: { tour: TourDto; playhead: Playhead; nowText: string | null }) {
  const rendition = bestRendition(tour);
  return (
    <div>
      {rendition ? (
        <video
          ref={playhead.videoRef}
          src={rendition.url}
          poster={tour.posterUrl ?? undefined}
          controls
          preload="metadata"
          playsInline
          aria-label={`Video: ${tour.title}`}
          className="aspect-video w-full rounded-t-lg bg-moss-deep"
        />
      ) : (
        <div className="grid aspect-video w-full place-items-center rounded-t-lg border border-dashed border-edge bg-card p-6 text-center">
          <p>
            {tour.state === 'processing' || tour.state === 'draft'
              ? 'The video is still being prepared. You can write captions and stops already: move the playhead on the timeline or with J and L.'
              : 'This tour has no playable video. Upload one from the edit page; captions and stops can be written meanwhile.'}
          </p>
        </div>
      )}
      <p aria-live="off" className="min-h-12 rounded-b-lg bg-moss-deep px-3 py-2 text-center whitespace-pre-line text-card">
        <span className="sr-only">Caption at the playhead: </span>
        {nowText ?? <span className="font-ui text-sm opacity-80">(no caption at the playhead)</span>}
      </p>
    </div>
  );
}

function Transport({ playhead, durationMs, follow, onFollow, hasVideo }: { playhead: Playhead; durationMs: number | null; follow: boolean; onFollow: (on: boolean) => void; hasVideo: boolean }) {
  return (
    <div className="flex flex-wrap items-center gap-2">
      <Button size="sm" onClick={playhead.togglePlay} disabled={!hasVideo} aria-keyshortcuts="Space">
        {playhead.playing ? 'Pause' : 'Play'}
      </Button>
      <Button size="sm" variant="secondary" onClick={() => playhead.seekBy(-SEEK_STEP_S * 1000)} aria-keyshortcuts="J">
        −{SEEK_STEP_S} s
      </Button>
      <Button size="sm" variant="secondary" onClick={() => playhead.seekBy(SEEK_STEP_S * 1000)} aria-keyshortcuts="L">
        +{SEEK_STEP_S} s
      </Button>
      <p className="font-mono text-sm tabular-nums">
        <span className="sr-only">Playhead at </span>
        {formatTimeInput(playhead.ms)}
        {durationMs != null && <span className="text-ink-soft"> / {formatTimeInput(durationMs)}</span>}
      </p>
      <label className="ml-auto flex items-center gap-2 font-ui text-sm">
        <input type="checkbox" checked={follow} onChange={(e) => onFollow(e.target.checked)} className="size-4 accent-moss" />
        Follow the video
      </label>
    </div>
  );
}

function Tabs({ tab, onTab, counts, baseId }: { tab: Tab; onTab: (t: Tab) => void; counts: Partial<Record<Tab, number>>; baseId: string }) {
  const refs = useRef<Record<string, HTMLButtonElement | null>>({});
  const onKeyDown = (event: ReactKeyboardEvent) => {
    const i = TABS.findIndex((t) => t.id === tab);
    const step = event.key === 'ArrowRight' ? 1 : event.key === 'ArrowLeft' ? -1 : 0;
    if (!step && event.key !== 'Home' && event.key !== 'End') return;
    event.preventDefault();
    const next = event.key === 'Home' ? TABS[0]! : event.key === 'End' ? TABS[TABS.length - 1]! : TABS[(i + step + TABS.length) % TABS.length]!;
    onTab(next.id);
    refs.current[next.id]?.focus();
  };
  return (
    <div role="tablist" aria-label="Editor parts" onKeyDown={onKeyDown} className="flex gap-1 border-b-2 border-rule">
      {TABS.map((t) => (
        <button
          key={t.id}
          ref={(el) => {
            refs.current[t.id] = el;
          }}
          type="button"
          role="tab"
          id={`${baseId}-tab-${t.id}`}
          aria-controls={`${baseId}-panel-${t.id}`}
          aria-selected={tab === t.id}
          tabIndex={tab === t.id ? 0 : -1}
          onClick={() => onTab(t.id)}
          className={`-mb-0.5 rounded-t-md border-b-4 px-4 py-2 font-ui text-sm font-bold ${tab === t.id ? 'border-moss bg-card text-moss-deep' : 'border-transparent text-ink-soft hover:bg-bark-wash hover:text-ink'}`}
        >
          {t.label}
          {counts[t.id] !== undefined && <span className="ml-1.5 font-normal tabular-nums">({counts[t.id]})</span>}
        </button>
      ))}
    </div>
  );
}

/** Asks before an in-app navigation would drop unsaved cues, and lets the browser ask before a reload or close. */
function useLeaveGuard(unsaved: boolean) {
  const blocker = useBlocker(({ currentLocation, nextLocation }) => unsaved && currentLocation.pathname !== nextLocation.pathname);
  useEffect(() => {
    if (!unsaved) return;
    const onBeforeUnload = (event: BeforeUnloadEvent) => {
      event.preventDefault();
      // Older browsers show the prompt only when returnValue is set.
      event.returnValue = '';
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => window.removeEventListener('beforeunload', onBeforeUnload);
  }, [unsaved]);
  return blocker;
}

interface SessionProps extends CaptionsWorkspaceProps {
  track: TrackDto | null;
  detail: TrackDetail | null;
  onUnsaved: (unsaved: boolean) => void;
  onReload: () => void;
  openPanel: (panel: 'new' | 'import') => void;
}

/**
 * One open track (or none): the video with the playhead, the tabs and the cue editor with undo,
 * autosave, quality checks and the keyboard. Remounted when another track is opened or reloaded.
 */
function EditorSession({ tour, track, detail, onUnsaved, onReload, openPanel, renderTimeline, renderStops }: SessionProps) {
  const baseId = useId();
  const [initial] = useState<EditorCue[]>(() => (detail ? editorCues(detail.cues) : []));
  const editor = useCueHistory(initial);
  const autosave = useAutosave(track?.id ?? 0, detail?.track.version ?? 1, editor.cues, initial);
  const playhead = usePlayhead(tour.durationMs);
  const [tab, setTab] = useState<Tab>('cues');
  const [visited, setVisited] = useState<Set<Tab>>(() => new Set<Tab>(['cues']));
  const [onlyIssues, setOnlyIssues] = useState(false);
  const [follow, setFollow] = useState(true);
  const listRef = useRef<HTMLDivElement | null>(null);
  const pressedAt = useRef(0);
  const helpRef = useRef<HTMLDetailsElement | null>(null);
  const rootRef = useRef<HTMLDivElement | null>(null);
  const textareas = useRef(new Map<string, HTMLTextAreaElement>());
  const focusSelected = useRef(false);
  const durationMs = tour.durationMs;
  const editable = track !== null;

  // Quality checks run on a deferred copy, so typing stays quick on long tracks.
  const checked = useDeferredValue(editor.cues);
  const issues = useMemo(() => checkCues(checked), [checked]);
  const issuesByKey = useMemo(() => {
    const map = new Map<string, QualityIssue[]>();
    for (const issue of issues) {
      const key = checked[issue.cueIndex]?.key;
      if (!key) continue;
      const list = map.get(key);
      if (list) list.push(issue);
      else map.set(key, [issue]);
    }
    return map;
  }, [issues, checked]);
  const summary = useMemo(() => summarise(issues, checked.length), [issues, checked.length]);

  const currentIndex = cueIndexAt(editor.cues, playhead.ms);
  const currentCue = editor.cues[currentIndex] ?? null;
  const currentKey = currentCue?.key ?? null;
  const selectedCue = editor.cues[indexOfKey(editor.cues, editor.selected)] ?? null;

  const unsaved = hasUnsavedWork(autosave.state);
  useEffect(() => onUnsaved(unsaved), [unsaved, onUnsaved]);
  const blocker = useLeaveGuard(unsaved);

  // While playing, the selection follows the cue being shown, unless the author is typing in the list.
  const { select } = editor;
  useEffect(() => {
    if (!follow || !playhead.playing || !currentKey) return;
    const active = document.activeElement;
    if (active && listRef.current?.contains(active) && (active.tagName === 'TEXTAREA' || active.tagName === 'INPUT')) return;
    select(currentKey);
  }, [currentKey, follow, playhead.playing, select]);

  // The selected cue scrolls into view inside the list (not the page), gently unless motion is
  // reduced; not when it was just clicked, since moving the row under the pointer would turn the
  // press and the release into a click on something else.
  useEffect(() => {
    const box = listRef.current;
    const key = editor.selected;
    if (!box || !key) return;
    const row = box.querySelector<HTMLElement>(`li[data-cue-key="${CSS.escape(key)}"]`);
    if (row && performance.now() - pressedAt.current > 600) {
      const top = row.offsetTop;
      const bottom = top + row.offsetHeight;
      if (top < box.scrollTop || bottom > box.scrollTop + box.clientHeight) {
        box.scrollTo({ top: Math.max(0, top - box.clientHeight / 3), behavior: prefersReducedMotion() ? 'auto' : 'smooth' });
      }
    }
    if (focusSelected.current) {
      focusSelected.current = false;
      textareas.current.get(key)?.focus({ preventScroll: true });
    }
  }, [editor.selected, editor.cues]);

  const run = (command: EditorCommand) => {
    const key = editor.selected;
    const ms = playhead.ms;
    const focusAfter = () => {
      focusSelected.current = true;
    };
    switch (command) {
      case 'play-pause':
        return playhead.togglePlay();
      case 'back':
        return playhead.seekBy(-SEEK_STEP_S * 1000);
      case 'forward':
        return playhead.seekBy(SEEK_STEP_S * 1000);
      case 'help':
        if (helpRef.current) helpRef.current.open = !helpRef.current.open;
        return;
      case 'undo':
        return editor.undo();
      case 'redo':
        return editor.redo();
    }
    if (!editable) return;
    if (command === 'add-cue') {
      focusAfter();
      return editor.apply((cues) => addCueAt(cues, ms, durationMs));
    }
    if (!key) return;
    switch (command) {
      case 'set-start':
        return editor.apply((cues) => setEdge(cues, key, 'start', ms, durationMs));
      case 'set-end':
        return editor.apply((cues) => setEdge(cues, key, 'end', ms, durationMs));
      case 'nudge-start-back':
        return editor.apply((cues) => nudgeEdge(cues, key, 'start', -NUDGE_MS, durationMs), `nudge:${key}:start`);
      case 'nudge-start-forward':
        return editor.apply((cues) => nudgeEdge(cues, key, 'start', NUDGE_MS, durationMs), `nudge:${key}:start`);
      case 'nudge-end-back':
        return editor.apply((cues) => nudgeEdge(cues, key, 'end', -NUDGE_MS, durationMs), `nudge:${key}:end`);
      case 'nudge-end-forward':
        return editor.apply((cues) => nudgeEdge(cues, key, 'end', NUDGE_MS, durationMs), `nudge:${key}:end`);
      case 'split': {
        const area = textareas.current.get(key);
        const caret = area && document.activeElement === area ? area.selectionStart : null;
        focusAfter();
        return editor.apply((cues) => splitCue(cues, key, ms, caret));
      }
      case 'merge':
        focusAfter();
        return editor.apply((cues) => mergeWithNext(cues, key));
      case 'delete':
        focusAfter();
        return editor.apply((cues) => deleteCue(cues, key));
      case 'previous-cue':
      case 'next-cue': {
        const i = indexOfKey(editor.cues, key);
        const target = editor.cues[command === 'next-cue' ? i + 1 : i - 1];
        if (!target) return;
        focusAfter();
        editor.select(target.key);
        return playhead.seek(target.startMs);
      }
    }
  };
  const runRef = useRef(run);
  runRef.current = run;
  const tabRef = useRef(tab);
  tabRef.current = tab;

  useEffect(() => {
    const onKey = (event: KeyboardEvent) => {
      if (event.defaultPrevented || (event.repeat && event.key === ' ')) return;
      const target = event.target instanceof HTMLElement ? event.target : null;
      if (!target) return;
      if (target !== document.body && !rootRef.current?.contains(target)) return;
      if (target.closest('[data-editor-keys="own"], dialog')) return;
      const tag = target.tagName;
      const type = target instanceof HTMLInputElement ? target.type : '';
      const typing = tag === 'TEXTAREA' || tag === 'SELECT' || (tag === 'INPUT' && TEXT_INPUTS.has(type)) || target.isContentEditable;
      const onControl = tag === 'BUTTON' || tag === 'A' || tag === 'SUMMARY' || tag === 'VIDEO' || (tag === 'INPUT' && !TEXT_INPUTS.has(type));
      const command = editorCommandForKey({ key: event.key, code: event.code, altKey: event.altKey, ctrlKey: event.ctrlKey, metaKey: event.metaKey, shiftKey: event.shiftKey, typing, onControl });
      if (!command) return;
      if (!GLOBAL_COMMANDS.has(command) && tabRef.current !== 'cues') return;
      event.preventDefault();
      runRef.current(command);
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, []);

  const onSelect = useCallback(
    (key: string, seek: boolean) => {
      select(key);
      if (seek) {
        const cue = editor.cues.find((c) => c.key === key);
        if (cue) playhead.seek(cue.startMs);
      }
    },
    [select, editor.cues, playhead.seek],
  );
  const { apply, closeGroup } = editor;
  const onText = useCallback((key: string, text: string) => apply((cues) => setText(cues, key, text), `text:${key}`), [apply]);
  const onTime = useCallback((key: string, edge: 'start' | 'end', ms: number) => apply((cues) => setEdge(cues, key, edge, ms, durationMs)), [apply, durationMs]);
  const registerText = useCallback((key: string, el: HTMLTextAreaElement | null) => {
    if (el) textareas.current.set(key, el);
    else textareas.current.delete(key);
  }, []);

  const changeTab = (next: Tab) => {
    setTab(next);
    setVisited((v) => (v.has(next) ? v : new Set(v).add(next)));
  };

  const ctx: WorkspaceContext = {
    tourId: tour.id,
    durationMs,
    playheadMs: playhead.ms,
    seek: playhead.seek,
    cues: editor.cues,
    selectedCue,
    lang: track?.lang ?? null,
  };
  const nowText = currentCue ? cuePlainText(currentCue.text).trim() || '…' : null;

  const empty = editable ? (
    <EmptyState title="This track has no cues yet">
      Play the video and press <kbd className="rounded border border-edge px-1 font-mono text-xs">Alt</kbd> +{' '}
      <kbd className="rounded border border-edge px-1 font-mono text-xs">N</kbd> (or “Add cue at playhead”) where the first words are said, or import a file.
    </EmptyState>
  ) : (
    <EmptyState title="No captions yet">
      <p>Import a .vtt or .srt file, or start a track and write the captions here beside the video.</p>
      <div className="mt-3 flex flex-wrap justify-center gap-2">
        <Button size="sm" onClick={() => openPanel('import')}>
          Import file
        </Button>
        <Button size="sm" variant="secondary" onClick={() => openPanel('new')}>
          New track
        </Button>
      </div>
    </EmptyState>
  );

  return (
    <div ref={rootRef} className="mt-4">
      {track && (
        <div className="mb-3 space-y-2">
          <SaveStatusLine state={autosave.state} onRetry={autosave.saveNow} />
          {autosave.state.phase === 'conflict' && <ConflictPanel message={autosave.state.message} onLoadTheirs={onReload} onKeepMine={autosave.saveOverTheirs} />}
        </div>
      )}
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,5fr)_minmax(0,7fr)]">
        <div className="space-y-3 lg:sticky lg:top-4">
          <VideoPane tour={tour} playhead={playhead} nowText={nowText} />
          <Transport playhead={playhead} durationMs={durationMs} follow={follow} onFollow={setFollow} hasVideo={tour.renditions.length > 0} />
          {renderTimeline?.(ctx)}
        </div>
        <div className="min-w-0">
          <Tabs tab={tab} onTab={changeTab} baseId={baseId} counts={{ cues: editor.cues.length }} />
          <div role="tabpanel" id={`${baseId}-panel-cues`} aria-labelledby={`${baseId}-tab-cues`} hidden={tab !== 'cues'} className="pt-4">
            <CueEditor
              cues={editor.cues}
              selected={editor.selected}
              currentKey={currentKey}
              issuesByKey={issuesByKey}
              summary={summary}
              onlyIssues={onlyIssues}
              onOnlyIssues={setOnlyIssues}
              durationMs={durationMs}
              canUndo={editor.canUndo}
              canRedo={editor.canRedo}
              run={run}
              onSelect={onSelect}
              onText={onText}
              onTextDone={closeGroup}
              onTime={onTime}
              registerText={registerText}
              listRef={listRef}
              pressedAt={pressedAt}
              helpRef={helpRef}
              empty={empty}
              editable={editable}
            />
          </div>
          <div role="tabpanel" id={`${baseId}-panel-stops`} aria-labelledby={`${baseId}-tab-stops`} hidden={tab !== 'stops'} className="pt-4">
            {visited.has('stops') && renderStops?.(ctx)}
          </div>
          <div role="tabpanel" id={`${baseId}-panel-files`} aria-labelledby={`${baseId}-tab-files`} hidden={tab !== 'files'} className="pt-4">
            {visited.has('files') && <DownloadsPanel tourId={tour.id} track={track} unsaved={unsaved} />}
          </div>
        </div>
      </div>
      <ConfirmDialog
        open={blocker.state === 'blocked'}
        title="Leave with unsaved changes?"
        confirmLabel="Leave anyway"
        cancelLabel="Stay here"
        tone="danger"
        onCancel={() => blocker.reset?.()}
        onConfirm={() => blocker.proceed?.()}
      >
        <p>Some changes to the captions are not saved yet ({autosave.state.phase === 'conflict' ? 'someone else saved first' : 'saving is still going on'}). If you leave now, they are lost.</p>
      </ConfirmDialog>
    </div>
  );
}

function TrackSession(props: Omit<SessionProps, 'detail'> & { track: TrackDto }) {
  const detail = useTrack(props.track.id);
  if (detail.isPending) return <Loading label={`Opening the “${props.track.label}” captions…`} />;
  if (detail.isError) return <ErrorState title="The captions could not be opened" error={detail.error} onRetry={() => void detail.refetch()} />;
  return <EditorSession {...props} detail={detail.data} />;
}

/**
 * The author's workspace for a tour's captions and stops: pick or create a track, import a file
 * with a review step, write and time cues beside the video with the keyboard, see quality checks
 * live, and (through the route's render props) place stops on the timeline.
 */
export function CaptionsWorkspace(props: CaptionsWorkspaceProps) {
  const { tour } = props;
  const client = useQueryClient();
  const tracks = useTracks(tour.id);
  const [params, setParams] = useSearchParams();
  const [panel, setPanel] = useState<'none' | 'new' | 'import' | 'settings'>('none');
  const [generation, setGeneration] = useState(0);
  const [unsaved, setUnsaved] = useState(false);
  const selectId = useId();
  useDocumentTitle(`Captions and stops · ${tour.title}`);

  const list = tracks.data ?? [];
  const wanted = Number(params.get('track'));
  const track = list.find((t) => t.id === wanted) ?? list[0] ?? null;

  const open = (next: TrackDto | null) => {
    setParams(
      (p) => {
        const copy = new URLSearchParams(p);
        if (next) copy.set('track', String(next.id));
        else copy.delete('track');
        return copy;
      },
      { replace: true },
    );
    setGeneration((g) => g + 1);
    setPanel('none');
  };
  const reload = () => {
    if (track) client.removeQueries({ queryKey: captionKeys.track(track.id) });
    setGeneration((g) => g + 1);
  };
  const onUnsaved = useCallback((u: boolean) => setUnsaved(u), []);

  return (
    <div className="mx-auto w-full max-w-7xl px-4 py-6 sm:px-6 sm:py-8">
      <p className="font-ui text-sm">
        <Link to={`/tours/${tour.id}/edit`}>
          <span aria-hidden="true">← </span>Edit tour
        </Link>
      </p>
      <h1 className="mt-1 text-3xl text-moss-deep sm:text-4xl">Captions and stops</h1>
      <p className="mt-1 text-lg text-ink-soft">{tour.title}</p>

      {tracks.isPending ? (
        <Loading label="Loading the caption tracks…" />
      ) : tracks.isError ? (
        <ErrorState title="The caption tracks could not be loaded" error={tracks.error} onRetry={() => void tracks.refetch()} />
      ) : (
        <>
          <div className="mt-5 flex flex-wrap items-end gap-3 rounded-lg border border-rule bg-card p-3 shadow-leaf" data-editor-keys="own">
            {list.length > 0 ? (
              <div className="min-w-0 space-y-1">
                <label htmlFor={selectId} className="block text-sm font-bold">
                  Caption track
                </label>
                <select
                  id={selectId}
                  value={track?.id ?? ''}
                  disabled={unsaved}
                  aria-describedby={unsaved ? `${selectId}-wait` : undefined}
                  onChange={(e) => open(list.find((t) => t.id === Number(e.target.value)) ?? null)}
                  className="block max-w-full rounded-md border border-edge bg-card px-3 py-2 text-base"
                >
                  {list.map((t) => (
                    <option key={t.id} value={t.id}>
                      {trackTitle(t)}
                    </option>
                  ))}
                </select>
              </div>
            ) : (
              <p className="self-center">This tour has no caption tracks yet.</p>
            )}
            <div className="flex flex-wrap gap-2">
              <Button size="sm" variant={panel === 'import' ? 'primary' : 'secondary'} disabled={unsaved} onClick={() => setPanel(panel === 'import' ? 'none' : 'import')} aria-expanded={panel === 'import'}>
                Import file
              </Button>
              <Button size="sm" variant={panel === 'new' ? 'primary' : 'secondary'} disabled={unsaved} onClick={() => setPanel(panel === 'new' ? 'none' : 'new')} aria-expanded={panel === 'new'}>
                New track
              </Button>
              {track && (
                <Button size="sm" variant="quiet" disabled={unsaved} onClick={() => setPanel(panel === 'settings' ? 'none' : 'settings')} aria-expanded={panel === 'settings'}>
                  Track settings
                </Button>
              )}
            </div>
            {unsaved && (
              <p id={`${selectId}-wait`} className="w-full text-sm text-ink-soft">
                Switching and importing wait until your changes are saved.
              </p>
            )}
          </div>
          <div className="mt-3 space-y-3">
            {panel === 'new' && <NewTrackForm tourId={tour.id} tracks={list} onCreated={open} onCancel={() => setPanel('none')} />}
            {panel === 'import' && <ImportPanel tourId={tour.id} durationMs={tour.durationMs} tracks={list} openTrack={track} onImported={open} onClose={() => setPanel('none')} />}
            {panel === 'settings' && track && <TrackSettings tourId={tour.id} track={track} onClose={() => setPanel('none')} onDeleted={() => open(list.find((t) => t.id !== track.id) ?? null)} />}
          </div>
          {track ? (
            <TrackSession key={`${track.id}:${generation}`} {...props} track={track} onUnsaved={onUnsaved} onReload={reload} openPanel={setPanel} />
          ) : (
            <EditorSession key={`none:${generation}`} {...props} track={null} detail={null} onUnsaved={onUnsaved} onReload={reload} openPanel={setPanel} />
          )}
        </>
      )}
    </div>
  );
}

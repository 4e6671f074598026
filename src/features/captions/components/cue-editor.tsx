import { useMemo, type ReactNode, type RefObject } from 'react';
import type { QualityIssue } from '@shared/captions/quality';
import { Button } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import type { EditorCue } from '../lib/cue-ops';
import { ariaShortcutFor, type EditorCommand } from '../lib/editor-keys';
import type { QualitySummary as Summary } from '../lib/quality-view';
import { CueRow } from './cue-row';
import { QualitySummary } from './quality-summary';
import { ShortcutHelp } from './shortcut-help';

const NO_ISSUES: readonly QualityIssue[] = [];

/** Props of CueEditor; the session owns the state and passes the handlers down. */
export interface CueEditorProps {
  cues: readonly EditorCue[];
  selected: string | null;
  currentKey: string | null;
  issuesByKey: ReadonlyMap<string, readonly QualityIssue[]>;
  summary: Summary;
  onlyIssues: boolean;
  onOnlyIssues: (on: boolean) => void;
  durationMs: number | null;
  canUndo: boolean;
  canRedo: boolean;
  run: (command: EditorCommand) => void;
  onSelect: (key: string, seek: boolean) => void;
  onText: (key: string, text: string) => void;
  onTextDone: () => void;
  onTime: (key: string, edge: 'start' | 'end', ms: number) => void;
  registerText: (key: string, el: HTMLTextAreaElement | null) => void;
  listRef: RefObject<HTMLDivElement | null>;
  /** When the pointer last went down in the list, so a selection made by clicking does not scroll the list under it. */
  pressedAt: RefObject<number>;
  helpRef: RefObject<HTMLDetailsElement | null>;
  /** Shown instead of the list when the track has no cues. */
  empty: ReactNode;
  /** False when no track is open: only `empty` is shown, since there is nothing to edit yet. */
  editable: boolean;
}

function Tool({ command, children, run, disabled }: { command: EditorCommand; children: ReactNode; run: (c: EditorCommand) => void; disabled?: boolean }) {
  const keys = ariaShortcutFor(command);
  return (
    <Button size="sm" variant="secondary" onClick={() => run(command)} disabled={disabled} aria-keyshortcuts={keys} title={keys ? `Shortcut: ${keys.replace('Bracket', '').replace('Control', 'Ctrl')}` : undefined}>
      {children}
    </Button>
  );
}

/**
 * The timed cue list with its toolbar, the quality summary and the shortcut help. Every toolbar
 * button has a shortcut (announced with aria-keyshortcuts), so the list can be worked from the
 * keyboard alone.
 */
export function CueEditor(props: CueEditorProps) {
  const { cues, selected, currentKey, issuesByKey, summary, onlyIssues, run, canUndo, canRedo, listRef } = props;
  const shown = onlyIssues ? cues.filter((c) => issuesByKey.has(c.key)) : cues;
  const none = selected === null;
  const numbers = useMemo(() => new Map(cues.map((c, i) => [c.key, i + 1])), [cues]);

  if (!props.editable) return <div className="rounded-md border border-rule bg-paper p-2">{props.empty}</div>;
  return (
    <div className="space-y-3">
      <ShortcutHelp ref={props.helpRef} />
      <QualitySummary summary={summary} onlyIssues={onlyIssues} onOnlyIssues={props.onOnlyIssues} />
      <div role="toolbar" aria-label="Cue tools" className="flex flex-wrap gap-1.5">
        <Tool command="add-cue" run={run}>
          Add cue at playhead
        </Tool>
        <Tool command="set-start" run={run} disabled={none}>
          Move start to playhead
        </Tool>
        <Tool command="set-end" run={run} disabled={none}>
          Move end to playhead
        </Tool>
        <Tool command="nudge-start-back" run={run} disabled={none}>
          Start −0.1 s
        </Tool>
        <Tool command="nudge-start-forward" run={run} disabled={none}>
          Start +0.1 s
        </Tool>
        <Tool command="nudge-end-back" run={run} disabled={none}>
          End −0.1 s
        </Tool>
        <Tool command="nudge-end-forward" run={run} disabled={none}>
          End +0.1 s
        </Tool>
        <Tool command="split" run={run} disabled={none}>
          Split
        </Tool>
        <Tool command="merge" run={run} disabled={none}>
          Merge with next
        </Tool>
        <Tool command="delete" run={run} disabled={none}>
          Delete cue
        </Tool>
        <Tool command="undo" run={run} disabled={!canUndo}>
          Undo
        </Tool>
        <Tool command="redo" run={run} disabled={!canRedo}>
          Redo
        </Tool>
      </div>
      <div
        ref={listRef}
        onPointerDown={() => {
          props.pressedAt.current = performance.now();
        }}
        className="relative max-h-[72vh] min-h-48 overflow-y-auto rounded-md border border-rule bg-paper p-2"
      >
        {cues.length === 0 ? (
          props.empty
        ) : shown.length === 0 ? (
          <EmptyState title="No cue has an issue">Untick “Only cues with issues” to see them all.</EmptyState>
        ) : (
          <ol aria-label="Cues" className="space-y-2">
            {shown.map((cue) => (
              <CueRow
                key={cue.key}
                cue={cue}
                number={numbers.get(cue.key) ?? 0}
                selected={cue.key === selected}
                current={cue.key === currentKey}
                issues={issuesByKey.get(cue.key) ?? NO_ISSUES}
                durationMs={props.durationMs}
                onSelect={props.onSelect}
                onText={props.onText}
                onTextDone={props.onTextDone}
                onTime={props.onTime}
                registerText={props.registerText}
              />
            ))}
          </ol>
        )}
      </div>
    </div>
  );
}

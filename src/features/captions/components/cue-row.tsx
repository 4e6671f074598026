import { memo, type MouseEvent } from 'react';
import { measureCue, type QualityIssue } from '@shared/captions/quality';
import { TimeField } from '@/components/time-field';
import { formatTimeInput } from '@/lib/time-input';
import type { EditorCue } from '../lib/cue-ops';
import { QualityBadges } from './quality-badges';

/** Props of CueRow; callbacks take the cue's key so one set of handlers serves every row. */
export interface CueRowProps {
  cue: EditorCue;
  number: number;
  selected: boolean;
  current: boolean;
  issues: readonly QualityIssue[];
  durationMs: number | null;
  onSelect: (key: string, seek: boolean) => void;
  onText: (key: string, text: string) => void;
  onTextDone: () => void;
  onTime: (key: string, edge: 'start' | 'end', ms: number) => void;
  registerText: (key: string, el: HTMLTextAreaElement | null) => void;
}

const FIELD_TAGS = new Set(['INPUT', 'TEXTAREA', 'BUTTON', 'SELECT', 'LABEL']);

function rowsFor(text: string): number {
  return Math.min(6, Math.max(2, text.split('\n').length));
}

/**
 * One cue in the editor: its number and times, the text in a text area, live measures (duration,
 * characters per second) and quality badges. A click on the row (outside the fields) selects the
 * cue and moves the playhead to its start; focusing a field only selects it.
 */
export const CueRow = memo(function CueRow({ cue, number, selected, current, issues, durationMs, onSelect, onText, onTextDone, onTime, registerText }: CueRowProps) {
  const m = measureCue(cue);
  const hasError = issues.some((i) => i.severity === 'error');
  const idBase = `cue-${cue.key}`;

  // On press, not click: selecting a row can scroll the list, and a click whose press and release
  // land on different elements would be reported on the row itself and seek by mistake.
  const onPress = (event: MouseEvent<HTMLLIElement>) => {
    if (event.button !== 0) return;
    const target = event.target as HTMLElement;
    if (FIELD_TAGS.has(target.tagName) || target.closest('input,textarea,button,label')) return;
    onSelect(cue.key, true);
  };

  return (
    <li
      data-cue-key={cue.key}
      aria-labelledby={`${idBase}-n`}
      aria-current={current ? 'true' : undefined}
      onMouseDown={onPress}
      onFocus={() => onSelect(cue.key, false)}
      className={`relative rounded-md border px-3 py-2 ${selected ? 'border-moss ring-2 ring-moss' : hasError ? 'border-maple' : 'border-rule'} ${
        current ? 'bg-moss-wash' : 'bg-card'
      }`}
    >
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
        <button
          type="button"
          id={`${idBase}-n`}
          onClick={() => onSelect(cue.key, true)}
          aria-label={`Cue ${number}, go to ${formatTimeInput(cue.startMs)}`}
          title="Go to this cue"
          className="rounded font-ui text-sm font-bold text-moss-deep tabular-nums hover:underline"
        >
          {number}
        </button>
        <TimeField label={`Start of cue ${number}`} hideLabel valueMs={cue.startMs} durationMs={durationMs} onCommit={(ms) => onTime(cue.key, 'start', ms)} />
        <span aria-hidden="true" className="text-ink-soft">
          →
        </span>
        <TimeField label={`End of cue ${number}`} hideLabel valueMs={cue.endMs} durationMs={durationMs} onCommit={(ms) => onTime(cue.key, 'end', ms)} />
        <span className="font-ui text-xs text-ink-soft tabular-nums">
          {(m.durationMs / 1000).toFixed(1)} s{m.charactersPerSecond !== null ? ` · ${m.charactersPerSecond.toFixed(1)} cps` : ''}
        </span>
        {current && (
          <span className="ml-auto font-ui text-xs font-bold text-moss-deep">
            <span aria-hidden="true">▶ </span>Showing now
          </span>
        )}
      </div>
      <label htmlFor={`${idBase}-text`} className="sr-only">
        Text of cue {number}
      </label>
      <textarea
        id={`${idBase}-text`}
        ref={(el) => registerText(cue.key, el)}
        data-cue-key={cue.key}
        value={cue.text}
        rows={rowsFor(cue.text)}
        spellCheck
        onChange={(e) => onText(cue.key, e.target.value)}
        onBlur={onTextDone}
        placeholder="Type what is said…"
        className="mt-1.5 block w-full resize-y rounded-md border border-edge bg-card px-2 py-1.5 text-base leading-snug"
      />
      <QualityBadges issues={issues} id={idBase} cueNumber={number} />
    </li>
  );
});

import { useId, useState, type KeyboardEvent } from 'react';
import { checkTimeInput, formatTimeInput, TIME_INPUT_HINT } from '@/lib/time-input';

/** Props of TimeField. */
export interface TimeFieldProps {
  label: string;
  /** The stored moment; the field shows it until the author types. */
  valueMs: number;
  /** Called with a checked moment when the author leaves the field or presses Enter. */
  onCommit: (ms: number) => void;
  /** The video's length, when known: later moments are refused with a message. */
  durationMs?: number | null;
  /** Hides the label visually (it stays the accessible name), for dense rows. */
  hideLabel?: boolean;
  /** A message from outside (e.g. the server) shown under the field. */
  error?: string;
  disabled?: boolean;
  className?: string;
}

/**
 * A moment typed as minutes:seconds.milliseconds and checked with the WebVTT timestamp parser the
 * caption import uses. Typing is free; the value is read on Enter or when the field is left, and
 * Escape puts the stored value back.
 */
export function TimeField({ label, valueMs, onCommit, durationMs, hideLabel = false, error, disabled, className = '' }: TimeFieldProps) {
  const id = useId();
  const [draft, setDraft] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const shown = draft ?? formatTimeInput(valueMs);
  const message = problem ?? error;

  const commit = () => {
    if (draft === null) return;
    const checked = checkTimeInput(draft, durationMs);
    if (!checked.ok) {
      setProblem(checked.message);
      return;
    }
    setProblem(null);
    setDraft(null);
    if (checked.ms !== valueMs) onCommit(checked.ms);
  };
  const onKeyDown = (event: KeyboardEvent<HTMLInputElement>) => {
    if (event.key === 'Enter') {
      event.preventDefault();
      commit();
    } else if (event.key === 'Escape' && draft !== null) {
      event.preventDefault();
      event.stopPropagation();
      setDraft(null);
      setProblem(null);
    }
  };

  return (
    <div className={className}>
      <label htmlFor={id} className={hideLabel ? 'sr-only' : 'block text-sm font-bold'}>
        {label}
      </label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        spellCheck={false}
        autoComplete="off"
        value={shown}
        disabled={disabled}
        title={`Type ${TIME_INPUT_HINT}`}
        aria-invalid={message ? true : undefined}
        aria-describedby={message ? `${id}-error` : undefined}
        onChange={(e) => {
          setDraft(e.target.value);
          setProblem(null);
        }}
        onBlur={commit}
        onKeyDown={onKeyDown}
        className={`block w-[7.25rem] rounded-md border bg-card px-2 py-1 font-mono text-sm text-ink tabular-nums ${message ? 'border-2 border-maple' : 'border-edge'}`}
      />
      {message && (
        <p id={`${id}-error`} className="mt-1 max-w-[16rem] text-xs font-bold text-maple">
          <span className="sr-only">Error: </span>
          {message}
        </p>
      )}
    </div>
  );
}

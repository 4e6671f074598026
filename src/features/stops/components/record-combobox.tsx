import { useQuery } from '@tanstack/react-query';
import { useId, useRef, useState, type KeyboardEvent } from 'react';
import { CultivarName, FictionalMark } from '@/components/cultivar-name';
import { cultivarPickerQueryOptions, type PickedCultivar } from '@/components/cultivar-picker';
import { Spinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { useDebouncedValue } from '@/lib/use-debounced-value';

/** What a stop links to: a record, or nothing (an unidentified tree). */
export type StopRecord = Pick<PickedCultivar, 'id' | 'acceptedName' | 'fictional'> & Partial<Pick<PickedCultivar, 'nameSegments' | 'epithet'>>;

/** Props of RecordCombobox. */
export interface RecordComboboxProps {
  label: string;
  value: StopRecord | null;
  onChange: (record: StopRecord | null) => void;
  /** Opens the small form for a record that does not exist yet. */
  onPropose: (typed: string) => void;
  error?: string;
}

type Option = { kind: 'none' } | { kind: 'record'; record: PickedCultivar } | { kind: 'propose' };

/** The chosen record as printed beside the search box, italics included when the segments are known. */
export function ChosenRecord({ value }: { value: StopRecord | null }) {
  if (!value) return <span>Unidentified tree</span>;
  return (
    <>
      {value.nameSegments ? <CultivarName record={{ acceptedName: value.acceptedName, nameSegments: value.nameSegments }} /> : value.acceptedName}{' '}
      <FictionalMark record={value} />
    </>
  );
}

/**
 * Picks the cultivar record of a stop: a combobox (WAI-ARIA 1.2 pattern, list autocomplete) whose
 * list starts with "Unidentified tree", then the approved records matching what is typed (with
 * italics from the server's name segments and a mark on invented demo records), then "Propose a
 * new record". Arrow keys move through the list, Enter chooses, Escape closes it.
 */
export function RecordCombobox({ label, value, onChange, onPropose, error }: RecordComboboxProps) {
  const id = useId();
  const listId = `${id}-list`;
  const [text, setText] = useState('');
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(0);
  const input = useRef<HTMLInputElement>(null);
  const q = useDebouncedValue(text.trim(), 200);
  const search = useQuery({ ...cultivarPickerQueryOptions(q), enabled: open });
  const records = search.data?.items ?? [];
  const options: Option[] = [{ kind: 'none' }, ...records.map((record) => ({ kind: 'record' as const, record })), { kind: 'propose' }];
  const activeIndex = Math.min(active, options.length - 1);
  const optionId = (i: number) => `${id}-opt-${i}`;

  const choose = (option: Option) => {
    if (option.kind === 'none') onChange(null);
    else if (option.kind === 'record') onChange(option.record);
    else onPropose(text.trim());
    setOpen(false);
    setText('');
    setActive(0);
  };

  const onKeyDown = (event: KeyboardEvent<HTMLInputElement>) => {
    switch (event.key) {
      case 'ArrowDown':
        event.preventDefault();
        if (!open) setOpen(true);
        else setActive((activeIndex + 1) % options.length);
        break;
      case 'ArrowUp':
        event.preventDefault();
        if (!open) setOpen(true);
        else setActive((activeIndex - 1 + options.length) % options.length);
        break;
      case 'Home':
        if (open) {
          event.preventDefault();
          setActive(0);
        }
        break;
      case 'End':
        if (open) {
          event.preventDefault();
          setActive(options.length - 1);
        }
        break;
      case 'Enter':
        if (open) {
          event.preventDefault();
          choose(options[activeIndex]!);
        }
        break;
      case 'Escape':
        if (open) {
          event.preventDefault();
          event.stopPropagation();
          setOpen(false);
        }
        break;
    }
  };

  const status = search.isError
    ? errorMessage(search.error)
    : search.isPending || (search.isFetching && !search.data)
      ? 'Looking…'
      : records.length === 0
        ? q
          ? `No record matches “${q}”.`
          : 'No records yet.'
        : search.data?.fuzzy
          ? `No name contains “${q}”; ${records.length} close name${records.length === 1 ? '' : 's'}.`
          : `${records.length} record${records.length === 1 ? '' : 's'}${q ? ` for “${q}”` : ''}.`;

  return (
    <div className="relative">
      <label htmlFor={`${id}-input`} className="block font-bold">
        {label}
      </label>
      <p id={`${id}-chosen`} className="text-sm">
        <span className="text-ink-soft">Linked to: </span>
        <ChosenRecord value={value} />
      </p>
      <input
        ref={input}
        id={`${id}-input`}
        type="text"
        role="combobox"
        aria-expanded={open}
        aria-controls={listId}
        aria-autocomplete="list"
        aria-activedescendant={open ? optionId(activeIndex) : undefined}
        aria-describedby={`${id}-chosen ${id}-hint${error ? ` ${id}-error` : ''}`}
        aria-invalid={error ? true : undefined}
        autoComplete="off"
        placeholder="Type part of a name"
        value={text}
        onChange={(e) => {
          setText(e.target.value);
          setOpen(true);
          setActive(0);
        }}
        onFocus={() => setOpen(true)}
        onBlur={() => setOpen(false)}
        onKeyDown={onKeyDown}
        className={`mt-1 block w-full rounded-md border bg-card px-3 py-2 text-base ${error ? 'border-2 border-maple' : 'border-edge'}`}
      />
      <p id={`${id}-hint`} className="mt-1 text-sm text-ink-soft">
        Arrow keys move through the list, Enter chooses. Misspellings find close names too.
      </p>
      {error && (
        <p id={`${id}-error`} className="mt-1 text-sm font-bold text-maple">
          <span className="sr-only">Error: </span>
          {error}
        </p>
      )}
      <p className="sr-only" role="status" aria-live="polite">
        {open ? status : ''}
      </p>
      {open && (
        <div className="absolute right-0 left-0 z-20 mt-1 rounded-md border border-edge bg-card shadow-leaf">
          <p className="flex items-center gap-2 border-b border-rule px-3 py-1.5 font-ui text-xs text-ink-soft" aria-hidden="true">
            {search.isFetching && <Spinner className="size-3" />}
            {status}
          </p>
          <ul id={listId} role="listbox" aria-label={`${label}: choices`} className="max-h-72 overflow-y-auto py-1">
            {options.map((option, i) => (
              <li
                key={option.kind === 'record' ? `r${option.record.id}` : option.kind}
                id={optionId(i)}
                role="option"
                aria-selected={i === activeIndex}
                // Keeps the focus in the input, so the list does not close before the click lands.
                onMouseDown={(e) => e.preventDefault()}
                onClick={() => choose(option)}
                onMouseMove={() => i !== activeIndex && setActive(i)}
                className={`flex min-h-10 cursor-pointer flex-wrap items-center gap-2 px-3 py-1.5 ${i === activeIndex ? 'bg-moss-wash' : ''} ${option.kind === 'propose' ? 'border-t border-rule font-ui text-sm font-bold text-moss' : ''}`}
              >
                {option.kind === 'none' && (
                  <span>
                    Unidentified tree <span className="font-ui text-xs text-ink-soft">— no record linked</span>
                  </span>
                )}
                {option.kind === 'record' && (
                  <>
                    <span className="flex-1">
                      <CultivarName record={option.record} />
                    </span>
                    <FictionalMark record={option.record} />
                  </>
                )}
                {option.kind === 'propose' && <span>Propose a new cultivar record{text.trim() ? ` for “${text.trim()}”` : ''}…</span>}
              </li>
            ))}
          </ul>
        </div>
      )}
    </div>
  );
}

import { useId, useState } from 'react';
import type { CultivarSummary } from '@shared/schemas/cultivars';
import { CultivarName, FictionalMark } from '@/components/cultivar-name';
import { Spinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { useCultivarSearch } from '../api/compare-api';

/** Props of RecordPicker. */
export interface RecordPickerProps {
  /** Records already on screen, left out of the results. */
  exclude: readonly number[];
  onPick: (record: CultivarSummary) => void;
  label?: string;
}

/**
 * A search box over the cultivar records with the matches as buttons under it: typing narrows the
 * list (misspellings on record are found too), and each button adds that record.
 */
export function RecordPicker({ exclude, onPick, label = 'Find a cultivar record' }: RecordPickerProps) {
  const id = useId();
  const [text, setText] = useState('');
  const q = useDebouncedValue(text.trim(), 250);
  const search = useCultivarSearch(q);
  const items = (search.data?.items ?? []).filter((c) => !exclude.includes(c.id));

  return (
    <div>
      <label htmlFor={`${id}-q`} className="block font-bold">
        {label}
      </label>
      <p id={`${id}-hint`} className="text-sm text-ink-soft">
        Type part of a name; common misspellings are found too.
      </p>
      <input
        id={`${id}-q`}
        type="search"
        value={text}
        onChange={(e) => setText(e.target.value)}
        aria-describedby={`${id}-hint ${id}-status`}
        autoComplete="off"
        className="mt-1 block w-full rounded-md border border-edge bg-card px-3 py-2 text-base"
      />
      <p id={`${id}-status`} role="status" className="mt-2 flex items-center gap-2 text-sm text-ink-soft">
        {search.isFetching && <Spinner className="size-4" />}
        {search.isError
          ? null
          : search.isPending
            ? 'Looking…'
            : items.length === 0
              ? q
                ? `No other record matches “${q}”.`
                : 'No other records to add.'
              : `${items.length} record${items.length === 1 ? '' : 's'} to choose from${q ? ` for “${q}”` : ''}.`}
      </p>
      {search.isError && (
        <p role="alert" className="text-sm font-bold text-maple">
          {errorMessage(search.error)}
        </p>
      )}
      {items.length > 0 && (
        <ul className="mt-2 divide-y divide-rule rounded-md border border-rule bg-card">
          {items.map((c) => (
            <li key={c.id}>
              <button type="button" onClick={() => onPick(c)} className="flex min-h-11 w-full flex-wrap items-center gap-2 px-3 py-2 text-left hover:bg-moss-wash">
                <span aria-hidden="true" className="font-bold text-moss">
                  +
                </span>
                <span className="sr-only">Add </span>
                <span className="flex-1">
                  <CultivarName record={c} />
                </span>
                <FictionalMark record={c} />
              </button>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
